import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router';
import { LandingCard } from '@/components/ui/landing-card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/hooks/use-user';

export default function ManageHomeRoute() {
  const { data: user } = useUser();
  return (
    <>
      <PageHeader title="Manage" lead={user ? `Signed in as ${user.name}.` : undefined} />
      <Box
        sx={{
          display: 'grid',
          gap: 3,
          gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' },
          alignItems: 'start',
        }}
      >
        <LandingCard
          title="Staff accounts"
          status="Add front desk, technician and manager accounts, change a role, or switch an account off."
          actions={
            <Button component={RouterLink} to={paths.manage.staff.getHref()} variant="contained">
              Open staff accounts
            </Button>
          }
        />
        <LandingCard
          title="Workshop set-up"
          status="These parts of Manage are still to be built."
          upcoming={[
            'Catalogue and price lists, with CSV import and export',
            'Vehicle specifications',
            'Modification rules per jurisdiction',
            'Bays, opening hours, closures and public holidays',
            'Labour rate, tax and deposit policy',
            'Reports',
          ]}
        />
      </Box>
    </>
  );
}
