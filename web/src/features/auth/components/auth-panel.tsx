import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { DocumentTitle } from '@/components/ui/document-title';

interface Props {
  title: string;
  lead?: ReactNode;
  children: ReactNode;
  /** Links under the card (to the other auth pages). */
  footer?: ReactNode;
}

/** The narrow card the sign-in, register and password pages share. */
export function AuthPanel({ title, lead, children, footer }: Props) {
  return (
    <Box sx={{ maxWidth: 440, mx: 'auto', py: { xs: 1, sm: 4 } }}>
      <DocumentTitle title={title} />
      <Card>
        <CardContent sx={{ p: { xs: 2.5, sm: 4 } }}>
          <Typography variant="h1" gutterBottom>
            {title}
          </Typography>
          {lead && (
            <Typography color="text.secondary" sx={{ mb: 1 }}>
              {lead}
            </Typography>
          )}
          {children}
        </CardContent>
      </Card>
      {footer && (
        <Box sx={{ mt: 2.5, display: 'grid', gap: 1, justifyItems: 'center', textAlign: 'center' }}>
          {footer}
        </Box>
      )}
    </Box>
  );
}
