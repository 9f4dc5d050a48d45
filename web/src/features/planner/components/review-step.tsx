import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import SaveOutlined from '@mui/icons-material/SaveOutlined';
import { useQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';
import { FitReportPanel } from '@/components/quote/fit-report-panel';
import { PriceBreakdown } from '@/components/quote/price-breakdown';
import { paths } from '@/config/paths';
import { formatWholeNumber } from '@/lib/format';
import { useCreateQuote } from '../api/create-quote';
import { uploadsQueryOptions } from '../api/get-uploads';
import { quotePreviewQueryOptions } from '../api/preview-quote';
import { toPackage, useLabels } from '../forms/build';
import { usePlanner } from '../hooks/use-planner';
import { PhotoAttachments } from './photo-attachments';
import { PlannerStep } from './planner-step';
import { ReviseReviewStep } from './revise-review-step';
import { ReviewSection, errorText } from './review-section';

/** Step 6: in a revision, the desk's terms and "Save and send"; otherwise "Save quote". */
export function ReviewStep() {
  const { config } = usePlanner();
  return config.mode === 'revise' ? <ReviseReviewStep /> : <SaveReviewStep />;
}

/** Step 6: the fit report, the price line by line, photos, and "Save quote". */
function SaveReviewStep() {
  const { build, config, stepHref, discard } = usePlanner();
  const navigate = useNavigate();
  const body = toPackage(build);
  const preview = useQuery({
    ...quotePreviewQueryOptions(
      body ?? { vehicleModelId: '', uses: [], constantLoadKg: 0, items: [] },
    ),
    enabled: body !== null,
  });
  const signedInCustomer = config.mode === 'customer' && config.viewerRole === 'customer';
  const uploads = useQuery({ ...uploadsQueryOptions(), enabled: signedInCustomer });
  const createQuote = useCreateQuote();
  const [askToSignIn, setAskToSignIn] = useState(false);
  const dialogTitleId = useId();
  const dialogTextId = useId();
  const blockedId = useId();
  const returnTo = stepHref('review');

  const walkIn = config.mode === 'walk-in';
  const staffOnPublicPlanner = !walkIn && config.viewerRole !== null && !signedInCustomer;
  const guest = !walkIn && config.viewerRole === null;
  const report = preview.data?.fitReport;
  const doesNotFit = report?.verdict === 'does-not-fit';
  const previewFailed = preview.isError;

  const save = () => {
    if (!body) return;
    if (guest) {
      setAskToSignIn(true);
      return;
    }
    const photoIds = signedInCustomer
      ? build.photos
          .filter((photo) =>
            (uploads.data?.items ?? []).some(
              (item) => item.id === photo.id && item.quoteId === null,
            ),
          )
          .map((photo) => photo.id)
      : [];
    createQuote.mutate(
      {
        ...body,
        ...(photoIds.length > 0 ? { photoIds } : {}),
        ...(walkIn && build.customer ? { customerId: build.customer.id } : {}),
      },
      {
        onSuccess: (quote) => {
          // The build is now a quote: the next visit to the planner starts afresh.
          discard();
          // The customer's quote page then offers to book a time for it straight away.
          void navigate(
            walkIn ? paths.desk.quote.getHref(quote.id) : paths.account.quote.getHref(quote.id),
            walkIn ? undefined : { state: { savedFromPlanner: true } },
          );
        },
      },
    );
  };

  const saveDisabled =
    !body ||
    preview.isPending ||
    previewFailed ||
    doesNotFit ||
    createQuote.isPending ||
    staffOnPublicPlanner;
  const deciding = report?.checks.filter((check) => check.verdict === 'does-not-fit') ?? [];

  return (
    <PlannerStep
      step="review"
      lead="Check the fit report and the price. Nothing is booked or paid yet."
      primaryAction={
        <Button
          variant="contained"
          size="large"
          color="secondary"
          startIcon={
            createQuote.isPending ? (
              <CircularProgress size={18} color="inherit" aria-hidden />
            ) : (
              <SaveOutlined aria-hidden />
            )
          }
          onClick={save}
          disabled={saveDisabled}
          aria-busy={createQuote.isPending || undefined}
          aria-describedby={doesNotFit || staffOnPublicPlanner ? blockedId : undefined}
        >
          Save quote
        </Button>
      }
    >
      {preview.isPending ? (
        <Box role="status" sx={{ display: 'flex', gap: 1.5, alignItems: 'center' }}>
          <CircularProgress size={24} aria-hidden />
          <Typography>Checking the fit and working out the price…</Typography>
        </Box>
      ) : previewFailed ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => void preview.refetch()}>
              Try again
            </Button>
          }
        >
          <AlertTitle>The package could not be priced</AlertTitle>
          {errorText(preview.error)} Go back to change the parts, or start again.
        </Alert>
      ) : (
        preview.data && (
          <>
            <ReviewSection title="Your vehicle">
              <Typography sx={{ fontWeight: 500 }}>
                {preview.data.vehicle.name}
                {build.year ? `, ${build.year}` : ''}
              </Typography>
              <Typography color="text.secondary">
                {build.uses.map((use) => useLabels[use]).join(', ')} ·{' '}
                {formatWholeNumber(build.constantLoadKg)} kg constant load
              </Typography>
              {build.customer && (
                <Typography color="text.secondary">
                  Quote for {build.customer.name} ({build.customer.email})
                </Typography>
              )}
            </ReviewSection>
            <ReviewSection title="Fit report">
              <FitReportPanel report={preview.data.fitReport} headingLevel="h3" />
            </ReviewSection>
            <ReviewSection title="Price">
              <PriceBreakdown
                price={preview.data.price}
                validUntilDate={preview.data.validUntilDate}
                caption="The price of your build, line by line"
              />
            </ReviewSection>
          </>
        )
      )}

      <PhotoAttachments returnTo={returnTo} />

      {doesNotFit && (
        <Alert id={blockedId} severity="error">
          <AlertTitle>This package cannot be saved</AlertTitle>
          It does not fit your vehicle: {deciding.map((check) => check.message).join(' ')} Go back
          and change the part the report names.
        </Alert>
      )}
      {staffOnPublicPlanner && (
        <Alert id={blockedId} severity="info">
          Quotes here are saved by customers for themselves.{' '}
          {config.viewerRole === 'desk' || config.viewerRole === 'manager' ? (
            <>
              To quote for a customer, use the{' '}
              <Link component={RouterLink} to={paths.desk.walkIn.getHref()}>
                walk-in quote
              </Link>{' '}
              at the front desk.
            </>
          ) : (
            'The front desk can save a quote for a customer.'
          )}
        </Alert>
      )}
      {createQuote.isError && (
        <Alert severity="error">
          <AlertTitle>The quote was not saved</AlertTitle>
          {errorText(createQuote.error)}
        </Alert>
      )}

      <Dialog
        open={askToSignIn}
        onClose={() => setAskToSignIn(false)}
        aria-labelledby={dialogTitleId}
        aria-describedby={dialogTextId}
      >
        <DialogTitle id={dialogTitleId}>Register or sign in to save</DialogTitle>
        <DialogContent>
          <DialogContentText id={dialogTextId}>
            A saved quote keeps its prices until the date shown and can be booked later. Your build
            stays on this device while you register or sign in, and you come straight back here to
            save it.
          </DialogContentText>
        </DialogContent>
        <DialogActions sx={{ flexWrap: 'wrap', gap: 1, px: 3, pb: 2 }}>
          <Button onClick={() => setAskToSignIn(false)}>Not now</Button>
          <Button
            component={RouterLink}
            to={paths.auth.signIn.getHref(returnTo)}
            variant="outlined"
          >
            Sign in
          </Button>
          <Button
            component={RouterLink}
            to={paths.auth.register.getHref(returnTo)}
            variant="contained"
          >
            Register
          </Button>
        </DialogActions>
      </Dialog>
    </PlannerStep>
  );
}
