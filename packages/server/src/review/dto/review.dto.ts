import { ApiProperty, ApiPropertyOptional, PickType } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, Length, MaxLength } from 'class-validator';
import { PageMetaDto } from '../../common/pagination.dto';
import type { Member } from '../../members/entities/member.entity';
import { MemberRefDto, toMemberRefDto } from '../../members/dto/member.dto';
import { PlanCardDto, RevisionSummaryDto, toPlanCardDto } from '../../plans/dto/plan.dto';
import type { Plan } from '../../plans/entities/plan.entity';
import type { Revision } from '../../plans/entities/revision.entity';
import { REVISION_STATES, type RevisionState } from '../../plans/vocabulary';
import { REVIEW_DECISIONS, type ReviewDecision, type ReviewDecisionKind } from '../entities/review-decision.entity';
import { REVIEW_CHECKS, type CheckResult, type ReviewCheck } from '../review-checklist';

const trimmed = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
const MAX_NOTES = 5000;

/** Publish and unhide: a note to the designer is welcome but not needed. */
export class OptionalNotesDto {
  @ApiPropertyOptional({ maxLength: MAX_NOTES, description: 'A note to the designer, e-mailed with the decision' })
  @IsOptional()
  @Transform(trimmed)
  @IsString()
  @MaxLength(MAX_NOTES)
  notes?: string;
}

/** Send back and decline: the designer must be told why. */
export class RequiredNotesDto {
  @ApiProperty({
    minLength: 1,
    maxLength: MAX_NOTES,
    description: 'What the designer should change (send back) or why it cannot be published (decline)',
  })
  @Transform(trimmed)
  @IsString({ message: 'Write notes for the designer.' })
  @Length(1, MAX_NOTES, { message: `Write notes for the designer (at most ${MAX_NOTES} characters).` })
  notes: string;
}

/** Hide: the reason, shown to the designer. */
export class HideDto {
  @ApiProperty({
    minLength: 1,
    maxLength: MAX_NOTES,
    description: 'Why the revision is hidden; e-mailed to the designer',
  })
  @Transform(trimmed)
  @IsString({ message: 'Give the reason for hiding this revision.' })
  @Length(1, MAX_NOTES, { message: `Give the reason for hiding this revision (at most ${MAX_NOTES} characters).` })
  reason: string;
}

export class ReviewCheckDto {
  @ApiProperty({ enum: REVIEW_CHECKS })
  check: ReviewCheck;

  @ApiProperty({ example: 'Cut list sane' })
  label: string;

  @ApiProperty()
  ok: boolean;

  @ApiProperty({ example: '9 pieces in 3 materials', description: 'What was found, passed or not' })
  summary: string;

  @ApiProperty({ type: [String], description: 'Each problem found; empty when the check passed' })
  problems: string[];
}

/** The plan a submission belongs to, as the desk shows it. */
export class ReviewPlanDto extends PickType(PlanCardDto, [
  'slug',
  'title',
  'designer',
  'category',
  'motorised',
  'tools',
  'licence',
] as const) {}

/** A revision handed in for review, with its checklist. */
export class SubmissionDto {
  @ApiProperty({ type: ReviewPlanDto })
  plan: ReviewPlanDto;

  @ApiProperty({ example: 2, description: 'Shown as r2' })
  number: number;

  @ApiProperty({
    enum: REVISION_STATES,
    description: 'submitted while it waits; the desk can show it after a decision',
  })
  state: RevisionState;

  @ApiProperty({
    type: String,
    format: 'date-time',
    description: 'When it was submitted (a submitted revision is read-only, so its last change)',
  })
  submittedAt: string;

  @ApiProperty()
  changelog: string;

  @ApiProperty({ description: 'The plan is the signed-in moderator’s own: another moderator decides on it' })
  ownPlan: boolean;

  @ApiProperty({ type: [ReviewCheckDto] })
  checklist: ReviewCheckDto[];
}

export class SubmissionPageDto extends PageMetaDto {
  @ApiProperty({ type: [SubmissionDto], description: 'Submitted revisions, oldest first' })
  items: SubmissionDto[];
}

export class ReviewDecisionDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ enum: REVIEW_DECISIONS })
  decision: ReviewDecisionKind;

  @ApiProperty({ description: 'Notes to the designer, or the reason for a hide; may be empty' })
  notes: string;

  @ApiProperty({ type: MemberRefDto, nullable: true, description: 'Null if the moderator’s account is gone' })
  moderator: MemberRefDto | null;

  @ApiProperty({ type: String, format: 'date-time' })
  at: string;
}

export const MAIL_OUTCOMES = ['sent', 'failed', 'not-wanted'] as const;
export type MailOutcome = (typeof MAIL_OUTCOMES)[number];

export class ReviewDecisionResultDto {
  @ApiProperty({ type: ReviewDecisionDto })
  decision: ReviewDecisionDto;

  @ApiProperty({ type: RevisionSummaryDto, description: 'The revision in its new state' })
  revision: RevisionSummaryDto;

  @ApiProperty({
    enum: MAIL_OUTCOMES,
    description: 'The designer’s e-mail: sent, failed (the decision stands), or not wanted (their settings)',
  })
  mail: MailOutcome;
}

export function toReviewDecisionDto(row: ReviewDecision, moderator: Member | null): ReviewDecisionDto {
  return {
    id: row.id,
    decision: row.decision,
    notes: row.notes,
    moderator: moderator ? toMemberRefDto(moderator) : null,
    at: row.createdAt.toISOString(),
  };
}

/** The plan needs its owner and tools loaded. */
export function toSubmissionDto(
  plan: Plan,
  revision: Revision,
  checklist: CheckResult[],
  viewerId: number,
): SubmissionDto {
  const { slug, title, designer, category, motorised, tools, licence } = toPlanCardDto(plan);
  return {
    plan: { slug, title, designer, category, motorised, tools, licence },
    number: revision.number,
    state: revision.state,
    submittedAt: revision.updatedAt.toISOString(),
    changelog: revision.changelog,
    ownPlan: plan.ownerId === viewerId,
    checklist,
  };
}
