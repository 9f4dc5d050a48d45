import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router';
import { paths } from '@/config/paths';
import { AuthPanel } from '@/features/auth/components/auth-panel';
import { ResetPasswordForm } from '@/features/auth/forms/reset-password-form';
import type { SignInLocationState } from './sign-in';

export default function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const token = searchParams.get('token');

  const done = () => {
    const state: SignInLocationState = { passwordChanged: true };
    void navigate(paths.auth.signIn.getHref(), { replace: true, state });
  };

  return (
    <AuthPanel
      title="Choose a new password"
      lead={token ? 'Choose the password you will sign in with from now on.' : undefined}
      footer={
        <Link component={RouterLink} to={paths.auth.forgotPassword.getHref()}>
          Link not working? Ask for a new one
        </Link>
      }
    >
      {token ? (
        <ResetPasswordForm token={token} onDone={done} />
      ) : (
        <Alert severity="error">
          This link is not complete. Open it again from the e-mail, or ask for a new one below.
        </Alert>
      )}
    </AuthPanel>
  );
}
