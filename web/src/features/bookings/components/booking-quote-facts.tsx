import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Skeleton from '@mui/material/Skeleton';
import Typography from '@mui/material/Typography';
import { FitReportPanel } from '@/components/quote/fit-report-panel';
import type { Booking, Quote, QuotePhoto } from '@/types/api';

/** The booking's quote as the route loaded it (GET /api/quotes/:id). */
export interface QuoteLoad {
  quote: Quote | undefined;
  loading: boolean;
  failed: boolean;
  retry: () => void;
}

const photoKindWords: Record<QuotePhoto['kind'], string> = {
  vehicle: 'Vehicle photo',
  'tyre-placard': 'Tyre placard photo',
};

/** The customer's photos on the quote, as thumbnails that open the full size. */
export function QuotePhotos({ photos }: { photos: readonly QuotePhoto[] }) {
  if (photos.length === 0) {
    return <Typography color="text.secondary">The customer has not added photos.</Typography>;
  }
  return (
    <Box
      component="ul"
      sx={{ listStyle: 'none', p: 0, m: 0, display: 'flex', flexWrap: 'wrap', gap: 1.5 }}
    >
      {photos.map((photo, index) => (
        <li key={photo.id}>
          <Link href={photo.url} target="_blank" rel="noopener" sx={{ display: 'block' }}>
            <Box
              component="img"
              src={photo.thumbnailUrl}
              alt={`${photoKindWords[photo.kind]} ${index + 1} (opens the full size)`}
              width={112}
              height={112}
              sx={{
                display: 'block',
                objectFit: 'cover',
                borderRadius: 2,
                border: 1,
                borderColor: 'divider',
              }}
            />
          </Link>
        </li>
      ))}
    </Box>
  );
}

/**
 * The fit report of the version the booking is for (the server's, shown as it made it), with
 * its cautions; while the quote loads, a placeholder; when it fails, a retry.
 */
export function BookedFitReport({ booking, load }: { booking: Booking; load: QuoteLoad }) {
  if (load.loading) {
    return <Skeleton variant="rounded" height={160} aria-label="Loading the fit report" />;
  }
  if (load.failed || !load.quote) {
    return (
      <Alert
        severity="error"
        action={
          <Button color="inherit" onClick={load.retry}>
            Try again
          </Button>
        }
      >
        The quote’s fit report could not be loaded.
      </Alert>
    );
  }
  const version = load.quote.versions.find(
    (candidate) => candidate.number === booking.quote.versionNumber,
  );
  if (!version) {
    return (
      <Typography color="text.secondary">
        Version {booking.quote.versionNumber} is not on the quote any more.
      </Typography>
    );
  }
  return <FitReportPanel report={version.fitReport} headingLevel="h3" onlyFindings />;
}
