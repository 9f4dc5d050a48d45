import TextField, { type TextFieldProps } from '@mui/material/TextField';
import { useField, useFormikContext } from 'formik';
import { useId } from 'react';
import { serverErrorFor } from '@/lib/form-errors';

export type FormTextFieldProps = Omit<
  TextFieldProps,
  'name' | 'value' | 'onChange' | 'onBlur' | 'error' | 'label'
> & {
  name: string;
  /** The visible label, which is also the field's accessible name. */
  label: string;
  /** Called after Formik has taken the new value (e.g. to reset fields that depend on it). */
  onChange?: TextFieldProps['onChange'];
};

/**
 * A Formik-bound text field. Its error (from the schema, or from the server while the value is
 * unchanged) is shown as helper text, which MUI ties to the input with aria-describedby;
 * aria-invalid is set with it.
 */
export function FormTextField({
  name,
  label,
  helperText,
  id,
  onChange,
  ...props
}: FormTextFieldProps) {
  const [field, meta] = useField<string>(name);
  const { status, submitCount } = useFormikContext();
  const generatedId = useId();
  // Schema errors show once the field has been changed and left, or after a submit: tabbing
  // through an empty form does not fill it with complaints.
  const judged = submitCount > 0 || (meta.touched && field.value !== meta.initialValue);
  const error = (judged && meta.error) || serverErrorFor(status, name, field.value);
  const showError = Boolean(error);
  return (
    <TextField
      {...props}
      {...field}
      onChange={(event) => {
        field.onChange(event);
        // A caller's own onChange runs after Formik has the new value.
        onChange?.(event);
      }}
      value={field.value ?? ''}
      id={id ?? `${generatedId}${name}`}
      label={label}
      error={showError}
      helperText={showError ? error : helperText}
    />
  );
}
