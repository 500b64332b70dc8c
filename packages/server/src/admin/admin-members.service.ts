import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { SessionsService } from '../auth/sessions.service';
import type { Actor } from '../common/ownership';
import type { Member } from '../members/entities/member.entity';
import { MemberChangeRefusedError } from '../members/members.errors';
import { MembersService } from '../members/members.service';

/** What admins do to members; each change and its audit entry are one transaction. */
@Injectable()
export class AdminMembersService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly members: MembersService,
    private readonly sessions: SessionsService,
  ) {}

  private async nonAdmin(login: string, refusal: { code: string; message: string }): Promise<Member> {
    const member = await this.members.getByLogin(login);
    if (member.role === 'admin') throw new MemberChangeRefusedError(refusal.code, refusal.message);
    return member;
  }

  async setModerator(actor: Actor, login: string, moderator: boolean): Promise<Member> {
    const member = await this.nonAdmin(login, {
      code: 'member_is_admin',
      message: `${login} is an admin; the moderator role does not apply.`,
    });
    return this.dataSource.transaction((manager) =>
      this.members.changeRole(manager, member, moderator ? 'moderator' : 'member', actor.memberId),
    );
  }

  /** Suspension ends every session of the member at once; they may sign in again to read. */
  async setSuspended(actor: Actor, login: string, suspended: boolean): Promise<Member> {
    const member = await this.nonAdmin(login, {
      code: 'member_is_admin',
      message: `${login} is an admin; admins cannot be suspended.`,
    });
    return this.dataSource.transaction(async (manager) => {
      const changed = await this.members.changeSuspension(manager, member, suspended, actor.memberId);
      if (suspended) await this.sessions.endAllFor(manager, member.id, 'member_suspended');
      return changed;
    });
  }
}
