import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useLocation } from 'react-router';
import { paths } from '@/config/paths';
import { AuthPanel } from '@/features/auth/components/auth-panel';
import { RedirectIfSignedIn } from '@/features/auth/components/redirect-if-signed-in';
import { SignInForm } from '@/features/auth/forms/sign-in-form';
import { useRedirectTarget } from '@/features/auth/hooks/use-redirect-target';

/** Set by the reset-password page when it sends the user here. */
export interface SignInLocationState {
  passwordChanged?: boolean;
}

export default function SignInRoute() {
  const redirectTo = useRedirectTarget();
  const state = useLocation().state as SignInLocationState | null;
  return (
    <RedirectIfSignedIn>
      <AuthPanel
        title="Sign in"
        lead="Welcome back. Sign in to see your quotes and bookings, or your work for today."
        footer={
          <>
            <Link component={RouterLink} to={paths.auth.forgotPassword.getHref()}>
              Forgot your password?
            </Link>
            <Typography>
              New here?{' '}
              <Link component={RouterLink} to={paths.auth.register.getHref(redirectTo)}>
                Create an account
              </Link>
            </Typography>
          </>
        }
      >
        <SignInForm
          notice={
            state?.passwordChanged && (
              <Alert severity="success" role="status" sx={{ mb: 1 }}>
                Your password has been changed. Sign in with the new one.
              </Alert>
            )
          }
        />
      </AuthPanel>
    </RedirectIfSignedIn>
  );
}
