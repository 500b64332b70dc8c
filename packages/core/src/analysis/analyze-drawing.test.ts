import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DrawingError, type DrawingLimitError } from '../dxf/drawing-error';
import { analyzeDrawing } from './analyze-drawing';

// Minimal DXF text written by hand (group code / value pairs), so each test shows its geometry.
function dxf(entities: string[], options: { insunits?: number; blocks?: string[] } = {}): string {
  const header =
    options.insunits === undefined ? '' : `0\nSECTION\n2\nHEADER\n9\n$INSUNITS\n70\n${options.insunits}\n0\nENDSEC\n`;
  const blocks = options.blocks ? `0\nSECTION\n2\nBLOCKS\n${options.blocks.join('')}0\nENDSEC\n` : '';
  return `${header}${blocks}0\nSECTION\n2\nENTITIES\n${entities.join('')}0\nENDSEC\n0\nEOF\n`;
}

function polyline(points: [number, number, number?][], layer = '0'): string {
  const vertices = points.map(([x, y, bulge]) => `10\n${x}\n20\n${y}\n${bulge ? `42\n${bulge}\n` : ''}`).join('');
  return `0\nLWPOLYLINE\n8\n${layer}\n90\n${points.length}\n70\n1\n${vertices}`;
}

function circle(x: number, y: number, r: number): string {
  return `0\nCIRCLE\n8\n0\n10\n${x}\n20\n${y}\n40\n${r}\n`;
}

function line(x1: number, y1: number, x2: number, y2: number): string {
  return `0\nLINE\n8\n0\n10\n${x1}\n20\n${y1}\n11\n${x2}\n21\n${y2}\n`;
}

function text(x: number, y: number, value: string): string {
  return `0\nTEXT\n8\n0\n10\n${x}\n20\n${y}\n40\n5\n1\n${value}\n`;
}

function block(name: string, entities: string[]): string {
  return `0\nBLOCK\n2\n${name}\n70\n0\n10\n0\n20\n0\n${entities.join('')}0\nENDBLK\n`;
}

function insert(name: string, extra = ''): string {
  return `0\nINSERT\n8\n0\n2\n${name}\n10\n0\n20\n0\n${extra}`;
}

function rectangle(w: number, h: number, at: [number, number] = [0, 0], angle = 0): [number, number][] {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  return (
    [
      [0, 0],
      [w, 0],
      [w, h],
      [0, h],
    ] as const
  ).map(([x, y]) => [at[0] + x * c - y * s, at[1] + x * s + y * c]);
}

