import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router';
import { LandingCard } from '@/components/ui/landing-card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/hooks/use-user';

export default function AccountHomeRoute() {
  const { data: user } = useUser();
  return (
    <>
      <PageHeader title="Your garage" lead={user ? `Signed in as ${user.name}.` : undefined} />
      <LandingCard
        title="Nothing saved yet"
        status="Your vehicles, quotes and bookings will appear here."
        upcoming={[
          'Keep your vehicles, with photos',
          'Save quotes and compare a revised quote with the one before',
          'Follow your bookings, and ask to move or cancel one',
        ]}
        actions={
          <Button component={RouterLink} to={paths.plan.getHref()} variant="contained">
            Start planning
          </Button>
        }
      />
    </>
  );
}
