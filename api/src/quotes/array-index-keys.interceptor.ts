import {
  type CallHandler,
  type ExecutionContext,
  Injectable,
  type NestInterceptor,
} from '@nestjs/common';
import { type Observable, catchError, throwError } from 'rxjs';
import { FieldErrorsException, type FieldErrors } from '../common/errors/field-errors.exception';

/** "items.2.quantity" → "items[2].quantity": list positions written as the engines write them. */
export function withIndexBrackets(fieldErrors: FieldErrors): FieldErrors {
  return Object.fromEntries(
    Object.entries(fieldErrors).map(([key, messages]) => [
      key.replace(/\.(\d+)(?=\.|$)/g, '[$1]'),
      messages,
    ]),
  );
}

/**
 * The package routes report every field of a list item as `items[2].productId`, whether the
 * global validation pipe or the service found the problem, so a client handles one form.
 */
@Injectable()
export class ArrayIndexKeysInterceptor implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next
      .handle()
      .pipe(
        catchError((error: unknown) =>
          throwError(() =>
            error instanceof FieldErrorsException
              ? new FieldErrorsException(
                  withIndexBrackets(error.fieldErrors),
                  error.message,
                  error.getStatus(),
                )
              : error,
          ),
        ),
      );
  }
}
