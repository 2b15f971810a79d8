import { useParams } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { UserMarkdown } from '@/components/ui/user-markdown';
import { paths } from '@/config/paths';
import { RequireRole } from '@/app/require-role';
import { ReviewForm } from '@/features/reviews/components/review-form';
import { waitingFor } from '@/features/reviews/components/waiting-time';
import { useSubmission } from '@/features/submissions/api/get-submissions';
import { StatusBadge } from '@/features/submissions/components/status-badge';
import { VersionPanel } from '../pieces/version-panel';

function ReviewPiece() {
  const id = Number(useParams().submissionId);
  const { data, isPending, error } = useSubmission(id);
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} title="This piece could not be opened" />;
  const version = data.versions[data.versions.length - 1];
  if (data.status !== 'waiting' || !version) {
    return (
      <EmptyState title="This piece is not waiting for review">
        <p>It may have been reviewed already.</p>
        <ButtonLink to={paths.submission(data.id)} variant="secondary" className="mt-4">
          Open the piece and its reviews
        </ButtonLink>
      </EmptyState>
    );
  }
  const earlier = data.versions.slice(0, -1);
  return (
    <>
      <PageHeader
        title={data.project.title}
        lead={
          <>
            {data.apprentice.name} · version <span className="num">{version.number}</span> · waiting{' '}
            <span className="num">{waitingFor(version.sentAt!)}</span> · {data.project.lesson.title}
          </>
        }
        actions={<StatusBadge status={data.status} />}
      />
      <div className="mb-6 grid gap-4 md:grid-cols-2">
        <section aria-labelledby="notes-title" className="rounded-lg border border-rule bg-card p-4">
          <h2 id="notes-title" className="font-serif text-lg font-semibold">
            {data.apprentice.name.split(' ')[0]}’s notes
          </h2>
          <UserMarkdown text={version.notes} empty="No notes with this version." />
        </section>
        {earlier.length > 0 && (
          <details className="rounded-lg border border-rule bg-card p-4">
            <summary className="min-h-11 cursor-pointer content-center font-serif text-lg font-semibold">
              Earlier versions and their reviews (<span className="num">{earlier.length}</span>)
            </summary>
            <div className="mt-3 space-y-8">
              {earlier.map((v) => (
                <VersionPanel key={v.id} version={v} project={data.project} ownerView={false} compact />
              ))}
            </div>
          </details>
        )}
      </div>
      <ReviewForm submission={data} version={version} />
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={['mentor', 'admin']}>
      <ReviewPiece />
    </RequireRole>
  );
}
