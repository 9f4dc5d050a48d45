import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import InputAdornment from '@mui/material/InputAdornment';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { Formik, useFormikContext } from 'formik';
import { useId, useMemo, useState, type ReactNode } from 'react';
import {
  FormAutocompleteField,
  type AutocompleteOption,
} from '@/components/ui/form-autocomplete-field';
import { FormAlert } from '@/components/ui/form-alert';
import { FormSelectField } from '@/components/ui/form-select-field';
import { FormSwitchField } from '@/components/ui/form-switch-field';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { cancellationPolicyText } from '@/lib/cancellation-policy';
import { applyApiErrorToForm } from '@/lib/form-errors';
import type { WorkshopSetup } from '@/types/api';
import { useUpdateWorkshopCalendar } from '../api/update-workshop-calendar';
import {
  FULL_REFUND_HOURS_BEFORE,
  LATE_CANCEL_REFUND_PERCENT,
  SLOT_STEP_MINUTES,
  calendarFieldFor,
  calendarFormFields,
  calendarRequest,
  calendarSchema,
  calendarValues,
  weekdayName,
  weekdayNames,
  type CalendarFormValues,
} from './calendar-fields';

/** Every zone the browser's time zone data lists, e.g. "Australia/Sydney". */
function timeZoneOptions(): AutocompleteOption[] {
  const zones =
    typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return zones.map((zone) => ({ value: zone, label: zone.replace(/_/g, ' ') }));
}

const slotStepOptions = SLOT_STEP_MINUTES.map((minutes) => ({
  value: String(minutes),
  label: `Every ${minutes} minutes`,
}));

function unit(text: string) {
  return {
    input: { endAdornment: <InputAdornment position="end">{text}</InputAdornment> },
    htmlInput: { inputMode: 'numeric' as const, autoComplete: 'off' },
  };
}

const timeField = {
  inputLabel: { shrink: true },
  htmlInput: { step: 300 },
} as const;

function Group({ title, lead, children }: { title: string; lead?: string; children: ReactNode }) {
  const id = useId();
  return (
    <Paper
      component="fieldset"
      variant="outlined"
      aria-labelledby={id}
      sx={{ m: 0, mb: 2, px: { xs: 2, sm: 3 }, pt: 2, pb: 2.5, minWidth: 0 }}
    >
      <Typography id={id} variant="h2" component="legend" sx={{ fontSize: '1.15rem', p: 0 }}>
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
          gridTemplateColumns: { xs: 'minmax(0, 1fr)', sm: 'repeat(2, minmax(0, 1fr))' },
          alignItems: 'start',
        }}
      >
        {children}
      </Box>
    </Paper>
  );
}

/** One weekday: open or not, its hours, and an optional break (a fieldset named by the day). */
function DayHoursFields({ index, readOnly }: { index: number; readOnly: boolean }) {
  const { values } = useFormikContext<CalendarFormValues>();
  const day = values.openingHours[index];
  const legendId = useId();
  const name = weekdayName(day.weekday);
  const prefix = `openingHours[${index}]`;
  const closed = !day.open;
  return (
    <Box
      component="fieldset"
      aria-labelledby={legendId}
      sx={{
        m: 0,
        p: 0,
        border: 0,
        borderTop: 1,
        borderColor: 'divider',
        pt: 1.5,
        pb: 1,
        minWidth: 0,
        display: 'grid',
        columnGap: 2,
        alignItems: 'start',
        gridTemplateColumns: {
          xs: 'repeat(2, minmax(0, 1fr))',
          md: '110px 120px repeat(4, minmax(0, 1fr))',
        },
      }}
    >
      <Typography
        id={legendId}
        component="legend"
        sx={{ fontWeight: 500, p: 0, float: 'left', pt: { md: 3 } }}
      >
        {name}
      </Typography>
      <Box sx={{ pt: { md: 2 } }}>
        <FormSwitchField name={`${prefix}.open`} label="Open" disabled={readOnly} />
      </Box>
      <FormTextField
        name={`${prefix}.opensAt`}
        label="Opens"
        type="time"
        disabled={readOnly || closed}
        slotProps={timeField}
      />
      <FormTextField
        name={`${prefix}.closesAt`}
        label="Closes"
        type="time"
        disabled={readOnly || closed}
        slotProps={timeField}
      />
      <FormTextField
        name={`${prefix}.breakStartsAt`}
        label="Break from"
        type="time"
        disabled={readOnly || closed}
        slotProps={timeField}
      />
      <FormTextField
        name={`${prefix}.breakEndsAt`}
        label="Break to"
        type="time"
        disabled={readOnly || closed}
        slotProps={timeField}
      />
    </Box>
  );
}

function wholeNumberIn(text: string, range: { min: number; max: number }): number | null {
  const trimmed = text.trim();
  if (!/^\d+$/.test(trimmed)) return null;
  const value = Number(trimmed);
  return value >= range.min && value <= range.max ? value : null;
}

