import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, Repository } from 'typeorm';
import { skipOf, type PageQueryDto } from '../common/pagination.dto';
import { AuditEntry, type AuditAction } from './entities/audit-entry.entity';

export interface AuditRecord {
  actorId: number | null;
  subjectId: number;
  action: AuditAction;
  /** For a review decision: the revision decided on. */
  revisionId?: number;
}

@Injectable()
export class AuditService {
  constructor(@InjectRepository(AuditEntry) private readonly entries: Repository<AuditEntry>) {}

  /** Written in the caller's transaction, so that a change and its entry are kept together or not at all. */
  async record(manager: EntityManager, record: AuditRecord): Promise<void> {
    await manager.insert(AuditEntry, record);
  }

  /** Newest first, with the members involved and the revision (and its plan) a decision was about. */
  list(query: PageQueryDto, subjectId?: number): Promise<[AuditEntry[], number]> {
    return this.entries.findAndCount({
      where: subjectId === undefined ? {} : { subjectId },
      relations: { actor: true, subject: true, revision: { plan: true } },
      order: { createdAt: 'DESC', id: 'DESC' },
      skip: skipOf(query),
      take: query.pageSize,
    });
  }
}
