import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import type { Environment } from '../config/environment';
import type { Member } from '../members/entities/member.entity';
import { MembersService, type GithubIdentity } from '../members/members.service';
import type { SessionTokenPayload } from './session';

@Injectable()
export class AuthService {
  constructor(
    private readonly members: MembersService,
    private readonly jwt: JwtService,
    private readonly config: ConfigService<Environment, true>,
  ) {}

  get sessionTtlSeconds(): number {
    return this.config.get('SESSION_TTL_SECONDS', { infer: true });
  }

  /** Records the sign-in and returns the member with a signed session token. */
  async signIn(identity: GithubIdentity): Promise<{ member: Member; token: string }> {
    const firstAdmin = this.config.get('FIRST_ADMIN_LOGIN', { infer: true });
    const existing = await this.members.upsertFromGithub(identity, { signedInAt: new Date() });
    const member =
      firstAdmin && existing.login === firstAdmin && existing.role !== 'admin'
        ? await this.members.upsertFromGithub(identity, { role: 'admin' })
        : existing;
    const payload: SessionTokenPayload = { sub: String(member.id), role: member.role };
    const token = await this.jwt.signAsync(payload, { expiresIn: this.sessionTtlSeconds });
    return { member, token };
  }
}
