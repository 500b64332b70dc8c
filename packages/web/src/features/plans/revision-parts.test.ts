import { describe, expect, it } from 'vitest';
import { revisionCutListParts, revisionDrawings } from './revision-parts';
import { demoRevision } from './test-revision';

describe('a revision’s parts', () => {
  const revision = demoRevision('five-cut-crosscut-sled', 1, 'sled.dxf');

  it('shows a renamed part under the owner’s name and count on the drawing', () => {
    const [first, ...rest] = revision.parts;
    const renamed = { ...revision, parts: [{ ...first!, name: 'Sled base', quantityOverride: 3 }, ...rest] };
    const [drawing] = revisionDrawings(renamed);
    expect(drawing!.analysis.parts[0]).toMatchObject({ name: 'Sled base', quantity: 3 });
    expect(drawing!.analysis.parts.slice(1).map((p) => p.name)).toEqual(rest.map((p) => p.name));
  });

  it('skips a drawing still being analysed', () => {
    const pending = {
      ...revision,
      drawings: revision.drawings.map((d) => ({ ...d, status: 'analysing' as const, analysis: null })),
    };
    expect(revisionDrawings(pending)).toEqual([]);
  });

  it('counts an overridden quantity in the cut list', () => {
    const [first, ...rest] = revision.parts;
    const parts = revisionCutListParts({ parts: [{ ...first!, quantityOverride: 5 }, ...rest] });
    expect(parts[0]!.quantity).toBe(5);
    expect(parts.slice(1).map((p) => p.quantity)).toEqual(rest.map((p) => p.quantity));
  });
});
