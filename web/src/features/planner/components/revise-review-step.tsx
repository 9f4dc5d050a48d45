import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import CircularProgress from '@mui/material/CircularProgress';
import InputAdornment from '@mui/material/InputAdornment';
import Typography from '@mui/material/Typography';
import SendOutlined from '@mui/icons-material/SendOutlined';
import { useQuery } from '@tanstack/react-query';
import { Formik, useFormikContext } from 'formik';
import { useEffect, useId, useMemo, useState } from 'react';
import { useNavigate } from 'react-router';
import { FitReportPanel } from '@/components/quote/fit-report-panel';
import { PriceBreakdown } from '@/components/quote/price-breakdown';
import { FormAlert } from '@/components/ui/form-alert';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { applyApiErrorToForm } from '@/lib/form-errors';
import { formatWholeNumber } from '@/lib/format';
import { formatCents } from '@/lib/money';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import type { PackagePrice, Quote, QuoteVersion, RevisionPreviewRequest } from '@/types/api';
import { revisionPreviewQueryOptions } from '../api/preview-revision';
import { useReviseQuote } from '../api/revise-quote';
import { useLabels, type BuildItem } from '../forms/build';
import {
  REASON_MAX_LENGTH,
  revisionFieldName,
  revisionFieldNames,
  revisionFormSchema,
  revisionFormValues,
  revisionTermsFrom,
  toRevisionRequest,
  type RevisionFormValues,
} from '../forms/revision';
import { usePlanner } from '../hooks/use-planner';
import { PlannerStep } from './planner-step';
import { ReviewSection, errorText } from './review-section';

/** Set on the desk's quote page after a revision is saved: which version is new. */
export interface RevisedState {
  revisedVersion: number;
}

const kindWords: Record<BuildItem['kind'], string> = {
  'suspension-kit': 'Suspension kit',
  wheel: 'Wheel',
  tyre: 'Tyre',
  component: 'Part',
  service: 'Workshop service',
};

function latestVersionOf(quote: Quote | undefined): QuoteVersion | undefined {
  return quote ? [...quote.versions].sort((a, b) => b.number - a.number)[0] : undefined;
}

/** Workshop minutes the price charges as labour (the parts' fitting time). */
function labourMinutesOf(price: PackagePrice): number {
  return price.lines.reduce(
    (sum, line) => sum + (line.kind === 'labour' ? (line.labourMinutes ?? 0) : 0),
    0,
  );
}

/** The version being replaced beside the revision's preview: total, deposit, labour. */
function ChangeSummary({ base, next }: { base: QuoteVersion; next: PackagePrice }) {
  const rows: [string, string, string][] = [
    ['Total', formatCents(base.price.totalCents), formatCents(next.totalCents)],
    ['Deposit', formatCents(base.price.depositCents), formatCents(next.depositCents)],
    [
      'Labour',
      `${formatWholeNumber(labourMinutesOf(base.price))} min`,
      `${formatWholeNumber(labourMinutesOf(next))} min`,
    ],
  ];
  return (
    <Box
      component="dl"
      sx={{
        m: 0,
        display: 'grid',
        gridTemplateColumns: 'auto minmax(0, 1fr)',
        columnGap: 2,
        rowGap: 0.5,
        '& dt': { color: 'text.secondary' },
        '& dd': { m: 0, fontVariantNumeric: 'tabular-nums' },
      }}
    >
      {rows.map(([label, before, after]) => (
        <Box key={label} sx={{ display: 'contents' }}>
          <dt>{label}</dt>
          <dd>
            {before === after ? (
              <>
                {after} <span>(unchanged)</span>
              </>
            ) : (
              <>
                {before} → <strong>{after}</strong>
              </>
            )}
          </dd>
        </Box>
      ))}
    </Box>
  );
}

/** One line of the revision: what it is, and its quantity and labour per unit as fields. */
function LineFields({ item, index }: { item: BuildItem; index: number }) {
  const saved = item.labourMinutes ?? 0;
  const headingId = useId();
  return (
    <Box
      component="li"
      aria-labelledby={headingId}
      sx={{
        listStyle: 'none',
        display: 'grid',
        gap: 1.5,
        gridTemplateColumns: {
          xs: 'minmax(0, 1fr) minmax(0, 1fr)',
          md: 'minmax(0, 1fr) 110px 170px',
        },
        alignItems: 'start',
        py: 1.5,
        borderTop: 1,
        borderColor: 'divider',
      }}
    >
      <Box sx={{ gridColumn: { xs: '1 / -1', md: 'auto' }, minWidth: 0 }}>
        <Typography id={headingId} sx={{ fontWeight: 500 }}>
          {item.name}
        </Typography>
        <Typography variant="body2" color="text.secondary">
          {kindWords[item.kind]}
          {item.brand ? ` · ${item.brand}` : ''} · {formatCents(item.priceCents)} each
        </Typography>
      </Box>
      <FormTextField
        name={`lines[${index}].quantity`}
        label="Quantity"
        size="small"
        slotProps={{ htmlInput: { inputMode: 'numeric', 'aria-describedby': headingId } }}
      />
      <FormTextField
        name={`lines[${index}].labourMinutes`}
        label="Labour per unit"
        size="small"
        helperText={`Saved: ${formatWholeNumber(saved)} min`}
        slotProps={{
          htmlInput: { inputMode: 'numeric' },
          input: { endAdornment: <InputAdornment position="end">min</InputAdornment> },
        }}
      />
    </Box>
  );
}

