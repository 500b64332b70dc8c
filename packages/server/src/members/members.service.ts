import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, EntityManager, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuditAction } from '../audit/entities/audit-entry.entity';
import { skipOf } from '../common/pagination.dto';
import { assertOwnedBy, type Actor } from '../common/ownership';
import type { MemberListQueryDto } from './dto/member.dto';
import type { UpdateSettingsDto } from './dto/settings.dto';
import { Member, type MemberRole } from './entities/member.entity';
import { MemberNotFoundError } from './members.errors';

export interface GithubIdentity {
  githubId: number;
  login: string;
  displayName: string;
  avatarUrl: string | null;
  email: string;
}

function roleChangeAction(from: MemberRole, to: MemberRole): AuditAction {
  if (to === 'admin') return 'admin_granted';
  if (from === 'admin') return 'admin_revoked';
  return to === 'moderator' ? 'moderator_granted' : 'moderator_revoked';
}

/** `%` and `_` typed into the search box are letters, not wildcards. */
function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

@Injectable()
export class MembersService {
  constructor(
    @InjectRepository(Member) private readonly members: Repository<Member>,
    private readonly audit: AuditService,
  ) {}

  findById(id: number): Promise<Member | null> {
    return this.members.findOneBy({ id });
  }

  findByGithubId(githubId: number): Promise<Member | null> {
    return this.members.findOneBy({ githubId });
  }

  /** A stored login may be stale after a rename at GitHub: the most recent sign-in holds it. */
  async getByLogin(login: string): Promise<Member> {
    const member = await this.members.findOne({
      where: { login },
      // MariaDB sorts NULL first ascending, so last descending: never-signed-in rows come last.
      order: { lastSignInAt: 'DESC', id: 'DESC' },
    });
    if (!member) throw new MemberNotFoundError(login);
    return member;
  }

  /**
   * Creates the member on first sign-in and refreshes login, avatar, e-mail (and the name, unless they
   * chose their own) on later ones. Matching is by GitHub id alone: logins and e-mail addresses can
   * change hands.
   */
  async upsertFromGithub(identity: GithubIdentity, { signedInAt }: { signedInAt?: Date } = {}): Promise<Member> {
    const existing = await this.members.findOneBy({ githubId: identity.githubId });
    const member = existing ?? this.members.create({ githubId: identity.githubId, role: 'member' });
    member.login = identity.login;
    if (!member.displayNameChosenAt) member.displayName = identity.displayName;
    member.avatarUrl = identity.avatarUrl;
    member.email = identity.email;
    if (signedInAt) member.lastSignInAt = signedInAt;
    return this.members.save(member);
  }

  /** Sets the role and keeps an audit entry, in the caller's transaction; no change, no entry. */
  async changeRole(manager: EntityManager, member: Member, role: MemberRole, actorId: number | null): Promise<Member> {
    if (member.role === role) return member;
    const action = roleChangeAction(member.role, role);
    await manager.update(Member, { id: member.id }, { role });
    await this.audit.record(manager, { actorId, subjectId: member.id, action });
    return manager.findOneByOrFail(Member, { id: member.id });
  }

  /** Suspends or restores, with an audit entry, in the caller's transaction; no change, no entry. */
  async changeSuspension(manager: EntityManager, member: Member, suspended: boolean, actorId: number): Promise<Member> {
    if ((member.suspendedAt !== null) === suspended) return member;
    await manager.update(Member, { id: member.id }, { suspendedAt: suspended ? new Date() : null });
    await this.audit.record(manager, { actorId, subjectId: member.id, action: suspended ? 'suspended' : 'restored' });
    return manager.findOneByOrFail(Member, { id: member.id });
  }

  /** A role set from configuration (FIRST_ADMIN_LOGIN, the demo seed): audited with no actor. */
  setRoleFromConfiguration(member: Member, role: MemberRole): Promise<Member> {
    return this.members.manager.transaction((manager) => this.changeRole(manager, member, role, null));
  }

  search(query: MemberListQueryDto): Promise<[Member[], number]> {
    const builder = this.members.createQueryBuilder('member');
    if (query.q) {
      const pattern = likePattern(query.q);
      builder.andWhere(
        new Brackets((where) =>
          where
            .where('member.login LIKE :pattern', { pattern })
            .orWhere('member.displayName LIKE :pattern', { pattern }),
        ),
      );
    }
    if (query.role) builder.andWhere('member.role = :role', { role: query.role });
    if (query.status === 'suspended') builder.andWhere('member.suspendedAt IS NOT NULL');
    if (query.status === 'active') builder.andWhere('member.suspendedAt IS NULL');
    return builder
      .orderBy('member.login', 'ASC')
      .addOrderBy('member.id', 'ASC')
      .skip(skipOf(query))
      .take(query.pageSize)
      .getManyAndCount();
  }

  async settingsOf(actor: Actor, login: string): Promise<Member> {
    return assertOwnedBy(actor, await this.getByLogin(login), (member) => member.id, {
      message: 'These settings belong to another member.',
    });
  }

  async updateSettings(actor: Actor, login: string, changes: UpdateSettingsDto): Promise<Member> {
    const member = await this.settingsOf(actor, login);
    if (changes.displayName !== undefined && changes.displayName !== member.displayName) {
      member.displayName = changes.displayName;
      member.displayNameChosenAt = new Date();
    }
    if (changes.units) member.units = changes.units;
    const notifications = changes.notifications ?? {};
    if (notifications.revisionDecided !== undefined) member.notifyRevisionDecided = notifications.revisionDecided;
    if (notifications.buildReported !== undefined) member.notifyBuildReported = notifications.buildReported;
    if (notifications.planAdapted !== undefined) member.notifyPlanAdapted = notifications.planAdapted;
    if (notifications.flagResolved !== undefined) member.notifyFlagResolved = notifications.flagResolved;
    return this.members.save(member);
  }
}