/** The rule as customers will read it in the cancel dialog, while both fields are valid. */
function PolicyPreview() {
  const { values } = useFormikContext<CalendarFormValues>();
  const hours = wholeNumberIn(values.fullRefundHoursBefore, FULL_REFUND_HOURS_BEFORE);
  const percent = wholeNumberIn(values.lateCancelRefundPercent, LATE_CANCEL_REFUND_PERCENT);
  if (hours === null || percent === null) return null;
  return (
    <Typography variant="body2" sx={{ gridColumn: '1 / -1', mt: 1 }}>
      Customers read: “
      {cancellationPolicyText({ fullRefundHoursBefore: hours, lateCancelRefundPercent: percent })}”
    </Typography>
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
        <SubmitButton>Save the calendar</SubmitButton>
      </Box>
    </Box>
  );
}

interface Props {
  setup: WorkshopSetup;
  /** The front desk reads the calendar; only a manager changes it (the API refuses others). */
  readOnly: boolean;
}

/**
 * The calendar as one form: time zone, holiday region, how start times are offered and held,
 * and the week's hours. Saved together (PUT /api/workshop/calendar); the server's field errors
 * land on the field they are about, e.g. Wednesday's closing time.
 */
export function CalendarForm({ setup, readOnly }: Props) {
  const updateCalendar = useUpdateWorkshopCalendar();
  const [saved, setSaved] = useState<string | null>(null);
  // Read-only fields are disabled; their hints would be greyed out too, so they are left off.
  const help = (text: string) => (readOnly ? undefined : text);
  const zones = useMemo(() => timeZoneOptions(), []);
  const regions = useMemo(
    () => setup.holidayRegions.map((region) => ({ value: region.code, label: region.name })),
    [setup.holidayRegions],
  );
  const schema = useMemo(
    () => calendarSchema(setup.holidayRegions.map((region) => region.code)),
    [setup.holidayRegions],
  );
  return (
    <Formik<CalendarFormValues>
      initialValues={calendarValues(setup)}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setSaved(null);
        try {
          const result = await updateCalendar.mutateAsync(calendarRequest(values));
          helpers.resetForm({ values: calendarValues(result) });
          setSaved(
            'Calendar saved. New start times follow it; bookings already made keep their times.',
          );
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, calendarFormFields, calendarFieldFor);
        }
      }}
    >
      <FormikForm aria-label="Workshop calendar">
        <FormAlert />
        <Group
          title="Time zone and public holidays"
          lead="Every time customers see is on this clock. The workshop is closed on the region's public holidays unless it opens anyway (below)."
        >
          <FormAutocompleteField
            name="timeZone"
            label="Time zone"
            options={zones}
            disabled={readOnly}
            helperText={help('Type a city, such as Sydney.')}
          />
          <FormAutocompleteField
            name="holidayRegion"
            label="Public holiday region"
            options={regions}
            disabled={readOnly}
            helperText={help('Country, or country and state.')}
          />
        </Group>

        <Group
          title="Start times and holds"
          lead="How customers' start times are offered, and how long a chosen time is held."
        >
          <FormSelectField
            name="slotStepMinutes"
            label="Start times offered"
            options={slotStepOptions}
            disabled={readOnly}
            helperText={help('From opening time, in steps of this size.')}
          />
          <FormTextField
            name="holdMinutes"
            label="A chosen time is held for"
            disabled={readOnly}
            slotProps={unit('minutes')}
          />
          <FormTextField
            name="leadTimeBufferDays"
            label="Days added after parts arrive"
            disabled={readOnly}
            helperText={help('To check in special-order parts before the job.')}
            slotProps={unit('days')}
          />
          <FormTextField
            name="fittingMinutesPerWheel"
            label="Bay time to fit one wheel"
            disabled={readOnly}
            helperText={help('Mount, balance and fit, per wheel.')}
            slotProps={unit('minutes')}
          />
        </Group>

        <Group
          title="Cancellation and refunds"
          lead="What a customer gets back of a paid deposit when they cancel. Refunds go back through the payment provider."
        >
          <FormTextField
            name="fullRefundHoursBefore"
            label="Full refund until"
            disabled={readOnly}
            helperText={help(
              `Hours before the start, ${FULL_REFUND_HOURS_BEFORE.min} to ${FULL_REFUND_HOURS_BEFORE.max}.`,
            )}
            slotProps={unit('hours before the start')}
          />
          <FormTextField
            name="lateCancelRefundPercent"
            label="Later cancellation refunds"
            disabled={readOnly}
            helperText={help('Share of the deposit, 0 for no refund.')}
            slotProps={unit('% of the deposit')}
          />
          <PolicyPreview />
        </Group>

        <Paper
          component="section"
          variant="outlined"
          aria-label="Opening hours"
          sx={{ mb: 2, px: { xs: 2, sm: 3 }, pt: 2, pb: 1.5, minWidth: 0 }}
        >
          <Typography variant="h2" sx={{ fontSize: '1.15rem' }}>
            Opening hours
          </Typography>
          <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5, mb: 1 }}>
            On the workshop&apos;s clock. Work pauses over the break and overnight; the bay stays
            taken.
          </Typography>
          {weekdayNames.map((name, index) => (
            <DayHoursFields key={name} index={index} readOnly={readOnly} />
          ))}
        </Paper>

        {readOnly ? (
          <Alert severity="info">Only a manager can change the calendar.</Alert>
        ) : (
          <SaveRow saved={saved} />
        )}
      </FormikForm>
    </Formik>
  );
}
