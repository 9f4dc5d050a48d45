import Alert from '@mui/material/Alert';
import { useFormikContext } from 'formik';
import type { FormStatus } from '@/lib/form-errors';

/** The form's general message (one not tied to a field), announced as an alert. */
export function FormAlert() {
  const { status } = useFormikContext();
  const message = (status as FormStatus | undefined)?.generalError;
  if (!message) return null;
  return (
    <Alert severity="error" sx={{ mb: 1 }}>
      {message}
    </Alert>
  );
}
