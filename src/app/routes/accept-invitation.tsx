import { useNavigate, useParams } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { AuthCardPage } from '@/features/auth/components/auth-card-page';
import { useInvitationPreview } from '@/features/classes/api/accept-invitation';
import { AcceptInvitationForm } from '@/features/classes/components/accept-invitation-form';
import { formatWhen } from '@/features/classes/components/format';

/** Reached from the invitation e-mail, before the invitee has an account: outside the signed-in shell. */
export function Component() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const invitation = useInvitationPreview(token);

  if (invitation.isPending) return <Loading label="Opening your invitation…" />;
  if (invitation.error) {
    return (
      <AuthCardPage title="This invitation link no longer works">
        <div className="space-y-4">
          <ErrorNotice error={invitation.error} title="The link cannot be used" />
          <p className="text-sm text-muted">If you already accepted it, sign in with the password you chose.</p>
          <ButtonLink to={paths.signIn()}>Sign in</ButtonLink>
        </div>
      </AuthCardPage>
    );
  }
  const inv = invitation.data;
  return (
    <AuthCardPage
      title={`Join ${inv.className}`}
      lead={
        <>
          The guild office has invited you to the class {inv.className}, on the course “{inv.courseTitle}”. This link
          works once, until {formatWhen(inv.expiresAt)}.
        </>
      }
    >
      <AcceptInvitationForm
        token={token}
        invitation={inv}
        onAccepted={() => navigate(paths.course(inv.courseSlug), { replace: true })}
      />
    </AuthCardPage>
  );
}
