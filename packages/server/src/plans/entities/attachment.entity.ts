import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Revision } from './revision.entity';

/** A file on a revision: controller code, a PDF, a photo. */
@Entity({ name: 'attachments' })
@Index('UQ_attachments_revision_sha256', ['revisionId', 'sha256'], { unique: true })
export class Attachment {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'revision_id', type: 'int', unsigned: true })
  revisionId: number;

  @ManyToOne(() => Revision, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'revision_id', foreignKeyConstraintName: 'FK_attachments_revision' })
  revision: Revision;

  @Column({ name: 'storage_key', type: 'varchar', length: 300 })
  storageKey: string;

  /** The download name. */
  @Column({ type: 'varchar', length: 255 })
  name: string;

  @Column({ name: 'media_type', type: 'varchar', length: 100 })
  mediaType: string;

  @Column({ type: 'int', unsigned: true })
  size: number;

  @Column({ type: 'char', length: 64 })
  sha256: string;

  @Column({ type: 'varchar', length: 500, default: '' })
  description: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
