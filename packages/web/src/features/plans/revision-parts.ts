import type { CutListPart, DrawingAnalysis } from '@jigwright/core';
import type { Part, RevisionDetail } from './api/types';

/** A drawn part's settings: the owner's row, found by name or, once renamed, by its outline. */
function ownersRow(parts: readonly Part[], drawn: DrawingAnalysis['parts'][number]): Part | undefined {
  const [x, y] = drawn.outline.points[0] ?? [Number.NaN, Number.NaN];
  return (
    parts.find((part) => part.name === drawn.name) ??
    parts.find((part) => part.outline.points[0]?.[0] === x && part.outline.points[0]?.[1] === y)
  );
}

export interface RevisionDrawing {
  id: number;
  fileName: string;
  /** The analysis with the parts under the owner's names and counts. */
  analysis: DrawingAnalysis;
}

/** The analysed drawings of a revision, their parts named and counted as the owner set them. */
export function revisionDrawings(revision: Pick<RevisionDetail, 'drawings' | 'parts'>): RevisionDrawing[] {
  return revision.drawings.flatMap((drawing) => {
    if (!drawing.analysis) return [];
    const own = revision.parts.filter((part) => part.drawingId === drawing.id);
    const parts = drawing.analysis.parts.map((drawn) => {
      const row = ownersRow(own, drawn);
      return row ? { ...drawn, name: row.name, quantity: row.quantityOverride ?? row.quantity } : drawn;
    });
    return [{ id: drawing.id, fileName: drawing.originalName, analysis: { ...drawing.analysis, parts } }];
  });
}

/** The revision's parts as the cut list takes them. */
export function revisionCutListParts(revision: Pick<RevisionDetail, 'parts'>): CutListPart[] {
  return revision.parts.map((part) => ({
    name: part.name,
    quantity: part.quantityOverride ?? part.quantity,
    length: part.length,
    width: part.width,
    thickness: part.thickness,
    material: part.material,
    stock: part.stock,
    grain: part.grain,
  }));
}
