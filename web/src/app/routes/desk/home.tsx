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
          title="Day board"
          status="Bays across, the day's working time down: every booking and hold in its bay, or the whole week."
          actions={
            <Button component={RouterLink} to={paths.desk.board.getHref()} variant="contained">
              Open the day board
            </Button>
          }
        />
        <LandingCard
          title="Requests and bookings"
          status="Bookings waiting for confirmation, today's and this week's; confirm, move or cancel them."
          actions={
            <Button component={RouterLink} to={paths.desk.bookings.getHref()} variant="outlined">
              Open the bookings
            </Button>
          }
        />
        <LandingCard
          title="Coming next"
          status="Revised quotes for booked work."
          upcoming={['Revise a quote and e-mail it to the customer']}
        />
      </Box>
    </>
  );
}
