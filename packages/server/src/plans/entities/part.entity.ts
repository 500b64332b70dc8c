import type { PointMm } from '@jigwright/core';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { GRAIN_RULES, STOCK_KINDS, type GrainRule, type StockKind } from '../vocabulary';
import { Drawing } from './drawing.entity';
import { Revision } from './revision.entity';

/** A part's outline and holes as polygons in mm, for previews. */
export interface PartOutline {
  points: PointMm[];
  holes: PointMm[][];
}

/** A piece of the jig as measured from a drawing, with the owner's stock settings. */
@Entity({ name: 'parts' })
export class Part {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('IDX_parts_revision')
  @Column({ name: 'revision_id', type: 'int', unsigned: true })
  revisionId: number;

  @ManyToOne(() => Revision, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'revision_id', foreignKeyConstraintName: 'FK_parts_revision' })
  revision: Revision;

  @Index('IDX_parts_drawing')
  @Column({ name: 'drawing_id', type: 'int', unsigned: true })
  drawingId: number;

  @ManyToOne(() => Drawing, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'drawing_id', foreignKeyConstraintName: 'FK_parts_drawing' })
  drawing: Drawing;

  /** Order on the drawing's analysis, so that the parts table keeps the drawing's order. */
  @Column({ type: 'int', unsigned: true })
  position: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** Copies the analysis counted on the drawing. */
  @Column({ type: 'int', unsigned: true })
  quantity: number;

  /** The owner's count when it differs from the drawing's; null uses the drawing's. */
  @Column({ name: 'quantity_override', type: 'int', unsigned: true, nullable: true })
  quantityOverride: number | null;

  @Column({ type: 'double' })
  length: number;

  @Column({ type: 'double' })
  width: number;

  @Column({ type: 'double' })
  thickness: number;

  @Column({ type: 'varchar', length: 120 })
  material: string;

  @Column({ type: 'enum', enum: STOCK_KINDS, name: 'stock_kind' })
  stock: StockKind;

  @Column({ type: 'enum', enum: GRAIN_RULES })
  grain: GrainRule;

  @Column({ type: 'json' })
  outline: PartOutline;

  /** What two tabs editing the same part compare (`expectedUpdatedAt`). */
  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
