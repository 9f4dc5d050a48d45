import Button, { type ButtonProps } from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import { useFormikContext } from 'formik';

/**
 * The form's submit button: stays named while busy and shows a spinner beside the name.
 * Pressing it with a mouse does not take focus from the field being edited, so that field's
 * blur (which may reveal its error and move the button down) cannot swallow the click.
 */
export function SubmitButton({ children, ...props }: Omit<ButtonProps, 'type'>) {
  const { isSubmitting } = useFormikContext();
  return (
    <Button
      variant="contained"
      size="large"
      {...props}
      type="submit"
      onMouseDown={(event) => event.preventDefault()}
      disabled={isSubmitting || props.disabled}
      aria-busy={isSubmitting || undefined}
      startIcon={
        isSubmitting ? <CircularProgress size={18} color="inherit" aria-hidden /> : undefined
      }
    >
      {children}
    </Button>
  );
}
