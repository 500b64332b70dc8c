import type { GrainRule, StockKind } from '@jigwright/core';
import type { Attachment, Drawing, HardwareRow, Part, RevisionDetail, RevisionState } from '../../../lib/api-types';

export type { AnalysisStatus, HardwareRow, RevisionState } from '../../../lib/api-types';

/**
 * What the designer's screens read and send, mirrored from the server's DTOs
 * (`packages/server/src/plans/dto/plan.dto.ts`, `revision.dto.ts`); only the fields these screens use.
 */

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

/** The editor's view of the shared revision shapes: only the fields its screens use. */
export type EditorDrawing = Omit<Drawing, 'sha256' | 'createdAt'>;
export type EditorPart = Omit<Part, 'outline'>;
export type EditorAttachment = Attachment;
export type EditorRevision = Omit<RevisionDetail, 'indexing' | 'drawings' | 'parts'> & {
  drawings: EditorDrawing[];
  parts: EditorPart[];
};
