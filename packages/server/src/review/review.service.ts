import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, In, Repository, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuditAction } from '../audit/entities/audit-entry.entity';
import { assertOwnedBy, type Actor } from '../common/ownership';
import { skipOf, type PageQueryDto } from '../common/pagination.dto';
import type { Environment } from '../config/environment';
import { MailService } from '../mail/mail.service';
import { Member } from '../members/entities/member.entity';
import { Drawing } from '../plans/entities/drawing.entity';
import { Part } from '../plans/entities/part.entity';
import { Plan } from '../plans/entities/plan.entity';
import { Revision } from '../plans/entities/revision.entity';
import { RevisionNotFoundError, RevisionStateError } from '../plans/plans.errors';
import { PlansService } from '../plans/plans.service';
import { RevisionsService } from '../plans/revisions.service';
import type { RevisionState } from '../plans/vocabulary';
import type { MailOutcome } from './dto/review.dto';
import { ReviewDecision, type ReviewDecisionKind } from './entities/review-decision.entity';
import { reviewChecklist, type ChecklistDrawing, type ChecklistPart, type CheckResult } from './review-checklist';
import { OwnPlanDecisionError } from './review.errors';
import { decisionMail } from './review-mail';

interface DecisionRule {
  from: RevisionState;
  to: 'published' | 'sent-back' | 'declined' | 'hidden';
  audit: AuditAction;
  /** The 409 when the revision is in another state. */
  refusal: { code: string; message: (number: number, state: RevisionState) => string };
}

const stateWord = (state: RevisionState) => state.replace('-', ' ');
const NOT_SUBMITTED = {
  code: 'revision_not_submitted',
  message: (number: number, state: RevisionState) => `r${number} is ${stateWord(state)}, not waiting for review.`,
};

const RULES: Record<ReviewDecisionKind, DecisionRule> = {
  publish: { from: 'submitted', to: 'published', audit: 'revision_published', refusal: NOT_SUBMITTED },
  'send-back': { from: 'submitted', to: 'sent-back', audit: 'revision_sent_back', refusal: NOT_SUBMITTED },
  decline: { from: 'submitted', to: 'declined', audit: 'revision_declined', refusal: NOT_SUBMITTED },
  hide: {
    from: 'published',
    to: 'hidden',
    audit: 'revision_hidden',
    refusal: {
      code: 'revision_not_published',
      message: (number, state) => `r${number} is ${stateWord(state)}; only a published revision can be hidden.`,
    },
  },
  unhide: {
    from: 'hidden',
    to: 'published',
    audit: 'revision_unhidden',
    refusal: {
      code: 'revision_not_hidden',
      message: (number, state) => `r${number} is ${stateWord(state)}, not hidden; there is nothing to restore.`,
    },
  },
};

export interface DecisionOutcome {
  revision: Revision;
  decision: ReviewDecision;
  moderator: Member;
  mail: MailOutcome;
}

export interface Submission {
  plan: Plan;
  revision: Revision;
  checklist: CheckResult[];
}

/** The review desk: the queue of submissions with their checklists, and the moderators' decisions. */
@Injectable()
export class ReviewService {
  private readonly logger = new Logger(ReviewService.name);
  private readonly publicUrl: string;

  constructor(
    private readonly dataSource: DataSource,
    @InjectRepository(Revision) private readonly revisions: Repository<Revision>,
    @InjectRepository(ReviewDecision) private readonly decisions: Repository<ReviewDecision>,
    private readonly plans: PlansService,
    private readonly planRevisions: RevisionsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    config: ConfigService<Environment, true>,
  ) {
    this.publicUrl = config.get('PUBLIC_URL', { infer: true }).replace(/\/+$/, '');
  }

  /** Submitted revisions, the longest waiting first, each with its checklist. */
  async queue(query: PageQueryDto): Promise<[Submission[], number]> {
    const [page, total] = await this.revisions.findAndCount({
      where: { state: 'submitted' },
      order: { updatedAt: 'ASC', id: 'ASC' },
      skip: skipOf(query),
      take: query.pageSize,
    });
    return [await this.withChecklists(page), total];
  }

  /** One revision as the desk shows it, in whatever state it is now (drafts are the owner's alone). */
  async submission(slug: string, number: number): Promise<Submission> {
    const plan = await this.plans.getBySlug(slug);
    const revision = await this.revisions.findOneBy({ planId: plan.id, number });
    if (!revision || revision.state === 'draft') throw new RevisionNotFoundError(slug, number);
    return (await this.withChecklists([revision]))[0]!;
  }

  private async withChecklists(revisions: readonly Revision[]): Promise<Submission[]> {
    if (revisions.length === 0) return [];
    const revisionIds = revisions.map((revision) => revision.id);
    const [plans, drawings, parts] = await Promise.all([
      this.dataSource.manager.find(Plan, {
        where: { id: In([...new Set(revisions.map((revision) => revision.planId))]) },
        relations: { owner: true, tools: true },
      }),
      this.checklistDrawings(revisionIds),
      // Without the outlines: the checks need sizes and settings only.
      this.dataSource.manager.find(Part, {
        select: {
          revisionId: true,
          name: true,
          quantity: true,
          quantityOverride: true,
          length: true,
          width: true,
          thickness: true,
          material: true,
          stock: true,
          grain: true,
        },
        where: { revisionId: In(revisionIds) },
        order: { drawingId: 'ASC', position: 'ASC' },
      }),
    ]);
    const planById = new Map(plans.map((plan) => [plan.id, plan]));
    return revisions.map((revision) => {
      const plan = planById.get(revision.planId)!;
      const checklistParts: ChecklistPart[] = parts
        .filter((part) => part.revisionId === revision.id)
        .map((part) => ({
          name: part.name,
          quantity: part.quantityOverride ?? part.quantity,
          length: part.length,
          width: part.width,
          thickness: part.thickness,
          material: part.material,
          stock: part.stock,
          grain: part.grain,
        }));
      const checklist = reviewChecklist({
        plan: { motorised: plan.motorised, tools: plan.tools.map((row) => row.tool), licence: plan.licence },
        safetyNotes: revision.safetyNotes,
        drawings: drawings.filter((drawing) => drawing.revisionId === revision.id),
        parts: checklistParts,
      });
      return { plan, revision, checklist };
    });
  }

