import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, In, Not, Repository, type FindOptionsWhere, type SelectQueryBuilder } from 'typeorm';
import { assertOwnedBy, type Actor } from '../common/ownership';
import { skipOf, type PageQueryDto } from '../common/pagination.dto';
import type { CreatePlanDto, PlanListQueryDto, UpdatePlanDto } from './dto/plan.dto';
import { Plan } from './entities/plan.entity';
import { PlanTool } from './entities/plan-tool.entity';
import { Revision } from './entities/revision.entity';
import { isDuplicateKey, PlanChangedError, PlanNotFoundError } from './plans.errors';
import { booleanSearchOf } from './search-query';
import type { RevisionState, Tool } from './vocabulary';

const MAX_SLUG_LENGTH = 60;

/** "Crosscut sled — 5-cut" → "crosscut-sled-5-cut". */
export function slugOf(title: string): string {
  const slug = title
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .slice(0, MAX_SLUG_LENGTH)
    .replace(/^-+|-+$/g, '');
  return slug || 'plan';
}

const SORTS: Record<PlanListQueryDto['sort'], Array<[string, 'ASC' | 'DESC']>> = {
  newest: [['plan.latestPublishedAt', 'DESC']],
  rated: [
    ['plan.ratingAverage', 'DESC'],
    ['plan.ratingCount', 'DESC'],
  ],
  built: [['plan.buildCount', 'DESC']],
};

/** Who is looking: a member, or an anonymous visitor (null). */
export type Viewer = Actor | null;

export function isOwner(viewer: Viewer, plan: Plan): boolean {
  return viewer !== null && viewer.memberId === plan.ownerId;
}

/** Moderators and admins work the review desk. */
export function isModerator(viewer: Viewer): boolean {
  return viewer?.role === 'moderator' || viewer?.role === 'admin';
}

/** Published revisions are everyone's; the owner reads all theirs; moderators all but drafts. */
export function mayReadRevision(viewer: Viewer, plan: Plan, state: RevisionState): boolean {
  return state === 'published' || isOwner(viewer, plan) || (state !== 'draft' && isModerator(viewer));
}

@Injectable()
export class PlansService {
  constructor(
    @InjectRepository(Plan) private readonly plans: Repository<Plan>,
    @InjectRepository(Revision) private readonly revisions: Repository<Revision>,
  ) {}

  findBySlug(slug: string): Promise<Plan | null> {
    return this.plans.findOne({ where: { slug }, relations: { owner: true, tools: true } });
  }

  /** Any plan by slug, with its owner and tools; ownership and visibility are the caller's business. */
  async getBySlug(slug: string, manager: EntityManager = this.plans.manager): Promise<Plan> {
    const plan = await manager.findOne(Plan, { where: { slug }, relations: { owner: true, tools: true } });
    if (!plan) throw new PlanNotFoundError(slug);
    return plan;
  }

  /** A plan others see once a revision is published; until then its owner does, and moderators once one is handed in. */
  async getVisible(viewer: Viewer, slug: string): Promise<Plan> {
    const plan = await this.getBySlug(slug);
    if (plan.latestPublishedNumber !== null || isOwner(viewer, plan)) return plan;
    if (isModerator(viewer) && (await this.revisions.existsBy({ planId: plan.id, state: Not('draft') }))) return plan;
    throw new PlanNotFoundError(slug);
  }

  async getOwned(actor: Actor, slug: string, manager?: EntityManager): Promise<Plan> {
    return assertOwnedBy(actor, await this.getBySlug(slug, manager), (plan) => plan.ownerId, {
      message: 'Only the designer of this plan can change it.',
    });
  }

  /** The revisions the viewer may see, oldest first (as `mayReadRevision` decides). */
  revisionsFor(viewer: Viewer, plan: Plan): Promise<Revision[]> {
    const where: FindOptionsWhere<Revision> = isOwner(viewer, plan)
      ? { planId: plan.id }
      : { planId: plan.id, state: isModerator(viewer) ? Not<RevisionState>('draft') : 'published' };
    return this.revisions.find({ where, order: { number: 'ASC' } });
  }

