import FormControlLabel from '@mui/material/FormControlLabel';
import FormHelperText from '@mui/material/FormHelperText';
import Switch from '@mui/material/Switch';
import { useField, useFormikContext } from 'formik';
import { useId } from 'react';
import { serverErrorFor } from '@/lib/form-errors';

interface Props {
  name: string;
  label: string;
  helperText?: string;
  disabled?: boolean;
}

/** A Formik-bound on/off switch with its label and an optional description tied to it. */
export function FormSwitchField({ name, label, helperText, disabled }: Props) {
  const [field, meta] = useField<boolean>({ name, type: 'checkbox' });
  const { status } = useFormikContext();
  const id = useId();
  const descriptionId = `${id}-description`;
  const error = (meta.touched && meta.error) || serverErrorFor(status, name, field.checked);
  const message = error || helperText;
  return (
    <>
      <FormControlLabel
        label={label}
        disabled={disabled}
        control={
          <Switch
            name={field.name}
            checked={Boolean(field.checked)}
            onChange={field.onChange}
            onBlur={field.onBlur}
            slotProps={{
              input: {
                'aria-describedby': message ? descriptionId : undefined,
                'aria-invalid': Boolean(error),
              },
            }}
          />
        }
      />
      {message && (
        <FormHelperText id={descriptionId} error={Boolean(error)}>
          {message}
        </FormHelperText>
      )}
    </>
  );
}
