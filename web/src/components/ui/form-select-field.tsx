import type { ReactNode } from 'react';
import { FormTextField, type FormTextFieldProps } from './form-text-field';

export interface SelectOption {
  value: string;
  label: ReactNode;
}

type Props = Omit<FormTextFieldProps, 'select' | 'children'> & {
  options: readonly SelectOption[];
};

/** A Formik-bound native select: the phone's own picker, and labelled like any other field. */
export function FormSelectField({ options, slotProps, ...props }: Props) {
  return (
    <FormTextField
      {...props}
      select
      slotProps={{ ...slotProps, select: { native: true }, inputLabel: { shrink: true } }}
    >
      {options.map((option) => (
        <option key={option.value} value={option.value}>
          {option.label}
        </option>
      ))}
    </FormTextField>
  );
}
