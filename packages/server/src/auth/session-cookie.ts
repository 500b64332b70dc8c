import type { CookieOptions } from 'express';

/** httpOnly and SameSite=Lax always; Secure whenever the site is served over https. */
export function sessionCookieOptions(publicUrl: string): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    secure: publicUrl.startsWith('https:'),
    path: '/',
  };
}
