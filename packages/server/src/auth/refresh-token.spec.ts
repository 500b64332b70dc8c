import { createHash } from 'node:crypto';
import { hashRefreshToken, newRefreshToken } from './refresh-token';

describe('refresh tokens', () => {
  it('are 256 random bits, URL-safe, never the same twice', () => {
    const tokens = new Set(Array.from({ length: 50 }, newRefreshToken));
    expect(tokens.size).toBe(50);
    for (const token of tokens) expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
  });

  it('are stored as their SHA-256 in hex (FIPS 180-4 test vector "abc")', () => {
    expect(hashRefreshToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    const token = newRefreshToken();
    expect(hashRefreshToken(token)).toBe(createHash('sha256').update(token).digest('hex'));
    expect(hashRefreshToken(token)).not.toContain(token);
  });
});
