/**
 * Errors in the provider's shape: `{ error: { type, message, code?, param?, decline_code? } }`
 * with the HTTP status the provider uses for each kind (see its "Errors" API reference).
 */

export type ErrorType = 'api_error' | 'card_error' | 'idempotency_error' | 'invalid_request_error';

export interface ErrorBody {
  type: ErrorType;
  message: string;
  code?: string;
  param?: string;
  decline_code?: string;
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly body: ErrorBody,
    /**
     * Whether the endpoint had begun to execute. The provider saves an idempotent result only
     * then: a request refused while its parameters are checked is not saved and may be retried
     * with the same key once corrected.
     */
    readonly executed: boolean,
  ) {
    super(body.message);
    this.name = 'ApiError';
  }

  toJSON(): { error: ErrorBody } {
    return { error: this.body };
  }
}

/** A parameter that is missing, unknown or malformed: 400, not saved for idempotency. */
export function paramError(param: string, message: string, code = 'parameter_invalid'): ApiError {
  return new ApiError(400, { type: 'invalid_request_error', message, param, code }, false);
}

export function missingParam(param: string): ApiError {
  return paramError(param, `Missing required param: ${param}.`, 'parameter_missing');
}

export function unknownParam(param: string): ApiError {
  return paramError(param, `Received unknown parameter: ${param}`, 'parameter_unknown');
}

/** An id that names nothing: 404, as the provider answers. */
export function noSuch(objectName: string, id: string, param?: string): ApiError {
  return new ApiError(
    404,
    {
      type: 'invalid_request_error',
      message: `No such ${objectName}: '${id}'`,
      code: 'resource_missing',
      ...(param ? { param } : {}),
    },
    false,
  );
}

/** A request that is well-formed but refused by the object's state (saved for idempotency). */
export function stateError(message: string, extra: Partial<ErrorBody> = {}): ApiError {
  return new ApiError(400, { type: 'invalid_request_error', message, ...extra }, true);
}
