import { describe, expect, it } from 'vitest';
import { compareRevisionParts, type ComparedPart } from './revision-diff';
import { analyseDemoDrawing, demoPartSettings } from './test-drawings';

function demoParts(slug: string, revision: number, drawing: string): ComparedPart[] {
  const thickness = Object.fromEntries(demoPartSettings(slug, revision).map((p) => [p.name, p.thickness]));
  return analyseDemoDrawing(`${slug}/r${revision}/${drawing}`).parts.map((part) => ({
    name: part.name,
    quantity: part.quantity,
    length: part.length,
    width: part.width,
    thickness: thickness[part.name] ?? 0,
  }));
}

const part = (name: string, length: number, width = 50, thickness = 18, quantity = 1): ComparedPart => ({
  name,
  quantity,
  length,
  width,
  thickness,
});

describe('comparing two revisions part by part', () => {
  it('finds added, removed, resized and unchanged parts with the differences in mm', () => {
    const changes = compareRevisionParts(
      [part('Base', 600), part('Fence', 500, 80), part('Stop', 60)],
      [part('Base', 600.02), part('Fence', 512, 76, 18, 2), part('Runner', 450, 19, 9)],
    );
    expect(changes.map((c) => [c.kind, c.name])).toEqual([
      ['unchanged', 'Base'],
      ['resized', 'Fence'],
      ['added', 'Runner'],
      ['removed', 'Stop'],
    ]);
    const fence = changes[1]!;
    if (fence.kind !== 'resized') throw new Error('Fence should be resized');
    expect(fence.difference.length).toBeCloseTo(12, 9);
    expect(fence.difference.width).toBeCloseTo(-4, 9);
    expect(fence.difference.thickness).toBe(0);
    expect(fence.quantityDifference).toBe(1);
  });

  it('finds what changed between the demo sled’s r1 and r2', () => {
    const r1 = demoParts('five-cut-crosscut-sled', 1, 'sled.dxf');
    const r2 = demoParts('five-cut-crosscut-sled', 2, 'sled.dxf');
    const changes = compareRevisionParts(r1, r2);
    expect(changes.filter((c) => c.kind !== 'unchanged').length).toBeGreaterThan(0);
    // Every part of either revision appears exactly once.
    const names = new Set([...r1, ...r2].map((p) => p.name));
    expect(changes.map((c) => c.name).sort()).toEqual([...names].sort());
  });

  it('finds nothing between a revision and itself', () => {
    const r1 = demoParts('five-cut-crosscut-sled', 1, 'sled.dxf');
    expect(compareRevisionParts(r1, r1).every((c) => c.kind === 'unchanged')).toBe(true);
  });
});