describe('drawing analysis', () => {
  it('a 600 × 400 rectangle with a 35 mm hole: area 240000 − π·17.5², perimeter 2000', () => {
    const analysis = analyzeDrawing(dxf([polyline(rectangle(600, 400)), circle(300, 200, 17.5)], { insunits: 4 }));
    const [part] = analysis.parts;
    expect(part).toMatchObject({ quantity: 1, holes: 1 });
    expect(part?.length).toBeCloseTo(600, 9);
    expect(part?.width).toBeCloseTo(400, 9);
    expect(part?.area).toBeCloseTo(240000 - Math.PI * 17.5 ** 2, 5);
    expect(part?.perimeter).toBeCloseTo(2000, 9);
    expect(analysis.extents).toEqual({ min: [0, 0], max: [600, 400] });
  });

  // Bulge = tan(θ/4) [DXF VERTEX, read]: a 100 × 40 stadium with bulge-1 ends has area 60·40 + π·20²
  // and perimeter 2·60 + 2π·20 [derived].
  it('bulge arcs give exact area and perimeter', () => {
    const stadium = polyline([
      [20, 0, 0],
      [80, 0, 1],
      [80, 40, 0],
      [20, 40, 1],
    ]);
    const [part] = analyzeDrawing(dxf([stadium], { insunits: 4 })).parts;
    expect(part?.area).toBeCloseTo(2400 + Math.PI * 400, 6);
    expect(part?.perimeter).toBeCloseTo(120 + 40 * Math.PI, 6);
    expect(part?.length).toBeCloseTo(100, 6);
    expect(part?.width).toBeCloseTo(40, 6);
  });

  it('chains loose lines within the tolerance into a part, and counts open paths', () => {
    const lines = [
      line(0, 0, 100, 0),
      line(100.005, 0, 100, 50),
      line(100, 50, 0, 50.004),
      line(0, 50, 0, 0),
      line(200, 0, 300, 0),
    ];
    const analysis = analyzeDrawing(dxf(lines, { insunits: 4 }));
    expect(analysis.parts).toHaveLength(1);
    expect(analysis.parts[0]?.area).toBeCloseTo(5000, 0);
    expect(analysis.openPaths).toBe(1);
    expect(analysis.warnings.map((w) => w.code)).toContain('open-paths');
    expect(analyzeDrawing(dxf(lines, { insunits: 4 }), { tolerance: 0.001 }).parts).toHaveLength(0);
  });

  it('an island inside a hole is a part of its own', () => {
    const analysis = analyzeDrawing(
      dxf(
        [polyline(rectangle(100, 100)), polyline(rectangle(80, 80, [10, 10])), polyline(rectangle(20, 20, [40, 40]))],
        { insunits: 4 },
      ),
    );
    expect(analysis.parts.map((p) => [p.holes, p.area])).toEqual([
      [1, 10000 - 6400],
      [0, 400],
    ]);
  });

  it('names parts by a label inside, else by block, else by layer; groups copies', () => {
    const blocks = [block('Runner', [polyline(rectangle(300, 19))])];
    const entities = [
      polyline(rectangle(200, 100), 'ply-12mm'),
      text(50, 50, 'Sled base'),
      polyline(rectangle(50, 50, [400, 0]), 'ply-12mm'),
      insert('Runner', '70\n3\n71\n2\n44\n400\n45\n40\n').replace('20\n0\n', '20\n200\n'),
    ];
    const names = analyzeDrawing(dxf(entities, { insunits: 4, blocks })).parts.map((p) => [
      p.name,
      p.nameSource,
      p.quantity,
    ]);
    expect(names).toEqual([
      ['Sled base', 'label', 1],
      ['ply-12mm', 'layer', 1],
      ['Runner', 'block', 6],
    ]);
  });

  it('inserts apply base point, scale, rotation and mirroring', () => {
    const blocks = [`0\nBLOCK\n2\nB\n70\n0\n10\n5\n20\n5\n${polyline(rectangle(10, 20, [5, 5]))}0\nENDBLK\n`];
    const mirrored = insert('B', '41\n-2\n42\n2\n50\n90\n').replace('10\n0\n20\n0\n', '10\n100\n20\n0\n');
    const analysis = analyzeDrawing(dxf([mirrored], { insunits: 4, blocks }));
    const [part] = analysis.parts;
    expect(part?.length).toBeCloseTo(40, 9);
    expect(part?.width).toBeCloseTo(20, 9);
    // Base (5,5) to origin, scaled (−2, 2): x ∈ [−20, 0], y ∈ [0, 40]; turned 90°: x ∈ [−40, 0], y ∈ [−20, 0]; moved by 100.
    expect(analysis.extents?.min[0]).toBeCloseTo(60, 9);
    expect(analysis.extents?.max[0]).toBeCloseTo(100, 9);
    expect(analysis.extents?.min[1]).toBeCloseTo(-20, 9);
    expect(analysis.extents?.max[1]).toBeCloseTo(0, 9);
  });

  it('reads the units: inches to mm by 25.4, unknown units with a warning, caller units win', () => {
    const square = [polyline(rectangle(2, 1))];
    expect(analyzeDrawing(dxf(square, { insunits: 1 })).parts[0]?.length).toBeCloseTo(50.8, 9);
    const unknown = analyzeDrawing(dxf(square));
    expect(unknown.units).toBe('unknown');
    expect(unknown.warnings.map((w) => w.code)).toContain('units-unknown');
    expect(analyzeDrawing(dxf(square), { units: 'cm' }).parts[0]?.length).toBeCloseTo(20, 9);
  });

  it('measures dimensions and warns when an override disagrees', () => {
    const dimension = (type: number, measured: number, override: string): string =>
      `0\nDIMENSION\n8\n0\n2\n*D1\n10\n0\n20\n10\n11\n50\n21\n12\n13\n0\n23\n0\n14\n100\n24\n0\n70\n${type}\n42\n${measured}\n1\n${override}\n`;
    const analysis = analyzeDrawing(
      dxf([dimension(1, 100, '<>'), dimension(33, 100, '95'), dimension(0, 100, '100.004')], { insunits: 4 }),
    );
    expect(analysis.dimensions.map((d) => [d.type, d.measured, d.text])).toEqual([
      ['aligned', 100, '<>'],
      ['aligned', 100, '95'],
      ['rotated', 100, '100.004'],
    ]);
    expect(analysis.warnings.filter((w) => w.code === 'dimension-text-mismatch')).toHaveLength(1);
  });

  it('computes a dimension from its definition points when group 42 is absent', () => {
    const entity = '0\nDIMENSION\n8\n0\n13\n0\n23\n0\n14\n30\n24\n40\n70\n1\n';
    const [dimension] = analyzeDrawing(dxf([entity], { insunits: 1 })).dimensions;
    expect(dimension).toMatchObject({ type: 'aligned', measuredFrom: 'definition-points' });
    expect(dimension?.measured).toBeCloseTo(50 * 25.4, 9);
  });

  it('counts unknown entity types and leaves paper space out', () => {
    const unknown = '0\nWIPEOUT\n8\n0\n10\n0\n20\n0\n';
    const paper = `0\nCIRCLE\n8\n0\n67\n1\n10\n0\n20\n0\n40\n5\n`;
    const analysis = analyzeDrawing(dxf([unknown, paper, circle(0, 0, 1)], { insunits: 4 }));
    expect(analysis.entities.unknown).toEqual({ WIPEOUT: 1 });
    expect(analysis.parts).toHaveLength(1);
    expect(analysis.extents).toEqual({ min: [-1, -1], max: [1, 1] });
  });

  it('does not mutate the text it reads and gives plain JSON', () => {
    const input = dxf([polyline(rectangle(10, 10))], { insunits: 4 });
    const analysis = analyzeDrawing(input);
    expect(JSON.parse(JSON.stringify(analysis))).toEqual(analysis);
    expect(analysis.parts[0]?.outline.points.length).toBeGreaterThanOrEqual(4);
  });
});

