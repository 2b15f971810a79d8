import { Columns2, RefreshCw } from 'lucide-react';
import { useState } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { Button, ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-me';
import { useSubmission } from '@/features/submissions/api/get-submissions';
import { StatusBadge } from '@/features/submissions/components/status-badge';
import { VersionPanel } from './version-panel';

/** A piece with all its versions: one at a time in tabs, or side by side to compare. */
export function Component() {
  const id = Number(useParams().id);
  const user = useUser();
  const { data, isPending, error } = useSubmission(id);
  const [params] = useSearchParams();
  const [picked, setPicked] = useState<number | null>(Number(params.get('version')) || null);
  const [sideBySide, setSideBySide] = useState(false);
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} title="This piece could not be opened" />;

  const own = data.apprentice.id === user.id;
  const versions = data.versions;
  const latest = versions[versions.length - 1];
  const shown = versions.find((v) => v.number === picked) ?? latest;
  const canCompare = versions.length > 1;

  return (
    <>
      <PageHeader
        title={data.project.title}
        lead={`${own ? '' : `${data.apprentice.name} · `}${data.project.lesson.title} · ${data.project.course.title}`}
        actions={
          <>
            <StatusBadge status={data.status} />
            {own && data.status === 'draft' && (
              <ButtonLink to={paths.editSubmission(data.id)}>Carry on with the draft</ButtonLink>
            )}
            {!own && data.status === 'waiting' && user.role !== 'apprentice' && (
              <ButtonLink to={paths.review(data.id)}>Review it</ButtonLink>
            )}
          </>
        }
      />
      {own && data.status === 'rework' && (
        <div
          role="status"
          className="mb-6 flex flex-wrap items-center justify-between gap-3 rounded-lg border border-rework/40 bg-rework/10 p-4"
        >
          <p>
            {latest.sentAt
              ? 'Your mentor asked for rework. Read the scores and the pins on your photos, rework the piece, then send a new version.'
              : `Version ${latest.number} is a draft: carry on with it and send it when ready.`}
          </p>
          <ButtonLink to={paths.editSubmission(data.id)}>
            <RefreshCw className="size-4" aria-hidden />
            {latest.sentAt ? 'Send a new version' : `Carry on with version ${latest.number}`}
          </ButtonLink>
        </div>
      )}
      {canCompare && (
        <div className="mb-4 flex flex-wrap items-center gap-3">
          {!sideBySide && (
            <div role="tablist" aria-label="Versions" className="flex flex-wrap gap-1">
              {versions.map((v) => (
                <button
                  key={v.id}
                  type="button"
                  role="tab"
                  aria-selected={v.id === shown.id}
                  aria-controls="version-shown"
                  onClick={() => setPicked(v.number)}
                  className={`min-h-11 rounded-md border px-4 text-sm font-semibold ${v.id === shown.id ? 'border-brass bg-brass/15 text-ink' : 'border-rule bg-card text-muted hover:text-ink'}`}
                >
                  Version <span className="num">{v.number}</span>
                  <span className="font-normal">
                    {' '}
                    ·{' '}
                    {v.review ? (v.review.outcome === 'passed' ? 'passed' : 'rework') : v.sentAt ? 'waiting' : 'draft'}
                  </span>
                </button>
              ))}
            </div>
          )}
          <Button variant="secondary" aria-pressed={sideBySide} onClick={() => setSideBySide(!sideBySide)}>
            <Columns2 className="size-4" aria-hidden />
            {sideBySide ? 'One version at a time' : 'Side by side'}
          </Button>
        </div>
      )}
      {sideBySide ? (
        <div className="grid auto-cols-[minmax(22rem,1fr)] grid-flow-col gap-6 overflow-x-auto pb-4">
          {versions.map((v) => (
            <div key={v.id} className="rounded-lg border border-rule bg-paper p-4">
              <VersionPanel version={v} project={data.project} ownerView={own} compact />
            </div>
          ))}
        </div>
      ) : (
        <div id="version-shown" role={canCompare ? 'tabpanel' : undefined}>
          <VersionPanel version={shown} project={data.project} ownerView={own} />
        </div>
      )}
    </>
  );
}
