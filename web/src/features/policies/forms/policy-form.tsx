import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Checkbox from '@mui/material/Checkbox';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import InputAdornment from '@mui/material/InputAdornment';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { Formik, useField, useFormikContext } from 'formik';
import { useId, useState, type ReactNode } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { FormSelectField } from '@/components/ui/form-select-field';
import { FormSwitchField } from '@/components/ui/form-switch-field';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm, serverErrorFor } from '@/lib/form-errors';
import { formatDateTime } from '@/lib/format';
import type { Policy, ProductKind } from '@/types/api';
import { useUpdatePolicies } from '../api/update-policies';
import {
  policyFieldFor,
  policyFormFields,
  policyRequest,
  policySchema,
  policyValues,
  productKindOptions,
  roundingOptions,
  type PolicyFormValues,
} from './policy-fields';

const dollarsAdornment = {
  input: { startAdornment: <InputAdornment position="start">$</InputAdornment> },
  htmlInput: { inputMode: 'decimal' as const, autoComplete: 'off' },
};

function unitAdornment(unit: string) {
  return {
    input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> },
    htmlInput: { inputMode: 'decimal' as const, autoComplete: 'off' },
  };
}

function Group({ title, lead, children }: { title: string; lead?: string; children: ReactNode }) {
  const id = useId();
  return (
    <Paper
      component="fieldset"
      variant="outlined"
      aria-labelledby={id}
      sx={{ m: 0, mb: 2, px: { xs: 2, sm: 3 }, pt: 2, pb: 2.5, minWidth: 0 }}
    >
      <Typography id={id} variant="h2" sx={{ fontSize: '1.15rem' }}>
        {title}
      </Typography>
      {lead && (
        <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
          {lead}
        </Typography>
      )}
      <Box
        sx={{
          display: 'grid',
          columnGap: 2,
          gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' },
          alignItems: 'start',
        }}
      >
        {children}
      </Box>
    </Paper>
  );
}

/** The product kinds a package needs for the discount, as a Formik-bound checkbox group. */
function RequiredKindsField() {
  const name = 'bundleDiscount.requiresKinds';
  const [field, meta, helpers] = useField<ProductKind[]>(name);
  const { status, submitCount } = useFormikContext<PolicyFormValues>();
  const legendId = useId();
  const helpId = useId();
  const error =
    ((submitCount > 0 || meta.touched) && typeof meta.error === 'string'
      ? meta.error
      : undefined) || serverErrorFor(status, name, field.value);
  const toggle = (kind: ProductKind, checked: boolean) => {
    const next = checked ? [...field.value, kind] : field.value.filter((other) => other !== kind);
    void helpers.setValue(productKindOptions.map((o) => o.value).filter((k) => next.includes(k)));
    void helpers.setTouched(true, false);
  };
  return (
    <FormControl component="fieldset" error={Boolean(error)} sx={{ gridColumn: '1 / -1', mt: 2 }}>
      <FormLabel id={legendId} component="legend">
        The package must include
      </FormLabel>
      <FormGroup row aria-describedby={helpId}>
        {productKindOptions.map((option) => (
          <FormControlLabel
            key={option.value}
            label={option.label}
            control={
              <Checkbox
                name={name}
                value={option.value}
                checked={field.value.includes(option.value)}
                onChange={(event) => toggle(option.value, event.target.checked)}
                slotProps={{ input: { 'aria-invalid': Boolean(error) } }}
              />
            }
          />
        ))}
      </FormGroup>
      <FormHelperText id={helpId} sx={{ mx: 0 }}>
        {error ?? 'The discount applies only when the quote has a line of every kind ticked.'}
      </FormHelperText>
    </FormControl>
  );
}

function SaveRow({ saved }: { saved: string | null }) {
  const { dirty } = useFormikContext();
  return (
    <Box sx={{ display: 'grid', gap: 1.5, mt: 1 }}>
      <Box aria-live="polite">
        {dirty ? (
          <Typography variant="body2" color="text.secondary">
            Changed, not saved yet.
          </Typography>
        ) : (
          saved && (
            <Alert severity="success" role="status">
              {saved}
            </Alert>
          )
        )}
      </Box>
      <Box>
        <SubmitButton>Save policies</SubmitButton>
      </Box>
    </Box>
  );
}

