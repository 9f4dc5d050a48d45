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
          title="Catalogue and prices"
          status="Wheels, tyres, suspension kits, components and services with their prices, labour and stock. Import a CSV price list or export the catalogue."
          actions={
            <Button
              component={RouterLink}
              to={paths.manage.catalogue.getHref()}
              variant="contained"
            >
              Open the catalogue
            </Button>
          }
        />
        <LandingCard
          title="Vehicle specifications"
          status="Spec sheets of the vehicle models the shop fits: suspension, bolt pattern, stock wheel and tyre, mass ratings."
          actions={
            <Button component={RouterLink} to={paths.manage.vehicles.getHref()} variant="outlined">
              Open vehicle specs
            </Button>
          }
        />
        <LandingCard
          title="Modification rules"
          status="The limits each rule set applies in the fit report, with the source of every rule."
          actions={
            <Button component={RouterLink} to={paths.manage.rules.getHref()} variant="outlined">
              Open the rules
            </Button>
          }
        />
        <LandingCard
          title="Pricing policies"
          status="Labour rate, GST and its rounding, fitting and disposal fees, the package discount, the deposit and how long quotes hold."
          actions={
            <Button component={RouterLink} to={paths.manage.policies.getHref()} variant="outlined">
              Open the policies
            </Button>
          }
        />
        <LandingCard
          title="Staff accounts"
          status="Add front desk, technician and manager accounts, change a role, or switch an account off."
          actions={
            <Button component={RouterLink} to={paths.manage.staff.getHref()} variant="outlined">
              Open staff accounts
            </Button>
          }
        />
        <LandingCard
          title="Workshop set-up"
          status="Time zone, opening hours, bays, closures and public holidays: what customers can book."
          upcoming={['Reports']}
          actions={
            <Button component={RouterLink} to={paths.manage.workshop.getHref()} variant="outlined">
              Open the workshop set-up
            </Button>
          }
        />
      </Box>
    </>
  );
}
