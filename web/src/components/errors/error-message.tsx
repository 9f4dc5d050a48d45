import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import ReportProblemOutlined from '@mui/icons-material/ReportProblemOutlined';
import { DocumentTitle } from '@/components/ui/document-title';

interface Props {
  title?: string;
  message?: string;
}

/**
 * What a page shows when it breaks: a plain message and a way forward. It uses plain anchors,
 * not router links, because it may render where the router itself has failed.
 */
export function ErrorMessage({
  title = 'Something went wrong',
  message = 'This page could not be shown. Reloading usually helps; if it keeps happening, please tell the workshop.',
}: Props) {
  return (
    <Box role="alert" sx={{ maxWidth: 560, mx: 'auto', py: 6, px: 2, textAlign: 'center' }}>
      <DocumentTitle title={title} />
      <ReportProblemOutlined aria-hidden sx={{ fontSize: 48, color: 'warning.main', mb: 1 }} />
      <Typography variant="h1" gutterBottom>
        {title}
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 3 }}>
        {message}
      </Typography>
      <Box sx={{ display: 'flex', gap: 1.5, justifyContent: 'center', flexWrap: 'wrap' }}>
        <Button variant="contained" onClick={() => window.location.reload()}>
          Reload the page
        </Button>
        <Button variant="outlined" href="/">
          Go to the home page
        </Button>
      </Box>
    </Box>
  );
}
