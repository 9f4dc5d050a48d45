import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import Typography from '@mui/material/Typography';
import { Formik } from 'formik';
import type { ReactNode } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { FormSelectField } from '@/components/ui/form-select-field';
import { FormSwitchField } from '@/components/ui/form-switch-field';
import { FormTextField } from '@/components/ui/form-text-field';
import { dialogFormStyle, FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import type { VehicleModel } from '@/types/api';
import { useCreateVehicleModel } from '../api/create-vehicle-model';
import { useUpdateVehicleModel } from '../api/update-vehicle-model';
import {
  bodyTypeLabels,
  frontSuspensionLabels,
  newVehicleModelValues,
  optionsOf,
  rearSuspensionLabels,
  speedSymbols,
  vehicleModelChanges,
  vehicleModelFormFields,
  vehicleModelSchema,
  vehicleModelSpec,
  vehicleModelValues,
  vehicleName,
  type VehicleModelFormValues,
} from './vehicle-model-fields';

interface Props {
  /** The spec sheet to edit; null for a new vehicle. */
  vehicle: VehicleModel | null;
  onCancel: () => void;
  onSaved: (vehicle: VehicleModel, created: boolean) => void;
}

const columns = {
  display: 'grid',
  columnGap: 2,
  gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr', md: '1fr 1fr 1fr' },
  alignItems: 'start',
} as const;

const speedOptions = speedSymbols.map((symbol) => ({ value: symbol, label: symbol }));

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Box component="fieldset" sx={{ border: 0, p: 0, m: 0, mt: 2.5, minWidth: 0 }}>
      <Typography component="legend" variant="h3" sx={{ p: 0 }}>
        {title}
      </Typography>
      {children}
    </Box>
  );
}

/** A whole or decimal number field (negative numbers need the full keyboard on phones). */
function NumberField(props: {
  name: string;
  label: string;
  helperText?: string;
  decimals?: boolean;
  negative?: boolean;
}) {
  const inputMode = props.negative ? undefined : props.decimals ? 'decimal' : 'numeric';
  return (
    <FormTextField
      name={props.name}
      label={props.label}
      helperText={props.helperText}
      autoComplete="off"
      slotProps={{ htmlInput: { inputMode } }}
    />
  );
}

/** The spec sheet editor (new or existing). Editing sends only the changed fields. */
export function VehicleModelForm({ vehicle, onCancel, onSaved }: Props) {
  const createVehicle = useCreateVehicleModel();
  const updateVehicle = useUpdateVehicleModel();

  return (
    <Formik<VehicleModelFormValues>
      initialValues={vehicle ? vehicleModelValues(vehicle) : newVehicleModelValues()}
      validationSchema={vehicleModelSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          if (vehicle) {
            const changes = vehicleModelChanges(vehicle, values);
            if (Object.keys(changes).length === 0) {
              onSaved(vehicle, false);
              return;
            }
            onSaved(await updateVehicle.mutateAsync({ id: vehicle.id, changes }), false);
          } else {
            onSaved(await createVehicle.mutateAsync(vehicleModelSpec(values)), true);
          }
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, vehicleModelFormFields);
        }
      }}
    >
      <FormikForm
        style={dialogFormStyle}
        aria-label={vehicle ? `Edit ${vehicleName(vehicle)}` : 'New vehicle'}
      >
        <DialogContent sx={{ pt: 0 }}>
          <FormAlert />
          <Section title="Vehicle">
            <Box sx={columns}>
              <FormTextField name="make" label="Make" autoComplete="off" />
              <FormTextField name="model" label="Model" autoComplete="off" />
              <FormTextField name="variant" label="Variant" autoComplete="off" />
              <NumberField name="yearFrom" label="First model year" />
              <NumberField name="yearTo" label="Last model year" />
              <FormSelectField name="bodyType" label="Body" options={optionsOf(bodyTypeLabels)} />
            </Box>
            <FormSwitchField
              name="offRoadCategory"
              label="Off-road category"
              helperText="Has off-road features (an off-road passenger vehicle)."
            />
          </Section>

          <Section title="Suspension">
            <Box sx={columns}>
              <FormSelectField
                name="frontSuspension"
                label="Front suspension"
                options={optionsOf(frontSuspensionLabels)}
              />
              <FormSelectField
                name="rearSuspension"
                label="Rear suspension"
                options={optionsOf(rearSuspensionLabels)}
              />
              <NumberField
                name="frontHalfShaftLengthMm"
                label="Front half-shaft (mm)"
                helperText="Independent front: for the joint-angle check."
              />
            </Box>
          </Section>

          <Section title="Wheels and tyres">
            <Box sx={columns}>
              <FormTextField
                name="boltPattern"
                label="Bolt pattern"
                autoComplete="off"
                helperText="Stud count x PCD in mm, like 6x139.7."
              />
              <FormTextField
                name="studThread"
                label="Stud thread"
                autoComplete="off"
                helperText="Like M12x1.5."
              />
              <NumberField name="centreBoreMm" label="Centre bore (mm)" decimals />
              <NumberField
                name="stockWheel.diameterIn"
                label="Stock wheel diameter (in)"
                decimals
              />
              <NumberField name="stockWheel.widthIn" label="Stock wheel width (in)" decimals />
              <NumberField name="stockWheel.offsetMm" label="Stock wheel offset (mm)" negative />
              <FormTextField
                name="stockTyre"
                label="Stock tyre"
                autoComplete="off"
                helperText="Like 265/65R17 112S."
              />
              <FormTextField
                name="largestSpecifiedTyre"
                label="Largest specified tyre"
                autoComplete="off"
                helperText="Optional; empty means the stock tyre."
              />
              <NumberField name="placardLoadIndex" label="Placard load index" />
              <FormSelectField
                name="placardSpeedSymbol"
                label="Placard speed symbol"
                options={speedOptions}
              />
              <NumberField name="topSpeedKmh" label="Top speed (km/h)" helperText="Optional." />
            </Box>
          </Section>

          <Section title="Mass ratings">
            <Box sx={columns}>
              <NumberField name="gvmKg" label="GVM (kg)" />
              <NumberField name="kerbMassKg" label="Kerb mass (kg)" />
              <NumberField name="frontAxleKg" label="Front axle rating (kg)" />
              <NumberField name="rearAxleKg" label="Rear axle rating (kg)" />
            </Box>
          </Section>
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2.5 }}>
          <Button onClick={onCancel}>Cancel</Button>
          <SubmitButton size="medium">{vehicle ? 'Save changes' : 'Add vehicle'}</SubmitButton>
        </DialogActions>
      </FormikForm>
    </Formik>
  );
}
