import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { Member, type MemberRole } from './entities/member.entity';

export interface GithubIdentity {
  githubId: number;
  login: string;
  displayName: string;
  avatarUrl: string | null;
  email: string;
}

@Injectable()
export class MembersService {
  constructor(@InjectRepository(Member) private readonly members: Repository<Member>) {}

  findById(id: number): Promise<Member | null> {
    return this.members.findOneBy({ id });
  }

  /**
   * Creates the member on first sign-in and refreshes login, name, avatar and e-mail on later ones.
   * Matching is by GitHub id alone: logins and e-mail addresses can change hands.
   */
  async upsertFromGithub(
    identity: GithubIdentity,
    options: { role?: MemberRole; signedInAt?: Date } = {},
  ): Promise<Member> {
    const existing = await this.members.findOneBy({ githubId: identity.githubId });
    const member = existing ?? this.members.create({ githubId: identity.githubId, role: options.role ?? 'member' });
    member.login = identity.login;
    member.displayName = identity.displayName;
    member.avatarUrl = identity.avatarUrl;
    member.email = identity.email;
    if (options.role) member.role = options.role;
    if (options.signedInAt) member.lastSignInAt = options.signedInAt;
    return this.members.save(member);
  }
}
