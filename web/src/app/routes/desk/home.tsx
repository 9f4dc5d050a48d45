import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router';
import { LandingCard } from '@/components/ui/landing-card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/hooks/use-user';

export default function DeskHomeRoute() {
  const { data: user } = useUser();
  return (
    <>
      <PageHeader title="Front desk" lead={user ? `Signed in as ${user.name}.` : undefined} />
      <Box
        sx={{
          display: 'grid',
          gap: 3,
          gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' },
          alignItems: 'start',
        }}
      >
        <LandingCard
          title="Walk-in quote"
          status="Find or add the customer, plan the build with them, and save the quote for them to accept."
          actions={
            <Button component={RouterLink} to={paths.desk.walkIn.getHref()} variant="contained">
              Start a walk-in quote
            </Button>
          }
        />
        <LandingCard
          title="Quotes"
          status="Every customer's quotes, searchable by number, name, e-mail or rego."
          actions={
            <Button component={RouterLink} to={paths.desk.quotes.getHref()} variant="outlined">
              Open the quotes
            </Button>
          }
        />
        <LandingCard
          title="No bookings to show yet"
          status="Booking requests and the day board will appear here."
          upcoming={[
            'See every booking request and confirm or reschedule it',
            'The day board: bays as columns, the day or the week as rows',
            'Revise a quote and e-mail it to the customer',
          ]}
        />
      </Box>
    </>
  );
}
