import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { CookieOptions, Request } from 'express';
import type { Metadata, StateStore, StateStoreStoreCallback, StateStoreVerifyCallback } from 'passport-oauth2';
import { OAUTH_STATE_COOKIE, safeReturnPath } from './session';

const STATE_LIFETIME_MS = 10 * 60 * 1000;

interface StoredState {
  state: string;
  returnTo: string;
}

/**
 * Keeps the OAuth `state` in a signed, short-lived, httpOnly cookie rather than a server session, so
 * that any replica can finish a sign-in that another one started.
 */
export class CookieStateStore implements StateStore {
  constructor(private readonly cookieOptions: CookieOptions) {}

  // Three parameters: passport-oauth2 picks the call form by the function's arity.
  store(
    request: Request,
    metaOrCallback: Metadata | StateStoreStoreCallback,
    maybeCallback?: StateStoreStoreCallback,
  ): void {
    const callback = (typeof metaOrCallback === 'function' ? metaOrCallback : maybeCallback)!;
    const state = randomBytes(24).toString('base64url');
    const stored: StoredState = { state, returnTo: safeReturnPath(request.query.returnTo) };
    request.res?.cookie(OAUTH_STATE_COOKIE, JSON.stringify(stored), {
      ...this.cookieOptions,
      signed: true,
      maxAge: STATE_LIFETIME_MS,
      path: '/api/auth',
    });
    callback(null, state);
  }

  // Three parameters again, for the arity check; the typings also allow a four-argument form.
  verify(request: Request, provided: string, metaOrCallback: Metadata | StateStoreVerifyCallback): void {
    const callback = metaOrCallback as StateStoreVerifyCallback;
    const raw = (request.signedCookies as Record<string, string | false> | undefined)?.[OAUTH_STATE_COOKIE];
    request.res?.clearCookie(OAUTH_STATE_COOKIE, { ...this.cookieOptions, path: '/api/auth' });
    const stored = typeof raw === 'string' ? parseStored(raw) : undefined;
    if (!stored || typeof provided !== 'string' || !sameText(stored.state, provided)) {
      callback(null, false, 'The sign-in could not be verified (its state did not match). Please try again.');
      return;
    }
    (request as Request & { returnTo?: string }).returnTo = stored.returnTo;
    callback(null, true, undefined);
  }
}

function parseStored(raw: string): StoredState | undefined {
  try {
    const value = JSON.parse(raw) as Partial<StoredState>;
    return typeof value.state === 'string'
      ? { state: value.state, returnTo: safeReturnPath(value.returnTo) }
      : undefined;
  } catch {
    return undefined;
  }
}

function sameText(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}
