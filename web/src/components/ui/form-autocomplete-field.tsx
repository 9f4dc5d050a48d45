import Autocomplete, { createFilterOptions } from '@mui/material/Autocomplete';
import TextField from '@mui/material/TextField';
import { useField, useFormikContext } from 'formik';
import { useId, useMemo } from 'react';
import { serverErrorFor } from '@/lib/form-errors';

export interface AutocompleteOption {
  value: string;
  label: string;
}

interface Props {
  name: string;
  /** The visible label, which is also the field's accessible name. */
  label: string;
  options: readonly AutocompleteOption[];
  helperText?: string;
  disabled?: boolean;
  /** Most options listed at once while typing (long lists stay quick). */
  limit?: number;
}

/**
 * A Formik-bound search-as-you-type choice from a long list (time zones, regions). The form
 * keeps the option's value; the field shows its label. A value the list lacks is still shown,
 * so a stored setting never looks empty.
 */
export function FormAutocompleteField({
  name,
  label,
  options,
  helperText,
  disabled,
  limit = 100,
}: Props) {
  const [field, meta, helpers] = useField<string>(name);
  const { status, submitCount } = useFormikContext();
  const id = useId();
  const filterOptions = useMemo(
    () =>
      createFilterOptions<AutocompleteOption>({
        limit,
        stringify: (option) => `${option.label} ${option.value}`,
      }),
    [limit],
  );
  const all = useMemo(() => {
    if (!field.value || options.some((option) => option.value === field.value)) return options;
    return [{ value: field.value, label: field.value }, ...options];
  }, [options, field.value]);
  const selected = all.find((option) => option.value === field.value) ?? null;
  const judged = submitCount > 0 || (meta.touched && field.value !== meta.initialValue);
  const error = (judged && meta.error) || serverErrorFor(status, name, field.value);

  return (
    <Autocomplete<AutocompleteOption, false, boolean>
      id={`${id}${name}`}
      options={all}
      value={selected}
      disabled={disabled}
      disableClearable={selected !== null}
      autoHighlight
      filterOptions={filterOptions}
      isOptionEqualToValue={(option, value) => option.value === value.value}
      getOptionLabel={(option) => option.label}
      onChange={(_event, option) => {
        void helpers.setValue(option?.value ?? '');
      }}
      onBlur={() => void helpers.setTouched(true)}
      renderInput={(params) => (
        <TextField
          {...params}
          name={name}
          label={label}
          error={Boolean(error)}
          helperText={error || helperText}
        />
      )}
    />
  );
}
