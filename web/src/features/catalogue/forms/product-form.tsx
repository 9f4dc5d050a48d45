import Autocomplete from '@mui/material/Autocomplete';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import InputAdornment from '@mui/material/InputAdornment';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { Formik, useField, useFormikContext } from 'formik';
import type { ReactNode } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { FormSelectField } from '@/components/ui/form-select-field';
import { FormSwitchField } from '@/components/ui/form-switch-field';
import { FormTextField } from '@/components/ui/form-text-field';
import { dialogFormStyle, FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm, serverErrorFor } from '@/lib/form-errors';
import type { Product, ProductKind } from '@/types/api';
import { useCreateProduct } from '../api/create-product';
import { useUpdateProduct } from '../api/update-product';
import {
  attributeFields,
  bayKindLabels,
  bayKinds,
  emptyAttributes,
  kindLabels,
  newProductValues,
  productChanges,
  productFieldFor,
  productFormFields,
  productKinds,
  productRequest,
  productSchema,
  productValues,
  type AttributeField,
  type ProductFormValues,
} from './product-fields';

/** A vehicle model the product can be marked as made for. */
export interface VehicleOption {
  id: string;
  label: string;
}

interface Props {
  /** The product to edit; null to add a new one. */
  product: Product | null;
  vehicleOptions: readonly VehicleOption[];
  onCancel: () => void;
  onSaved: (product: Product, created: boolean) => void;
}

const kindOptions = productKinds.map((kind) => ({ value: kind, label: kindLabels[kind] }));
const bayOptions = [
  { value: '', label: 'No bay time' },
  ...bayKinds.map((bay) => ({ value: bay, label: bayKindLabels[bay] })),
];

const twoColumns = {
  display: 'grid',
  columnGap: 2,
  gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' },
  alignItems: 'start',
} as const;

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Box component="fieldset" sx={{ border: 0, p: 0, m: 0, mt: 2.5, minWidth: 0 }}>
      <Typography component="legend" variant="h3" sx={{ p: 0 }}>
        {title}
      </Typography>
      {children}
    </Box>
  );
}

function inputModeFor(field: AttributeField): 'numeric' | 'decimal' | undefined {
  if (field.type !== 'number' || field.rule.min < 0) return undefined;
  return field.rule.whole ? 'numeric' : 'decimal';
}

function AttributeInput({ field }: { field: AttributeField }) {
  const name = `attributes.${field.key}`;
  switch (field.type) {
    case 'switch':
      return (
        <Box sx={{ gridColumn: '1 / -1', mt: 1 }}>
          <FormSwitchField name={name} label={field.label} helperText={field.helperText} />
        </Box>
      );
    case 'select':
      return <FormSelectField name={name} label={field.label} options={field.options} />;
    default:
      return (
        <FormTextField
          name={name}
          label={field.label}
          helperText={field.helperText}
          autoComplete="off"
          slotProps={{ htmlInput: { inputMode: inputModeFor(field) } }}
        />
      );
  }
}

function FitsVehiclesField({ options }: { options: readonly VehicleOption[] }) {
  const [field, meta, helpers] = useField<string[]>('fitsVehicleModelIds');
  const { status } = useFormikContext();
  const byId = new Map(options.map((option) => [option.id, option]));
  const selected = field.value.map((id) => byId.get(id) ?? { id, label: 'Unknown vehicle' });
  const error = (meta.touched && meta.error) || serverErrorFor(status, field.name, field.value);
  return (
    <Autocomplete
      multiple
      options={options}
      value={selected}
      getOptionLabel={(option) => option.label}
      isOptionEqualToValue={(option, value) => option.id === value.id}
      onChange={(_event, value) => void helpers.setValue(value.map((option) => option.id))}
      onBlur={() => void helpers.setTouched(true)}
      renderInput={(params) => (
        <TextField
          {...params}
          label="Fits vehicles"
          error={Boolean(error)}
          helperText={
            typeof error === 'string' && error
              ? error
              : 'Leave empty when it suits any vehicle (the fit report decides).'
          }
        />
      )}
    />
  );
}

