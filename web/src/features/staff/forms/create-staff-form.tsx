import Alert from '@mui/material/Alert';
import { Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { FormAlert } from '@/components/ui/form-alert';
import { FormSelectField } from '@/components/ui/form-select-field';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { roleLabels } from '@/config/roles';
import { applyApiErrorToForm } from '@/lib/form-errors';
import { useCreateStaff } from '../api/create-staff';
import {
  STAFF_EMAIL_MAX_LENGTH,
  STAFF_PASSWORD_MAX_LENGTH,
  STAFF_PASSWORD_MIN_LENGTH,
  staffNameField,
  staffRoleField,
  staffRoleOptions,
} from './staff-fields';

/** Mirrors the server's create-staff DTO: email, name, role desk|tech|manager, password 8..128. */
export const createStaffSchema = yup.object({
  email: yup
    .string()
    .trim()
    .required('Enter their e-mail address.')
    .max(STAFF_EMAIL_MAX_LENGTH, `Use at most ${STAFF_EMAIL_MAX_LENGTH} characters.`)
    .email('Enter an e-mail address like name@example.com.'),
  name: staffNameField,
  role: staffRoleField,
  password: yup
    .string()
    .required('Choose a first password for them.')
    .min(STAFF_PASSWORD_MIN_LENGTH, `Use at least ${STAFF_PASSWORD_MIN_LENGTH} characters.`)
    .max(STAFF_PASSWORD_MAX_LENGTH, `Use at most ${STAFF_PASSWORD_MAX_LENGTH} characters.`),
});

type CreateStaffValues = yup.InferType<typeof createStaffSchema>;
const fields = ['email', 'name', 'role', 'password'] as const;
const initialValues: CreateStaffValues = { email: '', name: '', role: 'desk', password: '' };

export function CreateStaffForm({ formLabelId }: { formLabelId?: string }) {
  const createStaff = useCreateStaff();
  const [added, setAdded] = useState<string | null>(null);

  return (
    <Formik<CreateStaffValues>
      initialValues={initialValues}
      validationSchema={createStaffSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setAdded(null);
        try {
          await createStaff.mutateAsync({
            email: values.email.trim(),
            name: values.name.trim(),
            role: values.role,
            password: values.password,
          });
          helpers.resetForm();
          setAdded(`Added ${values.name.trim()} (${roleLabels[values.role].toLowerCase()}).`);
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, fields);
        }
      }}
    >
      <FormikForm aria-labelledby={formLabelId}>
        {added && (
          <Alert severity="success" role="status" onClose={() => setAdded(null)} sx={{ mb: 1 }}>
            {added}
          </Alert>
        )}
        <FormAlert />
        <FormTextField name="name" label="Name" autoComplete="off" />
        <FormTextField name="email" label="E-mail" type="email" autoComplete="off" />
        <FormSelectField name="role" label="Role" options={staffRoleOptions} />
        <FormTextField
          name="password"
          label="Password"
          type="password"
          autoComplete="new-password"
          helperText={`At least ${STAFF_PASSWORD_MIN_LENGTH} characters. Give it to them in person; they can change it with "Forgot password".`}
        />
        <SubmitButton sx={{ mt: 2 }}>Add staff member</SubmitButton>
      </FormikForm>
    </Formik>
  );
}
