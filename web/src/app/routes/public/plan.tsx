import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';

export default function PlanRoute() {
  return (
    <>
      <PageHeader title="Plan a lift" />
      <Alert severity="info" role="status" sx={{ mb: 3 }}>
        The planner is not open yet. Thank you for your patience.
      </Alert>
      <Typography sx={{ mb: 2 }}>
        Here you will be able to choose a suspension lift, wheels and tyres for your vehicle, see
        whether the combination fits and what it needs to stay legal, and get a price before you
        book.
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 3 }}>
        Until then, the workshop is happy to talk it through with you.
      </Typography>
      <Button component={RouterLink} to={paths.home.getHref()} variant="outlined">
        Back to the home page
      </Button>
    </>
  );
}
