import type { DrawingAnalysis, GrainRule, StockKind } from '@jigwright/core';

/**
 * What the designer's screens read and send, mirrored from the server's DTOs
 * (`packages/server/src/plans/dto/plan.dto.ts`, `revision.dto.ts`); only the fields these screens use.
 */

export type RevisionState = 'draft' | 'submitted' | 'published' | 'sent-back' | 'declined' | 'hidden';

/** A plan's details as the create form and the editor's details section send them. */
export interface PlanDetailsInput {
  title: string;
  summary: string;
  category: string;
  tags: string[];
  toolsNeeded: string[];
  licence: string;
  motorised: boolean;
}

export interface OwnRevisionSummary {
  number: number;
  state: RevisionState;
  changelog: string;
  publishedAt: string | null;
  updatedAt: string;
}

export interface OwnPlan {
  slug: string;
  title: string;
  summary: string;
  category: string;
  licence: string;
  motorised: boolean;
  tags: string[];
  tools: string[];
  viewerIsOwner: boolean;
  latestRevision: { number: number; publishedAt: string } | null;
  /** Oldest first. */
  revisions: OwnRevisionSummary[];
  updatedAt: string;
}

export interface HardwareRow {
  item: string;
  specification: string;
  quantity: number;
  note: string;
}

export type AnalysisStatus = 'queued' | 'analysing' | 'done' | 'failed';

export interface EditorDrawing {
  id: number;
  originalName: string;
  size: number;
  units: string | null;
  needsUnits: boolean;
  status: AnalysisStatus;
  error: string | null;
  entityCount: number | null;
  analysis: DrawingAnalysis | null;
}

export interface EditorPart {
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
  /** Send back as `expectedUpdatedAt` when saving the part. */
  updatedAt: string;
}

export interface EditorAttachment {
  id: number;
  name: string;
  mediaType: string;
  size: number;
  description: string;
  downloadUrl: string;
}

export interface EditorRevision {
  planSlug: string;
  number: number;
  state: RevisionState;
  editable: boolean;
  changelog: string;
  notes: string;
  safetyNotes: string;
  hardware: HardwareRow[];
  publishedAt: string | null;
  /** Send back as `expectedUpdatedAt` when saving the revision. */
  updatedAt: string;
  drawings: EditorDrawing[];
  parts: EditorPart[];
  attachments: EditorAttachment[];
}

/** The revision's own text, as the editor saves it. */
export interface RevisionText {
  changelog: string;
  notes: string;
  safetyNotes: string;
  hardware: HardwareRow[];
}

export interface PartChanges {
  name: string;
  material: string;
  thickness: number;
  stock: StockKind;
  grain: GrainRule;
  quantityOverride: number | null;
}
