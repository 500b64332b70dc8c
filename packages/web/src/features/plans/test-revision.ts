import type { PlanDetail, RevisionDetail } from './api/types';
import { analyseDemoDrawing, demoPartSettings } from './test-drawings';

/** A demo revision as `GET /api/plans/:slug/revisions/:number` sends it; for tests. */
export function demoRevision(slug: string, number: number, drawing: string): RevisionDetail {
  const analysis = analyseDemoDrawing(`${slug}/r${number}/${drawing}`);
  const settings = demoPartSettings(slug, number);
  return {
    planSlug: slug,
    number,
    state: 'published',
    editable: false,
    changelog: number === 1 ? 'First published version.' : 'Wider fence.',
    notes: '## Building it\n\nGlue the **fence** first.\n\n<script>alert(1)</script>',
    safetyNotes: 'Keep the blade guard on.',
    hardware: [{ item: 'Wood screw', specification: '4 × 30 mm countersunk', quantity: 6, note: 'Fence to base.' }],
    indexing: null,
    publishedAt: `2025-0${number + 2}-01T00:00:00.000Z`,
    updatedAt: `2025-0${number + 2}-01T00:00:00.000Z`,
    drawings: [
      {
        id: number * 10,
        originalName: drawing,
        size: 1000,
        sha256: 'f'.repeat(64),
        units: 'mm',
        needsUnits: false,
        status: 'done',
        error: null,
        entityCount: 10,
        analysis,
        createdAt: '2025-01-01T00:00:00.000Z',
      },
    ],
    parts: analysis.parts.map((part, i) => {
      const own = settings.find((s) => s.name === part.name);
      return {
        id: number * 100 + i,
        drawingId: number * 10,
        name: part.name,
        quantity: part.quantity,
        quantityOverride: null,
        length: part.length,
        width: part.width,
        thickness: own?.thickness ?? 18,
        material: own?.material ?? 'Baltic birch plywood',
        stock: own?.stock ?? 'sheet',
        grain: own?.grain ?? 'length',
        outline: { points: part.outline.points, holes: part.holeOutlines.map((h) => h.points) },
        updatedAt: '2025-01-01T00:00:00.000Z',
      };
    }),
    attachments: [
      {
        id: 7,
        name: 'step-table.h',
        mediaType: 'text/x-c',
        size: 2048,
        description: 'Step table for the controller',
        downloadUrl: `/api/plans/${slug}/revisions/${number}/attachments/7`,
      },
    ],
  };
}

/** A demo plan as `GET /api/plans/:slug` sends it; for tests. */
export function demoPlan(slug: string, revisions: number[], overrides: Partial<PlanDetail> = {}): PlanDetail {
  return {
    slug,
    title: 'Five-cut crosscut sled',
    summary: 'A sled you square with the five-cut method.',
    category: 'sled',
    designer: { id: 2, login: 'demo-designer', displayName: 'Dana Designer', avatarUrl: null },
    licence: 'CC-BY-4.0',
    motorised: false,
    tags: ['sled'],
    tools: ['table-saw'],
    latestRevision: { number: Math.max(...revisions), publishedAt: '2025-04-01T00:00:00.000Z' },
    rating: { average: 0, count: 0 },
    buildCount: 0,
    thumbnail: null,
    viewerIsOwner: false,
    revisions: revisions.map((number) => ({
      number,
      state: 'published',
      changelog: number === 1 ? 'First published version.' : 'Wider fence.',
      publishedAt: `2025-0${number + 2}-01T00:00:00.000Z`,
      updatedAt: `2025-0${number + 2}-01T00:00:00.000Z`,
    })),
    createdAt: '2025-03-01T00:00:00.000Z',
    updatedAt: '2025-04-01T00:00:00.000Z',
    ...overrides,
  };
}