  /** The library: published plans only, filtered from the plans table's own indexes, then one page loaded whole. */
  async library(query: PlanListQueryDto): Promise<[Plan[], number]> {
    const builder = this.plans.createQueryBuilder('plan').where('plan.latestPublishedNumber IS NOT NULL');
    const search = query.q ? booleanSearchOf(query.q) : null;
    if (search) {
      builder.andWhere(
        'MATCH(plan.title, plan.summary, plan.tagsText, plan.searchNotes) AGAINST (:search IN BOOLEAN MODE)',
        {
          search,
        },
      );
    }
    if (query.category) builder.andWhere('plan.category = :category', { category: query.category });
    if (query.licence) builder.andWhere('plan.licence = :licence', { licence: query.licence });
    if (query.motorised !== undefined) builder.andWhere('plan.motorised = :motorised', { motorised: query.motorised });
    if (query.minRating !== undefined)
      builder.andWhere('plan.ratingAverage >= :minRating', { minRating: query.minRating });
    if (query.hasBuilds === true) builder.andWhere('plan.buildCount > 0');
    if (query.hasBuilds === false) builder.andWhere('plan.buildCount = 0');
    if (query.tools?.length) {
      builder.andWhere(
        'EXISTS (SELECT 1 FROM plan_tools needed WHERE needed.plan_id = plan.id AND needed.tool IN (:...tools))',
        { tools: query.tools },
      );
    }
    for (const [column, direction] of SORTS[query.sort]) builder.addOrderBy(column, direction);
    builder.addOrderBy('plan.id', 'DESC');
    const [ids, total] = search ? await this.pageWithTotal(builder, query) : await this.pageAndCount(builder, query);
    return [await this.loadWhole(ids), total];
  }

  /** Without a search, the page walks its sort index and stops, and the count reads an index alone. */
  private async pageAndCount(builder: SelectQueryBuilder<Plan>, query: PlanListQueryDto): Promise<[number[], number]> {
    const [page, total] = await builder.skip(skipOf(query)).take(query.pageSize).getManyAndCount();
    return [page.map((plan) => plan.id), total];
  }

  /**
   * With a search, every match is evaluated whatever the page, so one statement gives the page and
   * the total (a window count) instead of matching the FULLTEXT query twice. A page past the end has
   * no row to carry the total: then it is counted.
   */
  private async pageWithTotal(builder: SelectQueryBuilder<Plan>, query: PlanListQueryDto): Promise<[number[], number]> {
    const rows = await builder
      .select('plan.id', 'id')
      .addSelect('COUNT(*) OVER ()', 'total')
      .offset(skipOf(query))
      .limit(query.pageSize)
      .getRawMany<{ id: number | string; total: number | string }>();
    if (rows.length > 0) return [rows.map((row) => Number(row.id)), Number(rows[0]!.total)];
    return [[], skipOf(query) > 0 ? await builder.offset(undefined).limit(undefined).getCount() : 0];
  }

  async ownedBy(actor: Actor, query: PageQueryDto): Promise<[Array<{ plan: Plan; revisions: Revision[] }>, number]> {
    const [page, total] = await this.plans.findAndCount({
      where: { ownerId: actor.memberId },
      order: { updatedAt: 'DESC', id: 'DESC' },
      skip: skipOf(query),
      take: query.pageSize,
    });
    const plans = await this.loadWhole(page.map((plan) => plan.id));
    const revisions = plans.length
      ? await this.revisions.find({ where: { planId: In(plans.map((plan) => plan.id)) }, order: { number: 'ASC' } })
      : [];
    return [
      plans.map((plan) => ({ plan, revisions: revisions.filter((revision) => revision.planId === plan.id) })),
      total,
    ];
  }

