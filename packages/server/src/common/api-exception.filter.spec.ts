import { BadRequestException, HttpException, NotFoundException } from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import { ConflictError, ForbiddenError, NotFoundError, UnauthenticatedError } from './domain-error';
import { errorBodyOf } from './api-exception.filter';

describe('errorBodyOf', () => {
  it('maps each kind of domain error to its status, keeping code and message', () => {
    expect(errorBodyOf(new NotFoundError('member_not_found', 'No such member.'))).toEqual({
      statusCode: 404,
      code: 'member_not_found',
      message: 'No such member.',
    });
    expect(errorBodyOf(new ForbiddenError('role_required', 'x')).statusCode).toBe(403);
    expect(errorBodyOf(new ConflictError('member_is_admin', 'x')).statusCode).toBe(409);
    expect(errorBodyOf(new UnauthenticatedError('session_expired', 'x')).statusCode).toBe(401);
  });

  it('turns the validation messages into details', () => {
    const body = errorBodyOf(new BadRequestException(['units must be one of: mm, in']));
    expect(body).toEqual({
      statusCode: 400,
      code: 'validation_failed',
      message: 'The request is not valid.',
      details: ['units must be one of: mm, in'],
    });
  });

  it("gives Nest's own exceptions a code from their status", () => {
    expect(errorBodyOf(new NotFoundException('Cannot GET /api/nothing'))).toEqual({
      statusCode: 404,
      code: 'not_found',
      message: 'Cannot GET /api/nothing',
    });
    expect(errorBodyOf(new ThrottlerException('Too many')).code).toBe('rate_limited');
    expect(errorBodyOf(new HttpException('Teapot', 418)).code).toBe('http_error');
  });

  it('says nothing about the inside of an unexpected error', () => {
    expect(errorBodyOf(new Error('connection string with a password'))).toEqual({
      statusCode: 500,
      code: 'internal_error',
      message: 'Something went wrong on our side.',
    });
  });
});
