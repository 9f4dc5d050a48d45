import { getIn } from 'formik';
import { isApiError } from './api-client';

/** A field error from the server, with the value it was about. */
export interface ServerFieldError {
  message: string;
  value: unknown;
}

/**
 * What a form keeps in Formik's `status` after a failed submit. Server field errors live here
 * rather than in Formik's `errors`, which the schema rewrites on every change or blur; each is
 * shown while the field still holds the value the server refused.
 */
export interface FormStatus {
  generalError?: string | null;
  fieldErrors?: Record<string, ServerFieldError>;
}

export interface FormErrorResult {
  fieldErrors: Record<string, string>;
  /** Shown in the form's Alert; null when every problem has landed on a field. */
  generalMessage: string | null;
}

const FALLBACK_MESSAGE = 'Something went wrong. Please try again.';

/**
 * Where a server field error lands: a form field's name (a dotted path such as
 * "attributes.offsetMm" for nested values), or null to leave it for the general message.
 * Used when the form holds a value under another name than the API (dollars for priceCents).
 */
export type FieldNameMap = (property: string) => string | null | undefined;

/**
 * Splits an error from the API between the form's own fields and a general message. Field
 * errors for properties the form does not show (e.g. a reset token) join the general message so
 * they are never lost; their text then names the property, so the message still says which.
 */
export function toFormErrors(
  error: unknown,
  fields: readonly string[],
  mapField?: FieldNameMap,
): FormErrorResult {
  if (!isApiError(error)) return { fieldErrors: {}, generalMessage: FALLBACK_MESSAGE };

  const known = new Set(fields);
  const fieldErrors: Record<string, string> = {};
  const unplaced: string[] = [];
  for (const [property, messages] of Object.entries(error.fieldErrors)) {
    const text = messages.join(' ');
    const field = mapField?.(property) ?? property;
    if (known.has(field))
      fieldErrors[field] = fieldErrors[field] ? `${fieldErrors[field]} ${text}` : text;
    else unplaced.push(mapField ? `${property} ${text}` : text);
  }

  let generalMessage: string | null;
  if (unplaced.length > 0) generalMessage = unplaced.join(' ');
  else if (Object.keys(fieldErrors).length > 0) generalMessage = null;
  else generalMessage = error.message || FALLBACK_MESSAGE;
  return { fieldErrors, generalMessage };
}

/**
 * Puts an API error onto a Formik form: field errors on the fields, the rest in its Alert.
 * `fields` are the form's field names; nested ones as dotted paths ("stockWheel.offsetMm").
 */
export function applyApiErrorToForm<Values extends object>(
  error: unknown,
  helpers: { setStatus: (status: FormStatus) => void },
  values: Values,
  fields: readonly (keyof Values & string)[] | readonly string[],
  mapField?: FieldNameMap,
): void {
  const { fieldErrors, generalMessage } = toFormErrors(error, fields, mapField);
  const placed: Record<string, ServerFieldError> = {};
  for (const [field, message] of Object.entries(fieldErrors)) {
    placed[field] = { message, value: getIn(values, field) as unknown };
  }
  helpers.setStatus({ generalError: generalMessage, fieldErrors: placed });
}

/** The server's error for a field, if the field still holds the value it was about. */
export function serverErrorFor(status: unknown, name: string, value: unknown): string | undefined {
  const entry = (status as FormStatus | undefined)?.fieldErrors?.[name];
  return entry && Object.is(entry.value, value) ? entry.message : undefined;
}
