import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { PageMetaDto, PageQueryDto } from '../../common/pagination.dto';
import { MEMBER_ROLES, UNITS, type Member, type MemberRole, type Units } from '../entities/member.entity';

/** What the API shows of the signed-in member. */
export class MemberDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ example: 'demo-builder' })
  login: string;

  @ApiProperty()
  displayName: string;

  @ApiProperty({ nullable: true, type: String })
  avatarUrl: string | null;

  @ApiProperty()
  email: string;

  @ApiProperty({ enum: MEMBER_ROLES })
  role: MemberRole;

  @ApiProperty()
  suspended: boolean;

  @ApiProperty({ enum: UNITS, description: 'The units measurements are shown in' })
  units: Units;
}

export function toMemberDto(member: Member): MemberDto {
  return {
    id: member.id,
    login: member.login,
    displayName: member.displayName,
    avatarUrl: member.avatarUrl,
    email: member.email,
    role: member.role,
    suspended: member.suspendedAt !== null,
    units: member.units,
  };
}

/** A member as other records mention them (the audit log, later plans and build reports). */
export class MemberRefDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ example: 'demo-designer' })
  login: string;

  @ApiProperty()
  displayName: string;

  @ApiProperty({ nullable: true, type: String })
  avatarUrl: string | null;
}

export function toMemberRefDto(member: Member): MemberRefDto {
  return { id: member.id, login: member.login, displayName: member.displayName, avatarUrl: member.avatarUrl };
}

/** A member's public profile: nothing private (no e-mail address, no status). */
export class MemberProfileDto extends MemberRefDto {
  @ApiProperty({ enum: MEMBER_ROLES })
  role: MemberRole;

  @ApiProperty({ type: String, format: 'date-time' })
  memberSince: string;
}

export function toMemberProfileDto(member: Member): MemberProfileDto {
  return { ...toMemberRefDto(member), role: member.role, memberSince: member.createdAt.toISOString() };
}

/** A row of the admins' Members table. */
export class AdminMemberDto extends MemberProfileDto {
  @ApiProperty()
  email: string;

  @ApiProperty()
  suspended: boolean;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  suspendedAt: string | null;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  lastSignInAt: string | null;
}

export function toAdminMemberDto(member: Member): AdminMemberDto {
  return {
    ...toMemberProfileDto(member),
    email: member.email,
    suspended: member.suspendedAt !== null,
    suspendedAt: member.suspendedAt?.toISOString() ?? null,
    lastSignInAt: member.lastSignInAt?.toISOString() ?? null,
  };
}

export class AdminMemberPageDto extends PageMetaDto {
  @ApiProperty({ type: [AdminMemberDto] })
  items: AdminMemberDto[];
}

export const MEMBER_STATUSES = ['active', 'suspended'] as const;
export type MemberStatus = (typeof MEMBER_STATUSES)[number];

/** `?q=&role=&status=&page=&pageSize=` of the Members table. */
export class MemberListQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ description: 'Part of a login or display name' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  q?: string;

  @ApiPropertyOptional({ enum: MEMBER_ROLES })
  @IsOptional()
  @IsIn(MEMBER_ROLES)
  role?: MemberRole;

  @ApiPropertyOptional({ enum: MEMBER_STATUSES })
  @IsOptional()
  @IsIn(MEMBER_STATUSES)
  status?: MemberStatus;
}
