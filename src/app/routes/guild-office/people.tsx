import { useDeferredValue, useState } from 'react';
import { ROLES, USERS_PAGE_SIZE, type Role } from '@shared/schemas/user';
import { RequireRole } from '@/app/require-role';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { SelectField, TextField } from '@/components/ui/field';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { useUser } from '@/features/auth/api/get-me';
import { ROLE_LABEL } from '@/features/auth/role-labels';
import { useUsers } from '@/features/users/api/users';
import { PeopleTable } from '@/features/users/components/people-table';
import { OfficeNav } from './office-nav';

export function Component() {
  return (
    <RequireRole roles={['admin']}>
      <People />
    </RequireRole>
  );
}

function People() {
  const me = useUser();
  const [q, setQ] = useState('');
  const [role, setRole] = useState<Role | ''>('');
  const [page, setPage] = useState(1);
  const search = useDeferredValue(q.trim());
  const users = useUsers({ q: search || undefined, role: role || undefined, page });
  const pages = users.data ? Math.max(1, Math.ceil(users.data.total / USERS_PAGE_SIZE)) : 1;

  return (
    <>
      <PageHeader
        title="People"
        lead="Everyone with a Tickwright account. Change a role, or deactivate an account to sign its owner out everywhere."
      />
      <OfficeNav />
      <div className="mb-4 grid gap-4 sm:grid-cols-[1fr_14rem]">
        <TextField
          label="Search by name or e-mail"
          type="search"
          value={q}
          onChange={(e) => {
            setQ(e.target.value);
            setPage(1);
          }}
        />
        <SelectField
          label="Role"
          value={role}
          onChange={(e) => {
            setRole(e.target.value as Role | '');
            setPage(1);
          }}
        >
          <option value="">Every role</option>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABEL[r]}
            </option>
          ))}
        </SelectField>
      </div>
      {users.isPending ? (
        <Loading />
      ) : users.error ? (
        <ErrorNotice error={users.error} />
      ) : users.data.users.length === 0 ? (
        <EmptyState title="Nobody matches that search." />
      ) : (
        <>
          <PeopleTable users={users.data.users} selfId={me.id} />
          <nav aria-label="Pages" className="mt-4 flex items-center gap-3">
            <Button variant="secondary" disabled={page <= 1} onClick={() => setPage(page - 1)}>
              Previous
            </Button>
            <span className="text-sm">
              Page <span className="num">{page}</span> of <span className="num">{pages}</span> ·{' '}
              <span className="num">{users.data.total}</span> people
            </span>
            <Button variant="secondary" disabled={page >= pages} onClick={() => setPage(page + 1)}>
              Next
            </Button>
          </nav>
        </>
      )}
    </>
  );
}
