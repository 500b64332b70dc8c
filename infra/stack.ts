import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Settings } from './config.ts';
import { startFakeGithub } from './fake-github/server.ts';
import { startFakeS3 } from './fake-s3.ts';
import { startFakeSmtp } from './fake-smtp.ts';
import { startMariaDb } from './mariadb.ts';
import type { Log } from './process.ts';

export interface Stack {
  /** The environment the NestJS server (and its scripts and tests) runs with. */
  serverEnv: Record<string, string>;
  stop(): Promise<void>;
}

function secretIn(dir: string, name: string): string {
  const file = join(dir, name);
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const secret = randomBytes(32).toString('base64url');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}

/** Starts MariaDB and the local fakes that the settings ask for, in order; stops them in reverse. */
export async function startStack(
  settings: Settings,
  log: Log,
  options: { extraOrigins?: string[] } = {},
): Promise<Stack> {
  const stops: Array<() => Promise<void>> = [];
  const stop = async () => {
    for (const step of stops.reverse()) await step().catch((error: Error) => log(`while stopping: ${error.message}`));
    stops.length = 0;
  };
  try {
    mkdirSync(settings.dataDir, { recursive: true });
    const host = settings.get('APP_HOST');
    const env: Record<string, string> = {
      NODE_ENV: settings.profile === 'test' ? 'test' : 'production',
      // The SDK version is pinned to one that supports Node 20 (DEVELOPERS.md); its notice about later ones is noise here.
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
      HOST: host,
      PORT: String(settings.port('APP_PORT')),
      PUBLIC_URL: settings.appUrl,
      LOG_LEVEL: settings.get('LOG_LEVEL'),
      DB_HOST: settings.get('DB_HOST'),
      DB_PORT: String(settings.port('DB_PORT')),
      DB_NAME: settings.get('DB_NAME'),
      DB_USER: settings.get('DB_USER'),
      S3_REGION: settings.get('S3_REGION'),
      S3_BUCKET: settings.get('S3_BUCKET'),
      S3_ACCESS_KEY_ID: settings.get('S3_ACCESS_KEY_ID'),
      S3_SECRET_ACCESS_KEY: settings.get('S3_SECRET_ACCESS_KEY'),
      S3_FORCE_PATH_STYLE: settings.get('S3_FORCE_PATH_STYLE'),
      SMTP_HOST: settings.get('SMTP_HOST'),
      SMTP_PORT: String(settings.port('SMTP_PORT')),
      SMTP_SECURE: settings.get('SMTP_SECURE'),
      MAIL_FROM: settings.get('MAIL_FROM'),
      GITHUB_CLIENT_ID: settings.get('GITHUB_CLIENT_ID'),
      GITHUB_CLIENT_SECRET: settings.get('GITHUB_CLIENT_SECRET'),
      FIRST_ADMIN_LOGIN: settings.optional('FIRST_ADMIN_LOGIN') ?? '',
      JWT_SECRET: settings.optional('JWT_SECRET') ?? secretIn(settings.dataDir, 'jwt-secret'),
    };
    for (const name of ['SMTP_USER', 'SMTP_PASSWORD', 'WEB_DIST_DIR']) {
      const value = settings.optional(name);
      if (value) env[name] = value;
    }
    // Session lifetimes and the sign-in rate limit: the server's defaults unless set.
    for (const name of ['ACCESS_TOKEN_TTL_SECONDS', 'REFRESH_TOKEN_TTL_SECONDS', 'AUTH_RATE_LIMIT_PER_MINUTE']) {
      const value = settings.optional(name);
      if (value) env[name] = value;
    }

    if (settings.flag('LOCAL_MARIADB')) {
      const db = await startMariaDb({
        dir: join(settings.dataDir, 'mariadb'),
        host: env.DB_HOST!,
        port: settings.port('DB_PORT'),
        database: env.DB_NAME!,
        user: env.DB_USER!,
        grantAllDatabases: settings.profile === 'test',
        log,
      });
      stops.push(db.stop);
      env.DB_PASSWORD = db.password;
    } else {
      env.DB_PASSWORD = settings.get('DB_PASSWORD');
    }

    if (settings.flag('LOCAL_S3')) {
      const port = settings.port('S3_PORT');
      const s3 = await startFakeS3({
        host,
        port,
        dir: join(settings.dataDir, 's3'),
        bucket: env.S3_BUCKET!,
        allowedOrigins: [settings.appUrl, ...(options.extraOrigins ?? [])],
      });
      stops.push(s3.stop);
      env.S3_ENDPOINT = `http://${host}:${port}`;
    } else {
      env.S3_ENDPOINT = settings.optional('S3_ENDPOINT') ?? '';
    }

    if (settings.flag('LOCAL_SMTP')) {
      const smtp = await startFakeSmtp({
        host: env.SMTP_HOST!,
        smtpPort: settings.port('SMTP_PORT'),
        inboxPort: settings.port('MAIL_INBOX_PORT'),
      });
      stops.push(smtp.stop);
      env.MAIL_INBOX_URL = settings.inboxUrl;
    }

    if (settings.flag('LOCAL_GITHUB')) {
      const github = await startFakeGithub({
        host,
        port: settings.port('GITHUB_FAKE_PORT'),
        clientId: env.GITHUB_CLIENT_ID!,
        clientSecret: env.GITHUB_CLIENT_SECRET!,
      });
      stops.push(github.stop);
      env.GITHUB_AUTHORIZE_URL = `${github.url}/login/oauth/authorize`;
      env.GITHUB_TOKEN_URL = `${github.url}/login/oauth/access_token`;
      env.GITHUB_USER_PROFILE_URL = `${github.url}/user`;
      env.GITHUB_USER_EMAIL_URL = `${github.url}/user/emails`;
    } else {
      for (const name of [
        'GITHUB_AUTHORIZE_URL',
        'GITHUB_TOKEN_URL',
        'GITHUB_USER_PROFILE_URL',
        'GITHUB_USER_EMAIL_URL',
      ]) {
        const value = settings.optional(name);
        if (value) env[name] = value;
      }
    }
    return { serverEnv: env, stop };
  } catch (error) {
    await stop();
    throw error;
  }
}
