import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Member } from '../../members/entities/member.entity';

export const SESSION_END_REASONS = ['signed_out', 'refresh_reused', 'member_suspended'] as const;
export type SessionEndReason = (typeof SESSION_END_REASONS)[number];

/**
 * One signed-in browser: the family of refresh tokens that descend from one sign-in. Access tokens
 * name their session, so ending it (sign-out, a reused refresh token, suspension) refuses them at once.
 */
@Entity({ name: 'sessions' })
export class Session {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('IDX_sessions_member')
  @Column({ name: 'member_id', type: 'int', unsigned: true })
  memberId: number;

  @ManyToOne(() => Member, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'member_id', foreignKeyConstraintName: 'FK_sessions_member' })
  member: Member;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @Column({ name: 'ended_at', type: 'datetime', precision: 3, nullable: true })
  endedAt: Date | null;

  @Column({ name: 'end_reason', type: 'enum', enum: SESSION_END_REASONS, nullable: true })
  endReason: SessionEndReason | null;
}
