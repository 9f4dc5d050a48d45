import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { Formik, useFormikContext } from 'formik';
import { useId, useMemo, useState } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { FormSwitchField } from '@/components/ui/form-switch-field';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import type { RuleLimit, RuleSet } from '@/types/api';
import { useUpdateRuleSet } from '../api/update-rule-set';
import {
  groupRules,
  ruleFieldFor,
  ruleSetChanges,
  ruleSetFormFields,
  ruleSetSchema,
  ruleSetValues,
  type RuleSetFormValues,
} from './rule-limit-fields';

/** The phone's bottom navigation bar, which the save bar sits above. */
const BOTTOM_NAV_HEIGHT = 64;

interface Props {
  ruleSet: RuleSet;
}

function RuleRow({ ruleKey, limit }: { ruleKey: string; limit: RuleLimit }) {
  const labelId = useId();
  const sourceId = useId();
  const numeric = limit.value !== null;
  return (
    <Box
      role="group"
      aria-labelledby={labelId}
      aria-describedby={sourceId}
      sx={{
        display: 'grid',
        gap: { xs: 0.5, md: 3 },
        gridTemplateColumns: { xs: '1fr', md: 'minmax(0, 1fr) 340px' },
        py: 2,
        '& + &': { borderTop: 1, borderColor: 'divider' },
      }}
    >
      <Box sx={{ minWidth: 0 }}>
        <Typography id={labelId} sx={{ fontWeight: 500 }}>
          {limit.label}
        </Typography>
        <Typography variant="body2" color="text.secondary" id={sourceId} sx={{ mt: 0.5 }}>
          <Box component="span" sx={{ fontWeight: 500 }}>
            Source:
          </Box>{' '}
          {limit.source}
        </Typography>
      </Box>
      <Box
        sx={{
          display: 'flex',
          flexWrap: 'wrap',
          alignItems: 'flex-start',
          columnGap: 2,
          rowGap: 1,
          mt: { xs: 1, md: 0 },
          '& .MuiFormControl-root': { mt: 0 },
        }}
      >
        <Box sx={{ minWidth: 120, pt: { md: 0.5 } }}>
          <FormSwitchField name={`limits.${ruleKey}.enabled`} label="Enabled" />
        </Box>
        {numeric && (
          <FormTextField
            name={`limits.${ruleKey}.value`}
            label={limit.unit ? `Value (${limit.unit})` : 'Value'}
            autoComplete="off"
            size="small"
            sx={{ flex: '1 1 140px' }}
            slotProps={{ htmlInput: { inputMode: 'decimal' } }}
          />
        )}
      </Box>
    </Box>
  );
}

/** Stays in view at the bottom of the rules: what is unsaved, or what was last saved. */
function SaveBar({ ruleSet, lastSaved }: { ruleSet: RuleSet; lastSaved: string | null }) {
  const { values, dirty } = useFormikContext<RuleSetFormValues>();
  const changed = Object.keys(ruleSetChanges(ruleSet, values).limits).length;
  return (
    <Paper
      elevation={0}
      sx={{
        position: 'sticky',
        bottom: { xs: `calc(${BOTTOM_NAV_HEIGHT + 8}px + env(safe-area-inset-bottom))`, md: 16 },
        zIndex: 2,
        mt: 2,
        px: 2,
        py: 1.5,
        border: 1,
        borderColor: 'divider',
        display: 'flex',
        flexWrap: 'wrap',
        alignItems: 'center',
        justifyContent: 'space-between',
        gap: 1.5,
        boxShadow: '0 4px 18px rgba(29, 38, 35, 0.12)',
      }}
    >
      <Typography variant="body2" aria-live="polite">
        {changed > 0
          ? `${changed} rule${changed === 1 ? '' : 's'} changed, not saved yet.`
          : dirty
            ? 'Changed, not saved yet.'
            : (lastSaved ?? 'No unsaved changes.')}
      </Typography>
      <SubmitButton size="medium" disabled={!dirty}>
        Save changes
      </SubmitButton>
    </Paper>
  );
}

/** Every rule of one set: its switch and value, with the label, unit and source beside it. */
export function RuleSetForm({ ruleSet }: Props) {
  const updateRuleSet = useUpdateRuleSet();
  const [lastSaved, setLastSaved] = useState<string | null>(null);
  const schema = useMemo(() => ruleSetSchema(ruleSet), [ruleSet]);
  const groups = useMemo(() => groupRules(ruleSet), [ruleSet]);

  return (
    <Formik<RuleSetFormValues>
      initialValues={ruleSetValues(ruleSet)}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setLastSaved(null);
        const changes = ruleSetChanges(ruleSet, values);
        const changedRules = Object.keys(changes.limits).length;
        if (changedRules === 0) {
          helpers.resetForm({ values: ruleSetValues(ruleSet) });
          return;
        }
        try {
          const saved = await updateRuleSet.mutateAsync({ id: ruleSet.id, changes });
          helpers.resetForm({ values: ruleSetValues(saved) });
          setLastSaved(
            `Saved ${changedRules} rule${changedRules === 1 ? '' : 's'} of ${saved.name}.`,
          );
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, ruleSetFormFields(ruleSet), ruleFieldFor);
        }
      }}
    >
      <FormikForm aria-label={`Rules of ${ruleSet.name}`}>
        <FormAlert />
        {groups.map((group) => (
          <Paper key={group.title} variant="outlined" sx={{ px: { xs: 2, sm: 3 }, py: 1, mb: 2 }}>
            <Typography variant="h2" sx={{ pt: 1.5, fontSize: '1.15rem' }}>
              {group.title}
            </Typography>
            {group.keys.map((key) => (
              <RuleRow key={key} ruleKey={key} limit={ruleSet.limits[key]} />
            ))}
          </Paper>
        ))}
        <SaveBar ruleSet={ruleSet} lastSaved={lastSaved} />
      </FormikForm>
    </Formik>
  );
}
