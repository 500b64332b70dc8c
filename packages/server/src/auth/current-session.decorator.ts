import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';
import { sessionOf } from './session';

/** The signed-in member's session as a handler parameter; refuses a request without one. */
export const CurrentSession = createParamDecorator((_data: unknown, context: ExecutionContext) =>
  sessionOf(context.switchToHttp().getRequest<Request>()),
);
