import type { ReactNode } from 'react';
import type { Role } from '@shared/schemas/user';
import { ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';

/** A friendly page instead of the content when the signed-in role may not see it; the server refuses it anyway. */
export function RequireRole({ roles, children }: { roles: Role[]; children: ReactNode }) {
  const { data: user } = useMe();
  if (user && roles.includes(user.role)) return children;
  return (
    <div className="py-16 text-center">
      <h1 className="font-serif text-3xl">Not part of your work</h1>
      <p className="mt-2 text-muted">
        This page belongs to another role. If you think you should see it, ask the guild office.
      </p>
      <ButtonLink to={paths.home} className="mt-6">
        Back to Today
      </ButtonLink>
    </div>
  );
}