/** Keeps the build (and its storage) in step with the form, so other steps and a reload see it. */
function KeepBuildInStep() {
  const { values } = useFormikContext<RevisionFormValues>();
  const { build, setItemQuantity, setRevisionTerms } = usePlanner();
  useEffect(() => {
    for (const line of values.lines) {
      const quantity = Number(line.quantity.trim());
      if (/^\d+$/.test(line.quantity.trim()) && quantity >= 1 && quantity <= 24) {
        setItemQuantity(line.productId, quantity);
      }
    }
    setRevisionTerms(revisionTermsFrom(build, values));
    // The build changes as a result; only the form's values drive this.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [values]);
  return null;
}

const previewSchema = revisionFormSchema.pick(['lines', 'discount']);

function ReviseReviewContent({ save }: { save: ReturnType<typeof useReviseQuote> }) {
  const { build, config } = usePlanner();
  const { values, setStatus, isSubmitting } = useFormikContext<RevisionFormValues>();
  const quote = config.revisedQuote;
  const base = latestVersionOf(quote);
  const quoteId = build.revision?.quoteId ?? '';
  const settled = useDebouncedValue(values, 400);
  // Only figures that pass the form's rules are priced; until then the last price stays.
  const [priced, setPriced] = useState(settled);
  if (priced !== settled && previewSchema.isValidSync(settled)) setPriced(settled);
  const body: RevisionPreviewRequest | null = toRevisionRequest(build, priced);
  const previewBody = body ? { ...body, reason: undefined } : null;
  const preview = useQuery({
    ...revisionPreviewQueryOptions(
      quoteId,
      previewBody ?? { vehicleModelId: '', uses: [], constantLoadKg: 0, items: [] },
    ),
    enabled: previewBody !== null && quoteId !== '',
  });
  // The preview's refusal of a figure (a discount above the subtotal, say) is shown on its
  // field too, while the field holds the figure that was refused.
  const previewError = preview.isError ? preview.error : null;
  useEffect(() => {
    if (isSubmitting || !isApiError(previewError) || !previewError.isValidation) return;
    applyApiErrorToForm(
      previewError,
      { setStatus },
      priced,
      revisionFieldNames(priced),
      revisionFieldName,
    );
    // Only a new refusal of the preview puts errors on the fields.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [previewError]);
  const report = preview.data?.fitReport;
  const doesNotFit = report?.verdict === 'does-not-fit';
  const blockedId = useId();
  const reasonLength = values.reason.trim().length;
  const byId = new Map(build.items.map((item) => [item.productId, item]));
  const nextNumber = (base?.number ?? build.revision?.baseVersionNumber ?? 0) + 1;

  return (
    <PlannerStep
      step="review"
      lead={`Change quantities, labour or a discount, say why, and send version ${nextNumber} to ${build.customer?.name ?? 'the customer'}. The version they have now is replaced.`}
      primaryAction={
        <SubmitButton
          color="secondary"
          startIcon={<SendOutlined aria-hidden />}
          disabled={preview.isPending || doesNotFit || save.isPending}
          aria-describedby={doesNotFit ? blockedId : undefined}
        >
          Save and send version {nextNumber}
        </SubmitButton>
      }
    >
      <KeepBuildInStep />
      <ReviewSection title="The vehicle">
        <Typography sx={{ fontWeight: 500 }}>
          {build.vehicleName}
          {build.year ? `, ${build.year}` : ''}
        </Typography>
        <Typography color="text.secondary">
          {build.uses.map((use) => useLabels[use]).join(', ') || 'No use given'} ·{' '}
          {formatWholeNumber(build.constantLoadKg)} kg constant load
        </Typography>
        {build.customer && (
          <Typography color="text.secondary">
            Quote {build.revision?.reference} for {build.customer.name} ({build.customer.email})
          </Typography>
        )}
      </ReviewSection>

      <ReviewSection title="Lines">
        <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
          Swap a part on the earlier steps. Labour is per unit; each line starts from the minutes
          saved on version {build.revision?.baseVersionNumber}.
        </Typography>
        <Box component="ul" aria-label="Lines of the revision" sx={{ m: 0, p: 0 }}>
          {values.lines.map((line, index) => {
            const item = byId.get(line.productId);
            return item ? <LineFields key={line.productId} item={item} index={index} /> : null;
          })}
        </Box>
      </ReviewSection>

      <ReviewSection title="Discount and reason">
        <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'minmax(0, 1fr)' }}>
          <FormTextField
            name="discount"
            label="Workshop discount"
            helperText="In dollars, taken off the price; at most the subtotal. Leave empty for none."
            sx={{ maxWidth: 280 }}
            slotProps={{
              htmlInput: { inputMode: 'decimal' },
              input: { startAdornment: <InputAdornment position="start">$</InputAdornment> },
            }}
          />
          <FormTextField
            name="reason"
            label="Why the quote is revised"
            required
            multiline
            minRows={3}
            helperText={`The customer reads this with the new version. ${reasonLength}/${REASON_MAX_LENGTH} characters.`}
          />
        </Box>
      </ReviewSection>

      {preview.isPending ? (
        <Box role="status" sx={{ display: 'flex', gap: 1.5, alignItems: 'center' }}>
          <CircularProgress size={24} aria-hidden />
          <Typography>Checking the fit and working out the new price…</Typography>
        </Box>
      ) : preview.isError ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => void preview.refetch()}>
              Try again
            </Button>
          }
        >
          <AlertTitle>The revision could not be priced</AlertTitle>
          {errorText(preview.error)}
        </Alert>
      ) : (
        preview.data && (
          <>
            {base && (
              <ReviewSection title={`Version ${base.number} → version ${nextNumber}`}>
                <Card variant="outlined">
                  <CardContent aria-live="polite">
                    <ChangeSummary base={base} next={preview.data.price} />
                  </CardContent>
                </Card>
              </ReviewSection>
            )}
            <ReviewSection title="Fit report">
              <FitReportPanel report={preview.data.fitReport} headingLevel="h3" />
            </ReviewSection>
            <ReviewSection title="Price">
              <PriceBreakdown
                price={preview.data.price}
                validUntilDate={preview.data.validUntilDate}
                caption={`Version ${nextNumber}, line by line`}
              />
            </ReviewSection>
          </>
        )
      )}

      {doesNotFit && (
        <Alert id={blockedId} severity="error">
          <AlertTitle>This revision cannot be saved</AlertTitle>
          It does not fit the vehicle:{' '}
          {(report?.checks ?? [])
            .filter((check) => check.verdict === 'does-not-fit')
            .map((check) => check.message)
            .join(' ')}{' '}
          Go back and change the part the report names.
        </Alert>
      )}
      <FormAlert />
    </PlannerStep>
  );
}

