import type { DrawingAnalysis } from '@jigwright/core';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { ANALYSIS_STATUSES, type AnalysisStatus } from '../vocabulary';
import { Revision } from './revision.entity';

const jsonText = {
  to: (value: DrawingAnalysis | null | undefined) => (value ? JSON.stringify(value) : null),
  from: (value: string | null) => (value ? (JSON.parse(value) as DrawingAnalysis) : null),
};

/** A DXF file on a revision and what the analysis measured on it. */
@Entity({ name: 'drawings' })
@Index('UQ_drawings_revision_sha256', ['revisionId', 'sha256'], { unique: true })
@Index('IDX_drawings_status_lease', ['status', 'leaseUntil'])
export class Drawing {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'revision_id', type: 'int', unsigned: true })
  revisionId: number;

  @ManyToOne(() => Revision, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'revision_id', foreignKeyConstraintName: 'FK_drawings_revision' })
  revision: Revision;

  @Column({ name: 'storage_key', type: 'varchar', length: 300 })
  storageKey: string;

  @Column({ name: 'original_name', type: 'varchar', length: 255 })
  originalName: string;

  @Column({ type: 'int', unsigned: true })
  size: number;

  @Column({ type: 'char', length: 64 })
  sha256: string;

  /** Units the owner chose for a drawing that declares none; null reads the file's own. */
  @Column({ type: 'varchar', length: 20, nullable: true })
  units: string | null;

  @Column({ type: 'enum', enum: ANALYSIS_STATUSES, default: 'queued' })
  status: AnalysisStatus;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  error: string | null;

  /** JSON as text: a large drawing's analysis passes MariaDB's JSON_VALID check slowly and gains nothing from it. */
  @Column({ type: 'longtext', nullable: true, transformer: jsonText })
  analysis: DrawingAnalysis | null;

  @Column({ name: 'entity_count', type: 'int', unsigned: true, nullable: true })
  entityCount: number | null;

  /** How many times a replica has taken the analysis on; counted when it is taken, so a drawing that brings its replica down still counts. */
  @Column({ type: 'int', unsigned: true, default: 0 })
  attempts: number;

  /** The claim of the replica analysing the drawing: only the holder of this token may write the outcome. */
  @Column({ name: 'claim_token', type: 'char', length: 36, nullable: true })
  claimToken: string | null;

  /** Until when the claim holds; its holder renews it while it works, and after it any replica may take the drawing on. */
  @Column({ name: 'lease_until', type: 'datetime', precision: 3, nullable: true })
  leaseUntil: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
