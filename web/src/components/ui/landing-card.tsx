import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import CheckCircleOutline from '@mui/icons-material/CheckCircleOutline';
import type { ReactNode } from 'react';

interface Props {
  /** The card's h2. */
  title: string;
  /** What the area shows today (honestly: often "nothing yet"). */
  status: ReactNode;
  /** What the role will be able to do here. */
  upcoming?: readonly string[];
  actions?: ReactNode;
}

/** A role home's first card: what this area is for and what is still to come. */
export function LandingCard({ title, status, upcoming, actions }: Props) {
  return (
    <Card>
      <CardContent sx={{ p: { xs: 2.5, sm: 3 } }}>
        <Typography variant="h2" gutterBottom>
          {title}
        </Typography>
        <Typography color="text.secondary">{status}</Typography>
        {upcoming && upcoming.length > 0 && (
          <>
            <Typography variant="h3" sx={{ mt: 2.5, mb: 1 }}>
              Still to come
            </Typography>
            <Box component="ul" sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gap: 1 }}>
              {upcoming.map((line) => (
                <Box
                  component="li"
                  key={line}
                  sx={{ display: 'flex', gap: 1.25, alignItems: 'flex-start' }}
                >
                  <CheckCircleOutline
                    aria-hidden
                    fontSize="small"
                    sx={{ color: 'primary.main', mt: '2px' }}
                  />
                  <Typography>{line}</Typography>
                </Box>
              ))}
            </Box>
          </>
        )}
        {actions && (
          <Box sx={{ mt: 3, display: 'flex', gap: 1.5, flexWrap: 'wrap' }}>{actions}</Box>
        )}
      </CardContent>
    </Card>
  );
}
