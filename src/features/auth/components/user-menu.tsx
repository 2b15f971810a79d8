import { Link, useNavigate } from 'react-router-dom';
import type { UserDTO } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { useSignOut } from '../api/sign-in';
import { ROLE_LABEL } from '../role-labels';

export function UserMenu({ user }: { user: UserDTO }) {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <div className="flex items-center gap-2 text-sm">
      <Link
        to={paths.account}
        className="flex min-h-11 flex-col justify-center rounded-md px-2 no-underline hover:bg-rule/40"
      >
        <span className="font-semibold text-ink">{user.name}</span>
        <span className="text-xs text-muted">
          {ROLE_LABEL[user.role]}
          <span className="sr-only"> (my account)</span>
        </span>
      </Link>
      <Button
        variant="secondary"
        busy={signOut.isPending}
        onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.signIn()) })}
      >
        Sign out
      </Button>
    </div>
  );
}
