import Box from '@mui/material/Box';
import { Formik } from 'formik';
import { FormAlert } from '@/components/ui/form-alert';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import { useCreateClosure } from '../api/create-closure';
import {
  CLOSURE_REASON_MAX,
  closureFormFields,
  closureRequest,
  closureSchema,
  emptyClosure,
  type ClosureFormValues,
} from './closure-fields';

const dateField = { inputLabel: { shrink: true } } as const;

/** Adds a closure: first and last day (both included) and the reason customers see. */
export function ClosureForm({ labelledBy }: { labelledBy: string }) {
  const createClosure = useCreateClosure();
  return (
    <Formik<ClosureFormValues>
      initialValues={emptyClosure()}
      validationSchema={closureSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await createClosure.mutateAsync(closureRequest(values));
          helpers.resetForm({ values: emptyClosure() });
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, closureFormFields);
        }
      }}
    >
      <FormikForm aria-labelledby={labelledBy}>
        <FormAlert />
        <Box
          sx={{
            display: 'grid',
            columnGap: 2,
            gridTemplateColumns: { xs: 'minmax(0, 1fr)', sm: 'repeat(2, minmax(0, 1fr))' },
            alignItems: 'start',
          }}
        >
          <FormTextField
            name="startDate"
            label="First day closed"
            type="date"
            slotProps={dateField}
          />
          <FormTextField name="endDate" label="Last day closed" type="date" slotProps={dateField} />
        </Box>
        <FormTextField
          name="reason"
          label="Reason"
          helperText="Customers see it on the closed days, such as “Closed: stocktake”."
          slotProps={{ htmlInput: { maxLength: CLOSURE_REASON_MAX } }}
        />
        <Box sx={{ mt: 1 }}>
          <SubmitButton size="medium">Add the closure</SubmitButton>
        </Box>
      </FormikForm>
    </Formik>
  );
}
