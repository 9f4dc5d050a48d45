import { Formik } from 'formik';
import * as yup from 'yup';
import { FormAlert } from '@/components/ui/form-alert';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';
import { confirmationOf, newPasswordField, PASSWORD_MIN_LENGTH } from './auth-fields';

/** Mirrors the server's confirm DTO (password 8..128; the token comes from the link). */
export const resetPasswordSchema = yup.object({
  password: newPasswordField,
  confirmPassword: confirmationOf('password', 'new password'),
});

type ResetPasswordValues = yup.InferType<typeof resetPasswordSchema>;
const fields = ['password', 'confirmPassword'] as const;

interface Props {
  token: string;
  onDone: () => void;
}

/** Sets a new password with the token from the e-mailed link. A used or expired token is said so. */
export function ResetPasswordForm({ token, onDone }: Props) {
  const confirmReset = useConfirmPasswordReset();
  return (
    <Formik<ResetPasswordValues>
      initialValues={{ password: '', confirmPassword: '' }}
      validationSchema={resetPasswordSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await confirmReset.mutateAsync({ token, password: values.password });
          onDone();
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, fields);
        }
      }}
    >
      <FormikForm aria-label="Choose a new password">
        <FormAlert />
        <FormTextField
          name="password"
          label="New password"
          type="password"
          autoComplete="new-password"
          helperText={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        />
        <FormTextField
          name="confirmPassword"
          label="Confirm new password"
          type="password"
          autoComplete="new-password"
        />
        <SubmitButton fullWidth sx={{ mt: 2 }}>
          Set password
        </SubmitButton>
      </FormikForm>
    </Formik>
  );
}