/**
 * The review of a revision: every line with its quantity and labour per unit, a workshop
 * discount and the reason (Formik, the schema mirroring ReviseQuoteDto), a live preview of the
 * new fit report and price, and "Save and send", which makes the quote's next version and goes
 * back to the desk's quote page.
 */
export function ReviseReviewStep() {
  const { build, discard } = usePlanner();
  const navigate = useNavigate();
  const save = useReviseQuote();
  // The form starts from the build once; from then on the form leads and the build follows.
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const initialValues = useMemo(() => revisionFormValues(build), []);
  const quoteId = build.revision?.quoteId;
  if (!quoteId) {
    return <Alert severity="error">This build is not a revision of a quote.</Alert>;
  }
  return (
    <Formik<RevisionFormValues>
      initialValues={initialValues}
      validationSchema={revisionFormSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        const preview = toRevisionRequest(build, values);
        if (!preview) return;
        const body = { ...preview, reason: values.reason.trim() };
        try {
          const quote = await save.mutateAsync({ quoteId, body });
          const latest = latestVersionOf(quote);
          // The revision is a version of the quote now: the next revision starts afresh.
          discard();
          const state: RevisedState = { revisedVersion: latest?.number ?? 0 };
          void navigate(paths.desk.quote.getHref(quoteId), { state });
        } catch (error) {
          applyApiErrorToForm(
            error,
            helpers,
            values,
            revisionFieldNames(values),
            revisionFieldName,
          );
        }
      }}
    >
      <FormikForm aria-label="Revise the quote">
        <ReviseReviewContent save={save} />
      </FormikForm>
    </Formik>
  );
}
