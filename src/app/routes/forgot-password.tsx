import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { AuthCardPage } from '@/features/auth/components/auth-card-page';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

export function Component() {
  return (
    <AuthCardPage
      title="Forgotten your password?"
      lead="Give the address you sign in with. If it belongs to an account, we send it a link to set a new password."
    >
      <ForgotPasswordForm />
      <p className="mt-6 text-sm">
        <Link to={paths.signIn()}>Back to sign-in</Link>
      </p>
    </AuthCardPage>
  );
}
