import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import type { Environment } from '../config/environment';
import type { Member } from '../members/entities/member.entity';
import { MembersService, type GithubIdentity } from '../members/members.service';
import type { AccessTokenPayload } from './session';
import { SessionsService } from './sessions.service';

/** What a sign-in or a refresh hands the browser: a short-lived access token and the next refresh token. */
export interface IssuedTokens {
  accessToken: string;
  refreshToken: string;
}

@Injectable()
export class AuthService {
  constructor(
    private readonly members: MembersService,
    private readonly sessions: SessionsService,
    private readonly jwt: JwtService,
    private readonly config: ConfigService<Environment, true>,
  ) {}

  get refreshTtlSeconds(): number {
    return this.config.get('REFRESH_TOKEN_TTL_SECONDS', { infer: true });
  }

  private signAccessToken(memberId: number, sessionId: string): Promise<string> {
    const payload: AccessTokenPayload = { sub: String(memberId), sid: sessionId };
    return this.jwt.signAsync(payload, { expiresIn: this.config.get('ACCESS_TOKEN_TTL_SECONDS', { infer: true }) });
  }

  /** Records the sign-in, makes the configured first admin one, and starts a session. */
  async signIn(identity: GithubIdentity): Promise<{ member: Member } & IssuedTokens> {
    const firstAdmin = this.config.get('FIRST_ADMIN_LOGIN', { infer: true });
    const signedIn = await this.members.upsertFromGithub(identity, { signedInAt: new Date() });
    const member =
      firstAdmin && signedIn.login === firstAdmin
        ? await this.members.setRoleFromConfiguration(signedIn, 'admin')
        : signedIn;
    const { sessionId, refreshToken } = await this.sessions.start(member.id);
    return { member, refreshToken, accessToken: await this.signAccessToken(member.id, sessionId) };
  }

  async refresh(presentedRefreshToken: string): Promise<IssuedTokens> {
    const { memberId, sessionId, refreshToken } = await this.sessions.rotate(presentedRefreshToken);
    return { refreshToken, accessToken: await this.signAccessToken(memberId, sessionId) };
  }

  /**
   * Ends the session the browser holds, found from its refresh token or else its access token
   * (expired or not: signing out must work after a long pause too).
   */
  async signOut({ refreshToken, accessToken }: { refreshToken?: string; accessToken?: string }): Promise<void> {
    if (refreshToken) await this.sessions.endByRefreshToken(refreshToken);
    if (!accessToken) return;
    const payload = await this.jwt
      .verifyAsync<AccessTokenPayload>(accessToken, { ignoreExpiration: true, algorithms: ['HS256'] })
      .catch(() => undefined);
    if (payload?.sid) await this.sessions.end(payload.sid, 'signed_out');
  }
}
