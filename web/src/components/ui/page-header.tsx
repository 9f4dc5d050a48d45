import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { DocumentTitle } from './document-title';

interface Props {
  /** The page's h1, also used for the browser tab. */
  title: string;
  /** A short line under the heading. */
  lead?: ReactNode;
  /** Buttons beside the heading on wide screens, under it on phones. */
  actions?: ReactNode;
}

export function PageHeader({ title, lead, actions }: Props) {
  return (
    <Box
      sx={{
        display: 'flex',
        flexWrap: 'wrap',
        alignItems: 'flex-end',
        justifyContent: 'space-between',
        gap: 2,
        mb: 3,
      }}
    >
      <DocumentTitle title={title} />
      <Box sx={{ minWidth: 0 }}>
        <Typography variant="h1">{title}</Typography>
        {lead && (
          <Typography color="text.secondary" sx={{ mt: 0.75 }}>
            {lead}
          </Typography>
        )}
      </Box>
      {actions && <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>{actions}</Box>}
    </Box>
  );
}