  /** The drawings' states; of the analysis only its units, read in MariaDB so that the large JSON stays there. */
  private async checklistDrawings(revisionIds: number[]): Promise<Array<ChecklistDrawing & { revisionId: number }>> {
    const rows = await this.dataSource
      .createQueryBuilder(Drawing, 'drawing')
      .select('drawing.revision_id', 'revisionId')
      .addSelect('drawing.original_name', 'originalName')
      .addSelect('drawing.status', 'status')
      .addSelect('drawing.error', 'error')
      .addSelect('drawing.units', 'units')
      .addSelect("JSON_VALUE(drawing.analysis, '$.units')", 'analysisUnits')
      .where('drawing.revision_id IN (:...revisionIds)', { revisionIds })
      .orderBy('drawing.id', 'ASC')
      .getRawMany<{
        revisionId: number;
        originalName: string;
        status: Drawing['status'];
        error: string | null;
        units: string | null;
        analysisUnits: string | null;
      }>();
    return rows.map((row) => ({
      revisionId: Number(row.revisionId),
      originalName: row.originalName,
      status: row.status,
      error: row.error,
      // As DrawingDto.needsUnits decides: the owner's choice, else what the file declares.
      unitsKnown: row.units !== null || (row.analysisUnits !== null && row.analysisUnits !== 'unknown'),
    }));
  }

  /**
   * A moderator's decision: the new state, the decision row and the audit entry in one transaction;
   * then the designer's e-mail, whose failure is logged and leaves the decision standing.
   */
  async decide(
    actor: Actor,
    slug: string,
    number: number,
    kind: ReviewDecisionKind,
    notes: string,
  ): Promise<DecisionOutcome> {
    const rule = RULES[kind];
    const { plan, revision, decision, moderator } = await this.dataSource.transaction(async (manager) => {
      const plan = await this.plans.getBySlug(slug, manager);
      if (plan.ownerId === actor.memberId) throw new OwnPlanDecisionError();
      const revision = await manager.findOne(Revision, {
        where: { planId: plan.id, number },
        lock: { mode: 'pessimistic_write' },
      });
      if (!revision) throw new RevisionNotFoundError(slug, number);
      if (revision.state !== rule.from)
        throw new RevisionStateError(rule.refusal.code, rule.refusal.message(number, revision.state));
      await this.planRevisions.changeDecidedState(manager, revision, rule.to);
      const decision = await manager.save(
        manager.create(ReviewDecision, { revisionId: revision.id, moderatorId: actor.memberId, decision: kind, notes }),
      );
      await this.audit.record(manager, {
        actorId: actor.memberId,
        subjectId: plan.ownerId,
        action: rule.audit,
        revisionId: revision.id,
      });
      const moderator = await manager.findOneByOrFail(Member, { id: actor.memberId });
      return { plan, revision, decision: await this.reload(manager, decision), moderator };
    });
    return { revision, decision, moderator, mail: await this.tellDesigner(plan, revision, decision, moderator) };
  }

  /** The row as stored, so that its date is MariaDB's own. */
  private reload(manager: EntityManager, decision: ReviewDecision): Promise<ReviewDecision> {
    return manager.findOneByOrFail(ReviewDecision, { id: decision.id });
  }

  private async tellDesigner(
    plan: Plan,
    revision: Revision,
    decision: ReviewDecision,
    moderator: Member,
  ): Promise<MailOutcome> {
    if (!plan.owner.notifyRevisionDecided) return 'not-wanted';
    const mail = decisionMail({
      decision: decision.decision,
      designerName: plan.owner.displayName,
      designerEmail: plan.owner.email,
      moderatorName: moderator.displayName,
      planTitle: plan.title,
      number: revision.number,
      notes: decision.notes,
      revisionUrl: `${this.publicUrl}/plans/${encodeURIComponent(plan.slug)}?r=${revision.number}`,
      editorUrl: `${this.publicUrl}/plans/${encodeURIComponent(plan.slug)}/r/${revision.number}/edit`,
      workshopUrl: `${this.publicUrl}/workshop`,
    });
    try {
      await this.mail.send(mail);
      return 'sent';
    } catch (error) {
      this.logger.error(
        `The e-mail about decision ${decision.id} (${decision.decision} r${revision.number} of ${plan.slug}) to member ${plan.ownerId} was not sent: ${error instanceof Error ? error.message : String(error)}`,
      );
      return 'failed';
    }
  }

  /** The decisions on a revision, newest first: for its designer, moderators and admins. */
  async history(actor: Actor, slug: string, number: number): Promise<ReviewDecision[]> {
    const plan = assertOwnedBy(actor, await this.plans.getBySlug(slug), (found) => found.ownerId, {
      message: 'Only the designer of this plan and the moderators read its review decisions.',
      alsoRoles: ['moderator', 'admin'],
    });
    const revision = await this.revisions.findOneBy({ planId: plan.id, number });
    if (!revision) throw new RevisionNotFoundError(slug, number);
    return this.decisions.find({
      where: { revisionId: revision.id },
      relations: { moderator: true },
      order: { createdAt: 'DESC', id: 'DESC' },
    });
  }
}
