import { planJoint } from '@jigwright/core';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, Repository } from 'typeorm';
import { DomainError } from '../common/domain-error';
import type { Actor } from '../common/ownership';
import {
  toRevisionDetailDto,
  type RevisionContents,
  type RevisionDetailDto,
  type UpdatePartDto,
  type UpdateRevisionDto,
} from './dto/revision.dto';
import { Attachment } from './entities/attachment.entity';
import { Drawing } from './entities/drawing.entity';
import { Part } from './entities/part.entity';
import { Plan } from './entities/plan.entity';
import { Revision } from './entities/revision.entity';
import { PlanFilesService } from './plan-files.service';
import { mayReadRevision, PlansService, type Viewer } from './plans.service';
import {
  PartChangedError,
  PartNotFoundError,
  RevisionChangedError,
  RevisionNotFoundError,
  RevisionStateError,
  SubmissionIncompleteError,
} from './plans.errors';
import { buildThumbnail, outlinesOfAnalysis } from './thumbnail';
import { EDITABLE_STATES, type RevisionState } from './vocabulary';

export interface PlanRevision {
  plan: Plan;
  revision: Revision;
}

/**
 * Saves with an `updatedAt` of our own: TypeORM's automatic one is MariaDB's CURRENT_TIMESTAMP, whole
 * seconds, which two quick saves would share (and a stale editor could then pass the check). Always
 * later than the one before, even within a millisecond; the caller holds the row lock.
 */
function saveRevision(manager: EntityManager, revision: Revision): Promise<Revision> {
  revision.updatedAt = new Date(Math.max(Date.now(), revision.updatedAt.getTime() + 1));
  return manager.save(revision);
}

const IN_PROGRESS: readonly RevisionState[] = ['draft', 'submitted', 'sent-back'];

@Injectable()
export class RevisionsService {
  constructor(
    @InjectRepository(Revision) private readonly revisions: Repository<Revision>,
    private readonly plans: PlansService,
    private readonly files: PlanFilesService,
  ) {}

  /** A revision others may read once published; the owner reads every one, moderators every one handed in. */
  async getReadable(viewer: Viewer, slug: string, number: number): Promise<PlanRevision> {
    const plan = await this.plans.getVisible(viewer, slug);
    const revision = await this.revisions.findOneBy({ planId: plan.id, number });
    if (!revision || !mayReadRevision(viewer, plan, revision.state)) throw new RevisionNotFoundError(slug, number);
    return { plan, revision };
  }

  /** The actor's revision, in a state they may change, locked for the rest of the caller's transaction. */
  async getEditable(actor: Actor, slug: string, number: number, manager: EntityManager): Promise<PlanRevision> {
    const plan = await this.plans.getOwned(actor, slug, manager);
    const revision = await manager.findOne(Revision, {
      where: { planId: plan.id, number },
      lock: { mode: 'pessimistic_write' },
    });
    if (!revision) throw new RevisionNotFoundError(slug, number);
    if (!EDITABLE_STATES.includes(revision.state)) {
      throw new RevisionStateError(
        'revision_not_editable',
        revision.state === 'submitted'
          ? `r${number} is waiting for review and cannot change. Withdraw it to edit it again.`
          : `r${number} is ${revision.state} and cannot change. Start a new revision instead.`,
      );
    }
    return { plan, revision };
  }

  async contentsOf(revisionId: number, manager: EntityManager = this.revisions.manager): Promise<RevisionContents> {
    const [drawings, parts, attachments] = await Promise.all([
      manager.find(Drawing, { where: { revisionId }, order: { id: 'ASC' } }),
      manager.find(Part, { where: { revisionId }, order: { drawingId: 'ASC', position: 'ASC' } }),
      manager.find(Attachment, { where: { revisionId }, order: { id: 'ASC' } }),
    ]);
    return { drawings, parts, attachments };
  }

  /** The revision as the plan page and the editor show it, read fresh. */
  async detailOf(plan: Plan, revision: Revision): Promise<RevisionDetailDto> {
    return toRevisionDetailDto(
      plan.slug,
      revision,
      EDITABLE_STATES.includes(revision.state),
      await this.contentsOf(revision.id),
    );
  }

