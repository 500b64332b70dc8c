import type { DrawingAnalysis, JointInput } from '@jigwright/core';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsInt,
  IsISO8601,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  Length,
  MaxLength,
  Max,
  Min,
  ValidateNested,
} from 'class-validator';
import type { Attachment } from '../entities/attachment.entity';
import type { Drawing } from '../entities/drawing.entity';
import type { Part, PartOutline } from '../entities/part.entity';
import type { HardwareRow, IndexingSet, Revision } from '../entities/revision.entity';
import {
  ANALYSIS_STATUSES,
  GRAIN_RULES,
  REVISION_STATES,
  STOCK_KINDS,
  type AnalysisStatus,
  type GrainRule,
  type RevisionState,
  type StockKind,
} from '../vocabulary';

/** A row of the hardware list. */
export class HardwareRowDto {
  @ApiProperty({ example: 'Wood screw' })
  @IsString()
  @Length(1, 200, { message: 'Each hardware row needs an item of 1 to 200 characters.' })
  item: string;

  @ApiProperty({ example: '4 × 30 mm countersunk' })
  @IsString()
  @MaxLength(300)
  specification: string;

  @ApiProperty({ minimum: 1, example: 6 })
  @IsInt()
  @Min(1)
  @Max(100000)
  quantity: number;

  @ApiProperty({ description: 'May be empty' })
  @IsString()
  @MaxLength(500)
  note: string;
}

/** A saved set of indexing-calculator inputs (indexing jigs); `inputs` has the fields of the core's `JointInput`. */
export class IndexingSetDto {
  @ApiProperty({ example: '12 mm fingers across a 156 mm board, 6 mm bit' })
  @IsString()
  @Length(1, 200)
  name: string;

  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'JointInput: units, width, pin, kerf, lead, …',
  })
  @IsObject()
  inputs: JointInput;
}

/**
 * Saves a draft's text. `expectedUpdatedAt` is the `updatedAt` the editor loaded: when the draft
 * has been saved since (another tab), the save is refused with 409 `revision_changed`.
 */
export class UpdateRevisionDto {
  @ApiProperty({ type: String, format: 'date-time', description: 'The revision’s updatedAt as you loaded it' })
  @IsISO8601({ strict: true })
  expectedUpdatedAt: string;

  @ApiPropertyOptional({ description: 'What changed since the revision before, and why (needed from r2 on)' })
  @IsOptional()
  @IsString()
  @MaxLength(5000)
  changelog?: string;

  @ApiPropertyOptional({ description: 'Build notes, Markdown' })
  @IsOptional()
  @IsString()
  @MaxLength(200000)
  notes?: string;

  @ApiPropertyOptional({ description: 'Safety notes, Markdown' })
  @IsOptional()
  @IsString()
  @MaxLength(20000)
  safetyNotes?: string;

  @ApiPropertyOptional({ type: [HardwareRowDto] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => HardwareRowDto)
  hardware?: HardwareRowDto[];

  @ApiPropertyOptional({ type: IndexingSetDto, nullable: true, description: 'null removes the saved set' })
  @IsOptional()
  @ValidateNested()
  @Type(() => IndexingSetDto)
  indexing?: IndexingSetDto | null;
}

/**
 * The owner's settings for one part of a draft; anything left out stays. `expectedUpdatedAt` is the
 * part's `updatedAt` as the editor loaded it: when the part was saved since, 409 `part_changed`.
 */
export class UpdatePartDto {
  @ApiProperty({ type: String, format: 'date-time', description: 'The part’s updatedAt as you loaded it' })
  @IsISO8601({ strict: true })
  expectedUpdatedAt: string;

  @ApiPropertyOptional({ maxLength: 120 })
  @IsOptional()
  @IsString()
  @Length(1, 120, { message: 'A part name needs 1 to 120 characters.' })
  name?: string;

  @ApiPropertyOptional({ example: 'Baltic birch plywood' })
  @IsOptional()
  @IsString()
  @Length(1, 120, { message: 'A material needs 1 to 120 characters.' })
  material?: string;

  @ApiPropertyOptional({ description: 'mm', minimum: 0.1, maximum: 500 })
  @IsOptional()
  @IsNumber()
  @Min(0.1)
  @Max(500)
  thickness?: number;

