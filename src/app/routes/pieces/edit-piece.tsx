import { Link, useParams } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { RequireRole } from '@/app/require-role';
import { useUser } from '@/features/auth/api/get-me';
import { ReviewSummary } from '@/features/reviews/components/review-summary';
import { useSubmission } from '@/features/submissions/api/get-submissions';
import { StatusBadge } from '@/features/submissions/components/status-badge';
import { SubmissionForm } from '@/features/submissions/components/submission-form';
import { ProjectBriefFold } from './project-heading';

function EditPiece() {
  const id = Number(useParams().id);
  const user = useUser();
  const { data, isPending, error } = useSubmission(id);
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} title="This piece could not be opened" />;
  const latest = data.versions[data.versions.length - 1];
  if (data.apprentice.id !== user.id || data.status === 'waiting' || data.status === 'passed') {
    return (
      <EmptyState title={data.status === 'passed' ? 'This piece has passed' : 'This piece cannot be changed now'}>
        <p>
          {data.status === 'waiting'
            ? 'It is waiting for review; you can change it again if the mentor asks for rework.'
            : 'Open it to read the review.'}
        </p>
        <ButtonLink to={paths.submission(data.id)} variant="secondary" className="mt-4">
          Open the piece
        </ButtonLink>
      </EmptyState>
    );
  }
  // A reworked version starts from the one reviewed; a draft carries on as it is.
  const isDraft = latest.sentAt === null;
  const versionNumber = isDraft ? latest.number : latest.number + 1;
  const reviewed = [...data.versions].reverse().find((v) => v.review);
  return (
    <>
      <PageHeader
        title={data.project.title}
        lead={`Version ${versionNumber} · ${data.project.lesson.title} · ${data.project.course.title}`}
        actions={<StatusBadge status={data.status} />}
      />
      <ProjectBriefFold project={data.project} />
      <div className={reviewed ? 'grid gap-8 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]' : ''}>
        <SubmissionForm
          key={`${data.id}-${versionNumber}`}
          projectId={data.project.id}
          submissionId={data.id}
          versionNumber={versionNumber}
          start={{
            notes: latest.notes,
            photos: latest.photos,
            logEntries: latest.logEntries,
            calculations: latest.calculations,
          }}
        />
        {reviewed?.review && (
          <aside aria-label="What the mentor asked for" className="space-y-2">
            <h2 className="font-serif text-xl font-semibold">Review of version {reviewed.number}</h2>
            <ReviewSummary review={reviewed.review} project={data.project} photos={reviewed.photos} />
            <Link to={`${paths.submission(data.id)}?version=${reviewed.number}`}>See the pins on the photos</Link>
          </aside>
        )}
      </div>
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={['apprentice']}>
      <EditPiece />
    </RequireRole>
  );
}
