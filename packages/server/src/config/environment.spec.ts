import { validateEnvironment } from './environment';

const valid = {
  NODE_ENV: 'test',
  PORT: '3100',
  PUBLIC_URL: 'http://127.0.0.1:3100',
  DB_HOST: '127.0.0.1',
  DB_PORT: '3407',
  DB_NAME: 'jigwright_test',
  DB_USER: 'jigwright_test',
  DB_PASSWORD: 'secret',
  S3_BUCKET: 'bucket',
  S3_ACCESS_KEY_ID: 'key',
  S3_SECRET_ACCESS_KEY: 'secret',
  SMTP_HOST: '127.0.0.1',
  MAIL_FROM: 'Jigwright <no-reply@jigwright.example>',
  GITHUB_CLIENT_ID: 'id',
  GITHUB_CLIENT_SECRET: 'secret',
  JWT_SECRET: 'x'.repeat(32),
};

describe('validateEnvironment', () => {
  it('converts numbers and booleans and keeps defaults', () => {
    const env = validateEnvironment({ ...valid, S3_FORCE_PATH_STYLE: 'false' });
    expect(env.PORT).toBe(3100);
    expect(env.DB_PORT).toBe(3407);
    expect(env.S3_FORCE_PATH_STYLE).toBe(false);
    expect(env.ACCESS_TOKEN_TTL_SECONDS).toBe(900);
    expect(env.REFRESH_TOKEN_TTL_SECONDS).toBe(2592000);
    expect(env.AUTH_RATE_LIMIT_PER_MINUTE).toBe(20);
  });

  it('stops with a message naming a bad setting', () => {
    expect(() => validateEnvironment({ ...valid, DB_PORT: 'seventy' })).toThrow(/DB_PORT \("seventy"\)/);
  });

  it('names a missing setting', () => {
    const { DB_HOST: _omitted, ...rest } = valid;
    expect(() => validateEnvironment(rest)).toThrow(/DB_HOST \(missing\)/);
  });

  it('refuses a short signing secret', () => {
    expect(() => validateEnvironment({ ...valid, JWT_SECRET: 'short' })).toThrow(/JWT_SECRET must be at least 32/);
  });
});