  @ApiPropertyOptional({ enum: STOCK_KINDS })
  @IsOptional()
  @IsIn(STOCK_KINDS)
  stock?: StockKind;

  @ApiPropertyOptional({ enum: GRAIN_RULES })
  @IsOptional()
  @IsIn(GRAIN_RULES)
  grain?: GrainRule;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: 1, description: 'null: the count on the drawing' })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(10000)
  quantityOverride?: number | null;
}

/** Units a drawing can be read in when it declares none. */
export const CHOOSABLE_UNITS = ['mm', 'cm', 'm', 'in', 'ft'] as const;
export type ChoosableUnits = (typeof CHOOSABLE_UNITS)[number];

export class SetDrawingUnitsDto {
  @ApiProperty({ enum: CHOOSABLE_UNITS })
  @IsIn(CHOOSABLE_UNITS)
  units: ChoosableUnits;
}

/** The multipart form of a drawing upload: the file in `file`, and optionally its units. */
export class UploadDrawingDto {
  @ApiProperty({ type: 'string', format: 'binary', description: 'An ASCII DXF file' })
  file: unknown;

  @ApiPropertyOptional({ enum: CHOOSABLE_UNITS, description: 'Only for a drawing that does not declare its units' })
  @IsOptional()
  @IsIn(CHOOSABLE_UNITS)
  units?: ChoosableUnits;
}

/** The multipart form of an attachment upload. */
export class UploadAttachmentDto {
  @ApiProperty({
    type: 'string',
    format: 'binary',
    description: 'A PDF, an image or a text file such as controller code',
  })
  file: unknown;

  @ApiPropertyOptional({ maxLength: 500 })
  @IsOptional()
  @IsString()
  @MaxLength(500)
  description?: string;
}

export class DrawingDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ example: 'sled.dxf' })
  originalName: string;

  @ApiProperty({ description: 'bytes' })
  size: number;

  @ApiProperty()
  sha256: string;

  @ApiProperty({
    type: String,
    nullable: true,
    description: 'Units the drawing is read in: the ones it declares, or the ones the owner chose; null until analysed',
  })
  units: string | null;

  @ApiProperty({ description: 'The drawing declares no units and none were chosen: the owner may set them' })
  needsUnits: boolean;

  @ApiProperty({ enum: ANALYSIS_STATUSES })
  status: AnalysisStatus;

  @ApiProperty({ type: String, nullable: true, description: 'Why the analysis failed' })
  error: string | null;

  @ApiProperty({ type: Number, nullable: true })
  entityCount: number | null;

  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    nullable: true,
    description: "The core's DrawingAnalysis (mm): units, extents, parts with outlines, dimensions, warnings",
  })
  analysis: DrawingAnalysis | null;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt: string;
}

export class PartOutlineDto {
  @ApiProperty({ type: 'array', items: { type: 'array', items: { type: 'number' } }, description: '[x, y] in mm' })
  points: Array<[number, number]>;

  @ApiProperty({
    type: 'array',
    items: { type: 'array', items: { type: 'array', items: { type: 'number' } } },
  })
  holes: Array<Array<[number, number]>>;
}

export class PartDto {
  @ApiProperty()
  id: number;

  @ApiProperty()
  drawingId: number;

  @ApiProperty()
  name: string;

  @ApiProperty({ description: 'Copies counted on the drawing' })
  quantity: number;

  @ApiProperty({ type: Number, nullable: true, description: "The owner's count, when it differs from the drawing's" })
  quantityOverride: number | null;

  @ApiProperty({ description: 'mm' })
  length: number;

  @ApiProperty({ description: 'mm' })
  width: number;

  @ApiProperty({ description: 'mm' })
  thickness: number;

  @ApiProperty()
  material: string;

  @ApiProperty({ enum: STOCK_KINDS })
  stock: StockKind;

  @ApiProperty({ enum: GRAIN_RULES })
  grain: GrainRule;

  @ApiProperty({ type: PartOutlineDto })
  outline: PartOutline;

  @ApiProperty({
    type: String,
    format: 'date-time',
    description: 'Send it back as expectedUpdatedAt when saving the part',
  })
  updatedAt: string;
}

