import { Form, useFormikContext } from 'formik';
import { useEffect, useRef, type CSSProperties, type ReactNode } from 'react';
import type { FormStatus } from '@/lib/form-errors';

interface Props {
  children: ReactNode;
  /** Names the form for assistive technology when the page has more than one. */
  'aria-label'?: string;
  'aria-labelledby'?: string;
  /**
   * Inline layout for the form element, e.g. `dialogFormStyle` so a dialog's content scrolls
   * between its fixed title and actions.
   */
  style?: CSSProperties;
}

/** A form that is a dialog's body: DialogContent scrolls, DialogActions stay in view. */
export const dialogFormStyle: CSSProperties = {
  display: 'flex',
  flexDirection: 'column',
  minHeight: 0,
  flex: '1 1 auto',
};

/**
 * Formik's form without the browser's own validation bubbles. After a submit that ends with
 * errors (from the schema or the server), focus moves to the first invalid field so its message
 * is read out.
 */
export function FormikForm({ children, style, ...aria }: Props) {
  const formRef = useRef<HTMLFormElement>(null);
  const handledSubmitCount = useRef(0);
  const { submitCount, isSubmitting, isValidating, errors, status } = useFormikContext();
  const serverErrors = (status as FormStatus | undefined)?.fieldErrors ?? {};
  const hasErrors = Object.keys(errors).length > 0 || Object.keys(serverErrors).length > 0;

  useEffect(() => {
    if (isSubmitting || isValidating || submitCount === handledSubmitCount.current) return;
    handledSubmitCount.current = submitCount;
    if (!hasErrors) return;
    formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [submitCount, isSubmitting, isValidating, hasErrors]);

  return (
    <Form ref={formRef} noValidate style={style} {...aria}>
      {children}
    </Form>
  );
}
