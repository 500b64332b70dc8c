import 'reflect-metadata';
import { plainToInstance, Transform } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUrl,
  Max,
  Min,
  MinLength,
  validateSync,
} from 'class-validator';

// Reads the raw text: implicit conversion alone would turn "false" into true.
const toBoolean = ({ obj, key }: { obj: Record<string, unknown>; key: string }) => {
  const raw = obj[key];
  return typeof raw === 'string' ? /^(1|true|yes|on)$/i.test(raw) : raw;
};

const url = { require_tld: false, require_protocol: true };

/** Every setting the server reads, validated at boot: a bad value stops it with a message naming the setting. */
export class Environment {
  @IsIn(['development', 'production', 'test'])
  NODE_ENV: 'development' | 'production' | 'test' = 'development';

  @IsString()
  HOST: string = '127.0.0.1';

  @IsInt()
  @Min(1)
  @Max(65535)
  PORT: number = 3000;

  @IsUrl(url)
  PUBLIC_URL: string;

  @IsIn(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'])
  LOG_LEVEL: string = 'info';

  @IsString()
  @IsNotEmpty()
  DB_HOST: string;

  @IsInt()
  @Min(1)
  @Max(65535)
  DB_PORT: number = 3306;

  @IsString()
  @IsNotEmpty()
  DB_NAME: string;

  @IsString()
  @IsNotEmpty()
  DB_USER: string;

  @IsString()
  DB_PASSWORD: string;

  @IsOptional()
  @IsUrl(url)
  S3_ENDPOINT?: string;

  @IsString()
  S3_REGION: string = 'us-east-1';

  @IsString()
  @IsNotEmpty()
  S3_BUCKET: string;

  @IsString()
  @IsNotEmpty()
  S3_ACCESS_KEY_ID: string;

  @IsString()
  @IsNotEmpty()
  S3_SECRET_ACCESS_KEY: string;

  @Transform(toBoolean)
  @IsBoolean()
  S3_FORCE_PATH_STYLE: boolean = true;

  @IsString()
  @IsNotEmpty()
  SMTP_HOST: string;

  @IsInt()
  @Min(1)
  @Max(65535)
  SMTP_PORT: number = 25;

  @Transform(toBoolean)
  @IsBoolean()
  SMTP_SECURE: boolean = false;

  @IsOptional()
  @IsString()
  SMTP_USER?: string;

  @IsOptional()
  @IsString()
  SMTP_PASSWORD?: string;

  @IsString()
  @IsNotEmpty()
  MAIL_FROM: string;

  @IsOptional()
  @IsUrl(url)
  MAIL_INBOX_URL?: string;

  @IsString()
  @IsNotEmpty()
  GITHUB_CLIENT_ID: string;

  @IsString()
  @IsNotEmpty()
  GITHUB_CLIENT_SECRET: string;

  @IsUrl(url)
  GITHUB_AUTHORIZE_URL: string = 'https://github.com/login/oauth/authorize';

  @IsUrl(url)
  GITHUB_TOKEN_URL: string = 'https://github.com/login/oauth/access_token';

  @IsUrl(url)
  GITHUB_USER_PROFILE_URL: string = 'https://api.github.com/user';

  @IsUrl(url)
  GITHUB_USER_EMAIL_URL: string = 'https://api.github.com/user/emails';

  /** Origins avatar pictures may come from, besides the sign-in provider's own (comma-separated). */
  @IsString()
  AVATAR_ORIGINS: string = 'https://avatars.githubusercontent.com';

  @IsOptional()
  @IsString()
  FIRST_ADMIN_LOGIN?: string;

  @IsString()
  @MinLength(32, { message: 'JWT_SECRET must be at least 32 characters long' })
  JWT_SECRET: string;

  /** How long an access token (the jw_session cookie's JWT) is good for; the web app refreshes it. */
  @IsInt()
  @Min(1)
  ACCESS_TOKEN_TTL_SECONDS: number = 15 * 60;

  /** How long a refresh token is good for if unused; each refresh replaces it with a new one. */
  @IsInt()
  @Min(60)
  REFRESH_TOKEN_TTL_SECONDS: number = 30 * 24 * 3600;

  /** Requests per minute and client address to each sign-in and token route. */
  @IsInt()
  @Min(1)
  AUTH_RATE_LIMIT_PER_MINUTE: number = 20;

  /** Where the built web app is; empty to serve the API only. */
  @IsOptional()
  @IsString()
  WEB_DIST_DIR?: string;
}

export function validateEnvironment(raw: Record<string, unknown>): Environment {
  const env = plainToInstance(Environment, raw, { enableImplicitConversion: true, exposeDefaultValues: true });
  const errors = validateSync(env, { skipMissingProperties: false, whitelist: false });
  if (errors.length > 0) {
    const lines = errors.map((error) => {
      const value = raw[error.property];
      const shown = value === undefined ? 'missing' : `"${String(value)}"`;
      return `  ${error.property} (${shown}): ${Object.values(error.constraints ?? {}).join('; ')}`;
    });
    throw new Error(`Invalid server configuration:\n${lines.join('\n')}`);
  }
  return env;
}
