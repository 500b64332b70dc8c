import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  OneToMany,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import { Member } from '../../members/entities/member.entity';
import { LICENCES, PLAN_CATEGORIES, type Licence, type PlanCategory } from '../vocabulary';
import { PlanTool } from './plan-tool.entity';

/** Part outlines of the latest published revision, simplified for a library card (mm). */
export interface PlanThumbnail {
  extents: { min: [number, number]; max: [number, number] };
  outlines: Array<[number, number][]>;
}

const numberFromDecimal = { to: (v: number) => v, from: (v: string | number) => Number(v) };

/**
 * A jig design. The columns after `motorised` are copies of what the library sorts and searches on
 * (the latest published revision, its notes, the community figures), kept here so that the library
 * answers from this one table's indexes.
 */
@Entity({ name: 'plans' })
@Index('FT_plans_search', ['title', 'summary', 'tagsText', 'searchNotes'], { fulltext: true })
@Index('IDX_plans_build_count_published', ['buildCount', 'latestPublishedNumber'])
@Index('IDX_plans_rating', ['ratingAverage', 'ratingCount'])
export class Plan {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('UQ_plans_slug', { unique: true })
  @Column({ type: 'varchar', length: 80 })
  slug: string;

  @Index('IDX_plans_owner')
  @Column({ name: 'owner_id', type: 'int', unsigned: true })
  ownerId: number;

  @ManyToOne(() => Member, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'owner_id', foreignKeyConstraintName: 'FK_plans_owner' })
  owner: Member;

  @Column({ type: 'varchar', length: 120 })
  title: string;

  @Column({ type: 'varchar', length: 500 })
  summary: string;

  @Index('IDX_plans_category')
  @Column({ type: 'enum', enum: PLAN_CATEGORIES })
  category: PlanCategory;

  @Column({ type: 'json' })
  tags: string[];

  /** The tags joined by spaces, for the FULLTEXT index (which cannot index JSON). */
  @Column({ name: 'tags_text', type: 'varchar', length: 1000, default: '' })
  tagsText: string;

  @OneToMany(() => PlanTool, (tool) => tool.plan, { cascade: true })
  tools: PlanTool[];

  @Index('IDX_plans_licence')
  @Column({ type: 'enum', enum: LICENCES })
  licence: Licence;

  @Index('IDX_plans_motorised')
  @Column({ type: 'boolean', default: false })
  motorised: boolean;

  @Index('IDX_plans_latest_published_number')
  @Column({ name: 'latest_published_number', type: 'int', unsigned: true, nullable: true })
  latestPublishedNumber: number | null;

  @Index('IDX_plans_latest_published_at')
  @Column({ name: 'latest_published_at', type: 'datetime', precision: 3, nullable: true })
  latestPublishedAt: Date | null;

  /** Build notes of the latest published revision, for the FULLTEXT index. */
  @Column({ name: 'search_notes', type: 'mediumtext' })
  searchNotes: string;

  @Column({ type: 'json', nullable: true })
  thumbnail: PlanThumbnail | null;

  @Column({
    name: 'rating_average',
    type: 'decimal',
    precision: 3,
    scale: 2,
    default: 0,
    transformer: numberFromDecimal,
  })
  ratingAverage: number;

  @Column({ name: 'rating_count', type: 'int', unsigned: true, default: 0 })
  ratingCount: number;

  @Index('IDX_plans_build_count')
  @Column({ name: 'build_count', type: 'int', unsigned: true, default: 0 })
  buildCount: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
