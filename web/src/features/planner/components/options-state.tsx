import Accordion from '@mui/material/Accordion';
import AccordionDetails from '@mui/material/AccordionDetails';
import AccordionSummary from '@mui/material/AccordionSummary';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Skeleton from '@mui/material/Skeleton';
import Typography from '@mui/material/Typography';
import ExpandMore from '@mui/icons-material/ExpandMore';
import { isApiError } from '@/lib/api-client';
import type { PlannerOption, Product } from '@/types/api';
import { availabilityText } from '../forms/product-text';
import { usePlanner } from '../hooks/use-planner';

/** Placeholder cards while the options load, announced once. */
export function OptionsLoading({ label }: { label: string }) {
  return (
    <Box role="status" aria-label={label} sx={{ display: 'grid', gap: 1 }}>
      {[0, 1, 2].map((index) => (
        <Skeleton key={index} variant="rounded" height={76} />
      ))}
    </Box>
  );
}

export function OptionsError({ error, onRetry }: { error: unknown; onRetry: () => void }) {
  return (
    <Alert
      severity="error"
      action={
        <Button color="inherit" onClick={onRetry}>
          Try again
        </Button>
      }
    >
      {isApiError(error) ? error.message : 'The choices could not be loaded.'}
    </Alert>
  );
}

/** Products that do not fit, out of the way but there to read, each with the reason. */
export function UnsuitableOptions({
  options,
  title = 'Not suitable for this vehicle or load',
}: {
  options: readonly PlannerOption[];
  title?: string;
}) {
  if (options.length === 0) return null;
  return (
    <Accordion
      disableGutters
      variant="outlined"
      sx={{ borderRadius: 2, '&::before': { display: 'none' } }}
    >
      <AccordionSummary expandIcon={<ExpandMore aria-hidden />}>
        <Typography sx={{ fontWeight: 500 }}>
          {title} ({options.length})
        </Typography>
      </AccordionSummary>
      <AccordionDetails>
        <Box component="ul" sx={{ m: 0, pl: 2.5, display: 'grid', gap: 1 }}>
          {options.map((option) => (
            <li key={option.product.id}>
              <Typography component="span" sx={{ fontWeight: 500 }}>
                {option.product.name}
              </Typography>
              <Typography variant="body2" color="text.secondary">
                {summaryWithoutVerdict(option)}
              </Typography>
            </li>
          ))}
        </Box>
      </AccordionDetails>
    </Accordion>
  );
}

/** The API's summary opens with the verdict in words, which the chip beside it already says. */
const VERDICT_OPENING = /^(Does not fit|Needs an engineer's certificate|Fits, with advice): /;

export function summaryWithoutVerdict(option: PlannerOption): string {
  const text = option.summary.replace(VERDICT_OPENING, '');
  return text.charAt(0).toUpperCase() + text.slice(1);
}

export function isSelectable(option: PlannerOption): boolean {
  return option.verdict !== 'does-not-fit';
}

/**
 * Stock on the shelf or the lead time, for the front desk (walk-in quotes and revisions) choosing
 * a part; the customer's own planner leaves it out.
 */
export function StockNote({
  product,
}: {
  product: Pick<Product, 'kind' | 'stockQty' | 'leadDays'>;
}) {
  const { config } = usePlanner();
  const text = config.mode === 'customer' ? null : availabilityText(product);
  if (!text) return null;
  return (
    <Box
      component="span"
      sx={{
        display: 'block',
        mt: 0.5,
        fontWeight: 500,
        color: product.stockQty > 0 ? 'success.dark' : 'warning.dark',
      }}
    >
      {text}
    </Box>
  );
}
