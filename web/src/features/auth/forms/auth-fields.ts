import * as yup from 'yup';

/** Field rules shared by the auth forms; they mirror the server's DTOs. */
export const PASSWORD_MIN_LENGTH = 8;
export const PASSWORD_MAX_LENGTH = 128;
export const NAME_MAX_LENGTH = 100;
export const EMAIL_MAX_LENGTH = 254;

export const emailField = yup
  .string()
  .trim()
  .required('Enter your e-mail address.')
  .max(EMAIL_MAX_LENGTH, `Use at most ${EMAIL_MAX_LENGTH} characters.`)
  .email('Enter an e-mail address like name@example.com.');

export const newPasswordField = yup
  .string()
  .required('Choose a password.')
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`);

export function confirmationOf(field: string, label = 'password') {
  return yup
    .string()
    .required(`Enter the ${label} again.`)
    .oneOf([yup.ref(field)], 'The two passwords are not the same.');
}

export const nameField = yup
  .string()
  .trim()
  .required('Enter your name.')
  .max(NAME_MAX_LENGTH, `Use at most ${NAME_MAX_LENGTH} characters.`);
