import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export const MEMBER_ROLES = ['member', 'moderator', 'admin'] as const;
export type MemberRole = (typeof MEMBER_ROLES)[number];

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

  @Column({ type: 'varchar', length: 39 })
  login: string;

  @Column({ name: 'display_name', type: 'varchar', length: 100 })
  displayName: string;

  @Column({ name: 'avatar_url', type: 'varchar', length: 500, nullable: true })
  avatarUrl: string | null;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'enum', enum: MEMBER_ROLES, default: 'member' })
  role: MemberRole;

  @Column({ name: 'suspended_at', type: 'datetime', precision: 3, nullable: true })
  suspendedAt: Date | null;

  @Column({ name: 'last_sign_in_at', type: 'datetime', precision: 3, nullable: true })
  lastSignInAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
