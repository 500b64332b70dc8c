import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayUnique,
  IsArray,
  IsBoolean,
  IsIn,
  IsISO8601,
  IsNumber,
  IsOptional,
  IsString,
  Length,
  Max,
  MaxLength,
  Min,
} from 'class-validator';
import { PageMetaDto, PageQueryDto } from '../../common/pagination.dto';
import { MemberRefDto, toMemberRefDto } from '../../members/dto/member.dto';
import type { Plan } from '../entities/plan.entity';
import type { Revision } from '../entities/revision.entity';
import {
  LICENCES,
  PLAN_CATEGORIES,
  REVISION_STATES,
  TOOLS,
  type Licence,
  type PlanCategory,
  type RevisionState,
  type Tool,
} from '../vocabulary';

const trimmed = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
const lowerTags = ({ value }: { value: unknown }) =>
  Array.isArray(value) ? value.map((tag) => (typeof tag === 'string' ? tag.trim().toLowerCase() : tag)) : value;
/** `?tools=a,b` and `?tools=a&tools=b` alike. */
const listParam = ({ value }: { value: unknown }) =>
  (Array.isArray(value) ? value : [value]).flatMap((item) => (typeof item === 'string' ? item.split(',') : [item]));
/** Query strings are text: "true" and "false" as written, not JavaScript's truthiness. */
const booleanParam = ({ value }: { value: unknown }) => (value === 'true' ? true : value === 'false' ? false : value);

/** The form that starts a plan; its r1 is created as a draft. */
export class CreatePlanDto {
  @ApiProperty({ minLength: 3, maxLength: 120, example: 'Crosscut sled squared by the five-cut check' })
  @Transform(trimmed)
  @IsString()
  @Length(3, 120, { message: 'The title needs 3 to 120 characters.' })
  title: string;

  @ApiProperty({ minLength: 10, maxLength: 500 })
  @Transform(trimmed)
  @IsString()
  @Length(10, 500, { message: 'The summary needs 10 to 500 characters.' })
  summary: string;

  @ApiProperty({ enum: PLAN_CATEGORIES })
  @IsIn(PLAN_CATEGORIES, { message: 'Choose a category from the list.' })
  category: PlanCategory;

  @ApiProperty({
    type: [String],
    maxItems: 12,
    example: ['crosscut', 'runners'],
    description: 'Lower case, 1–30 characters each',
  })
  @Transform(lowerTags)
  @IsArray()
  @ArrayMaxSize(12, { message: 'At most 12 tags.' })
  @ArrayUnique({ message: 'Each tag once.' })
  @IsString({ each: true })
  @Length(1, 30, { each: true, message: 'Each tag needs 1 to 30 characters.' })
  tags: string[];

  @ApiProperty({ enum: TOOLS, isArray: true })
  @IsArray()
  @ArrayUnique({ message: 'Each tool once.' })
  @IsIn(TOOLS, { each: true, message: 'Choose the tools from the list.' })
  toolsNeeded: Tool[];

  @ApiProperty({ enum: LICENCES, description: 'SPDX id of an open licence' })
  @IsIn(LICENCES, { message: 'Choose one of the open licences.' })
  licence: Licence;

  @ApiProperty({ description: 'The jig has a motor (the plan page then always shows the mains cautions)' })
  @IsBoolean()
  motorised: boolean;
}

/** Changes to a plan's details; the slug never changes, so that links keep working. */
/**
 * Changes to a plan's details. `expectedUpdatedAt` is the plan's `updatedAt` as the editor loaded it:
 * when the plan has been saved since (another tab), the save is refused with 409 `plan_changed`.
 */
export class UpdatePlanDto extends PartialType(CreatePlanDto) {
  @ApiProperty({ type: String, format: 'date-time', description: 'The plan’s updatedAt as you loaded it' })
  @IsISO8601({ strict: true })
  expectedUpdatedAt: string;
}

export const LIBRARY_SORTS = ['newest', 'rated', 'built'] as const;
export type LibrarySort = (typeof LIBRARY_SORTS)[number];

/** `GET /api/plans`: search, filters, sort and page of the library. */
export class PlanListQueryDto extends PageQueryDto {
  @ApiPropertyOptional({
    description: 'Words searched in titles, summaries, tags and build notes (all must match; prefixes match)',
  })
  @IsOptional()
  @Transform(trimmed)
  @IsString()
  @MaxLength(200)
  q?: string;

  @ApiPropertyOptional({ enum: PLAN_CATEGORIES })
  @IsOptional()
  @IsIn(PLAN_CATEGORIES)
  category?: PlanCategory;

  @ApiPropertyOptional({
    enum: TOOLS,
    isArray: true,
    description: 'Plans needing any of these tools; comma-separated or repeated',
  })
  @IsOptional()
  @Transform(listParam)
  @IsIn(TOOLS, { each: true })
  tools?: Tool[];

  @ApiPropertyOptional({ type: Boolean })
  @IsOptional()
  @Transform(booleanParam)
  @IsBoolean()
  motorised?: boolean;

  @ApiPropertyOptional({ enum: LICENCES })
  @IsOptional()
  @IsIn(LICENCES)
  licence?: Licence;

  @ApiPropertyOptional({ minimum: 0, maximum: 5, description: 'Lowest average rating' })
  @IsOptional()
  @Type(() => Number)
  @IsNumber()
  @Min(0)
  @Max(5)
  minRating?: number;

