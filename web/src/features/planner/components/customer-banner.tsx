import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router';
import { usePlanner } from '../hooks/use-planner';

/** Walk-in quotes: who the front desk is quoting for, with a way to choose someone else. */
export function PlannerCustomerBanner({ changeHref }: { changeHref: string }) {
  const { build } = usePlanner();
  if (!build.customer) return null;
  return (
    <Alert
      severity="info"
      role="note"
      icon={false}
      sx={{ mb: 2.5, alignItems: 'center' }}
      action={
        <Button component={RouterLink} to={changeHref} color="inherit" size="small">
          Change customer
        </Button>
      }
    >
      Walk-in quote for <strong>{build.customer.name}</strong> ({build.customer.email})
    </Alert>
  );
}
