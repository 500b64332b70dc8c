import type { JointInput } from '@jigwright/core';

/**
 * The shape of plans-seed/plans/<slug>/plan.json (plans-seed/README.md), read by the seed and by
 * tools/drawings/check-demo-plans.ts. Plain types only, so that the tools can import them without
 * the server's decorators.
 */
export interface DemoPlanFile {
  slug: string;
  owner: string;
  title: string;
  summary: string;
  category: string;
  tags: string[];
  toolsNeeded: string[];
  licence: string;
  motorised: boolean;
  revisions: DemoRevision[];
}

export interface DemoRevision {
  number: number;
  publishedAt: string;
  changelog: string;
  notes: string;
  safety: string;
  hardware: Array<{ item: string; specification: string; quantity: number; note: string }>;
  drawings: Array<{ file: string; parts: DemoPart[] }>;
  attachments?: Array<{ file: string; name: string; mediaType: string; description: string }>;
  indexing?: { name: string; inputs: JointInput };
}

/** The designer's settings for a part the drawing's analysis finds. */
export interface DemoPart {
  name: string;
  quantity: number;
  material: string;
  thickness: number;
  stock: string;
  grain: string;
}
