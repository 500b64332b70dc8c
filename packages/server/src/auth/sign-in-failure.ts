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

/** passport-oauth2 wraps a failed API call with the provider's HTTP answer as `oauthError`. */
interface WrappedProviderError {
  oauthError?: { statusCode?: number };
}

/** Sorts passport-oauth2's outcomes into our failure codes. */
export function classifySignInFailure(error: unknown, info: unknown, providerError: unknown): SignInFailure {
  if (error instanceof Error) {
    if (error.name === 'TokenError') return 'token_rejected';
    if (error.name === 'AuthorizationError') return 'provider_error';
    // A failed call to the provider: a 401 means it refused the access token it had just issued.
    if (error.name === 'InternalOAuthError') {
      return (error as WrappedProviderError).oauthError?.statusCode === 401 ? 'token_rejected' : 'provider_unavailable';
    }
    // GitHub answers a bad code with 200 and an error body, which passport-oauth2 reports as "no token".
    if (error.message === 'Failed to obtain access token') return 'token_rejected';
    return 'provider_unavailable';
  }
  const code = (info as PassportFailureInfo | undefined)?.code;
  if (code) return code;
  if (providerError === 'access_denied') return 'cancelled';
  if (providerError) return 'provider_error';
  return 'state_mismatch';
}
