import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export const MEMBER_ROLES = ['member', 'moderator', 'admin'] as const;
export type MemberRole = (typeof MEMBER_ROLES)[number];

export const UNITS = ['mm', 'in'] as const;
export type Units = (typeof UNITS)[number];

/** Everyone who has signed in. Matched on return by GitHub id, never by login or e-mail. */
@Entity({ name: 'members' })
export class Member {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('UQ_members_github_id', { unique: true })
  @Column({
    name: 'github_id',
    type: 'bigint',
    unsigned: true,
    transformer: { to: (v: number) => v, from: (v: string) => Number(v) },
  })
  githubId: number;

  /** Not unique: a stored login can be stale after a rename on GitHub, and logins change hands. */
  @Index('IDX_members_login')
  @Column({ type: 'varchar', length: 39 })
  login: string;

  @Column({ name: 'display_name', type: 'varchar', length: 100 })
  displayName: string;

  @Column({ name: 'avatar_url', type: 'varchar', length: 500, nullable: true })
  avatarUrl: string | null;

  /** Set when the member chose their display name in Settings; GitHub's name no longer overwrites it. */
  @Column({ name: 'display_name_chosen_at', type: 'datetime', precision: 3, nullable: true })
  displayNameChosenAt: Date | null;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'enum', enum: MEMBER_ROLES, default: 'member' })
  role: MemberRole;

  @Column({ name: 'suspended_at', type: 'datetime', precision: 3, nullable: true })
  suspendedAt: Date | null;

  @Column({ name: 'last_sign_in_at', type: 'datetime', precision: 3, nullable: true })
  lastSignInAt: Date | null;

  @Column({ type: 'enum', enum: UNITS, default: 'mm' })
  units: Units;

  @Column({ name: 'notify_revision_decided', type: 'boolean', default: true })
  notifyRevisionDecided: boolean;

  @Column({ name: 'notify_build_reported', type: 'boolean', default: true })
  notifyBuildReported: boolean;

  @Column({ name: 'notify_plan_adapted', type: 'boolean', default: true })
  notifyPlanAdapted: boolean;

  @Column({ name: 'notify_flag_resolved', type: 'boolean', default: true })
  notifyFlagResolved: boolean;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
