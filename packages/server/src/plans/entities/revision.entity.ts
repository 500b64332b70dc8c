import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { JointInput } from '@jigwright/core';
import { REVISION_STATES, type RevisionState } from '../vocabulary';
import { Plan } from './plan.entity';

export interface HardwareRow {
  item: string;
  specification: string;
  quantity: number;
  note: string;
}

/** A saved set of indexing-calculator inputs (indexing jigs). */
export interface IndexingSet {
  name: string;
  inputs: JointInput;
}

/** One numbered state of a plan (r1, r2, …). `updatedAt` is what two tabs editing a draft compare. */
@Entity({ name: 'revisions' })
@Index('UQ_revisions_plan_number', ['planId', 'number'], { unique: true })
export class Revision {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'plan_id', type: 'int', unsigned: true })
  planId: number;

  @ManyToOne(() => Plan, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'plan_id', foreignKeyConstraintName: 'FK_revisions_plan' })
  plan: Plan;

  @Column({ type: 'int', unsigned: true })
  number: number;

  @Index('IDX_revisions_state')
  @Column({ type: 'enum', enum: REVISION_STATES, default: 'draft' })
  state: RevisionState;

  @Column({ type: 'text' })
  changelog: string;

  @Column({ type: 'mediumtext' })
  notes: string;

  @Column({ name: 'safety_notes', type: 'text' })
  safetyNotes: string;

  @Column({ type: 'json' })
  hardware: HardwareRow[];

  @Column({ type: 'json', nullable: true })
  indexing: IndexingSet | null;

  @Column({ name: 'published_at', type: 'datetime', precision: 3, nullable: true })
  publishedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