interface Props {
  policy: Policy;
  /** The workshop's time zone, for "last changed". */
  timeZone?: string;
}

/** Every pricing rule the workshop sets, saved together (the API takes the whole policy). */
export function PolicyForm({ policy, timeZone }: Props) {
  const updatePolicies = useUpdatePolicies();
  const [saved, setSaved] = useState<string | null>(null);
  return (
    <Formik<PolicyFormValues>
      initialValues={policyValues(policy)}
      validationSchema={policySchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setSaved(null);
        try {
          const result = await updatePolicies.mutateAsync(policyRequest(values));
          helpers.resetForm({ values: policyValues(result) });
          setSaved(
            `Policies saved (${formatDateTime(result.updatedAt, timeZone)}). New quotes use them; quotes already saved keep their prices.`,
          );
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, policyFormFields, policyFieldFor);
        }
      }}
    >
      {({ values }) => (
        <FormikForm aria-label="Pricing policies">
          <FormAlert />
          <Group title="Labour and tax">
            <FormTextField
              name="labourRate"
              label="Labour rate per hour"
              slotProps={dollarsAdornment}
            />
            <FormTextField name="taxRatePercent" label="GST rate" slotProps={unitAdornment('%')} />
            <FormSelectField
              name="taxRoundingMethod"
              label="GST rounding"
              options={roundingOptions}
              helperText="Both are lawful; the quote says which is used."
            />
            <Box sx={{ pt: { sm: 3 } }}>
              <FormSwitchField
                name="pricesIncludeTax"
                label="Prices include GST"
                helperText="Catalogue prices, the labour rate and the fees below include GST."
              />
            </Box>
          </Group>

          <Group
            title="Fitting and disposal"
            lead="Charged for every wheel fitted and every old tyre taken back."
          >
            <FormTextField
              name="fittingBalancing"
              label="Fitting and balancing per wheel"
              slotProps={dollarsAdornment}
            />
            <FormTextField
              name="tyreDisposal"
              label="Tyre disposal per tyre"
              slotProps={dollarsAdornment}
            />
          </Group>

          <Group
            title="Package discount"
            lead="Taken off the parts when a quote holds every kind ticked below."
          >
            <Box sx={{ pt: { sm: 3 } }}>
              <FormSwitchField name="bundleDiscount.enabled" label="Give a package discount" />
            </Box>
            <FormTextField
              name="bundleDiscount.percent"
              label="Discount on parts"
              disabled={!values.bundleDiscount.enabled}
              slotProps={unitAdornment('%')}
            />
            <RequiredKindsField />
          </Group>

          <Group
            title="Deposit"
            lead="A share of the total, never less than the smallest or more than the largest deposit (and never more than the total)."
          >
            <FormTextField
              name="deposit.percent"
              label="Deposit, share of the total"
              slotProps={unitAdornment('%')}
            />
            <FormTextField
              name="deposit.specialOrderPercent"
              label="Deposit with special-order parts"
              helperText="Used when any part must be ordered in."
              slotProps={unitAdornment('%')}
            />
            <FormTextField
              name="deposit.floor"
              label="Smallest deposit"
              slotProps={dollarsAdornment}
            />
            <FormTextField
              name="deposit.cap"
              label="Largest deposit"
              slotProps={dollarsAdornment}
            />
          </Group>

          <Group title="Quotes">
            <FormTextField
              name="quoteValidDays"
              label="Quotes hold their prices for"
              slotProps={{
                input: { endAdornment: <InputAdornment position="end">days</InputAdornment> },
                htmlInput: { inputMode: 'numeric', autoComplete: 'off' },
              }}
            />
          </Group>

          <SaveRow saved={saved} />
        </FormikForm>
      )}
    </Formik>
  );
}
