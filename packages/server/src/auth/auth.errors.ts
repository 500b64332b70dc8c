import { UnauthenticatedError } from '../common/domain-error';

/** Why a request's session or a refresh did not count; the web app refreshes only on `session_expired`. */
export const SESSION_FAILURES = {
  not_signed_in: 'Sign in first.',
  session_expired: 'Your session has expired.',
  session_invalid: 'Your session could not be verified. Please sign in again.',
  session_ended: 'This session has ended. Please sign in again.',
  refresh_invalid: 'Please sign in again.',
  refresh_expired: 'Your sign-in has expired. Please sign in again.',
  refresh_reused:
    'This sign-in was used from two places at once, so it has been ended everywhere for safety. Please sign in again.',
} as const;

export type SessionFailure = keyof typeof SESSION_FAILURES;

export class SessionError extends UnauthenticatedError {
  constructor(readonly failure: SessionFailure) {
    super(failure, SESSION_FAILURES[failure]);
  }
}
