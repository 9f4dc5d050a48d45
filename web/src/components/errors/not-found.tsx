import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';

export function NotFound() {
  return (
    <Box sx={{ maxWidth: 560, mx: 'auto', py: 6, textAlign: 'center' }}>
      <DocumentTitle title="Page not found" />
      <Typography variant="overline" color="text.secondary" component="p">
        Error 404
      </Typography>
      <Typography variant="h1" gutterBottom>
        Page not found
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 3 }}>
        There is nothing at this address. It may have moved, or the link may be mistyped.
      </Typography>
      <Button variant="contained" component={RouterLink} to={paths.home.getHref()}>
        Go to the home page
      </Button>
    </Box>
  );
}