  @ApiPropertyOptional({ type: Boolean, description: 'true: only plans with at least one build report' })
  @IsOptional()
  @Transform(booleanParam)
  @IsBoolean()
  hasBuilds?: boolean;

  @ApiPropertyOptional({ enum: LIBRARY_SORTS, default: 'newest' })
  @IsOptional()
  @IsIn(LIBRARY_SORTS)
  sort: LibrarySort = 'newest';
}

export class PlanThumbnailDto {
  @ApiProperty({
    description: 'Box around the outlines, mm: { min: [x, y], max: [x, y] }',
    example: { min: [0, 0], max: [600, 450] },
  })
  extents: { min: [number, number]; max: [number, number] };

  @ApiProperty({
    description: 'Part outlines as closed polygons of [x, y] points in mm, y up, within `extents`',
    type: 'array',
    items: { type: 'array', items: { type: 'array', items: { type: 'number' }, minItems: 2, maxItems: 2 } },
  })
  outlines: Array<[number, number][]>;
}

export class LatestRevisionDto {
  @ApiProperty({ example: 2 })
  number: number;

  @ApiProperty({ type: String, format: 'date-time' })
  publishedAt: string;
}

export class RatingDto {
  @ApiProperty({ description: '0 when there are no ratings' })
  average: number;

  @ApiProperty()
  count: number;
}

/** A plan as the library shows it. */
export class PlanCardDto {
  @ApiProperty({ example: 'five-cut-crosscut-sled' })
  slug: string;

  @ApiProperty()
  title: string;

  @ApiProperty()
  summary: string;

  @ApiProperty({ enum: PLAN_CATEGORIES })
  category: PlanCategory;

  @ApiProperty({ type: MemberRefDto })
  designer: MemberRefDto;

  @ApiProperty({ enum: LICENCES })
  licence: Licence;

  @ApiProperty()
  motorised: boolean;

  @ApiProperty({ type: [String] })
  tags: string[];

  @ApiProperty({ enum: TOOLS, isArray: true })
  tools: Tool[];

  @ApiProperty({ type: LatestRevisionDto, nullable: true, description: 'null until a revision is published' })
  latestRevision: LatestRevisionDto | null;

  @ApiProperty({ type: RatingDto })
  rating: RatingDto;

  @ApiProperty()
  buildCount: number;

  @ApiProperty({ type: PlanThumbnailDto, nullable: true, description: "The latest published revision's parts" })
  thumbnail: PlanThumbnailDto | null;
}

export class PlanCardPageDto extends PageMetaDto {
  @ApiProperty({ type: [PlanCardDto] })
  items: PlanCardDto[];
}

/** A revision in a plan's history. */
export class RevisionSummaryDto {
  @ApiProperty({ example: 1, description: 'Shown as r1, r2, …' })
  number: number;

  @ApiProperty({ enum: REVISION_STATES })
  state: RevisionState;

  @ApiProperty()
  changelog: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  publishedAt: string | null;

  @ApiProperty({ type: String, format: 'date-time' })
  updatedAt: string;
}

/** The plan page's header and history. */
export class PlanDetailDto extends PlanCardDto {
  @ApiProperty({ description: 'Whether the signed-in member owns this plan (and sees every revision)' })
  viewerIsOwner: boolean;

  @ApiProperty({
    type: [RevisionSummaryDto],
    description: 'Oldest first; only published revisions, except for the owner, who sees all',
  })
  revisions: RevisionSummaryDto[];

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, format: 'date-time' })
  updatedAt: string;
}

export class MyPlanPageDto extends PageMetaDto {
  @ApiProperty({ type: [PlanDetailDto], description: 'Your plans, most recently changed first, with every revision' })
  items: PlanDetailDto[];
}

/** The plan needs its owner and tools loaded. */
export function toPlanCardDto(plan: Plan): PlanCardDto {
  return {
    slug: plan.slug,
    title: plan.title,
    summary: plan.summary,
    category: plan.category,
    designer: toMemberRefDto(plan.owner),
    licence: plan.licence,
    motorised: plan.motorised,
    tags: plan.tags,
    tools: plan.tools.map((row) => row.tool).sort((a, b) => TOOLS.indexOf(a) - TOOLS.indexOf(b)),
    latestRevision:
      plan.latestPublishedNumber !== null && plan.latestPublishedAt !== null
        ? { number: plan.latestPublishedNumber, publishedAt: plan.latestPublishedAt.toISOString() }
        : null,
    rating: { average: plan.ratingAverage, count: plan.ratingCount },
    buildCount: plan.buildCount,
    thumbnail: plan.thumbnail,
  };
}

export function toRevisionSummaryDto(revision: Revision): RevisionSummaryDto {
  return {
    number: revision.number,
    state: revision.state,
    changelog: revision.changelog,
    publishedAt: revision.publishedAt?.toISOString() ?? null,
    updatedAt: revision.updatedAt.toISOString(),
  };
}

export function toPlanDetailDto(plan: Plan, revisions: readonly Revision[], viewerIsOwner: boolean): PlanDetailDto {
  return {
    ...toPlanCardDto(plan),
    viewerIsOwner,
    revisions: revisions.map(toRevisionSummaryDto),
    createdAt: plan.createdAt.toISOString(),
    updatedAt: plan.updatedAt.toISOString(),
  };
}
