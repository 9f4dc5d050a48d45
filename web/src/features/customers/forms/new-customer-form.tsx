import { Formik } from 'formik';
import * as yup from 'yup';
import { FormAlert } from '@/components/ui/form-alert';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import type { Customer } from '@/types/api';
import { useCreateCustomer } from '../api/create-customer';

/** Mirrors the server's create-customer DTO: name 1..100, e-mail. */
export const newCustomerSchema = yup.object({
  name: yup
    .string()
    .trim()
    .required("Enter the customer's name.")
    .max(100, 'Use at most 100 characters.'),
  email: yup
    .string()
    .trim()
    .required("Enter the customer's e-mail address.")
    .max(254, 'Use at most 254 characters.')
    .email('Enter an e-mail address like name@example.com.'),
});

type NewCustomerValues = yup.InferType<typeof newCustomerSchema>;
const fields = ['name', 'email'] as const;

interface Props {
  /** Starts the name field with what was searched for. */
  initialName?: string;
  formLabelId: string;
  onCreated: (customer: Customer) => void;
}

export function NewCustomerForm({ initialName = '', formLabelId, onCreated }: Props) {
  const createCustomer = useCreateCustomer();
  return (
    <Formik<NewCustomerValues>
      initialValues={{ name: initialName, email: '' }}
      validationSchema={newCustomerSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          const customer = await createCustomer.mutateAsync({
            name: values.name.trim(),
            email: values.email.trim(),
          });
          onCreated(customer);
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, fields);
        }
      }}
    >
      <FormikForm aria-labelledby={formLabelId}>
        <FormAlert />
        <FormTextField name="name" label="Name" autoComplete="off" />
        <FormTextField
          name="email"
          label="E-mail"
          type="email"
          autoComplete="off"
          helperText="They get an e-mail to choose a password, so they can see the quote."
        />
        <SubmitButton sx={{ mt: 2 }}>Add customer</SubmitButton>
      </FormikForm>
    </Formik>
  );
}
