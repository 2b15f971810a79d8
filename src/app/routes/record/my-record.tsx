import { PageHeader } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { RequireRole } from '@/app/require-role';
import { useUser } from '@/features/auth/api/get-me';
import { useRecord } from '@/features/record/api/get-record';
import { RecordView } from '@/features/record/components/record-view';

function MyRecord() {
  const user = useUser();
  const { data, isPending, error } = useRecord(user.id);
  return (
    <>
      <PageHeader
        title="My record"
        lead="Each skill of your courses, the work that shows it, and your mentor’s sign-off. Certificates and your portfolio are at the end."
      />
      {isPending && <Loading label="Gathering your record…" />}
      {error && <ErrorNotice error={error} title="Your record could not be loaded" />}
      {data && <RecordView record={data} viewer={user} />}
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={['apprentice']}>
      <MyRecord />
    </RequireRole>
  );
}
