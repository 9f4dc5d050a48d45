import Button from '@mui/material/Button';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import { Formik } from 'formik';
import { FormAlert } from '@/components/ui/form-alert';
import { FormSelectField } from '@/components/ui/form-select-field';
import { FormSwitchField } from '@/components/ui/form-switch-field';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm, dialogFormStyle } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import type { Bay } from '@/types/api';
import { useCreateBay } from '../api/create-bay';
import { useUpdateBay } from '../api/update-bay';
import {
  BAY_NAME_MAX,
  bayFormFields,
  bayKindOptions,
  baySchema,
  bayValues,
  createBayRequest,
  newBayValues,
  updateBayRequest,
  type BayFormValues,
} from './bay-fields';

interface Props {
  /** The bay being edited; none to add one. */
  bay: Bay | null;
  bayCount: number;
  titleId: string;
  onCancel: () => void;
  onSaved: () => void;
}

/** The bay dialog's body: add a bay (name and kind), or edit one (also its place and status). */
export function BayForm({ bay, bayCount, titleId, onCancel, onSaved }: Props) {
  const createBay = useCreateBay();
  const updateBay = useUpdateBay();
  return (
    <Formik<BayFormValues>
      initialValues={bay ? bayValues(bay) : newBayValues()}
      validationSchema={baySchema(bayCount)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          if (bay) {
            const changes = updateBayRequest(bay, values);
            if (Object.keys(changes).length > 0) {
              await updateBay.mutateAsync({ id: bay.id, changes });
            }
          } else {
            await createBay.mutateAsync(createBayRequest(values));
          }
          onSaved();
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, bayFormFields);
        }
      }}
    >
      <FormikForm aria-labelledby={titleId} style={dialogFormStyle}>
        <DialogContent sx={{ pt: 0 }}>
          <FormAlert />
          <FormTextField
            name="name"
            label="Name"
            autoComplete="off"
            slotProps={{ htmlInput: { maxLength: BAY_NAME_MAX } }}
          />
          <FormSelectField name="kind" label="Kind" options={bayKindOptions} />
          {bay && (
            <>
              <FormTextField
                name="position"
                label="Place in the order"
                helperText={`1 to ${bayCount}. A job takes the first free bay of its kind.`}
                slotProps={{ htmlInput: { inputMode: 'numeric', autoComplete: 'off' } }}
              />
              <FormSwitchField
                name="active"
                label="In use"
                helperText="A bay switched off is offered for no new bookings."
              />
            </>
          )}
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2.5 }}>
          <Button onClick={onCancel}>Cancel</Button>
          <SubmitButton size="medium">{bay ? 'Save changes' : 'Add bay'}</SubmitButton>
        </DialogActions>
      </FormikForm>
    </Formik>
  );
}
