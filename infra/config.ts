import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseEnv } from 'node:util';

export const ROOT = resolve(fileURLToPath(new URL('..', import.meta.url)));

export type Profile = 'start' | 'test' | 'bench';

/**
 * Every setting with its default for `npm start`; `npm test` reads the same names prefixed TEST_ and
 * `npm run bench` prefixed BENCH_, each with its own defaults.
 */
const DEFAULTS: Record<Profile, Record<string, string>> = {
  start: {
    APP_HOST: '127.0.0.1',
    APP_PORT: '3000',
    WEB_DEV_PORT: '5173',
    DATA_DIR: '.data',
    LOCAL_MARIADB: 'true',
    DB_HOST: '127.0.0.1',
    DB_PORT: '3307',
    DB_NAME: 'jigwright',
    DB_USER: 'jigwright',
    LOCAL_S3: 'true',
    S3_PORT: '4569',
    S3_BUCKET: 'jigwright',
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    S3_FORCE_PATH_STYLE: 'true',
    LOCAL_SMTP: 'true',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: '1025',
    SMTP_SECURE: 'false',
    MAIL_INBOX_PORT: '1080',
    MAIL_FROM: 'Jigwright <no-reply@jigwright.example>',
    LOCAL_GITHUB: 'true',
    GITHUB_FAKE_PORT: '4000',
    GITHUB_CLIENT_ID: 'jigwright-local',
    GITHUB_CLIENT_SECRET: 'jigwright-local-secret',
    FIRST_ADMIN_LOGIN: 'demo-admin',
    LOG_LEVEL: 'info',
  },
  test: {},
  bench: {},
};
DEFAULTS.test = {
  ...DEFAULTS.start,
  APP_PORT: '3100',
  WEB_DEV_PORT: '5273',
  DATA_DIR: '.data/test',
  DB_PORT: '3407',
  DB_NAME: 'jigwright_test',
  DB_USER: 'jigwright_test',
  S3_PORT: '4669',
  S3_BUCKET: 'jigwright-test',
  SMTP_PORT: '1125',
  MAIL_INBOX_PORT: '1180',
  GITHUB_FAKE_PORT: '4100',
  LOG_LEVEL: 'warn',
};
DEFAULTS.bench = {
  ...DEFAULTS.test,
  APP_PORT: '3640',
  WEB_DEV_PORT: '5373',
  DATA_DIR: '.data/bench',
  DB_PORT: '3441',
  DB_NAME: 'jigwright_bench',
  DB_USER: 'jigwright_bench',
  S3_PORT: '4641',
  S3_BUCKET: 'jigwright-bench',
  SMTP_PORT: '1141',
  MAIL_INBOX_PORT: '1142',
  GITHUB_FAKE_PORT: '4141',
};

export interface Settings {
  profile: Profile;
  get(name: string): string;
  optional(name: string): string | undefined;
  flag(name: string): boolean;
  port(name: string): number;
  dataDir: string;
  appUrl: string;
  inboxUrl: string;
  githubFakeUrl: string;
}

function readDotEnv(): Record<string, string> {
  const file = join(ROOT, '.env');
  return existsSync(file) ? (parseEnv(readFileSync(file, 'utf8')) as Record<string, string>) : {};
}

export function loadSettings(profile: Profile): Settings {
  const fromFile = readDotEnv();
  const prefix = { start: '', test: 'TEST_', bench: 'BENCH_' }[profile];
  const lookup = (name: string): string | undefined => {
    const key = prefix + name;
    const value = process.env[key] ?? fromFile[key] ?? DEFAULTS[profile][name];
    return value === '' ? undefined : value;
  };
  const get = (name: string) => {
    const value = lookup(name);
    if (value === undefined) throw new Error(`Setting ${prefix}${name} is missing (see .env.example)`);
    return value;
  };
  const port = (name: string) => {
    const value = Number(get(name));
    if (!Number.isInteger(value) || value < 1 || value > 65535) {
      throw new Error(`Setting ${prefix}${name} must be a port number between 1 and 65535, not "${get(name)}"`);
    }
    return value;
  };
  const host = get('APP_HOST');
  return {
    profile,
    get,
    optional: lookup,
    flag: (name) => /^(1|true|yes|on)$/i.test(lookup(name) ?? ''),
    port,
    dataDir: resolve(ROOT, get('DATA_DIR')),
    appUrl: lookup('PUBLIC_URL') ?? `http://${host}:${port('APP_PORT')}`,
    inboxUrl: lookup('MAIL_INBOX_URL') ?? `http://${get('SMTP_HOST')}:${port('MAIL_INBOX_PORT')}`,
    githubFakeUrl: `http://${host}:${port('GITHUB_FAKE_PORT')}`,
  };
}
