import { Controller, Delete, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import {
  ApiConflictResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { AuditPageDto, toAuditEntryDto } from '../audit/dto/audit-entry.dto';
import { AuditService } from '../audit/audit.service';
import { Roles } from '../auth/roles.decorator';
import { CurrentSession } from '../auth/current-session.decorator';
import type { Session } from '../auth/session';
import { ApiErrorDto } from '../common/api-error.dto';
import { pageMeta, PageQueryDto } from '../common/pagination.dto';
import { AdminMemberDto, AdminMemberPageDto, MemberListQueryDto, toAdminMemberDto } from '../members/dto/member.dto';
import { MembersService } from '../members/members.service';
import { AdminMembersService } from './admin-members.service';

@ApiTags('admin')
@Controller('admin')
@Roles('admin')
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
@ApiForbiddenResponse({ type: ApiErrorDto, description: 'Only for admins' })
export class AdminMembersController {
  constructor(
    private readonly members: MembersService,
    private readonly admin: AdminMembersService,
    private readonly audit: AuditService,
  ) {}

  @Get('members')
  @ApiOkResponse({ type: AdminMemberPageDto, description: 'Members by login, filtered and paginated' })
  async list(@Query() query: MemberListQueryDto): Promise<AdminMemberPageDto> {
    const [members, total] = await this.members.search(query);
    return { items: members.map(toAdminMemberDto), ...pageMeta(query, total) };
  }

  @Post('members/:login/moderator')
  @HttpCode(200)
  @ApiOkResponse({ type: AdminMemberDto, description: 'The member, now a moderator' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No member has this login' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'The member is an admin' })
  async grantModerator(@CurrentSession() session: Session, @Param('login') login: string): Promise<AdminMemberDto> {
    return toAdminMemberDto(await this.admin.setModerator(session, login, true));
  }

  @Delete('members/:login/moderator')
  @ApiOkResponse({ type: AdminMemberDto, description: 'The member, a moderator no longer' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No member has this login' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'The member is an admin' })
  async revokeModerator(@CurrentSession() session: Session, @Param('login') login: string): Promise<AdminMemberDto> {
    return toAdminMemberDto(await this.admin.setModerator(session, login, false));
  }

  @Post('members/:login/suspension')
  @HttpCode(200)
  @ApiOkResponse({ type: AdminMemberDto, description: 'The member, suspended; their sessions have ended' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No member has this login' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'The member is an admin' })
  async suspend(@CurrentSession() session: Session, @Param('login') login: string): Promise<AdminMemberDto> {
    return toAdminMemberDto(await this.admin.setSuspended(session, login, true));
  }

  @Delete('members/:login/suspension')
  @ApiOkResponse({ type: AdminMemberDto, description: 'The member, restored' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No member has this login' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'The member is an admin' })
  async restore(@CurrentSession() session: Session, @Param('login') login: string): Promise<AdminMemberDto> {
    return toAdminMemberDto(await this.admin.setSuspended(session, login, false));
  }

  @Get('audit')
  @ApiOkResponse({
    type: AuditPageDto,
    description: 'Every role and status change and every review decision, newest first',
  })
  async auditLog(@Query() query: PageQueryDto): Promise<AuditPageDto> {
    const [entries, total] = await this.audit.list(query);
    return { items: entries.map(toAuditEntryDto), ...pageMeta(query, total) };
  }
}
