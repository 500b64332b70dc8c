import { describe, expect, it } from 'vitest';
import { analyseDemoDrawing, demoPartSettings } from '../../test-drawings';
import { pieceGeometry, pieceShape } from './part-geometry';
import { benchLayout } from './scene-layout';

const analysis = analyseDemoDrawing('band-saw-circle-jig/r1/circle-jig.dxf');
const thickness = Object.fromEntries(demoPartSettings('band-saw-circle-jig', 1).map((p) => [p.name, p.thickness]));
const layout = benchLayout(analysis.parts, (name) => thickness[name] ?? 18, { gap: 20 });

const boundsOf = (ring: readonly [number, number][]) => ({
  minX: Math.min(...ring.map((p) => p[0])),
  maxX: Math.max(...ring.map((p) => p[0])),
  minY: Math.min(...ring.map((p) => p[1])),
  maxY: Math.max(...ring.map((p) => p[1])),
});

describe('the 3D bench layout', () => {
  it('lays out every copy of every part', () => {
    expect(layout.pieces).toHaveLength(analysis.parts.reduce((sum, part) => sum + part.quantity, 0));
  });

  it('squares each piece up: length along x, centred on its own origin', () => {
    for (const piece of layout.pieces) {
      const b = boundsOf(piece.outline);
      expect(b.maxX - b.minX).toBeCloseTo(piece.length, 3);
      expect(b.maxY - b.minY).toBeCloseTo(piece.width, 3);
      expect((b.maxX + b.minX) / 2).toBeCloseTo(0, 3);
    }
  });

  it('keeps pieces a gap apart', () => {
    const boxes = layout.pieces.map((p) => ({
      x0: p.position[0] - p.length / 2,
      x1: p.position[0] + p.length / 2,
      y0: p.position[1] - p.width / 2,
      y1: p.position[1] + p.width / 2,
    }));
    boxes.forEach((a, i) =>
      boxes.slice(i + 1).forEach((b) => {
        const apart =
          a.x1 + 20 <= b.x0 + 1e-9 || b.x1 + 20 <= a.x0 + 1e-9 || a.y1 + 20 <= b.y0 + 1e-9 || b.y1 + 20 <= a.y0 + 1e-9;
        expect(apart).toBe(true);
      }),
    );
    expect(Math.max(...boxes.map((b) => b.x1))).toBeCloseTo(layout.size[0], 6);
  });

  it('takes each piece’s thickness from the part settings', () => {
    expect(layout.pieces.find((p) => p.name === 'Platform')!.thickness).toBe(12);
    expect(layout.pieces.find((p) => p.name === 'Edge stop')!.thickness).toBe(19);
  });
});

describe('the piece geometry', () => {
  const holed = analyseDemoDrawing('shelf-pin-drilling-guide/r1/shelf-pin-guide.dxf');
  const guide = benchLayout(holed.parts, () => 12).pieces.find((p) => p.name === 'Guide strip')!;

  it('cuts every hole out of the shape', () => {
    expect(guide.holes).toHaveLength(24);
    expect(pieceShape(guide).holes).toHaveLength(24);
  });

  it('extrudes to the thickness over the part’s size', () => {
    const geometry = pieceGeometry(guide);
    geometry.computeBoundingBox();
    const box = geometry.boundingBox!;
    expect(box.max.z - box.min.z).toBeCloseTo(12, 6);
    expect(box.max.x - box.min.x).toBeCloseTo(800, 3);
    expect(box.max.y - box.min.y).toBeCloseTo(60, 3);
  });

  it('gives each hole its own walls', () => {
    const faces = (holes: [number, number][][]) => pieceGeometry({ ...guide, holes }).getAttribute('position').count;
    expect(faces(guide.holes)).toBeGreaterThan(faces([]));
  });
});
