import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { Strategy, type Profile, type StrategyOptions } from 'passport-github2';
import type { Environment } from '../config/environment';
import type { GithubIdentity } from '../members/members.service';
import { CookieStateStore } from './oauth-state.store';
import { sessionCookieOptions } from './session-cookie';

interface GithubEmail {
  value: string;
  primary?: boolean;
  verified?: boolean;
}

type Done = (error: Error | null, identity?: GithubIdentity | false, info?: { code: string; message: string }) => void;

/** The verified primary e-mail address, or the first verified one; never an unverified address. */
export function verifiedEmailOf(emails: GithubEmail[] | undefined): string | undefined {
  const verified = (emails ?? []).filter((email) => email.verified === true);
  return (verified.find((email) => email.primary) ?? verified[0])?.value;
}

@Injectable()
export class GithubStrategy extends PassportStrategy(Strategy, 'github') {
  constructor(config: ConfigService<Environment, true>) {
    const publicUrl = config.get('PUBLIC_URL', { infer: true });
    const options: StrategyOptions & { allRawEmails: boolean; store: CookieStateStore } = {
      clientID: config.get('GITHUB_CLIENT_ID', { infer: true }),
      clientSecret: config.get('GITHUB_CLIENT_SECRET', { infer: true }),
      callbackURL: new URL('/api/auth/github/callback', publicUrl).toString(),
      authorizationURL: config.get('GITHUB_AUTHORIZE_URL', { infer: true }),
      tokenURL: config.get('GITHUB_TOKEN_URL', { infer: true }),
      userProfileURL: config.get('GITHUB_USER_PROFILE_URL', { infer: true }),
      userEmailURL: config.get('GITHUB_USER_EMAIL_URL', { infer: true }),
      scope: ['read:user', 'user:email'],
      allRawEmails: true,
      store: new CookieStateStore(sessionCookieOptions(publicUrl)),
    };
    super(options);
  }

  validate(_accessToken: string, _refreshToken: string, profile: Profile, done: Done): void {
    const email = verifiedEmailOf(profile.emails as GithubEmail[] | undefined);
    if (!email) {
      done(null, false, {
        code: 'no_verified_email',
        message: 'Your GitHub account has no verified e-mail address.',
      });
      return;
    }
    done(null, {
      githubId: Number(profile.id),
      login: profile.username ?? String(profile.id),
      displayName: profile.displayName || profile.username || `Member ${profile.id}`,
      avatarUrl: profile.photos?.[0]?.value ?? null,
      email,
    });
  }
}
