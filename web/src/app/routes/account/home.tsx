import Box from '@mui/material/Box';
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
      <Box sx={{ display: 'grid', gap: 3 }}>
        <LandingCard
          title="My quotes"
          status="The quotes you have saved, each with its versions, the fit report and a PDF. Accept a quote when it suits you."
          actions={
            <>
              <Button
                component={RouterLink}
                to={paths.account.quotes.getHref()}
                variant="contained"
              >
                Open my quotes
              </Button>
              <Button component={RouterLink} to={paths.plan.getHref()} variant="outlined">
                Start planning
              </Button>
            </>
          }
        />
        <LandingCard
          title="My bookings"
          status="Your times in the workshop: hold a time for a quote, pick another while it is held, ask to move or cancel a booking."
          actions={
            <Button component={RouterLink} to={paths.account.bookings.getHref()} variant="outlined">
              Open my bookings
            </Button>
          }
        />
        <LandingCard
          title="Still to come"
          status="Your vehicles and the deposit will appear here."
          upcoming={['Keep your vehicles, with photos', 'Pay the deposit for a held time']}
        />
      </Box>
    </>
  );
}
