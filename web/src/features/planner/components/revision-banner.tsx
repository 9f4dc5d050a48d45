import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router';
import { usePlanner } from '../hooks/use-planner';

/** Revisions: which quote and version the desk is revising, for whom, and the way back. */
export function RevisionBanner() {
  const { build, config } = usePlanner();
  if (!build.revision) return null;
  return (
    <Alert
      severity="info"
      role="note"
      icon={false}
      sx={{ mb: 2.5, '& .MuiAlert-message': { width: '100%' } }}
    >
      <Box
        sx={{
          display: 'flex',
          flexWrap: 'wrap',
          alignItems: 'center',
          justifyContent: 'space-between',
          columnGap: 2,
          rowGap: 0.5,
        }}
      >
        <Box component="span" sx={{ minWidth: 0, overflowWrap: 'anywhere' }}>
          Revising quote <strong>{build.revision.reference}</strong> (version{' '}
          {build.revision.baseVersionNumber})
          {build.customer ? (
            <>
              {' '}
              for <strong>{build.customer.name}</strong> ({build.customer.email})
            </>
          ) : null}
        </Box>
        {config.firstStepBackHref && (
          <Button
            component={RouterLink}
            to={config.firstStepBackHref}
            color="inherit"
            size="small"
            sx={{ ml: -0.5 }}
          >
            Back to the quote
          </Button>
        )}
      </Box>
    </Alert>
  );
}