export class AttachmentDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ example: 'finger-indexer.ino' })
  name: string;

  @ApiProperty({ example: 'text/x-c++src' })
  mediaType: string;

  @ApiProperty({ description: 'bytes' })
  size: number;

  @ApiProperty()
  description: string;

  @ApiProperty({ example: '/api/plans/lead-screw-finger-joint-indexer/revisions/2/attachments/3' })
  downloadUrl: string;
}

/** Everything of one revision the plan page and the editor show. */
export class RevisionDetailDto {
  @ApiProperty()
  planSlug: string;

  @ApiProperty()
  number: number;

  @ApiProperty({ enum: REVISION_STATES })
  state: RevisionState;

  @ApiProperty({ description: 'The owner may change it now (draft or sent back)' })
  editable: boolean;

  @ApiProperty()
  changelog: string;

  @ApiProperty({ description: 'Build notes, Markdown' })
  notes: string;

  @ApiProperty({ description: 'Markdown' })
  safetyNotes: string;

  @ApiProperty({ type: [HardwareRowDto] })
  hardware: HardwareRow[];

  @ApiProperty({ type: IndexingSetDto, nullable: true })
  indexing: IndexingSet | null;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  publishedAt: string | null;

  @ApiProperty({ type: String, format: 'date-time', description: 'Send it back as expectedUpdatedAt when saving' })
  updatedAt: string;

  @ApiProperty({ type: [DrawingDto] })
  drawings: DrawingDto[];

  @ApiProperty({ type: [PartDto], description: 'In drawing order' })
  parts: PartDto[];

  @ApiProperty({ type: [AttachmentDto] })
  attachments: AttachmentDto[];
}

export function toDrawingDto(drawing: Drawing): DrawingDto {
  const units =
    drawing.units ?? (drawing.analysis && drawing.analysis.units !== 'unknown' ? drawing.analysis.units : null);
  return {
    id: drawing.id,
    originalName: drawing.originalName,
    size: drawing.size,
    sha256: drawing.sha256,
    units,
    needsUnits: drawing.status === 'done' && units === null,
    status: drawing.status,
    error: drawing.error,
    entityCount: drawing.entityCount,
    analysis: drawing.analysis,
    createdAt: drawing.createdAt.toISOString(),
  };
}

export function toPartDto(part: Part): PartDto {
  return {
    id: part.id,
    drawingId: part.drawingId,
    name: part.name,
    quantity: part.quantity,
    quantityOverride: part.quantityOverride,
    length: part.length,
    width: part.width,
    thickness: part.thickness,
    material: part.material,
    stock: part.stock,
    grain: part.grain,
    outline: part.outline,
    updatedAt: part.updatedAt.toISOString(),
  };
}

export function attachmentPath(planSlug: string, revisionNumber: number, attachmentId: number): string {
  return `/api/plans/${planSlug}/revisions/${revisionNumber}/attachments/${attachmentId}`;
}

export function toAttachmentDto(attachment: Attachment, planSlug: string, revisionNumber: number): AttachmentDto {
  return {
    id: attachment.id,
    name: attachment.name,
    mediaType: attachment.mediaType,
    size: attachment.size,
    description: attachment.description,
    downloadUrl: attachmentPath(planSlug, revisionNumber, attachment.id),
  };
}

export interface RevisionContents {
  drawings: readonly Drawing[];
  parts: readonly Part[];
  attachments: readonly Attachment[];
}

export function toRevisionDetailDto(
  planSlug: string,
  revision: Revision,
  editable: boolean,
  { drawings, parts, attachments }: RevisionContents,
): RevisionDetailDto {
  return {
    planSlug,
    number: revision.number,
    state: revision.state,
    editable,
    changelog: revision.changelog,
    notes: revision.notes,
    safetyNotes: revision.safetyNotes,
    hardware: revision.hardware,
    indexing: revision.indexing,
    publishedAt: revision.publishedAt?.toISOString() ?? null,
    updatedAt: revision.updatedAt.toISOString(),
    drawings: drawings.map(toDrawingDto),
    parts: parts.map(toPartDto),
    attachments: attachments.map((attachment) => toAttachmentDto(attachment, planSlug, revision.number)),
  };
}
