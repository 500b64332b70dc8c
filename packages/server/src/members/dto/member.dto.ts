import { ApiProperty } from '@nestjs/swagger';
import { MEMBER_ROLES, type Member, type MemberRole } from '../entities/member.entity';

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
  };
}
