import { createHash, randomBytes } from 'node:crypto';

/** A new refresh token: 256 random bits, URL-safe. */
export function newRefreshToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What the database keeps of a refresh token. */
export function hashRefreshToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
