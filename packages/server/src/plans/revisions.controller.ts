import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  ParseIntPipe,
  Patch,
  Post,
  Req,
  UseGuards,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
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
import { PartDto, RevisionDetailDto, toPartDto, UpdatePartDto, UpdateRevisionDto } from './dto/revision.dto';
import { OptionalSessionGuard, viewerOf } from './optional-session.guard';
import { RevisionsService } from './revisions.service';

const REVISION = 'plans/:slug/revisions/:number';

@ApiTags('revisions')
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in (changes)' })
@ApiForbiddenResponse({ type: ApiErrorDto, description: "Another member's plan, or you are suspended (changes)" })
@ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such plan or revision, or it is not published' })
@Controller()
export class RevisionsController {
  constructor(private readonly revisions: RevisionsService) {}

  @Public()
  @UseGuards(OptionalSessionGuard)
  @Get(REVISION)
  @ApiOkResponse({
    type: RevisionDetailDto,
    description: 'Notes, safety notes, hardware list, drawings with their analysis, parts, attachments, indexing set',
  })
  async detail(
    @Req() request: Request,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
  ): Promise<RevisionDetailDto> {
    const { plan, revision } = await this.revisions.getReadable(viewerOf(request), slug, number);
    return this.revisions.detailOf(plan, revision);
  }

  @Patch(REVISION)
  @ApiOkResponse({ type: RevisionDetailDto, description: 'The draft as saved, with its new updatedAt' })
  @ApiConflictResponse({
    type: ApiErrorDto,
    description: '`revision_changed`: saved elsewhere since you loaded it; `revision_not_editable`: not a draft',
  })
  async update(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Body() changes: UpdateRevisionDto,
  ): Promise<RevisionDetailDto> {
    const { plan, revision } = await this.revisions.updateDraft(session, slug, number, changes);
    return this.revisions.detailOf(plan, revision);
  }

  @Delete(REVISION)
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The draft and its files are gone' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Not a draft, or the plan’s only revision' })
  async remove(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
  ): Promise<void> {
    await this.revisions.remove(session, slug, number);
  }

  @Post(`${REVISION}/submit`)
  @HttpCode(200)
  @ApiOkResponse({ type: RevisionDetailDto, description: 'Submitted for review; read-only until withdrawn or decided' })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: '`revision_incomplete`: details lists what is missing' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Not a draft' })
  async submit(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
  ): Promise<RevisionDetailDto> {
    const { plan, revision } = await this.revisions.submit(session, slug, number);
    return this.revisions.detailOf(plan, revision);
  }

  @Post(`${REVISION}/withdraw`)
  @HttpCode(200)
  @ApiOkResponse({ type: RevisionDetailDto, description: 'Back to draft' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Not waiting for review' })
  async withdraw(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
  ): Promise<RevisionDetailDto> {
    const { plan, revision } = await this.revisions.withdraw(session, slug, number);
    return this.revisions.detailOf(plan, revision);
  }

  @Patch(`${REVISION}/parts/:partId`)
  @ApiOkResponse({ type: PartDto, description: 'The part as saved, with its new updatedAt' })
  @ApiConflictResponse({
    type: ApiErrorDto,
    description: '`part_changed`: saved elsewhere since you loaded it; `revision_not_editable`: not a draft',
  })
  async updatePart(
    @CurrentSession() session: Session,
    @Param('slug') slug: string,
    @Param('number', ParseIntPipe) number: number,
    @Param('partId', ParseIntPipe) partId: number,
    @Body() changes: UpdatePartDto,
  ): Promise<PartDto> {
    return toPartDto(await this.revisions.updatePart(session, slug, number, partId, changes));
  }
}