describe('invariants (property tests)', () => {
  const shape = fc.record({
    w: fc.integer({ min: 10, max: 1000 }),
    h: fc.integer({ min: 10, max: 1000 }),
    angle: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
    dx: fc.integer({ min: -5000, max: 5000 }),
    dy: fc.integer({ min: -5000, max: 5000 }),
  });

  it('length, width, area and perimeter do not change when a part is rotated and moved', () => {
    fc.assert(
      fc.property(shape, ({ w, h, angle, dx, dy }) => {
        const draw = (a: number, at: [number, number]) => {
          const pts = rectangle(w, h, at, a);
          const c: [number, number] = [
            at[0] + (w / 2) * Math.cos(a) - (h / 2) * Math.sin(a),
            at[1] + (w / 2) * Math.sin(a) + (h / 2) * Math.cos(a),
          ];
          return analyzeDrawing(dxf([polyline(pts), circle(c[0], c[1], Math.min(w, h) / 4)], { insunits: 4 })).parts[0];
        };
        const still = draw(0, [0, 0]);
        const moved = draw(angle, [dx, dy]);
        expect(moved?.length).toBeCloseTo(still?.length ?? NaN, 6);
        expect(moved?.width).toBeCloseTo(still?.width ?? NaN, 6);
        expect(moved?.area).toBeCloseTo(still?.area ?? NaN, 4);
        expect(moved?.perimeter).toBeCloseTo(still?.perimeter ?? NaN, 6);
      }),
      { numRuns: 50 },
    );
  });

  // A right triangle's minimum-area rectangles on a leg (a × b) and on the hypotenuse (c × ab/c)
  // have the same area (Freeman & Shapira 1975: a side of the optimum lies on a hull edge), so the
  // copies must not fall either way by how they are turned.
  it('identical right triangles at any rotation are one row', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 10, max: 500 }),
        fc.integer({ min: 10, max: 500 }),
        fc.array(fc.integer({ min: 0, max: 3599 }), { minLength: 2, maxLength: 6 }),
        (a, b, tenths) => {
          const angles = tenths.map((tenth) => (tenth * Math.PI) / 1800);
          const triangles = angles.map((angle, k) => {
            const c = Math.cos(angle);
            const s = Math.sin(angle);
            const corners: [number, number][] = [
              [0, 0],
              [a, 0],
              [0, b],
            ];
            return polyline(corners.map(([x, y]) => [2000 * k + x * c - y * s, x * s + y * c]));
          });
          const { parts } = analyzeDrawing(dxf(triangles, { insunits: 4 }));
          expect(parts).toHaveLength(1);
          expect(parts[0]?.quantity).toBe(angles.length);
          // Of the two, the rectangle on the legs has the shorter perimeter.
          expect(parts[0]?.length).toBeCloseTo(Math.max(a, b), 6);
          expect(parts[0]?.width).toBeCloseTo(Math.min(a, b), 6);
        },
      ),
      { numRuns: 40 },
    );
  });

  // 1 in = 25.4 mm exactly (NBS 1959): the same part drawn in inches with coordinates / 25.4 gives the same mm.
  it('a drawing in inches with coordinates divided by 25.4 gives the same millimetres', () => {
    fc.assert(
      fc.property(shape, ({ w, h, angle, dx, dy }) => {
        const inMm = analyzeDrawing(dxf([polyline(rectangle(w, h, [dx, dy], angle))], { insunits: 4 }));
        const scaled = rectangle(w / 25.4, h / 25.4, [dx / 25.4, dy / 25.4], angle);
        const inInches = analyzeDrawing(dxf([polyline(scaled)], { insunits: 1 }));
        expect(inInches.parts[0]?.length).toBeCloseTo(inMm.parts[0]?.length ?? NaN, 6);
        expect(inInches.parts[0]?.area).toBeCloseTo(inMm.parts[0]?.area ?? NaN, 3);
        expect(inInches.extents?.max[0]).toBeCloseTo(inMm.extents?.max[0] ?? NaN, 6);
      }),
      { numRuns: 50 },
    );
  });
});

