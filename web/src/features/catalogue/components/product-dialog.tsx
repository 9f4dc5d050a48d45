import Dialog from '@mui/material/Dialog';
import DialogTitle from '@mui/material/DialogTitle';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme } from '@mui/material/styles';
import { useId } from 'react';
import type { Product } from '@/types/api';
import { ProductForm, type VehicleOption } from '../forms/product-form';

interface Props {
  open: boolean;
  /** The product being edited (kept while the dialog fades out); null for a new one. */
  product: Product | null;
  vehicleOptions: readonly VehicleOption[];
  onClose: () => void;
  onExited: () => void;
  onSaved: (product: Product, created: boolean) => void;
}

/** The product editor: a dialog on wide screens, the whole screen on a phone. */
export function ProductDialog({
  open,
  product,
  vehicleOptions,
  onClose,
  onExited,
  onSaved,
}: Props) {
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
      <DialogTitle id={titleId}>{product ? `Edit ${product.sku}` : 'New product'}</DialogTitle>
      <ProductForm
        key={product?.id ?? 'new'}
        product={product}
        vehicleOptions={vehicleOptions}
        onCancel={onClose}
        onSaved={onSaved}
      />
    </Dialog>
  );
}
