import Alert from '@mui/material/Alert';
import { Formik } from 'formik';
import * as yup from 'yup';
import { FormAlert } from '@/components/ui/form-alert';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { emailField } from './auth-fields';

export const forgotPasswordSchema = yup.object({ email: emailField });

type ForgotPasswordValues = yup.InferType<typeof forgotPasswordSchema>;
const fields = ['email'] as const;

/**
 * Asks for a reset link. The answer is the same whether or not the address has an account, so
 * the page never tells anyone who is registered.
 */
export function ForgotPasswordForm() {
  const requestReset = useRequestPasswordReset();

  if (requestReset.isSuccess) {
    return (
      <Alert severity="success" role="status">
        If an account uses that e-mail address, we have sent it a link to choose a new password. The
        link works once and only for a limited time. Check your spam folder if nothing arrives in a
        few minutes.
      </Alert>
    );
  }

  return (
    <Formik<ForgotPasswordValues>
      initialValues={{ email: '' }}
      validationSchema={forgotPasswordSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await requestReset.mutateAsync({ email: values.email.trim() });
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, fields);
        }
      }}
    >
      <FormikForm aria-label="Ask for a reset link">
        <FormAlert />
        <FormTextField name="email" label="E-mail" type="email" autoComplete="email" />
        <SubmitButton fullWidth sx={{ mt: 2 }}>
          Send reset link
        </SubmitButton>
      </FormikForm>
    </Formik>
  );
}
