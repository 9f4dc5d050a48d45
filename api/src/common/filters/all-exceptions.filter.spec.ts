import { NotFoundError, UniqueConstraintViolationException } from '@mikro-orm/core';
import {
  BadRequestException,
  ForbiddenException,
  HttpStatus,
  Logger,
  NotFoundException,
} from '@nestjs/common';
import { ExecutionContextHost } from '@nestjs/core/helpers/execution-context-host';
import type { Request, Response } from 'express';
import { describe, expect, it } from 'vitest';
import { FieldErrorsException } from '../errors/field-errors.exception';
import { TooManyAttemptsException } from '../errors/too-many-attempts.exception';
import {
  AllExceptionsFilter,
  GENERIC_SERVER_ERROR_MESSAGE,
  toErrorBody,
} from './all-exceptions.filter';

describe('toErrorBody', () => {
  it('keeps the status and message of an HttpException', () => {
    expect(toErrorBody(new ForbiddenException('Your role does not allow this'))).toEqual({
      statusCode: 403,
      error: 'Forbidden',
      message: 'Your role does not allow this',
    });
    expect(toErrorBody(new NotFoundException())).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'Not Found',
    });
  });

  it('joins the message list of a default BadRequestException', () => {
    expect(toErrorBody(new BadRequestException(['a is wrong', 'b is wrong'])).message).toBe(
      'a is wrong; b is wrong',
    );
  });

  it('adds fieldErrors only for field errors', () => {
    expect(toErrorBody(new FieldErrorsException({ 'address.postcode': ['is required'] }))).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Some fields are not valid',
      fieldErrors: { 'address.postcode': ['is required'] },
    });
    expect(toErrorBody(new ForbiddenException())).not.toHaveProperty('fieldErrors');
  });

  it('maps MikroORM not-found to 404 and unique violations to 409, without their details', () => {
    const notFound = toErrorBody(new NotFoundError('User not found ({ id: 42 })'));
    expect(notFound).toMatchObject({ statusCode: 404, error: 'Not Found' });
    expect(notFound.message).not.toContain('42');
    const duplicate = toErrorBody(
      new UniqueConstraintViolationException(
        new Error('duplicate key value violates unique constraint "user_email_unique"'),
      ),
    );
    expect(duplicate).toMatchObject({ statusCode: 409, error: 'Conflict' });
    expect(duplicate.message).not.toContain('user_email_unique');
  });

  it('maps body-parser errors to their 4xx', () => {
    const syntax = Object.assign(new SyntaxError('Unexpected end of JSON input'), {
      status: 400,
      statusCode: 400,
      expose: true as const,
      type: 'entity.parse.failed',
    });
    expect(toErrorBody(syntax)).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'The request body is not valid JSON',
    });
    const tooLarge = Object.assign(new Error('request entity too large'), {
      status: 413,
      expose: true as const,
      type: 'entity.too.large',
    });
    expect(toErrorBody(tooLarge)).toMatchObject({
      statusCode: 413,
      message: 'The request body is too large',
    });
  });

  it('answers anything else with a generic 500', () => {
    expect(
      toErrorBody(new TypeError("Cannot read properties of undefined (reading 'id')")),
    ).toEqual({
      statusCode: 500,
      error: 'Internal Server Error',
      message: GENERIC_SERVER_ERROR_MESSAGE,
    });
    expect(toErrorBody('a string was thrown').statusCode).toBe(500);
  });
});

describe('AllExceptionsFilter', () => {
  // The filter logs 5xx errors; that output is not under test here.
  Logger.overrideLogger(false);

  function run(exception: unknown, requestId: string | null = 'req-1') {
    const headers: Record<string, string> = {};
    const sent: { status?: number; body?: unknown } = {};
    const response = {
      headersSent: false,
      setHeader: (name: string, value: string) => {
        headers[name.toLowerCase()] = value;
      },
      getHeader: (name: string) => headers[name.toLowerCase()],
      status(code: number) {
        sent.status = code;
        return this;
      },
      json(body: unknown) {
        sent.body = body;
        return this;
      },
    } as unknown as Response;
    const request = { id: requestId ?? undefined, headers: {} } as unknown as Request;
    new AllExceptionsFilter().catch(exception, new ExecutionContextHost([request, response]));
    return { headers, ...sent };
  }

  it('writes the contract shape with the request id and no stack', () => {
    const result = run(new Error('database password is hunter2'));
    expect(result.status).toBe(500);
    expect(result.body).toEqual({
      statusCode: 500,
      error: 'Internal Server Error',
      message: GENERIC_SERVER_ERROR_MESSAGE,
      requestId: 'req-1',
    });
    expect(JSON.stringify(result.body)).not.toContain('hunter2');
  });

  it('sets Retry-After on a 429', () => {
    const result = run(new TooManyAttemptsException(14 * 60_000 + 1));
    expect(result.status).toBe(HttpStatus.TOO_MANY_REQUESTS);
    expect(result.headers['retry-after']).toBe('841');
    expect((result.body as { message: string }).message).toBe(
      'Too many attempts. Try again in 15 minutes.',
    );
  });

  it('makes a request id when none was assigned yet', () => {
    const result = run(new ForbiddenException(), null);
    const requestId = (result.body as { requestId: string }).requestId;
    expect(requestId).toMatch(/^[0-9a-f-]{36}$/);
    expect(result.headers['x-request-id']).toBe(requestId);
  });
});
