import type { CookieOptions } from 'express';
import { REFRESH_COOKIE_PATH } from './session';

/** httpOnly and SameSite=Lax always; Secure whenever the site is served over https. */
export function sessionCookieOptions(publicUrl: string): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    secure: publicUrl.startsWith('https:'),
    path: '/',
  };
}

/**
 * The refresh token's cookie: sent only to /api/auth, and only with requests our own pages make
 * (SameSite=Strict: a link from another site never carries it).
 */
export function refreshCookieOptions(publicUrl: string): CookieOptions {
  return { ...sessionCookieOptions(publicUrl), sameSite: 'strict', path: REFRESH_COOKIE_PATH };
}
