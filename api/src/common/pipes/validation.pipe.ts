import { ValidationPipe, type ValidationError } from '@nestjs/common';
import { FieldErrorsException, type FieldErrors } from '../errors/field-errors.exception';

const UNKNOWN_FIELD_MESSAGE = 'is not an expected field';

/** class-validator's default messages start with the property name; the key already says it. */
function withoutPropertyName(message: string, property: string): string {
  return message.startsWith(`${property} `) ? message.slice(property.length + 1) : message;
}

/** The key of a nested field: `a.b` for an object's property, `items[2]` for a list position. */
function childPath(parentPath: string, property: string): string {
  if (!parentPath) return property;
  return /^\d+$/.test(property) ? `${parentPath}[${property}]` : `${parentPath}.${property}`;
}

/**
 * Flattens class-validator errors into { "a.b": [messages], "items[2].quantity": [messages] }:
 * list positions in brackets, as the services write them, so a client handles one form.
 */
export function toFieldErrors(errors: ValidationError[], parentPath = ''): FieldErrors {
  const fieldErrors: FieldErrors = {};
  for (const error of errors) {
    const path = childPath(parentPath, error.property);
    const messages = Object.entries(error.constraints ?? {}).map(([rule, message]) =>
      rule === 'whitelistValidation'
        ? UNKNOWN_FIELD_MESSAGE
        : withoutPropertyName(message, error.property),
    );
    if (messages.length > 0) fieldErrors[path] = messages;
    if (error.children && error.children.length > 0) {
      Object.assign(fieldErrors, toFieldErrors(error.children, path));
    }
  }
  return fieldErrors;
}

export function validationException(errors: ValidationError[]): FieldErrorsException {
  return new FieldErrorsException(toFieldErrors(errors));
}

/** The global pipe: strips nothing silently, rejects unknown fields, converts to DTO classes. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    stopAtFirstError: true,
    validationError: { target: false, value: false },
    exceptionFactory: validationException,
  });
}
