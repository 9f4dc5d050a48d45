import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import { AuthPanel } from '@/features/auth/components/auth-panel';
import { RedirectIfSignedIn } from '@/features/auth/components/redirect-if-signed-in';
import { RegisterForm } from '@/features/auth/forms/register-form';
import { useRedirectTarget } from '@/features/auth/hooks/use-redirect-target';

export default function RegisterRoute() {
  const redirectTo = useRedirectTarget();
  return (
    <RedirectIfSignedIn>
      <AuthPanel
        title="Create an account"
        lead="Save your quotes, hold a workshop slot and follow your bookings."
        footer={
          <Typography>
            Already have an account?{' '}
            <Link component={RouterLink} to={paths.auth.signIn.getHref(redirectTo)}>
              Sign in
            </Link>
          </Typography>
        }
      >
        <RegisterForm />
      </AuthPanel>
    </RedirectIfSignedIn>
  );
}
