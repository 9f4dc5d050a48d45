import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Skeleton from '@mui/material/Skeleton';
import Typography from '@mui/material/Typography';
import { FitReportPanel } from '@/components/quote/fit-report-panel';
import { PhotoThumbnails } from '@/components/quote/photo-thumbnails';
import type { Booking, Quote, QuotePhoto } from '@/types/api';

/** The booking's quote as the route loaded it (GET /api/quotes/:id). */
export interface QuoteLoad {
  quote: Quote | undefined;
  loading: boolean;
  failed: boolean;
  retry: () => void;
}

/** The customer's photos on the quote, as thumbnails that open the full size. */
export function QuotePhotos({ photos }: { photos: readonly QuotePhoto[] }) {
  if (photos.length === 0) {
    return <Typography color="text.secondary">The customer has not added photos.</Typography>;
  }
  return <PhotoThumbnails photos={photos} sizePx={112} />;
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
