import { classifySignInFailure } from './sign-in-failure';

function named(name: string): Error {
  const error = new Error('x');
  error.name = name;
  return error;
}

describe('classifySignInFailure', () => {
  it('tells a rejected code or token from an unreachable provider', () => {
    expect(classifySignInFailure(named('TokenError'), undefined, undefined)).toBe('token_rejected');
    expect(classifySignInFailure(new Error('Failed to obtain access token'), undefined, undefined)).toBe(
      'token_rejected',
    );
    expect(classifySignInFailure(named('InternalOAuthError'), undefined, undefined)).toBe('provider_unavailable');
    expect(classifySignInFailure(named('AuthorizationError'), undefined, 'server_error')).toBe('provider_error');
  });

  it('tells a token the provider refuses from a provider that fails', () => {
    const refused = Object.assign(named('InternalOAuthError'), { oauthError: { statusCode: 401 } });
    const failing = Object.assign(named('InternalOAuthError'), { oauthError: { statusCode: 502 } });
    expect(classifySignInFailure(refused, undefined, undefined)).toBe('token_rejected');
    expect(classifySignInFailure(failing, undefined, undefined)).toBe('provider_unavailable');
  });

  it('keeps the code our verify step gave', () => {
    expect(classifySignInFailure(null, { code: 'no_verified_email' }, undefined)).toBe('no_verified_email');
  });

  it('reads a cancelled authorisation and otherwise a state mismatch', () => {
    expect(classifySignInFailure(null, { message: 'denied' }, 'access_denied')).toBe('cancelled');
    expect(classifySignInFailure(null, { message: 'Unable to verify' }, undefined)).toBe('state_mismatch');
  });
});
