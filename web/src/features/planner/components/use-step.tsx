import Box from '@mui/material/Box';
import Checkbox from '@mui/material/Checkbox';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import InputAdornment from '@mui/material/InputAdornment';
import TextField from '@mui/material/TextField';
import { useId, useState } from 'react';
import { numberInRange } from '@/lib/number-fields';
import type { VehicleUse } from '@/types/api';
import { MAX_CONSTANT_LOAD_KG, useLabels, vehicleUses } from '../forms/build';
import { usePlanner } from '../hooks/use-planner';
import { PlannerStep } from './planner-step';

const loadRule = numberInRange({ min: 0, max: MAX_CONSTANT_LOAD_KG, unit: 'kg', whole: true });

/** The schema's message for the typed load, or null when it is a whole number in range. */
function loadProblem(text: string): string | null {
  if (text.trim() === '') return 'Enter the load in kg, or 0 if you carry nothing extra.';
  try {
    loadRule.validateSync(Number(text.trim()));
    return null;
  } catch (error) {
    return (error as Error).message;
  }
}

const useHints: Record<VehicleUse, string> = {
  daily: 'Commuting, school runs, the shops',
  touring: 'Long trips on highways and gravel',
  towing: 'A trailer, boat or caravan behind',
  'off-road': 'Tracks, sand, mud or rocks',
};

function UseCheckbox({
  use,
  checked,
  onChange,
}: {
  use: VehicleUse;
  checked: boolean;
  onChange: (checked: boolean) => void;
}) {
  const id = useId();
  return (
    <FormControlLabel
      control={
        <Checkbox
          name="uses"
          value={use}
          checked={checked}
          onChange={(event) => onChange(event.target.checked)}
          slotProps={{
            input: { 'aria-labelledby': `${id}-name`, 'aria-describedby': `${id}-hint` },
          }}
        />
      }
      label={
        <Box component="span">
          <span id={`${id}-name`}>{useLabels[use]}</span>
          <Box
            component="span"
            id={`${id}-hint`}
            sx={{ display: 'block', color: 'text.secondary', fontSize: '0.875rem' }}
          >
            {useHints[use]}
          </Box>
        </Box>
      }
      sx={{ alignItems: 'flex-start', mb: 1, '& .MuiCheckbox-root': { mt: -0.75 } }}
    />
  );
}

/** Step 2: how the vehicle is used, and the load it always carries. */
export function UseStep() {
  const { build, setUses, setConstantLoad } = usePlanner();
  const [loadText, setLoadText] = useState(String(build.constantLoadKg));
  const [loadTouched, setLoadTouched] = useState(false);
  const [attempted, setAttempted] = useState(false);
  const legendId = useId();
  const usesHelpId = useId();
  const problem = loadProblem(loadText);
  const showLoadError = (attempted || loadTouched) && problem !== null;
  const usesError = attempted && build.uses.length === 0;

  const toggle = (use: VehicleUse, checked: boolean) => {
    const next = checked ? [...build.uses, use] : build.uses.filter((other) => other !== use);
    // Kept in the planner's order, whatever order they were ticked in.
    setUses(vehicleUses.filter((candidate) => next.includes(candidate)));
  };

  return (
    <PlannerStep
      step="use"
      lead="This decides which springs suit the vehicle and what the fit report looks at."
      onNext={() => {
        setAttempted(true);
        return build.uses.length > 0 && problem === null;
      }}
      footerMessage={
        usesError || (attempted && problem) ? 'Check the answers above before going on.' : undefined
      }
    >
      <FormControl component="fieldset" error={usesError}>
        <FormLabel
          id={legendId}
          component="legend"
          sx={{
            typography: 'h2',
            color: 'text.primary',
            mb: 0.5,
            '&.Mui-focused': { color: 'text.primary' },
          }}
        >
          How do you use the vehicle?
        </FormLabel>
        <FormHelperText id={usesHelpId} sx={{ mx: 0, mb: 1 }}>
          {usesError ? 'Choose at least one.' : 'Choose every one that applies.'}
        </FormHelperText>
        <FormGroup aria-describedby={usesHelpId}>
          {vehicleUses.map((use) => (
            <UseCheckbox
              key={use}
              use={use}
              checked={build.uses.includes(use)}
              onChange={(checked) => toggle(use, checked)}
            />
          ))}
        </FormGroup>
      </FormControl>

      <Box sx={{ maxWidth: 360 }}>
        <TextField
          id="planner-constant-load"
          label="Constant load"
          value={loadText}
          margin="none"
          error={showLoadError}
          helperText={
            showLoadError
              ? problem
              : `Drawers, canopy, water, tools you always carry: 0 to ${MAX_CONSTANT_LOAD_KG} kg.`
          }
          onChange={(event) => {
            const text = event.target.value;
            setLoadText(text);
            if (loadProblem(text) === null) setConstantLoad(Number(text.trim()));
          }}
          onBlur={() => setLoadTouched(true)}
          slotProps={{
            htmlInput: { inputMode: 'numeric', autoComplete: 'off' },
            input: { endAdornment: <InputAdornment position="end">kg</InputAdornment> },
          }}
        />
      </Box>
    </PlannerStep>
  );
}
