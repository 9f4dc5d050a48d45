import { Formik } from 'formik';
import * as yup from 'yup';
import { FormAlert } from '@/components/ui/form-alert';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import { useRegister } from '../api/register';
import {
  confirmationOf,
  emailField,
  nameField,
  newPasswordField,
  PASSWORD_MIN_LENGTH,
} from './auth-fields';

/** Mirrors the server's register DTO (name 1..100, e-mail, password 8..128) plus a confirmation. */
export const registerSchema = yup.object({
  name: nameField,
  email: emailField,
  password: newPasswordField,
  confirmPassword: confirmationOf('password'),
});

type RegisterValues = yup.InferType<typeof registerSchema>;
const fields = ['name', 'email', 'password', 'confirmPassword'] as const;

export function RegisterForm() {
  const registerAccount = useRegister();
  return (
    <Formik<RegisterValues>
      initialValues={{ name: '', email: '', password: '', confirmPassword: '' }}
      validationSchema={registerSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await registerAccount.mutateAsync({
            name: values.name.trim(),
            email: values.email.trim(),
            password: values.password,
          });
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, fields);
        }
      }}
    >
      <FormikForm aria-label="Create account">
        <FormAlert />
        <FormTextField name="name" label="Name" autoComplete="name" />
        <FormTextField name="email" label="E-mail" type="email" autoComplete="email" />
        <FormTextField
          name="password"
          label="Password"
          type="password"
          autoComplete="new-password"
          helperText={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        />
        <FormTextField
          name="confirmPassword"
          label="Confirm password"
          type="password"
          autoComplete="new-password"
        />
        <SubmitButton fullWidth sx={{ mt: 2 }}>
          Create account
        </SubmitButton>
      </FormikForm>
    </Formik>
  );
}