  async updateDraft(actor: Actor, slug: string, number: number, changes: UpdateRevisionDto): Promise<PlanRevision> {
    return this.revisions.manager.transaction(async (manager) => {
      const found = await this.getEditable(actor, slug, number, manager);
      if (Date.parse(changes.expectedUpdatedAt) !== found.revision.updatedAt.getTime())
        throw new RevisionChangedError();
      if (changes.indexing) {
        const outcome = planJoint(changes.indexing.inputs);
        if (!outcome.ok) {
          throw new DomainError(
            'invalid',
            'indexing_invalid',
            'The saved indexing set does not make a joint.',
            outcome.errors,
          );
        }
      }
      const { expectedUpdatedAt: _loaded, ...fields } = changes;
      Object.assign(found.revision, fields);
      return { plan: found.plan, revision: await saveRevision(manager, found.revision) };
    });
  }

  async updatePart(actor: Actor, slug: string, number: number, partId: number, changes: UpdatePartDto): Promise<Part> {
    return this.revisions.manager.transaction(async (manager) => {
      const { revision } = await this.getEditable(actor, slug, number, manager);
      const part = await manager.findOneBy(Part, { id: partId, revisionId: revision.id });
      if (!part) throw new PartNotFoundError(partId);
      if (Date.parse(changes.expectedUpdatedAt) !== part.updatedAt.getTime()) throw new PartChangedError(part.name);
      const { expectedUpdatedAt: _loaded, ...fields } = changes;
      Object.assign(part, fields);
      // The same own, always later `updatedAt` as a revision's (see saveRevision); the row is locked
      // through its revision's lock.
      part.updatedAt = new Date(Math.max(Date.now(), part.updatedAt.getTime() + 1));
      return manager.save(part);
    });
  }

  /** Hands the revision to the moderators; it is read-only until withdrawn or decided. */
  async submit(actor: Actor, slug: string, number: number): Promise<PlanRevision> {
    return this.revisions.manager.transaction(async (manager) => {
      const found = await this.getEditable(actor, slug, number, manager);
      const { drawings } = await this.contentsOf(found.revision.id, manager);
      const missing: string[] = [];
      if (number > 1 && found.revision.changelog.trim() === '') {
        missing.push('Write a changelog: what changed since the revision before, and why.');
      }
      if (!drawings.some((drawing) => drawing.status === 'done'))
        missing.push('Upload a drawing and let it be analysed.');
      if (drawings.some((drawing) => drawing.status === 'queued' || drawing.status === 'analysing')) {
        missing.push('Wait until every drawing is analysed.');
      }
      if (drawings.some((drawing) => drawing.status === 'failed')) {
        missing.push('Remove the drawings whose analysis failed, or upload them again fixed.');
      }
      if (missing.length > 0) throw new SubmissionIncompleteError(missing);
      found.revision.state = 'submitted';
      return { plan: found.plan, revision: await saveRevision(manager, found.revision) };
    });
  }

  async withdraw(actor: Actor, slug: string, number: number): Promise<PlanRevision> {
    return this.revisions.manager.transaction(async (manager) => {
      const plan = await this.plans.getOwned(actor, slug, manager);
      const revision = await manager.findOne(Revision, {
        where: { planId: plan.id, number },
        lock: { mode: 'pessimistic_write' },
      });
      if (!revision) throw new RevisionNotFoundError(slug, number);
      if (revision.state !== 'submitted') {
        throw new RevisionStateError(
          'revision_not_submitted',
          `r${number} is ${revision.state}, not waiting for review.`,
        );
      }
      revision.state = 'draft';
      return { plan, revision: await saveRevision(manager, revision) };
    });
  }

  /** Deletes a draft and its files. A plan keeps at least one revision; published ones are never deleted. */
  async remove(actor: Actor, slug: string, number: number): Promise<void> {
    const keys = await this.revisions.manager.transaction(async (manager) => {
      const { plan, revision } = await this.getEditable(actor, slug, number, manager);
      if ((await manager.countBy(Revision, { planId: plan.id })) === 1) {
        throw new RevisionStateError(
          'last_revision',
          `r${number} is this plan's only revision; edit it instead of deleting it.`,
        );
      }
      const { drawings, attachments } = await this.contentsOf(revision.id, manager);
      await manager.delete(Revision, { id: revision.id });
      return [...drawings, ...attachments].map((file) => file.storageKey);
    });
    // After the commit: a file whose deletion fails is left over, but no row points at a missing file.
    await this.files.discard(keys);
  }

