import { useParams } from 'react-router-dom';
import { AuthCardPage } from '@/features/auth/components/auth-card-page';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';

export function Component() {
  const { token = '' } = useParams();
  return (
    <AuthCardPage title="Set a new password" lead="Choose a password you do not use anywhere else.">
      <ResetPasswordForm token={token} />
    </AuthCardPage>
  );
}
