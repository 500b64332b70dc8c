/** Why a sign-in did not finish; the sign-in page shows a message for each. */
export const SIGN_IN_FAILURES = [
  'cancelled',
  'provider_error',
  'state_mismatch',
  'token_rejected',
  'provider_unavailable',
  'no_verified_email',
] as const;
export type SignInFailure = (typeof SIGN_IN_FAILURES)[number];

interface PassportFailureInfo {
  code?: SignInFailure;
}

/** Sorts passport-oauth2's outcomes into our failure codes. */
export function classifySignInFailure(error: unknown, info: unknown, providerError: unknown): SignInFailure {
  if (error instanceof Error) {
    // GitHub answers a bad code with 200 and an error body, which passport-oauth2 reports as "no token".
    if (error.name === 'TokenError' || error.message === 'Failed to obtain access token') return 'token_rejected';
    if (error.name === 'AuthorizationError') return 'provider_error';
    return 'provider_unavailable';
  }
  const code = (info as PassportFailureInfo | undefined)?.code;
  if (code) return code;
  if (providerError === 'access_denied') return 'cancelled';
  if (providerError) return 'provider_error';
  return 'state_mismatch';
}
