import { ExecutionContext, Injectable } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';
import type { Request } from 'express';
import { classifySignInFailure, type SignInFailure } from './sign-in-failure';

export type SignInRequest = Request & { signInFailure?: SignInFailure; returnTo?: string };

/**
 * Runs the GitHub strategy but never throws: a failed sign-in is recorded on the request so that
 * the callback can send the visitor back to the sign-in page with a message.
 */
@Injectable()
export class GithubAuthGuard extends AuthGuard('github') {
  override handleRequest<T>(error: unknown, identity: T, info: unknown, context: ExecutionContext): T {
    if (identity && !error) return identity;
    const request = context.switchToHttp().getRequest<SignInRequest>();
    request.signInFailure = classifySignInFailure(error, info, request.query.error);
    return false as T;
  }
}
