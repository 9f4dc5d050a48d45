import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import { Formik } from 'formik';
import { useId } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm, dialogFormStyle } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import type { Booking } from '@/types/api';
import { useRequestBookingMove } from '../api/request-booking-move';
import {
  MOVE_REQUEST_NOTE_MAX,
  moveRequestBody,
  moveRequestFormFields,
  moveRequestSchema,
  type MoveRequestFormValues,
} from '../forms/move-request-fields';

interface Props {
  booking: Booking;
  open: boolean;
  onClose: () => void;
  onSent: () => void;
}

/** A requested or confirmed booking: the customer asks the workshop for another time. */
export function AskToMoveDialog({ booking, open, onClose, onSent }: Props) {
  const requestMove = useRequestBookingMove();
  const titleId = useId();
  const textId = useId();
  return (
    <Dialog
      open={open}
      onClose={() => {
        if (!requestMove.isPending) onClose();
      }}
      aria-labelledby={titleId}
      aria-describedby={textId}
      fullWidth
      maxWidth="sm"
    >
      <Formik<MoveRequestFormValues>
        initialValues={{ note: booking.moveRequest?.note ?? '' }}
        validationSchema={moveRequestSchema}
        onSubmit={async (values, helpers) => {
          helpers.setStatus(undefined);
          try {
            await requestMove.mutateAsync({ bookingId: booking.id, ...moveRequestBody(values) });
            onSent();
          } catch (error) {
            applyApiErrorToForm(error, helpers, values, moveRequestFormFields);
          }
        }}
      >
        <FormikForm aria-labelledby={titleId} style={dialogFormStyle}>
          <DialogTitle id={titleId}>Ask to move booking {booking.reference}</DialogTitle>
          <DialogContent>
            <DialogContentText id={textId} sx={{ mb: 2 }}>
              The deposit is paid, so the workshop moves the booking for you. Say which days or
              times would suit; they will get back to you. Your present time stays until then.
            </DialogContentText>
            <FormAlert />
            <FormTextField
              name="note"
              label="When would suit you better?"
              multiline
              minRows={3}
              fullWidth
              helperText={`Up to ${MOVE_REQUEST_NOTE_MAX} characters.`}
              slotProps={{ htmlInput: { maxLength: MOVE_REQUEST_NOTE_MAX } }}
            />
          </DialogContent>
          <DialogActions sx={{ px: 3, pb: 2, flexWrap: 'wrap', gap: 1 }}>
            <Button onClick={onClose} disabled={requestMove.isPending}>
              Cancel
            </Button>
            <SubmitButton size="medium">Send the request</SubmitButton>
          </DialogActions>
        </FormikForm>
      </Formik>
    </Dialog>
  );
}
