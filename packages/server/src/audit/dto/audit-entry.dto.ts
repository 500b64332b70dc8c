import { ApiProperty } from '@nestjs/swagger';
import { PageMetaDto } from '../../common/pagination.dto';
import { MemberRefDto, toMemberRefDto } from '../../members/dto/member.dto';
import { AUDIT_ACTIONS, type AuditAction, type AuditEntry } from '../entities/audit-entry.entity';

/** The revision a review decision was about. */
export class AuditRevisionDto {
  @ApiProperty({ example: 'five-cut-crosscut-sled' })
  planSlug: string;

  @ApiProperty()
  planTitle: string;

  @ApiProperty({ example: 2, description: 'Shown as r2' })
  number: number;
}

export class AuditEntryDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ type: MemberRefDto, nullable: true, description: 'Null when the change came from configuration' })
  actor: MemberRefDto | null;

  @ApiProperty({ type: MemberRefDto })
  subject: MemberRefDto;

  @ApiProperty({ enum: AUDIT_ACTIONS })
  action: AuditAction;

  @ApiProperty({
    type: AuditRevisionDto,
    nullable: true,
    description: 'For review decisions (subject: the designer); null for role and status changes',
  })
  revision: AuditRevisionDto | null;

  @ApiProperty({ type: String, format: 'date-time' })
  at: string;
}

export class AuditPageDto extends PageMetaDto {
  @ApiProperty({ type: [AuditEntryDto] })
  items: AuditEntryDto[];
}

export function toAuditEntryDto(entry: AuditEntry): AuditEntryDto {
  return {
    id: entry.id,
    actor: entry.actor ? toMemberRefDto(entry.actor) : null,
    subject: toMemberRefDto(entry.subject),
    action: entry.action,
    revision: entry.revision
      ? { planSlug: entry.revision.plan.slug, planTitle: entry.revision.plan.title, number: entry.revision.number }
      : null,
    at: entry.createdAt.toISOString(),
  };
}
