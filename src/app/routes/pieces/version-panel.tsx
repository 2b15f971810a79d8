import { Link } from 'react-router-dom';
import type { ProjectSummary, VersionDTO } from '@shared/schemas/submission';
import { UserMarkdown } from '@/components/ui/user-markdown';
import { paths } from '@/config/paths';
import { PinnedPhoto } from '@/features/reviews/components/pinned-photo';
import { ReviewSummary } from '@/features/reviews/components/review-summary';

const date = (iso: string) =>
  new Date(iso).toLocaleString(undefined, {
    day: 'numeric',
    month: 'long',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
  });

/** One version of a piece as sent: its photos with the mentor's pins, the notes, the links, and its review. */
export function VersionPanel({
  version,
  project,
  ownerView,
  compact = false,
}: {
  version: VersionDTO;
  project: ProjectSummary;
  ownerView: boolean;
  compact?: boolean;
}) {
  const pins = version.review?.pins ?? [];
  const links = [
    ...version.logEntries.map((r) => ({
      key: `l${r.id}`,
      label: r.label ?? `Log entry ${r.id} (removed)`,
      to: r.label ? paths.logEntry(r.id) : null,
      kind: 'Bench log',
    })),
    ...version.calculations.map((r) => ({
      key: `c${r.id}`,
      label: r.label ?? `Calculation ${r.id} (removed)`,
      to: ownerView && r.label ? paths.savedCalculations : null,
      kind: 'Calculation',
    })),
  ];
  return (
    <article aria-labelledby={`version-${version.id}`} className="space-y-5">
      <header>
        <h2 id={`version-${version.id}`} className="font-serif text-2xl font-semibold">
          Version <span className="num">{version.number}</span>
        </h2>
        <p className="text-sm text-muted">{version.sentAt ? `Sent ${date(version.sentAt)}` : 'Draft, not sent yet'}</p>
      </header>
      {version.review ? (
        <ReviewSummary review={version.review} project={project} photos={version.photos} />
      ) : (
        version.sentAt && (
          <p className="rounded-md border border-steel/30 bg-steel/5 p-3 text-sm">Waiting for review.</p>
        )
      )}
      <section aria-label="Photos" className={`grid gap-4 ${compact ? '' : 'sm:grid-cols-2'}`}>
        {version.photos.map((photo, i) => (
          <PinnedPhoto
            key={photo.uploadId}
            photo={photo}
            index={i}
            pins={pins.filter((p) => p.uploadId === photo.uploadId)}
          />
        ))}
        {version.photos.length === 0 && <p className="text-muted">No photos yet.</p>}
      </section>
      <section aria-label="Notes">
        <h3 className="text-sm font-semibold text-muted">Notes</h3>
        <UserMarkdown text={version.notes} empty="No notes." />
      </section>
      {links.length > 0 && (
        <section aria-label="Linked records">
          <h3 className="text-sm font-semibold text-muted">Linked records</h3>
          <ul className="mt-1 space-y-1 text-sm">
            {links.map((l) => (
              <li key={l.key}>
                <span className="text-muted">{l.kind}:</span> {l.to ? <Link to={l.to}>{l.label}</Link> : l.label}
              </li>
            ))}
          </ul>
        </section>
      )}
    </article>
  );
}
