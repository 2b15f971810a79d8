import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import type { RosterEntry, RosterReply, RosterStatus } from '@shared/schemas/class';
import { Button } from '@/components/ui/button';
import { ConfirmStep } from '@/components/ui/confirm-step';
import { EmptyState, ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useSetEnrolment } from '../api/save-class';
import { formatDate } from './format';

const STATUS_LABEL: Record<RosterStatus, string> = { active: 'Active', invited: 'Invited', withdrawn: 'Withdrawn' };
const STATUS_STYLE: Record<RosterStatus, string> = {
  active: 'border-steel/40 text-steel',
  invited: 'border-brass/50 text-brass-dark',
  withdrawn: 'border-rule text-muted',
};

/** The class's apprentices with their progress; the admin can withdraw and re-enrol, a mentor only reads. */
export function RosterTable({ classId, roster, canEdit }: { classId: number; roster: RosterReply; canEdit: boolean }) {
  const setEnrolment = useSetEnrolment(classId);
  if (roster.entries.length === 0)
    return (
      <EmptyState title="Nobody in this class yet">Invite apprentices by e-mail or with a roster file.</EmptyState>
    );
  return (
    <div className="space-y-3">
      {setEnrolment.error && <ErrorNotice error={setEnrolment.error} />}
      <div className="overflow-x-auto rounded-lg border border-rule bg-card">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Roster</caption>
          <thead className="border-b border-rule text-muted">
            <tr>
              <th scope="col" className="p-3">
                Apprentice
              </th>
              <th scope="col" className="p-3">
                Status
              </th>
              <th scope="col" className="p-3">
                Lessons done
              </th>
              <th scope="col" className="p-3">
                Projects passed
              </th>
              <th scope="col" className="p-3">
                Since
              </th>
              {canEdit && (
                <th scope="col" className="p-3">
                  <span className="sr-only">Actions</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {roster.entries.map((e) => (
              <tr
                key={e.userId ? `u${e.userId}` : `i${e.invitationId}`}
                className="border-b border-rule/60 last:border-0"
              >
                <td className="p-3">
                  <div className="font-semibold">
                    {e.name || <span className="font-normal text-muted">(name not given yet)</span>}
                  </div>
                  <div className="text-muted">{e.email}</div>
                  {e.userId && (
                    <div className="flex gap-4">
                      <Link to={paths.apprenticeLog(e.userId)}>Bench log</Link>
                      {e.status === 'active' && (
                        <Link to={paths.apprenticeRecord(e.userId)} aria-label={`Record of ${e.name}`}>
                          Record
                        </Link>
                      )}
                    </div>
                  )}
                </td>
                <td className="p-3">
                  <span className={`rounded border px-2 py-0.5 text-xs font-semibold ${STATUS_STYLE[e.status]}`}>
                    {STATUS_LABEL[e.status]}
                  </span>
                </td>
                <td className="p-3 whitespace-nowrap">
                  <span className="num">{e.lessonsDone}</span> of <span className="num">{roster.lessonsTotal}</span>{' '}
                  lessons
                </td>
                <td className="p-3 whitespace-nowrap">
                  <span className="num">{e.projectsPassed}</span> of <span className="num">{roster.projectsTotal}</span>{' '}
                  projects
                </td>
                <td className="p-3 whitespace-nowrap text-muted">
                  <time dateTime={e.since}>{formatDate(e.since)}</time>
                </td>
                {canEdit && (
                  <td className="p-3 text-right">
                    <EnrolmentAction
                      entry={e}
                      busy={setEnrolment.isPending}
                      onAct={(action) =>
                        setEnrolment.mutate(
                          { userId: e.userId!, action },
                          {
                            onSuccess: () =>
                              toast.success(
                                action === 'withdraw'
                                  ? `${e.name} is withdrawn; their work is kept.`
                                  : `${e.name} is back in the class.`,
                              ),
                          },
                        )
                      }
                    />
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/** Withdrawing asks once more, in place, because the apprentice loses access to the class at once. */
function EnrolmentAction({
  entry,
  busy,
  onAct,
}: {
  entry: RosterEntry;
  busy: boolean;
  onAct: (a: 'withdraw' | 'reenrol') => void;
}) {
  if (entry.userId === null) return null;
  if (entry.status === 'withdrawn') {
    return (
      <Button variant="secondary" busy={busy} onClick={() => onAct('reenrol')} aria-label={`Re-enrol ${entry.name}`}>
        Re-enrol
      </Button>
    );
  }
  return (
    <ConfirmStep
      label={`Withdraw ${entry.name}`}
      question={`${entry.name.split(' ')[0]} loses access to the class at once.`}
      confirmLabel={`Withdraw ${entry.name.split(' ')[0]}`}
      busy={busy}
      onConfirm={() => onAct('withdraw')}
    >
      Withdraw
    </ConfirmStep>
  );
}
