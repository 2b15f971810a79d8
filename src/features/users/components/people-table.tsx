import { useState } from 'react';
import { toast } from 'sonner';
import { ROLES, type Role, type UserListItem } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/states';
import { ROLE_LABEL } from '@/features/auth/role-labels';
import { useUpdateUser } from '../api/users';

/** One row per account: the role can be changed in place, and the account switched off or on. Never one's own. */
export function PeopleTable({ users, selfId }: { users: UserListItem[]; selfId: number }) {
  const update = useUpdateUser();
  const change = (u: UserListItem, input: { role?: Role; active?: boolean }, done: string) =>
    update.mutate({ id: u.id, ...input }, { onSuccess: () => toast.success(done) });

  return (
    <div className="space-y-3">
      {update.error && <ErrorNotice error={update.error} title="The account was not changed" />}
      <div className="overflow-x-auto rounded-lg border border-rule bg-card">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">People</caption>
          <thead className="border-b border-rule text-muted">
            <tr>
              <th scope="col" className="p-3">
                Name
              </th>
              <th scope="col" className="p-3">
                Role
              </th>
              <th scope="col" className="p-3">
                Account
              </th>
              <th scope="col" className="p-3">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {users.map((u) => {
              const self = u.id === selfId;
              return (
                <tr key={u.id} className={`border-b border-rule/60 last:border-0 ${u.active ? '' : 'text-muted'}`}>
                  <td className="p-3">
                    <div className="font-semibold">
                      {u.name}
                      {self && <span className="font-normal text-muted"> (you)</span>}
                    </div>
                    <div className="text-muted">{u.email}</div>
                  </td>
                  <td className="p-3">
                    <label className="sr-only" htmlFor={`role-${u.id}`}>
                      Role of {u.name}
                    </label>
                    <select
                      id={`role-${u.id}`}
                      value={u.role}
                      disabled={self || update.isPending}
                      onChange={(e) =>
                        change(
                          u,
                          { role: e.target.value as Role },
                          `${u.name} is now ${ROLE_LABEL[e.target.value as Role].toLowerCase()}.`,
                        )
                      }
                      className="min-h-11 rounded-md border border-rule bg-white px-2"
                    >
                      {ROLES.map((r) => (
                        <option key={r} value={r}>
                          {ROLE_LABEL[r]}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td className="p-3">{u.active ? 'Active' : <strong className="text-error">Deactivated</strong>}</td>
                  <td className="p-3 text-right">
                    {!self && (
                      <AccountToggle
                        user={u}
                        busy={update.isPending && update.variables?.id === u.id}
                        onToggle={() =>
                          change(
                            u,
                            { active: !u.active },
                            u.active
                              ? `${u.name} is deactivated and signed out everywhere.`
                              : `${u.name} can sign in again.`,
                          )
                        }
                      />
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/** Deactivating signs the person out at once, so it asks once more in place; reactivating does not need to. */
function AccountToggle({ user, busy, onToggle }: { user: UserListItem; busy: boolean; onToggle: () => void }) {
  const [confirming, setConfirming] = useState(false);
  if (!user.active) {
    return (
      <Button variant="secondary" busy={busy} onClick={onToggle} aria-label={`Reactivate ${user.name}`}>
        Reactivate
      </Button>
    );
  }
  if (!confirming) {
    return (
      <Button variant="quiet" onClick={() => setConfirming(true)} aria-label={`Deactivate ${user.name}`}>
        Deactivate
      </Button>
    );
  }
  return (
    <span className="inline-flex flex-wrap justify-end gap-2">
      <Button
        variant="danger"
        busy={busy}
        onClick={() => {
          setConfirming(false);
          onToggle();
        }}
      >
        Deactivate and sign out
      </Button>
      <Button variant="quiet" onClick={() => setConfirming(false)}>
        Keep
      </Button>
    </span>
  );
}
