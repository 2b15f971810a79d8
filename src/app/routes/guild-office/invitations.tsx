import { RequireRole } from '@/app/require-role';
import { PageHeader } from '@/components/ui/card';
import { PendingInvitations } from '@/features/classes/components/pending-invitations';
import { OfficeNav } from './office-nav';

export function Component() {
  return (
    <RequireRole roles={['admin']}>
      <PageHeader
        title="Invitations"
        lead="Every invitation not yet accepted, in every class. Invite new people from a class's page."
      />
      <OfficeNav />
      <PendingInvitations />
    </RequireRole>
  );
}
