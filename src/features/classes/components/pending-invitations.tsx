import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { ConfirmStep } from '@/components/ui/confirm-step';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { useResendInvitation, useRevokeInvitation, usePendingInvitations } from '../api/invitations';
import { MailState } from '@/features/outbox/components/mail-state';
import { formatWhen } from './format';

/** Invitations not yet accepted: resending issues a new link (the old one stops working), revoking ends it. */
export function PendingInvitations({ classId }: { classId?: number }) {
  const list = usePendingInvitations(classId);
  const resend = useResendInvitation();
  const revoke = useRevokeInvitation();
  if (list.isPending) return <Loading />;
  if (list.error) return <ErrorNotice error={list.error} />;
  if (list.data.length === 0) return <EmptyState title="No open invitations" />;
  return (
    <div className="space-y-3">
      {(resend.error || revoke.error) && <ErrorNotice error={resend.error ?? revoke.error} />}
      <div className="overflow-x-auto rounded-lg border border-rule bg-card">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Open invitations</caption>
          <thead className="border-b border-rule text-muted">
            <tr>
              <th scope="col" className="p-3">
                Invitee
              </th>
              {!classId && (
                <th scope="col" className="p-3">
                  Class
                </th>
              )}
              <th scope="col" className="p-3">
                Sent
              </th>
              <th scope="col" className="p-3">
                Link valid until
              </th>
              <th scope="col" className="p-3">
                E-mail
              </th>
              <th scope="col" className="p-3">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {list.data.map((inv) => (
              <tr key={inv.id} className="border-b border-rule/60 last:border-0">
                <td className="p-3">
                  <div className="font-semibold">{inv.email}</div>
                  {inv.name && <div className="text-muted">{inv.name}</div>}
                </td>
                {!classId && <td className="p-3">{inv.className}</td>}
                <td className="p-3 whitespace-nowrap text-muted">
                  {formatWhen(inv.sentAt)}
                  {inv.invitedBy && <> by {inv.invitedBy.name}</>}
                </td>
                <td className="p-3 whitespace-nowrap">
                  {inv.expired ? (
                    <span className="font-semibold text-rework">Ran out {formatWhen(inv.expiresAt)}</span>
                  ) : (
                    formatWhen(inv.expiresAt)
                  )}
                </td>
                <td className="p-3">
                  {inv.mail ? <MailState {...inv.mail} /> : <span className="text-muted">Not recorded</span>}
                </td>
                <td className="p-3">
                  <span className="flex flex-wrap justify-end gap-2">
                    <Button
                      variant="secondary"
                      busy={resend.isPending && resend.variables === inv.id}
                      aria-label={`Resend invitation to ${inv.email}`}
                      onClick={() =>
                        resend.mutate(inv.id, {
                          onSuccess: () => toast.success(`A new link is queued for ${inv.email}.`),
                        })
                      }
                    >
                      Resend
                    </Button>
                    <ConfirmStep
                      label={`Revoke invitation to ${inv.email}`}
                      question="The link stops working at once."
                      confirmLabel="Revoke"
                      busy={revoke.isPending && revoke.variables === inv.id}
                      onConfirm={() =>
                        revoke.mutate(inv.id, {
                          onSuccess: () => toast.success(`The invitation to ${inv.email} is revoked.`),
                        })
                      }
                    >
                      Revoke
                    </ConfirmStep>
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