  /**
   * A new plan and its r1 draft, under a slug made from the title (with -2, -3… when taken). The
   * demo seed gives its plans' own slugs.
   */
  async create(actor: Actor, details: CreatePlanDto, { slug: given }: { slug?: string } = {}): Promise<Plan> {
    // Two plans with the same title created at once can pick the same free slug: the second tries again.
    for (let attempt = 1; ; attempt++) {
      try {
        const planId = await this.insertPlan(actor, details, given ?? (await this.freeSlug(slugOf(details.title))));
        return (await this.loadWhole([planId]))[0]!;
      } catch (error) {
        if (given !== undefined || attempt === 3 || !isDuplicateKey(error)) throw error;
      }
    }
  }

  private insertPlan(actor: Actor, details: CreatePlanDto, slug: string): Promise<number> {
    return this.plans.manager.transaction(async (manager) => {
      const plan = await manager.save(
        manager.create(Plan, {
          slug,
          ownerId: actor.memberId,
          title: details.title,
          summary: details.summary,
          category: details.category,
          tags: details.tags,
          tagsText: details.tags.join(' '),
          licence: details.licence,
          motorised: details.motorised,
          searchNotes: '',
          thumbnail: null,
          latestPublishedNumber: null,
          latestPublishedAt: null,
        }),
      );
      await this.replaceTools(manager, plan.id, details.toolsNeeded);
      await manager.save(
        manager.create(Revision, {
          planId: plan.id,
          number: 1,
          state: 'draft',
          changelog: '',
          notes: '',
          safetyNotes: '',
          hardware: [],
          indexing: null,
          publishedAt: null,
        }),
      );
      return plan.id;
    });
  }

  async update(actor: Actor, slug: string, changes: UpdatePlanDto): Promise<Plan> {
    const plan = await this.getOwned(actor, slug);
    await this.plans.manager.transaction(async (manager) => {
      const locked = await manager.findOneOrFail(Plan, { where: { id: plan.id }, lock: { mode: 'pessimistic_write' } });
      if (Date.parse(changes.expectedUpdatedAt) !== locked.updatedAt.getTime()) throw new PlanChangedError();
      const { toolsNeeded, expectedUpdatedAt: _loaded, ...columns } = changes;
      await manager.update(
        Plan,
        { id: plan.id },
        {
          ...columns,
          ...(columns.tags ? { tagsText: columns.tags.join(' ') } : {}),
          // Our own, always later than the last: MariaDB's CURRENT_TIMESTAMP could repeat within a second.
          updatedAt: new Date(Math.max(Date.now(), locked.updatedAt.getTime() + 1)),
        },
      );
      if (toolsNeeded) await this.replaceTools(manager, plan.id, toolsNeeded);
    });
    return (await this.loadWhole([plan.id]))[0]!;
  }

  private async replaceTools(manager: EntityManager, planId: number, tools: readonly Tool[]): Promise<void> {
    await manager.delete(PlanTool, { planId });
    if (tools.length > 0)
      await manager.insert(
        PlanTool,
        tools.map((tool) => ({ planId, tool })),
      );
  }

  private async freeSlug(base: string): Promise<string> {
    const taken = new Set(
      (
        await this.plans
          .createQueryBuilder('plan')
          .select('plan.slug', 'slug')
          .where('plan.slug = :base OR plan.slug LIKE :pattern', { base, pattern: `${base}-%` })
          .getRawMany<{ slug: string }>()
      ).map((row) => row.slug),
    );
    if (!taken.has(base)) return base;
    let n = 2;
    while (taken.has(`${base}-${n}`)) n++;
    return `${base}-${n}`;
  }

  /** Plans by id with owner and tools, in the order of the ids. */
  private async loadWhole(ids: readonly number[]): Promise<Plan[]> {
    if (ids.length === 0) return [];
    const plans = await this.plans.find({ where: { id: In([...ids]) }, relations: { owner: true, tools: true } });
    const byId = new Map(plans.map((plan) => [plan.id, plan]));
    return ids.flatMap((id) => byId.get(id) ?? []);
  }
}
