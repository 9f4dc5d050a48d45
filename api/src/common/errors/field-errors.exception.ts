import { HttpException, HttpStatus } from '@nestjs/common';

export type FieldErrors = Record<string, string[]>;

/** An error about particular fields of the request; the body lists them in fieldErrors. */
export class FieldErrorsException extends HttpException {
  constructor(
    readonly fieldErrors: FieldErrors,
    message = 'Some fields are not valid',
    status: HttpStatus = HttpStatus.BAD_REQUEST,
  ) {
    super(message, status);
  }
}
