import { TimeTakenException } from '../errors/time-taken.exception';
import { STATUS_CODES } from 'node:http';
import { NotFoundError, UniqueConstraintViolationException } from '@mikro-orm/core';
import {
  type ArgumentsHost,
  Catch,
  type ExceptionFilter,
  HttpException,
  HttpStatus,
  Logger,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import { FieldErrorsException, type FieldErrors } from '../errors/field-errors.exception';
import { TooManyAttemptsException } from '../errors/too-many-attempts.exception';
import { REQUEST_ID_HEADER, requestIdFor } from '../request-id';

export interface ErrorBody {
  statusCode: number;
  error: string;
  message: string;
  fieldErrors?: FieldErrors;
  /** Only with a 409 for a taken time: the next times that are free. */
  nextStarts?: unknown[];
}

export const GENERIC_SERVER_ERROR_MESSAGE = 'Something went wrong on our side. Try again later.';

/** Errors raised by body-parser and other http-errors users: a status and a safe message. */
interface ExposedHttpError {
  status: number;
  message: string;
  type?: string;
  expose: true;
}

function isExposedHttpError(error: unknown): error is ExposedHttpError {
  if (typeof error !== 'object' || error === null) return false;
  const candidate = error as Partial<ExposedHttpError>;
  return (
    candidate.expose === true &&
    typeof candidate.status === 'number' &&
    candidate.status >= 400 &&
    candidate.status < 500 &&
    typeof candidate.message === 'string'
  );
}

function body(statusCode: number, message: string, fieldErrors?: FieldErrors): ErrorBody {
  return {
    statusCode,
    error: STATUS_CODES[statusCode] ?? 'Error',
    message,
    ...(fieldErrors ? { fieldErrors } : {}),
  };
}

function messageOf(exception: HttpException): string {
  const response = exception.getResponse();
  if (typeof response === 'string') return response;
  const message = (response as { message?: unknown }).message;
  if (typeof message === 'string') return message;
  if (Array.isArray(message)) return message.map(String).join('; ');
  return STATUS_CODES[exception.getStatus()] ?? 'Error';
}

/** Maps anything thrown to the contract's error body. Never includes a stack trace. */
export function toErrorBody(exception: unknown): ErrorBody {
  if (exception instanceof FieldErrorsException) {
    return body(exception.getStatus(), messageOf(exception), exception.fieldErrors);
  }
  if (exception instanceof TimeTakenException) {
    return {
      ...body(exception.getStatus(), messageOf(exception)),
      nextStarts: exception.nextStarts,
    };
  }
  if (exception instanceof HttpException) {
    return body(exception.getStatus(), messageOf(exception));
  }
  if (exception instanceof NotFoundError) {
    return body(HttpStatus.NOT_FOUND, 'The requested record was not found');
  }
  if (exception instanceof UniqueConstraintViolationException) {
    return body(HttpStatus.CONFLICT, 'This record already exists');
  }
  if (isExposedHttpError(exception)) {
    if (exception.type === 'entity.parse.failed') {
      return body(exception.status, 'The request body is not valid JSON');
    }
    if (exception.type === 'entity.too.large') {
      return body(exception.status, 'The request body is too large');
    }
    return body(exception.status, exception.message);
  }
  return body(HttpStatus.INTERNAL_SERVER_ERROR, GENERIC_SERVER_ERROR_MESSAGE);
}

@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    if (host.getType() !== 'http') throw exception;
    const request = host.switchToHttp().getRequest<Request>();
    const response = host.switchToHttp().getResponse<Response>();
    const errorBody = toErrorBody(exception);

    if (errorBody.statusCode >= 500 && exception instanceof HttpException) {
      // Deliberate 5xx answers (e.g. health: database down) need no stack trace.
      this.logger.warn(`${errorBody.statusCode} ${messageOf(exception)}`);
    } else if (errorBody.statusCode >= 500) {
      this.logger.error(
        exception instanceof Error ? (exception.stack ?? exception.message) : String(exception),
      );
    }
    if (response.headersSent) return;

    const requestId =
      typeof request.id === 'string' || typeof request.id === 'number'
        ? String(request.id)
        : (response.getHeader(REQUEST_ID_HEADER)?.toString() ?? requestIdFor(request, response));
    if (exception instanceof TooManyAttemptsException) {
      response.setHeader('Retry-After', String(exception.retryAfterSeconds));
    }
    response.status(errorBody.statusCode).json({ ...errorBody, requestId });
  }
}
