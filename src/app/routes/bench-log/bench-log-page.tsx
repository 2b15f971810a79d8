import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { LogEntryFilters } from '@shared/schemas/log-entry';
import { Card, PageHeader } from '@/components/ui/card';
import { useUser } from '@/features/auth/api/get-me';
import { useLogSummary } from '@/features/bench-log/api/get-log-summary';
import { useCreateLogEntry } from '@/features/bench-log/api/save-log-entry';
import { ApprenticeLogs } from '@/features/bench-log/components/apprentice-logs';
import { EntryForm } from '@/features/bench-log/components/entry-form';
import { EntryList } from '@/features/bench-log/components/entry-list';
import { LogFilters } from '@/features/bench-log/components/log-filters';
import { LogOverview } from '@/features/bench-log/components/log-overview';

function Entries({ apprentice }: { apprentice?: number }) {
  const [filters, setFilters] = useState<LogEntryFilters>({ apprentice });
  const [page, setPage] = useState(1);
  return (
    <section aria-labelledby="entries-heading" className="space-y-4">
      <h2 id="entries-heading" className="font-serif text-2xl font-semibold">
        Entries
      </h2>
      <LogFilters
        filters={filters}
        onChange={(f) => {
          setFilters({ ...f, apprentice });
          setPage(1);
        }}
      />
      <EntryList filters={filters} page={page} onPage={setPage} />
    </section>
  );
}

function OwnLog({ userId }: { userId: number }) {
  const create = useCreateLogEntry();
  return (
    <>
      <PageHeader
        title="Bench log"
        lead="Time at the bench, what you measured and what it looked like, for you and your mentor."
      />
      <div className="space-y-8">
        <Card>
          <h2 className="mb-4 font-serif text-xl font-semibold">New entry</h2>
          <EntryForm userId={userId} onSave={(input) => create.mutateAsync(input)} />
        </Card>
        <LogOverview />
        <Entries />
      </div>
    </>
  );
}

function ApprenticeLog({ apprentice }: { apprentice: number }) {
  const { data } = useLogSummary(apprentice);
  return (
    <>
      <PageHeader
        title={data ? `${data.apprentice.name}’s bench log` : 'Bench log'}
        lead="Read the entries, comment on them and grade the quality of the record."
      />
      <div className="space-y-8">
        <LogOverview apprentice={apprentice} />
        <Entries key={apprentice} apprentice={apprentice} />
      </div>
    </>
  );
}

/** An apprentice keeps their own log here; mentors and the guild office read an apprentice's by ?apprentice=<id>. */
export function Component() {
  const user = useUser();
  const [params] = useSearchParams();
  const apprentice = Number(params.get('apprentice')) || undefined;
  if (user.role === 'apprentice') return <OwnLog userId={user.id} />;
  if (apprentice) return <ApprenticeLog apprentice={apprentice} />;
  return (
    <>
      <PageHeader
        title="Bench logs"
        lead="The apprentices of your classes and how much of their logs is still to read."
      />
      <ApprenticeLogs />
    </>
  );
}