describe('pathological input', () => {
  const refused = (input: string, code: string, options = {}): DrawingError => {
    try {
      analyzeDrawing(input, options);
    } catch (error) {
      expect(error).toBeInstanceOf(DrawingError);
      expect((error as DrawingError).code).toBe(code);
      expect((error as Error).message).not.toContain('\n');
      return error as DrawingError;
    }
    throw new Error('expected the drawing to be refused');
  };

  it('an empty file', () => {
    refused('', 'empty');
    refused('  \n\n', 'empty');
  });

  it('random bytes', () => {
    fc.assert(
      fc.property(fc.uint8Array({ minLength: 1, maxLength: 2000 }), (bytes) => {
        const input = new TextDecoder('latin1').decode(bytes);
        try {
          analyzeDrawing(input);
        } catch (error) {
          expect(error).toBeInstanceOf(DrawingError);
        }
      }),
      { numRuns: 200 },
    );
    expect(refused('\u0089PNG\r\n\u001a\nrandom', 'not-dxf').line).toBe(1);
  });

  it('a file cut in half, with the line where it ends', () => {
    const whole = dxf([polyline(rectangle(100, 50)), circle(5, 5, 2)], { insunits: 4 });
    const half = whole.slice(0, Math.floor(whole.length / 2));
    const error = refused(half, 'truncated');
    expect(error.line).toBe(half.trimEnd().split('\n').length);
  });

  it('binary DXF', () => {
    refused('AutoCAD Binary DXF\r\n\u001a\u0000', 'binary');
  });

  it('a block that inserts itself', () => {
    const error = refused(
      dxf([insert('Loop')], { blocks: [block('Loop', [circle(0, 0, 1), insert('Loop')])] }),
      'block-cycle',
    );
    expect(error.message).toContain('Loop');
  });

  it('arrays of arrays of arrays, and a 1e9 column count, fail at once naming the limit', () => {
    const blocks = [
      block('A', [circle(0, 0, 1)]),
      block('B', [insert('A', '70\n500\n71\n500\n44\n3\n45\n3\n')]),
      block('C', [insert('B', '70\n500\n71\n500\n44\n2000\n45\n2000\n')]),
    ];
    const nested = refused(dxf([insert('C', '70\n100\n71\n100\n')], { blocks }), 'limit') as DrawingLimitError;
    expect(nested.limit).toBe('maxExpandedEntities');
    const started = Date.now();
    const wide = refused(dxf([insert('A', '70\n1000000000\n44\n1\n')], { blocks }), 'limit') as DrawingLimitError;
    expect(wide.limit).toBe('maxExpandedEntities');
    expect(Date.now() - started).toBeLessThan(2000);
  });

  it('every limit can be set, and each names itself', () => {
    const input = dxf([polyline(rectangle(10, 10)), circle(1, 1, 0.5)], { insunits: 4 });
    const limitOf = (limits: object): string => (refused(input, 'limit', { limits }) as DrawingLimitError).limit;
    expect(limitOf({ maxFileSize: 10 })).toBe('maxFileSize');
    expect(limitOf({ maxEntities: 1 })).toBe('maxEntities');
    expect(limitOf({ maxExpandedEntities: 1 })).toBe('maxExpandedEntities');
    const deep = dxf([insert('A')], { blocks: [block('A', [insert('B')]), block('B', [circle(0, 0, 1)])] });
    expect((refused(deep, 'limit', { limits: { maxBlockDepth: 1 } }) as DrawingLimitError).limit).toBe('maxBlockDepth');
    const many = dxf(
      Array.from({ length: 3000 }, (_, i) => circle(i * 3, 0, 1)),
      { insunits: 4 },
    );
    let clock = 0;
    const late = refused(many, 'limit', { limits: { maxTimeMs: 10 }, now: () => (clock += 100) }) as DrawingLimitError;
    expect(late.limit).toBe('maxTimeMs');
  });
});
