import { Link } from 'react-router-dom';
import { useState } from 'react';
import { toast } from 'sonner';
import { ROLES, type Role, type UserListItem } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { ConfirmStep } from '@/components/ui/confirm-step';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
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
                    {u.role === 'apprentice' && (
                      <Link to={paths.apprenticeRecord(u.id)} aria-label={`Record of ${u.name}`}>
                        Record
                      </Link>
                    )}
                  </td>
                  <td className="p-3">
                    <RoleChoice
                      key={u.role}
                      user={u}
                      self={self}
                      busy={update.isPending}
                      onChange={(role) => change(u, { role }, `${u.name} is now ${ROLE_LABEL[role].toLowerCase()}.`)}
                    />
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
  if (!user.active) {
    return (
      <Button variant="secondary" busy={busy} onClick={onToggle} aria-label={`Reactivate ${user.name}`}>
        Reactivate
      </Button>
    );
  }
  return (
    <ConfirmStep
      label={`Deactivate ${user.name}`}
      question={`Sign ${user.name.split(' ')[0]} out everywhere and stop their sign-in?`}
      confirmLabel="Deactivate and sign out"
      busy={busy}
      onConfirm={onToggle}
    >
      Deactivate
    </ConfirmStep>
  );
}

/**
 * The new role is chosen first and applied with its own button: a select changes with the arrow keys, and a role
 * must not change while someone is only moving through the list by keyboard.
 */
function RoleChoice({
  user,
  self,
  busy,
  onChange,
}: {
  user: UserListItem;
  self: boolean;
  busy: boolean;
  onChange: (role: Role) => void;
}) {
  const [choice, setChoice] = useState<Role>(user.role);
  const changed = choice !== user.role;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <label className="sr-only" htmlFor={`role-${user.id}`}>
        Role of {user.name}
      </label>
      <select
        id={`role-${user.id}`}
        value={choice}
        disabled={self || busy}
        onChange={(e) => setChoice(e.target.value as Role)}
        className="min-h-11 rounded-md border border-rule bg-white px-2"
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABEL[r]}
          </option>
        ))}
      </select>
      {changed && (
        <>
          <Button
            variant="secondary"
            busy={busy}
            aria-label={`Make ${user.name} ${ROLE_LABEL[choice].toLowerCase()}`}
            onClick={() => onChange(choice)}
          >
            Change role
          </Button>
          <Button variant="quiet" onClick={() => setChoice(user.role)} aria-label={`Keep ${user.name}'s role`}>
            Keep
          </Button>
        </>
      )}
    </div>
  );
}
