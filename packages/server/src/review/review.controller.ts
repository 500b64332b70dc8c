import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { CurrentSession } from '../auth/current-session.decorator';
import { Roles } from '../auth/roles.decorator';
import type { Session } from '../auth/session';
import { ApiErrorDto } from '../common/api-error.dto';
import { pageMeta, PageQueryDto } from '../common/pagination.dto';
import { toRevisionSummaryDto } from '../plans/dto/plan.dto';
import {
  HideDto,
  OptionalNotesDto,
  RequiredNotesDto,
  ReviewDecisionDto,
  ReviewDecisionResultDto,
  SubmissionDto,
  SubmissionPageDto,
  toReviewDecisionDto,
  toSubmissionDto,
} from './dto/review.dto';
import type { ReviewDecisionKind } from './entities/review-decision.entity';
import { ReviewService } from './review.service';

const REVISION = 'plans/:slug/revisions/:number';

@ApiTags('review')
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
@Controller()
export class ReviewController {
  constructor(private readonly review: ReviewService) {}

  @Get('review/revisions')
  @Roles('moderator', 'admin')
  @ApiOkResponse({ type: SubmissionPageDto, description: 'The review desk’s queue: submitted revisions, oldest first' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Only for moderators and admins' })
  async queue(@CurrentSession() session: Session, @Query() query: PageQueryDto): Promise<SubmissionPageDto> {
    const [submissions, total] = await this.review.queue(query);
    return {
      items: submissions.map(({ plan, revision, checklist }) =>
        toSubmissionDto(plan, revision, checklist, session.memberId),
      ),
      ...pageMeta(query, total),
    };
  }

  @Get('review/revisions/:slug/:number')
  @Roles('moderator', 'admin')
  @ApiOkResponse({ type: SubmissionDto, description: 'One revision handed in for review, with its checklist' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Only for moderators and admins' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan or revision, or it is a draft' })
  async submission(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
  ): Promise<SubmissionDto> {
    const { plan, revision, checklist } = await this.review.submission(slug, number);
    return toSubmissionDto(plan, revision, checklist, session.memberId);
  }

  @Post(`${REVISION}/publish`)
  @HttpCode(200)
  @Roles('moderator', 'admin')
  @ApiOkResponse({ type: ReviewDecisionResultDto, description: 'Published: in the library as the latest revision' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Not a moderator, suspended, or `own_plan_review`' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan or revision' })
  @ApiConflictResponse({ type: ApiErrorDto, description: '`revision_not_submitted`' })
  publish(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Body() body: OptionalNotesDto,
  ): Promise<ReviewDecisionResultDto> {
    return this.decide(session, slug, number, 'publish', body.notes ?? '');
  }

  @Post(`${REVISION}/send-back`)
  @HttpCode(200)
  @Roles('moderator', 'admin')
  @ApiOkResponse({ type: ReviewDecisionResultDto, description: 'Sent back: the designer can edit it again' })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'No notes' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Not a moderator, suspended, or `own_plan_review`' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan or revision' })
  @ApiConflictResponse({ type: ApiErrorDto, description: '`revision_not_submitted`' })
  sendBack(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Body() body: RequiredNotesDto,
  ): Promise<ReviewDecisionResultDto> {
    return this.decide(session, slug, number, 'send-back', body.notes);
  }

  @Post(`${REVISION}/decline`)
  @HttpCode(200)
  @Roles('moderator', 'admin')
  @ApiOkResponse({ type: ReviewDecisionResultDto, description: 'Declined: it will not be published' })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'No notes' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Not a moderator, suspended, or `own_plan_review`' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan or revision' })
  @ApiConflictResponse({ type: ApiErrorDto, description: '`revision_not_submitted`' })
  decline(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Body() body: RequiredNotesDto,
  ): Promise<ReviewDecisionResultDto> {
    return this.decide(session, slug, number, 'decline', body.notes);
  }

  @Post(`${REVISION}/hide`)
  @HttpCode(200)
  @Roles('moderator', 'admin')
  @ApiOkResponse({
    type: ReviewDecisionResultDto,
    description:
      'Hidden from everyone but its designer and the moderators; the library shows the plan’s latest other published revision, or leaves the plan out',
  })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'No reason' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Not a moderator, suspended, or `own_plan_review`' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan or revision' })
  @ApiConflictResponse({ type: ApiErrorDto, description: '`revision_not_published`' })
  hide(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Body() body: HideDto,
  ): Promise<ReviewDecisionResultDto> {
    return this.decide(session, slug, number, 'hide', body.reason);
  }

  @Post(`${REVISION}/unhide`)
  @HttpCode(200)
  @Roles('moderator', 'admin')
  @ApiOkResponse({ type: ReviewDecisionResultDto, description: 'Published again, with its first publication date' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Not a moderator, suspended, or `own_plan_review`' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan or revision' })
  @ApiConflictResponse({ type: ApiErrorDto, description: '`revision_not_hidden`' })
  unhide(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Body() body: OptionalNotesDto,
  ): Promise<ReviewDecisionResultDto> {
    return this.decide(session, slug, number, 'unhide', body.notes ?? '');
  }

  @Get(`${REVISION}/decisions`)
  @ApiOkResponse({ type: [ReviewDecisionDto], description: 'The review decisions on this revision, newest first' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Neither the designer nor a moderator or admin' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan or revision' })
  async decisions(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
  ): Promise<ReviewDecisionDto[]> {
    const rows = await this.review.history(session, slug, number);
    return rows.map((row) => toReviewDecisionDto(row, row.moderator));
  }

  private async decide(
    session: Session,
    slug: string,
    number: number,
    kind: ReviewDecisionKind,
    notes: string,
  ): Promise<ReviewDecisionResultDto> {
    const outcome = await this.review.decide(session, slug, number, kind, notes);
    return {
      decision: toReviewDecisionDto(outcome.decision, outcome.moderator),
      revision: toRevisionSummaryDto(outcome.revision),
      mail: outcome.mail,
    };
  }
}
