import { BadRequestException, HttpException, NotFoundException } from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import { describe, expect, it, vi } from 'vitest';
import { ApiExceptionFilter } from './api-exception.filter.js';

describe('ApiExceptionFilter.toBody', () => {
  const filter = new ApiExceptionFilter();

  it('renders Nest exceptions in the one shape', () => {
    expect(filter.toBody(new NotFoundException('User 3 not found'))).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'User 3 not found',
    });
    expect(filter.toBody(new BadRequestException(['a is bad', 'b is bad']))).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'a is bad; b is bad',
    });
  });

  it('gives 429 a readable message', () => {
    expect(filter.toBody(new ThrottlerException())).toEqual({
      statusCode: 429,
      error: 'Too Many Requests',
      message: 'Too many requests; wait a minute and try again',
    });
  });

  it('maps body-parser errors, wrapped or not', () => {
    const parse = Object.assign(new SyntaxError('Unexpected token'), {
      type: 'entity.parse.failed',
      status: 400,
    });
    expect(filter.toBody(parse).message).toBe('Malformed JSON body');
    expect(filter.toBody(new HttpException('x', 400, { cause: parse })).message).toBe(
      'Malformed JSON body',
    );
    const big = Object.assign(new Error('too large'), { type: 'entity.too.large', status: 413 });
    expect(filter.toBody(big)).toEqual({
      statusCode: 413,
      error: 'Payload Too Large',
      message: 'Request body too large',
    });
  });

  it('answers unknown errors with a generic 500 and no internals', () => {
    const log = vi.spyOn((filter as unknown as { logger: { error: () => void } }).logger, 'error');
    log.mockImplementation(() => undefined);
    const body = filter.toBody(
      new TypeError('Cannot read properties of undefined (reading "secret")'),
    );
    expect(body).toEqual({
      statusCode: 500,
      error: 'Internal Server Error',
      message: 'Internal server error',
    });
    expect(log).toHaveBeenCalledOnce();
  });
});
