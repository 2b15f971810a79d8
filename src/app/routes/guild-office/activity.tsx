import { useState } from 'react';
import { AUDIT_ACTIONS, type AuditAction } from '@shared/schemas/audit';
import { RequireRole } from '@/app/require-role';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { SelectField, TextField } from '@/components/ui/field';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { useAudit, type AuditFilters } from '@/features/audit/api/get-audit';
import { ACTION_LABEL, describeDetails } from '@/features/audit/components/audit-labels';
import { formatWhen } from '@/features/classes/components/format';
import { OfficeNav } from './office-nav';

export function Component() {
  return (
    <RequireRole roles={['admin']}>
      <Activity />
    </RequireRole>
  );
}

function Activity() {
  const [filters, setFilters] = useState<AuditFilters>({ page: 1 });
  const audit = useAudit(filters);
  const set = (patch: Partial<AuditFilters>) => setFilters((f) => ({ ...f, ...patch, page: patch.page ?? 1 }));
  const pages = audit.data ? Math.max(1, Math.ceil(audit.data.total / audit.data.pageSize)) : 1;

  return (
    <>
      <PageHeader
        title="Activity"
        lead="What the guild office did, who did it and when: classes, mentors, invitations, enrolments and accounts."
      />
      <OfficeNav />
      <div className="mb-4 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <SelectField label="Who" value={filters.actor ?? ''} onChange={(e) => set({ actor: e.target.value })}>
          <option value="">Anyone</option>
          {audit.data?.actors.map((a) => (
            <option key={a.id} value={a.id}>
              {a.name}
            </option>
          ))}
        </SelectField>
        <SelectField label="What" value={filters.action ?? ''} onChange={(e) => set({ action: e.target.value })}>
          <option value="">Any action</option>
          {AUDIT_ACTIONS.map((a) => (
            <option key={a} value={a}>
              {ACTION_LABEL[a]}
            </option>
          ))}
        </SelectField>
        <TextField
          label="From"
          type="date"
          value={filters.from ?? ''}
          onChange={(e) => set({ from: e.target.value })}
        />
        <TextField label="To" type="date" value={filters.to ?? ''} onChange={(e) => set({ to: e.target.value })} />
      </div>
      {audit.isPending ? (
        <Loading />
      ) : audit.error ? (
        <ErrorNotice error={audit.error} />
      ) : audit.data.events.length === 0 ? (
        <EmptyState title="Nothing recorded for these filters." />
      ) : (
        <>
          <div className="overflow-x-auto rounded-lg border border-rule bg-card">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">Activity record</caption>
              <thead className="border-b border-rule text-muted">
                <tr>
                  <th scope="col" className="p-3">
                    When
                  </th>
                  <th scope="col" className="p-3">
                    Who
                  </th>
                  <th scope="col" className="p-3">
                    What
                  </th>
                  <th scope="col" className="p-3">
                    On what
                  </th>
                  <th scope="col" className="p-3">
                    Details
                  </th>
                </tr>
              </thead>
              <tbody>
                {audit.data.events.map((e) => (
                  <tr key={e.id} className="border-b border-rule/60 align-top last:border-0">
                    <td className="p-3 whitespace-nowrap">{formatWhen(e.createdAt)}</td>
                    <td className="p-3">{e.actor?.name ?? <span className="text-muted">Removed account</span>}</td>
                    <td className="p-3">{ACTION_LABEL[e.action as AuditAction]}</td>
                    <td className="p-3">{e.targetLabel}</td>
                    <td className="p-3 text-muted">{describeDetails(e)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <nav aria-label="Pages" className="mt-4 flex items-center gap-3">
            <Button variant="secondary" disabled={filters.page <= 1} onClick={() => set({ page: filters.page - 1 })}>
              Newer
            </Button>
            <span className="text-sm">
              Page <span className="num">{filters.page}</span> of <span className="num">{pages}</span> ·{' '}
              <span className="num">{audit.data.total}</span> events
            </span>
            <Button
              variant="secondary"
              disabled={filters.page >= pages}
              onClick={() => set({ page: filters.page + 1 })}
            >
              Older
            </Button>
          </nav>
        </>
      )}
    </>
  );
}
