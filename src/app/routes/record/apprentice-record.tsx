import { useParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { RequireRole } from '@/app/require-role';
import { useUser } from '@/features/auth/api/get-me';
import { useRecord } from '@/features/record/api/get-record';
import { RecordView } from '@/features/record/components/record-view';

function ApprenticeRecordPage() {
  const user = useUser();
  const id = Number(useParams().id);
  const { data, isPending, error } = useRecord(id);
  return (
    <>
      <PageHeader
        title={data ? `Record of ${data.apprentice.name}` : 'Record'}
        lead={
          user.role === 'admin'
            ? 'Every skill with its evidence and sign-off. Issue a certificate once a course is finished.'
            : 'Sign off a skill once its evidence meets the standard: choose what you judged and say what you saw.'
        }
      />
      {isPending && <Loading label="Gathering the record…" />}
      {error && <ErrorNotice error={error} title="This record could not be loaded" />}
      {data && <RecordView record={data} viewer={user} />}
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={['mentor', 'admin']}>
      <ApprenticeRecordPage />
    </RequireRole>
  );
}
