import { useParams } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-me';
import { useLogEntry } from '@/features/bench-log/api/get-log-entries';
import { EntryDetail } from '@/features/bench-log/components/entry-detail';
import { ApiError } from '@/lib/api-client';

export function Component() {
  const user = useUser();
  const id = Number(useParams().id);
  const { data, error } = useLogEntry(Number.isSafeInteger(id) && id > 0 ? id : -1);
  if (error instanceof ApiError && error.status === 404)
    return (
      <div className="py-16 text-center">
        <h1 className="font-serif text-3xl">No such entry</h1>
        <p className="mt-2 text-muted">It may have been deleted, or it belongs to a log you do not read.</p>
        <ButtonLink to={paths.benchLog} className="mt-6">
          Back to the bench log
        </ButtonLink>
      </div>
    );
  if (error) return <ErrorNotice error={error} title="The entry could not be loaded" />;
  if (!data) return <Loading label="Opening the entry…" />;
  return <EntryDetail entry={data} viewer={user} />;
}
