import { ApiProperty } from '@nestjs/swagger';
import { PageMetaDto } from '../../common/pagination.dto';
import { MemberRefDto, toMemberRefDto } from '../../members/dto/member.dto';
import { AUDIT_ACTIONS, type AuditAction, type AuditEntry } from '../entities/audit-entry.entity';

export class AuditEntryDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ type: MemberRefDto, nullable: true, description: 'Null when the change came from configuration' })
  actor: MemberRefDto | null;

  @ApiProperty({ type: MemberRefDto })
  subject: MemberRefDto;

  @ApiProperty({ enum: AUDIT_ACTIONS })
  action: AuditAction;

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
    at: entry.createdAt.toISOString(),
  };
}
