import { useState } from 'react';
import { toast } from 'sonner';
import { OUTBOX_STATES, type OutboxState } from '@shared/schemas/outbox';
import { RequireRole } from '@/app/require-role';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { SelectField } from '@/components/ui/field';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { formatWhen } from '@/features/classes/components/format';
import { useOutbox, useResendMail, type OutboxFilters } from '@/features/outbox/api/outbox';
import { MailState } from '@/features/outbox/components/mail-state';
import { OfficeNav } from './office-nav';

const STATE_LABEL: Record<OutboxState, string> = { queued: 'Queued', sent: 'Sent', failed: 'Not delivered' };
const KIND_LABEL = {
  'password-reset': 'Password reset',
  invitation: 'Invitation',
  enrolment: 'Enrolment',
  notification: 'Notice',
} as const;

export function Component() {
  return (
    <RequireRole roles={['admin']}>
      <OutgoingMail />
    </RequireRole>
  );
}

function OutgoingMail() {
  const [filters, setFilters] = useState<OutboxFilters>({ page: 1 });
  const outbox = useOutbox(filters);
  const resend = useResendMail();
  const pages = outbox.data ? Math.max(1, Math.ceil(outbox.data.total / outbox.data.pageSize)) : 1;

  return (
    <>
      <PageHeader
        title="Outgoing mail"
        lead="Every e-mail Tickwright sends waits here until the mail server takes it. Messages that could not be delivered for a day are marked, and can be sent again."
      />
      <OfficeNav />
      {outbox.data && (
        <p className="mb-4 text-sm" role="status">
          <span className="num">{outbox.data.counts.queued}</span> queued ·{' '}
          <span className="num">{outbox.data.counts.sent}</span> sent ·{' '}
          <span className="num">{outbox.data.counts.failed}</span> not delivered
        </p>
      )}
      <div className="mb-4 max-w-xs">
        <SelectField
          label="Show"
          value={filters.state ?? ''}
          onChange={(e) => setFilters({ state: (e.target.value || undefined) as OutboxState | undefined, page: 1 })}
        >
          <option value="">All messages</option>
          {OUTBOX_STATES.map((s) => (
            <option key={s} value={s}>
              {STATE_LABEL[s]}
            </option>
          ))}
        </SelectField>
      </div>
      {resend.error && <ErrorNotice error={resend.error} />}
      {outbox.isPending ? (
        <Loading />
      ) : outbox.error ? (
        <ErrorNotice error={outbox.error} />
      ) : outbox.data.messages.length === 0 ? (
        <EmptyState title="No messages here." />
      ) : (
        <>
          <div className="overflow-x-auto rounded-lg border border-rule bg-card">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">Outgoing mail</caption>
              <thead className="border-b border-rule text-muted">
                <tr>
                  <th scope="col" className="p-3">
                    Written
                  </th>
                  <th scope="col" className="p-3">
                    To
                  </th>
                  <th scope="col" className="p-3">
                    Subject
                  </th>
                  <th scope="col" className="p-3">
                    State
                  </th>
                  <th scope="col" className="p-3">
                    <span className="sr-only">Actions</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {outbox.data.messages.map((m) => (
                  <tr key={m.id} className="border-b border-rule/60 align-top last:border-0">
                    <td className="p-3 whitespace-nowrap">{formatWhen(m.createdAt)}</td>
                    <td className="p-3">{m.to}</td>
                    <td className="p-3">
                      <div>{m.subject}</div>
                      <div className="text-xs text-muted">{KIND_LABEL[m.kind]}</div>
                    </td>
                    <td className="p-3">
                      <MailState state={m.state} lastError={m.lastError} />
                      <div className="text-xs text-muted">
                        {m.sentAt
                          ? `Delivered ${formatWhen(m.sentAt)}`
                          : m.nextAttemptAt && m.attempts > 0
                            ? `Tried ${m.attempts} times; next try ${formatWhen(m.nextAttemptAt)}`
                            : null}
                      </div>
                    </td>
                    <td className="p-3 text-right">
                      {m.state === 'failed' && (
                        <Button
                          variant="secondary"
                          busy={resend.isPending && resend.variables === m.id}
                          aria-label={`Send again to ${m.to}`}
                          onClick={() =>
                            resend.mutate(m.id, { onSuccess: () => toast.success(`Queued again for ${m.to}.`) })
                          }
                        >
                          Send again
                        </Button>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <nav aria-label="Pages" className="mt-4 flex items-center gap-3">
            <Button
              variant="secondary"
              disabled={filters.page <= 1}
              onClick={() => setFilters((f) => ({ ...f, page: f.page - 1 }))}
            >
              Newer
            </Button>
            <span className="text-sm">
              Page <span className="num">{filters.page}</span> of <span className="num">{pages}</span>
            </span>
            <Button
              variant="secondary"
              disabled={filters.page >= pages}
              onClick={() => setFilters((f) => ({ ...f, page: f.page + 1 }))}
            >
              Older
            </Button>
          </nav>
        </>
      )}
    </>
  );
}
