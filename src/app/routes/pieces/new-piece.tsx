import { Navigate, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/card';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { RequireRole } from '@/app/require-role';
import { useProjectForPiece } from '@/features/submissions/api/get-submissions';
import { SubmissionForm } from '@/features/submissions/components/submission-form';
import { ProjectBriefFold } from './project-heading';

const EMPTY = { notes: '', photos: [], logEntries: [], calculations: [] };

function NewPiece() {
  const [params] = useSearchParams();
  const projectId = Number(params.get('project'));
  const { data, isPending, error } = useProjectForPiece(Number.isSafeInteger(projectId) ? projectId : 0);
  if (!(projectId > 0))
    return (
      <EmptyState title="Which project?">
        Start a piece from the project of a lesson: its brief has a “Send for review” button.
      </EmptyState>
    );
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} title="This project cannot be sent" />;
  // One piece per project: carry on with the one already started.
  if (data.submissionId !== null) return <Navigate to={paths.editSubmission(data.submissionId)} replace />;
  return (
    <>
      <PageHeader
        title={data.project.title}
        lead={`New piece · ${data.project.lesson.title} · ${data.project.course.title}`}
      />
      <ProjectBriefFold project={data.project} />
      <SubmissionForm projectId={data.project.id} submissionId={null} start={EMPTY} versionNumber={1} />
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={['apprentice']}>
      <NewPiece />
    </RequireRole>
  );
}
