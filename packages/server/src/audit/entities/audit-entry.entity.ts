import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Member } from '../../members/entities/member.entity';
import { Revision } from '../../plans/entities/revision.entity';

export const AUDIT_ACTIONS = [
  'moderator_granted',
  'moderator_revoked',
  'admin_granted',
  'admin_revoked',
  'suspended',
  'restored',
  'revision_published',
  'revision_sent_back',
  'revision_declined',
  'revision_hidden',
  'revision_unhidden',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

/**
 * One change of a member's role or status, or a review decision on a member's revision: who did what
 * to whom, and when. Never updated or deleted.
 */
@Entity({ name: 'audit_log' })
export class AuditEntry {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  /** Null when the change came from configuration (FIRST_ADMIN_LOGIN or the demo seed). */
  @Column({ name: 'actor_id', type: 'int', unsigned: true, nullable: true })
  actorId: number | null;

  @ManyToOne(() => Member, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'actor_id', foreignKeyConstraintName: 'FK_audit_log_actor' })
  actor: Member | null;

  @Index('IDX_audit_log_subject')
  @Column({ name: 'subject_id', type: 'int', unsigned: true })
  subjectId: number;

  @ManyToOne(() => Member, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'subject_id', foreignKeyConstraintName: 'FK_audit_log_subject' })
  subject: Member;

  @Column({ type: 'enum', enum: AUDIT_ACTIONS })
  action: AuditAction;

  /** The revision a review decision was about; null for role and status changes (or once it is deleted). */
  @Column({ name: 'revision_id', type: 'int', unsigned: true, nullable: true })
  revisionId: number | null;

  @ManyToOne(() => Revision, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'revision_id', foreignKeyConstraintName: 'FK_audit_log_revision' })
  revision: Revision | null;

  @Index('IDX_audit_log_created')
  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
