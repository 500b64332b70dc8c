import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Member } from '../../members/entities/member.entity';
import { Revision } from '../../plans/entities/revision.entity';

/** What a moderator can decide: on a submitted revision publish, send back or decline; on a published one hide; on a hidden one unhide. */
export const REVIEW_DECISIONS = ['publish', 'send-back', 'decline', 'hide', 'unhide'] as const;
export type ReviewDecisionKind = (typeof REVIEW_DECISIONS)[number];

/** One decision of the review desk on a revision, with the moderator's notes to the designer. Never updated. */
@Entity({ name: 'review_decisions' })
@Index('IDX_review_decisions_revision', ['revisionId', 'createdAt'])
export class ReviewDecision {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'revision_id', type: 'int', unsigned: true })
  revisionId: number;

  @ManyToOne(() => Revision, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'revision_id', foreignKeyConstraintName: 'FK_review_decisions_revision' })
  revision: Revision;

  /** Null only if the moderator's account is gone. */
  @Column({ name: 'moderator_id', type: 'int', unsigned: true, nullable: true })
  moderatorId: number | null;

  @ManyToOne(() => Member, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'moderator_id', foreignKeyConstraintName: 'FK_review_decisions_moderator' })
  moderator: Member | null;

  @Column({ type: 'enum', enum: REVIEW_DECISIONS })
  decision: ReviewDecisionKind;

  /** Notes to the designer (required to send back or decline); the reason, for a hide. May be empty. */
  @Column({ type: 'text' })
  notes: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
