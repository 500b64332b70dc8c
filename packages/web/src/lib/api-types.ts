import type { DrawingAnalysis, GrainRule, JointInput, PointMm, StockKind } from '@jigwright/core';

/**
 * The revision shapes of the plans API that several features read (the plan page, the designer's
 * editor, the review desk), mirrored from the server's DTOs (`packages/server/src/plans/dto/revision.dto.ts`):
 * the web app never imports server code.
 */

export type RevisionState = 'draft' | 'submitted' | 'published' | 'sent-back' | 'declined' | 'hidden';

export type AnalysisStatus = 'queued' | 'analysing' | 'done' | 'failed';

export interface HardwareRow {
  item: string;
  specification: string;
  quantity: number;
  note: string;
}

export interface Drawing {
  id: number;
  originalName: string;
  size: number;
  sha256: string;
  units: string | null;
  needsUnits: boolean;
  status: AnalysisStatus;
  error: string | null;
  entityCount: number | null;
  analysis: DrawingAnalysis | null;
  createdAt: string;
}

export interface Part {
  id: number;
  drawingId: number;
  name: string;
  quantity: number;
  quantityOverride: number | null;
  length: number;
  width: number;
  thickness: number;
  material: string;
  stock: StockKind;
  grain: GrainRule;
  outline: { points: PointMm[]; holes: PointMm[][] };
  /** Send back as `expectedUpdatedAt` when the owner saves the part. */
  updatedAt: string;
}

export interface Attachment {
  id: number;
  name: string;
  mediaType: string;
  size: number;
  description: string;
  downloadUrl: string;
}

export interface RevisionDetail {
  planSlug: string;
  number: number;
  state: RevisionState;
  editable: boolean;
  changelog: string;
  notes: string;
  safetyNotes: string;
  hardware: HardwareRow[];
  indexing: { name: string; inputs: JointInput } | null;
  publishedAt: string | null;
  updatedAt: string;
  drawings: Drawing[];
  parts: Part[];
  attachments: Attachment[];
}