  /** The next revision, a copy of the latest published one (files copied too) with an empty changelog. */
  async startNew(actor: Actor, slug: string): Promise<PlanRevision> {
    const copied: string[] = [];
    try {
      return await this.revisions.manager.transaction(async (manager) => {
        const plan = await this.plans.getOwned(actor, slug, manager);
        await manager.findOne(Plan, { where: { id: plan.id }, lock: { mode: 'pessimistic_write' } });
        const all = await manager.find(Revision, { where: { planId: plan.id }, order: { number: 'DESC' } });
        const inProgress = all.find((revision) => IN_PROGRESS.includes(revision.state));
        if (inProgress) {
          throw new RevisionStateError(
            'revision_in_progress',
            `r${inProgress.number} is still ${inProgress.state === 'submitted' ? 'waiting for review' : 'a draft'}; finish it first.`,
          );
        }
        // The latest published revision; with none, the newest declined or hidden one, so that a
        // designer can rework a plan a moderator turned down instead of being left with nothing to edit.
        const source =
          all.find((revision) => revision.state === 'published') ??
          all.find((revision) => revision.state === 'declined' || revision.state === 'hidden');
        if (!source)
          throw new RevisionStateError(
            'nothing_published',
            'A new revision starts from a published, declined or hidden one; this plan has none.',
          );
        const revision = await manager.save(
          manager.create(Revision, {
            planId: plan.id,
            number: all[0]!.number + 1,
            state: 'draft',
            changelog: '',
            notes: source.notes,
            safetyNotes: source.safetyNotes,
            hardware: source.hardware,
            indexing: source.indexing,
            publishedAt: null,
          }),
        );
        const contents = await this.contentsOf(source.id, manager);
        for (const drawing of contents.drawings) {
          const storageKey = this.files.newKey(plan.id, revision.id, 'drawings');
          await this.files.copy(drawing.storageKey, storageKey);
          copied.push(storageKey);
          const { id: _source, ...columns } = drawing;
          const copy = await manager.save(manager.create(Drawing, { ...columns, revisionId: revision.id, storageKey }));
          const parts = contents.parts.filter((part) => part.drawingId === drawing.id);
          if (parts.length > 0) {
            await manager.insert(
              Part,
              parts.map(({ id: _part, ...part }) => ({ ...part, revisionId: revision.id, drawingId: copy.id })),
            );
          }
        }
        for (const attachment of contents.attachments) {
          const storageKey = this.files.newKey(plan.id, revision.id, 'attachments');
          await this.files.copy(attachment.storageKey, storageKey);
          copied.push(storageKey);
          const { id: _source, ...columns } = attachment;
          await manager.insert(Attachment, { ...columns, revisionId: revision.id, storageKey });
        }
        return { plan, revision };
      });
    } catch (error) {
      await this.files.discard(copied);
      throw error;
    }
  }

  /**
   * Makes a revision public and refreshes what the library reads from the plan row: the latest
   * published revision, its notes for search and its thumbnail. Not a route: the review desk's
   * decision and the demo seed call it.
   */
  async publish(revisionId: number, publishedAt: Date = new Date()): Promise<Revision> {
    return this.revisions.manager.transaction(async (manager) => {
      const revision = await manager.findOneOrFail(Revision, {
        where: { id: revisionId },
        lock: { mode: 'pessimistic_write' },
      });
      revision.publishedAt = publishedAt;
      return this.changeDecidedState(manager, revision, 'published');
    });
  }

  /**
   * A review decision's new state, in the caller's transaction (which holds the row lock): published
   * is dated the first time only, and the plan row the library reads follows what is published.
   */
  async changeDecidedState(
    manager: EntityManager,
    revision: Revision,
    state: 'published' | 'sent-back' | 'declined' | 'hidden',
  ): Promise<Revision> {
    revision.state = state;
    if (state === 'published') revision.publishedAt ??= new Date();
    await saveRevision(manager, revision);
    if (state === 'published' || state === 'hidden') await this.refreshPublished(manager, revision.planId);
    return revision;
  }

  private async refreshPublished(manager: EntityManager, planId: number): Promise<void> {
    const latest = await manager.findOne(Revision, {
      where: { planId, state: 'published' },
      order: { number: 'DESC' },
    });
    if (!latest) {
      await manager.update(
        Plan,
        { id: planId },
        { latestPublishedNumber: null, latestPublishedAt: null, searchNotes: '', thumbnail: null },
      );
      return;
    }
    const drawings = await manager.find(Drawing, {
      where: { revisionId: latest.id, status: 'done' },
      order: { id: 'ASC' },
    });
    await manager.update(
      Plan,
      { id: planId },
      {
        latestPublishedNumber: latest.number,
        latestPublishedAt: latest.publishedAt,
        searchNotes: latest.notes,
        thumbnail: buildThumbnail(
          drawings.flatMap((drawing) => (drawing.analysis ? [outlinesOfAnalysis(drawing.analysis)] : [])),
        ),
      },
    );
  }
}
