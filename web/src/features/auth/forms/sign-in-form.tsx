import { Formik } from 'formik';
import type { ReactNode } from 'react';
import * as yup from 'yup';
import { FormAlert } from '@/components/ui/form-alert';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import { useSignIn } from '../api/sign-in';
import { emailField, PASSWORD_MAX_LENGTH } from './auth-fields';

export const signInSchema = yup.object({
  email: emailField,
  // Only presence and the server's upper bound: a wrong password gets the same answer as any.
  password: yup
    .string()
    .required('Enter your password.')
    .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`),
});

type SignInValues = yup.InferType<typeof signInSchema>;
const fields = ['email', 'password'] as const;

interface Props {
  /** A message from the page that sent the user here, shown until they first submit. */
  notice?: ReactNode;
}

/** E-mail and password. Where the user goes next is decided by the page (see RedirectIfSignedIn). */
export function SignInForm({ notice }: Props) {
  const signIn = useSignIn();
  return (
    <Formik<SignInValues>
      initialValues={{ email: '', password: '' }}
      validationSchema={signInSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await signIn.mutateAsync({ email: values.email.trim(), password: values.password });
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, fields);
        }
      }}
    >
      {({ submitCount }) => (
        <FormikForm aria-label="Sign in">
          {submitCount === 0 && notice}
          <FormAlert />
          <FormTextField name="email" label="E-mail" type="email" autoComplete="username" />
          <FormTextField
            name="password"
            label="Password"
            type="password"
            autoComplete="current-password"
          />
          <SubmitButton fullWidth sx={{ mt: 2 }}>
            Sign in
          </SubmitButton>
        </FormikForm>
      )}
    </Formik>
  );
}
