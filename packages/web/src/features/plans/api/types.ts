import type { PointMm } from '@jigwright/core';
import type { RevisionState } from '../../../lib/api-types';

export type {
  AnalysisStatus,
  Attachment,
  Drawing,
  HardwareRow,
  Part,
  RevisionDetail,
  RevisionState,
} from '../../../lib/api-types';

/**
 * The plans API's response shapes, mirrored from the server's DTOs
 * (`packages/server/src/plans/dto/plan.dto.ts`, `revision.dto.ts`): the web app never imports server code.
 */

export type PlanCategory =
  | 'sled'
  | 'fence'
  | 'taper-jig'
  | 'circle-jig'
  | 'drilling-guide'
  | 'router-jig'
  | 'indexing-jig'
  | 'clamping'
  | 'sharpening'
  | 'other';

export type Tool =
  | 'table-saw'
  | 'router-table'
  | 'band-saw'
  | 'drill-press'
  | 'hand-drill'
  | 'router'
  | 'jigsaw'
  | 'random-orbit-sander'
  | '3d-printer'
  | 'soldering-iron'
  | 'hand-plane'
  | 'hand-saw';

export type Licence = 'CC-BY-4.0' | 'CC-BY-SA-4.0' | 'CC0-1.0' | 'CERN-OHL-P-2.0' | 'CERN-OHL-W-2.0' | 'CERN-OHL-S-2.0';

export type LibrarySort = 'newest' | 'rated' | 'built';

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export interface MemberRef {
  id: number;
  login: string;
  displayName: string;
  avatarUrl: string | null;
}

/** Part outlines as closed polygons in mm, y up, within `extents`. */
export interface PlanThumbnail {
  extents: { min: PointMm; max: PointMm };
  outlines: PointMm[][];
}

export interface PlanCard {
  slug: string;
  title: string;
  summary: string;
  category: PlanCategory;
  designer: MemberRef;
  licence: Licence;
  motorised: boolean;
  tags: string[];
  tools: Tool[];
  latestRevision: { number: number; publishedAt: string } | null;
  rating: { average: number; count: number };
  buildCount: number;
  thumbnail: PlanThumbnail | null;
}

export interface RevisionSummary {
  number: number;
  state: RevisionState;
  changelog: string;
  publishedAt: string | null;
  updatedAt: string;
}

export interface PlanDetail extends PlanCard {
  viewerIsOwner: boolean;
  /** Oldest first. */
  revisions: RevisionSummary[];
  createdAt: string;
  updatedAt: string;
}
