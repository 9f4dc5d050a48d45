import Dialog from '@mui/material/Dialog';
import DialogTitle from '@mui/material/DialogTitle';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme } from '@mui/material/styles';
import { useId } from 'react';
import type { VehicleModel } from '@/types/api';
import { VehicleModelForm } from '../forms/vehicle-model-form';
import { vehicleName } from '../forms/vehicle-model-fields';

interface Props {
  open: boolean;
  /** The vehicle being edited (kept while the dialog fades out); null for a new one. */
  vehicle: VehicleModel | null;
  onClose: () => void;
  onExited: () => void;
  onSaved: (vehicle: VehicleModel, created: boolean) => void;
}

/** The spec sheet editor: a dialog on wide screens, the whole screen on a phone. */
export function VehicleModelDialog({ open, vehicle, onClose, onExited, onSaved }: Props) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const titleId = useId();
  return (
    <Dialog
      open={open}
      onClose={onClose}
      fullWidth
      maxWidth="md"
      fullScreen={phone}
      aria-labelledby={titleId}
      slotProps={{ transition: { onExited } }}
    >
      <DialogTitle id={titleId}>
        {vehicle ? `Edit ${vehicleName(vehicle)}` : 'New vehicle'}
      </DialogTitle>
      <VehicleModelForm
        key={vehicle?.id ?? 'new'}
        vehicle={vehicle}
        onCancel={onClose}
        onSaved={onSaved}
      />
    </Dialog>
  );
}
