import { Card, PageHeader } from '@/components/ui/card';
import { useUser } from '@/features/auth/api/get-me';
import { AccountProfileForm } from '@/features/auth/components/account-profile-form';
import { PasswordChangeForm } from '@/features/auth/components/password-change-form';
import { ROLE_LABEL } from '@/features/auth/role-labels';
import { StorageUsage } from '@/features/uploads/components/storage-usage';

export function Component() {
  const user = useUser();
  return (
    <>
      <PageHeader
        title="My account"
        lead="Your name as mentors and the guild office see it, the units you work in, your password and, for apprentices, the room your photos take."
      />
      <div className="grid gap-6 md:grid-cols-2">
        <Card>
          <h2 className="font-serif text-xl">About you</h2>
          <dl className="mt-2 mb-5 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="text-muted">E-mail</dt>
            <dd>{user.email}</dd>
            <dt className="text-muted">Role</dt>
            <dd>{ROLE_LABEL[user.role]}</dd>
          </dl>
          <AccountProfileForm user={user} />
        </Card>
        <Card>
          <h2 className="font-serif text-xl">Password</h2>
          <p className="mt-1 mb-5 text-sm text-muted">
            To change it, give the current one first. Anywhere else you are signed in will be signed out.
          </p>
          <PasswordChangeForm />
        </Card>
        {user.role === 'apprentice' && (
          <Card>
            <h2 className="font-serif text-xl">Photo storage</h2>
            <div className="mt-3">
              <StorageUsage />
            </div>
          </Card>
        )}
      </div>
    </>
  );
}
