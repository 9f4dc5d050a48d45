import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import { AuthPanel } from '@/features/auth/components/auth-panel';
import { ForgotPasswordForm } from '@/features/auth/forms/forgot-password-form';

export default function ForgotPasswordRoute() {
  return (
    <AuthPanel
      title="Forgot your password?"
      lead="Enter the e-mail address you sign in with. We will send a link to choose a new password."
      footer={
        <Link component={RouterLink} to={paths.auth.signIn.getHref()}>
          Back to sign in
        </Link>
      }
    >
      <ForgotPasswordForm />
    </AuthPanel>
  );
}
