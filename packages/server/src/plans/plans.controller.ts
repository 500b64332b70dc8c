import { Body, Controller, Get, HttpCode, Param, Patch, Post, Query, Req, UseGuards } from '@nestjs/common';
import {
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../auth/public.decorator';
import { CurrentSession } from '../auth/current-session.decorator';
import type { Session } from '../auth/session';
import { ApiErrorDto } from '../common/api-error.dto';
import { pageMeta, PageQueryDto } from '../common/pagination.dto';
import {
  CreatePlanDto,
  MyPlanPageDto,
  PlanCardPageDto,
  PlanDetailDto,
  PlanListQueryDto,
  toPlanCardDto,
  toPlanDetailDto,
  UpdatePlanDto,
} from './dto/plan.dto';
import { RevisionDetailDto } from './dto/revision.dto';
import { OptionalSessionGuard, viewerOf } from './optional-session.guard';
import { PlansService } from './plans.service';
import { RevisionsService } from './revisions.service';

@ApiTags('plans')
@Controller()
export class PlansController {
  constructor(
    private readonly plans: PlansService,
    private readonly revisions: RevisionsService,
  ) {}

  @Public()
  @Get('plans')
  @ApiOkResponse({ type: PlanCardPageDto, description: 'The library: published plans matching the search and filters' })
  async library(@Query() query: PlanListQueryDto): Promise<PlanCardPageDto> {
    const [plans, total] = await this.plans.library(query);
    return { items: plans.map(toPlanCardDto), ...pageMeta(query, total) };
  }

  @Post('plans')
  @ApiCreatedResponse({ type: PlanDetailDto, description: 'The new plan, with its r1 as a draft' })
  @ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'You are suspended' })
  async create(@CurrentSession() session: Session, @Body() details: CreatePlanDto): Promise<PlanDetailDto> {
    const actor = session;
    const plan = await this.plans.create(actor, details);
    return toPlanDetailDto(plan, await this.plans.revisionsFor(actor, plan), true);
  }

  @Get('me/plans')
  @ApiOkResponse({ type: MyPlanPageDto, description: 'My workshop: your plans with every revision' })
  @ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
  async mine(@CurrentSession() session: Session, @Query() query: PageQueryDto): Promise<MyPlanPageDto> {
    const [plans, total] = await this.plans.ownedBy(session, query);
    return {
      items: plans.map(({ plan, revisions }) => toPlanDetailDto(plan, revisions, true)),
      ...pageMeta(query, total),
    };
  }

  @Public()
  @UseGuards(OptionalSessionGuard)
  @Get('plans/:slug')
  @ApiOkResponse({ type: PlanDetailDto, description: 'The plan and its revision history' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan, or nothing of it is published yet' })
  async detail(@Req() request: Request, @Param('slug') slug: string): Promise<PlanDetailDto> {
    const viewer = viewerOf(request);
    const plan = await this.plans.getVisible(viewer, slug);
    return toPlanDetailDto(plan, await this.plans.revisionsFor(viewer, plan), viewer?.memberId === plan.ownerId);
  }

  @Patch('plans/:slug')
  @ApiOkResponse({ type: PlanDetailDto, description: 'The plan as saved' })
  @ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: "Another member's plan, or you are suspended" })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan' })
  async update(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Body() changes: UpdatePlanDto,
  ): Promise<PlanDetailDto> {
    const actor = session;
    const plan = await this.plans.update(actor, slug, changes);
    return toPlanDetailDto(plan, await this.plans.revisionsFor(actor, plan), true);
  }

  @Post('plans/:slug/revisions')
  @HttpCode(201)
  @ApiCreatedResponse({
    type: RevisionDetailDto,
    description:
      'The next revision, a draft copied from the latest published one (or, with none, the newest declined or hidden one)',
  })
  @ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: "Another member's plan, or you are suspended" })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'A revision is still in progress, or none is published yet' })
  async startRevision(@CurrentSession() session: Session, @Param('slug') slug: string): Promise<RevisionDetailDto> {
    const { plan, revision } = await this.revisions.startNew(session, slug);
    return this.revisions.detailOf(plan, revision);
  }
}