/** The product editor's body (new or existing). Editing sends only the changed fields. */
export function ProductForm({ product, vehicleOptions, onCancel, onSaved }: Props) {
  const createProduct = useCreateProduct();
  const updateProduct = useUpdateProduct();
  const editing = product !== null;

  return (
    <Formik<ProductFormValues>
      initialValues={product ? productValues(product) : newProductValues()}
      validationSchema={productSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          if (product) {
            const changes = productChanges(product, values);
            if (Object.keys(changes).length === 0) {
              onSaved(product, false);
              return;
            }
            onSaved(await updateProduct.mutateAsync({ id: product.id, changes }), false);
          } else {
            onSaved(await createProduct.mutateAsync(productRequest(values)), true);
          }
        } catch (error) {
          applyApiErrorToForm(
            error,
            helpers,
            values,
            productFormFields(values.kind),
            productFieldFor,
          );
        }
      }}
    >
      {({ values, setFieldValue }) => (
        <FormikForm
          style={dialogFormStyle}
          aria-label={editing ? `Edit ${product.sku}` : 'New product'}
        >
          <DialogContent sx={{ pt: 0 }}>
            <FormAlert />
            <Section title="Product">
              <Box sx={twoColumns}>
                <FormTextField
                  name="sku"
                  label="SKU"
                  autoComplete="off"
                  disabled={editing}
                  helperText={
                    editing
                      ? 'The price list matches rows by SKU, so it stays as it is.'
                      : 'Upper-case letters, digits and hyphens.'
                  }
                  slotProps={{ htmlInput: { autoCapitalize: 'characters', spellCheck: false } }}
                />
                <FormSelectField
                  name="kind"
                  label="Kind"
                  options={kindOptions}
                  disabled={editing}
                  // Another kind brings its own attribute fields, empty.
                  onChange={(event) =>
                    void setFieldValue(
                      'attributes',
                      emptyAttributes(event.target.value as ProductKind),
                      false,
                    )
                  }
                  helperText={editing ? 'Add a new product for another kind.' : undefined}
                />
              </Box>
              <FormTextField name="name" label="Name" autoComplete="off" />
              <FormTextField name="brand" label="Brand" autoComplete="off" />
              <FormTextField name="description" label="Description" multiline minRows={2} />
            </Section>

            <Section title="Price, labour and stock">
              <Box sx={twoColumns}>
                <FormTextField
                  name="price"
                  label="Price (AUD)"
                  autoComplete="off"
                  helperText="Including tax, in dollars, like 1249.00."
                  slotProps={{
                    htmlInput: { inputMode: 'decimal' },
                    input: { startAdornment: <InputAdornment position="start">$</InputAdornment> },
                  }}
                />
                <FormTextField
                  name="labourMinutes"
                  label="Labour (minutes)"
                  autoComplete="off"
                  slotProps={{ htmlInput: { inputMode: 'numeric' } }}
                />
                <FormSelectField
                  name="bayKind"
                  label="Bay"
                  options={bayOptions}
                  helperText="Where the labour is done."
                />
                <FormTextField
                  name="stockQty"
                  label="In stock"
                  autoComplete="off"
                  slotProps={{ htmlInput: { inputMode: 'numeric' } }}
                />
                <FormTextField
                  name="leadDays"
                  label="Lead time (days)"
                  autoComplete="off"
                  helperText="To get it in when out of stock."
                  slotProps={{ htmlInput: { inputMode: 'numeric' } }}
                />
              </Box>
              <FormSwitchField
                name="active"
                label="Active"
                helperText="Only active products are offered to customers."
              />
            </Section>

            <Section title={`${kindLabels[values.kind]} details`}>
              <Box sx={twoColumns}>
                {attributeFields[values.kind].map((field) => (
                  <AttributeInput key={`${values.kind}-${field.key}`} field={field} />
                ))}
              </Box>
            </Section>

            <Section title="Vehicles">
              <FitsVehiclesField options={vehicleOptions} />
            </Section>
          </DialogContent>
          <DialogActions sx={{ px: 3, pb: 2.5 }}>
            <Button onClick={onCancel}>Cancel</Button>
            <SubmitButton size="medium">{editing ? 'Save changes' : 'Add product'}</SubmitButton>
          </DialogActions>
        </FormikForm>
      )}
    </Formik>
  );
}
