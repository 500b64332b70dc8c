import { point3d, type DxfWriter } from '@tarikjabiri/dxf';
import { addLayer, drawPart, insertBlock, newDrawing, type InsertPlacement, type PartDrawing } from './drawing';
import { place, placePoint, roundedRectangle, slot, type Placement, type Vertex } from './shapes';

/**
 * The demo plans' drawings (plans-seed/plans/<slug>/r<N>/<name>.dxf). Every part is a closed
 * outline with its name as a TEXT label inside it, on a layer whose name carries the stock
 * thickness; identical parts are one block inserted several times or as an array, so that the
 * analysis counts them. Sizes are the plans' own and match their build notes and plan.json.
 */

type Target = Parameters<typeof drawPart>[0];

interface Sheet {
  dxf: DxfWriter;
  /** Label height in drawing units: 5 mm, or 3/16 in on inch drawings. */
  textHeight: number;
}

function sheet(units: 'mm' | 'in', layers: readonly string[]): Sheet {
  const dxf = newDrawing(units);
  for (const layer of layers) addLayer(dxf, layer);
  return { dxf, textHeight: units === 'mm' ? 5 : 0.1875 };
}

/** drawPart with the label at this sheet's text height (drawPart's own label is 5 units high). */
function put(target: Target, s: Sheet, part: PartDrawing, layer: string, at: Placement = {}): void {
  const { label, labelAt, ...shape } = part;
  drawPart(target, shape, at, layer);
  if (label && labelAt) {
    const p = placePoint(labelAt.x, labelAt.y, at);
    target.addText(point3d(p.x, p.y, 0), s.textHeight, label, { layerName: layer });
  }
}

/** A block named after the part, holding the part at its base point, inserted as asked. */
function repeated(s: Sheet, part: PartDrawing & { label: string }, layer: string, inserts: InsertPlacement[]): void {
  put(s.dxf.addBlock(part.label), s, part, layer);
  for (const at of inserts) insertBlock(s.dxf, part.label, at);
}

function polygon(points: readonly [number, number][]): Vertex[] {
  return points.map(([x, y]) => ({ x, y, bulge: 0 }));
}

function moved(vertices: readonly Vertex[], x: number, y: number, angle = 0): Vertex[] {
  return place(vertices, { x, y, angle });
}

/**
 * A corner brace: a right triangle with legs along +X and +Y and its two sharp tips cut back to
 * 10 % of the leg (safer to handle, and it makes the smallest enclosing rectangle the leg square
 * rather than a tie with the rectangle along the long edge).
 */
function brace(leg: number): Vertex[] {
  const tip = leg / 10;
  return polygon([
    [0, 0],
    [leg, 0],
    [leg, tip],
    [tip, leg],
    [0, leg],
  ]);
}

/** Four holes on a square pattern of side `pitch` centred on (x, y). */
function squarePattern(x: number, y: number, pitch: number, diameter: number) {
  const h = pitch / 2;
  return [
    { x: x - h, y: y - h, diameter },
    { x: x + h, y: y - h, diameter },
    { x: x + h, y: y + h, diameter },
    { x: x - h, y: y + h, diameter },
  ];
}

// ---------------------------------------------------------------------------------------------
// lead-screw-finger-joint-indexer (mm)

interface IndexerRevision {
  carriageLength: number;
  /** Centre distance along the shafts between the two bearing blocks on each shaft. */
  bearingCentres: number;
  limitSwitches: number;
}

const PLY18 = 'BIRCH-PLY-18mm';
const PLY12 = 'BIRCH-PLY-12mm';
const RUNNER = 'MAPLE-8mm';

function indexer(rev: IndexerRevision): string {
  const s = sheet('mm', [PLY18, PLY12, 'MDF-12mm', RUNNER, 'MAPLE-19mm']);
  const { dxf } = s;
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(560, 360),
      holes: [29, 531].flatMap((x) => [260, 320].map((y) => ({ x, y, diameter: 5 }))),
      label: 'Sled base',
      labelAt: { x: 200, y: 150 },
    },
    PLY18,
  );
  put(dxf, s, { outline: roundedRectangle(360, 19), label: 'Runner', labelAt: { x: 150, y: 7 } }, RUNNER, {
    y: -60,
  });
  // End plates: two 12 mm shafts 100 mm apart with the screw between them, 70 mm up.
  const shaftBores = [20, 120].map((x) => ({ x, y: 70, diameter: 12 }));
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(140, 110),
      // NEMA 17 face: 22 mm boss, M3 clearance holes on a 31 mm square.
      holes: [...shaftBores, { x: 70, y: 70, diameter: 22 }, ...squarePattern(70, 70, 31, 3.4)],
      label: 'Motor end plate',
      labelAt: { x: 30, y: 20 },
    },
    PLY18,
    { x: 600 },
  );
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(140, 110),
      // 608 bearing (8 × 22 × 7) for the screw's end journal.
      holes: [...shaftBores, { x: 70, y: 70, diameter: 22 }],
      label: 'Idler end plate',
      labelAt: { x: 30, y: 20 },
    },
    PLY18,
    { x: 780 },
  );
  const half = rev.bearingCentres / 2;
  const middle = rev.carriageLength / 2;
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(rev.carriageLength, 140),
      // Two M5 screws per bearing block, 30 mm apart along the shaft; shafts at y 20 and 120.
      holes: [middle - half, middle + half].flatMap((bx) =>
        [20, 120].flatMap((by) => [bx - 15, bx + 15].map((x) => ({ x, y: by, diameter: 5.5 }))),
      ),
      label: 'Carriage plate',
      labelAt: { x: middle - 40, y: 65 },
    },
    PLY18,
    { x: 600, y: 160 },
  );
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(70, 60),
      // Flanged nut: 10.5 mm for its body, M3 clearance on a 16 mm pitch circle.
      holes: [
        { x: 35, y: 25, diameter: 10.5 },
        ...[45, 135, 225, 315].map((deg) => ({
          x: 35 + 8 * Math.cos((deg * Math.PI) / 180),
          y: 25 + 8 * Math.sin((deg * Math.PI) / 180),
          diameter: 3.4,
        })),
      ],
      label: 'Nut block',
      labelAt: { x: 8, y: 46 },
    },
    'MAPLE-19mm',
    { x: 900, y: 160 },
  );
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(300, 160),
      cutouts: [moved(slot(60, 8.5), 75, 100, 90), moved(slot(60, 8.5), 225, 100, 90)],
      label: 'Carriage fence',
      labelAt: { x: 110, y: 30 },
    },
    PLY18,
    { x: 0, y: 420 },
  );
  put(
    dxf,
    s,
    {
      // M8 carriage bolts through the carriage fence's slots clamp the board under this bar.
      outline: roundedRectangle(320, 40),
      holes: [
        { x: 85, y: 20, diameter: 8.5 },
        { x: 235, y: 20, diameter: 8.5 },
      ],
      label: 'Hold-down bar',
      labelAt: { x: 120, y: 14 },
    },
    'MAPLE-19mm',
    { x: 0, y: 620 },
  );
  put(
    dxf,
    s,
    { outline: roundedRectangle(300, 150), label: 'Sacrificial face', labelAt: { x: 100, y: 70 } },
    'MDF-12mm',
    {
      x: 340,
      y: 420,
    },
  );
  repeated(s, { outline: brace(100), label: 'Gusset', labelAt: { x: 12, y: 15 } }, PLY18, [
    { x: 680, y: 420, columns: 2, columnSpacing: 120 },
  ]);
  repeated(
    s,
    {
      outline: roundedRectangle(60, 40),
      // A basic lever microswitch: two mounting holes 22.2 mm apart.
      holes: [
        { x: 18.9, y: 28, diameter: 3.2 },
        { x: 41.1, y: 28, diameter: 3.2 },
      ],
      label: 'Limit switch bracket',
      labelAt: { x: 5, y: 8 },
    },
    PLY12,
    [{ x: 940, y: 420, columns: rev.limitSwitches, columnSpacing: 80 }],
  );
  return dxf.stringify();
}

// ---------------------------------------------------------------------------------------------
// five-cut-crosscut-sled (mm)

function crosscutSled(withStopAndGuard: boolean): string {
  const s = sheet('mm', [PLY12, PLY18, RUNNER, 'MAPLE-19mm', 'T-TRACK-9.5mm']);
  const { dxf } = s;
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(600, 450),
      // Rear fence: a pivot screw at the left end and one through a short slot at the right.
      holes: [{ x: 40, y: 50, diameter: 5 }],
      cutouts: [moved(slot(20, 6), 560, 50, 90)],
      label: 'Sled base',
      labelAt: { x: 250, y: 220 },
    },
    PLY12,
  );
  repeated(s, { outline: roundedRectangle(450, 19), label: 'Runner', labelAt: { x: 190, y: 7 } }, RUNNER, [
    { y: -100, rows: 2, rowSpacing: 40 },
  ]);
  repeated(s, { outline: roundedRectangle(600, 100), label: 'Rear fence layer', labelAt: { x: 250, y: 45 } }, PLY18, [
    { y: 500, rows: 2, rowSpacing: 120 },
  ]);
  put(dxf, s, { outline: roundedRectangle(600, 75), label: 'Front fence', labelAt: { x: 250, y: 35 } }, PLY18, {
    y: 760,
  });
  if (withStopAndGuard) {
    repeated(s, { outline: roundedRectangle(150, 90), label: 'Blade guard layer', labelAt: { x: 20, y: 40 } }, PLY18, [
      { x: 660, y: 500, rows: 3, rowSpacing: 110 },
    ]);
    put(dxf, s, { outline: roundedRectangle(560, 19), label: 'T-track', labelAt: { x: 240, y: 7 } }, 'T-TRACK-9.5mm', {
      y: 880,
    });
    put(
      dxf,
      s,
      {
        outline: roundedRectangle(90, 50),
        cutouts: [moved(slot(30, 6.6), 45, 25)],
        label: 'Stop block',
        labelAt: { x: 5, y: 38 },
      },
      'MAPLE-19mm',
      { x: 660, y: 850 },
    );
  }
  return dxf.stringify();
}

// ---------------------------------------------------------------------------------------------
// hinged-taper-jig (inches)

const PLY34 = 'BIRCH-PLY-3/4in';
const MAPLE34 = 'MAPLE-3/4in';

function taperJig(spreader: { width: number; slotWidth: number }): string {
  const s = sheet('in', [PLY34, MAPLE34, 'MAPLE-1/2in']);
  const { dxf } = s;
  // Both arms take a 1/4-20 threaded insert (3/8 in hole) for the spreader bar, 22 in from the hinge.
  const insert = [{ x: 22, y: 1.75, diameter: 0.375 }];
  put(
    dxf,
    s,
    { outline: roundedRectangle(30, 3.5), holes: insert, label: 'Fence arm', labelAt: { x: 2, y: 1.5 } },
    PLY34,
  );
  put(
    dxf,
    s,
    { outline: roundedRectangle(30, 3.5), holes: insert, label: 'Work arm', labelAt: { x: 2, y: 1.5 } },
    PLY34,
    {
      y: 5,
    },
  );
  put(dxf, s, { outline: roundedRectangle(4, 1.5), label: 'Heel stop', labelAt: { x: 0.3, y: 0.6 } }, MAPLE34, {
    x: 32,
  });
  const middle = spreader.width / 2;
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(10, spreader.width),
      holes: [{ x: 0.75, y: middle, diameter: 0.266 }],
      cutouts: [moved(slot(7, spreader.slotWidth), 5.5, middle)],
      label: 'Spreader bar',
      labelAt: { x: 1.2, y: 0.1 },
    },
    'MAPLE-1/2in',
    { x: 0, y: 10 },
  );
  repeated(s, { outline: roundedRectangle(3, 2), label: 'Hold-down riser', labelAt: { x: 0.2, y: 0.8 } }, MAPLE34, [
    { x: 12, y: 10, columns: 2, columnSpacing: 4 },
  ]);
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(7, 4, 0.75),
      cutouts: [moved(slot(4, 1.25), 3.5, 2.6)],
      label: 'Handle',
      labelAt: { x: 0.6, y: 0.6 },
    },
    PLY34,
    { x: 22, y: 10 },
  );
  return dxf.stringify();
}

// ---------------------------------------------------------------------------------------------
// band-saw-circle-jig (mm)

function circleJig(): string {
  const s = sheet('mm', [PLY12, 'BIRCH-PLY-6mm', 'MAPLE-10mm', RUNNER, 'MAPLE-19mm']);
  const { dxf } = s;
  put(
    dxf,
    s,
    {
      // The blade enters through a 3 mm kerf notch from the front edge, 420 mm from the left.
      outline: polygon([
        [0, 0],
        [418.5, 0],
        [418.5, 200],
        [421.5, 200],
        [421.5, 0],
        [500, 0],
        [500, 400],
        [0, 400],
      ]),
      label: 'Platform',
      labelAt: { x: 100, y: 300 },
    },
    PLY12,
  );
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(320, 19),
      holes: [{ x: 310, y: 9.5, diameter: 3 }],
      label: 'Pivot bar',
      labelAt: { x: 100, y: 7 },
    },
    'MAPLE-10mm',
    { y: -50 },
  );
  repeated(s, { outline: roundedRectangle(320, 15), label: 'Guide strip', labelAt: { x: 100, y: 5 } }, 'MAPLE-10mm', [
    { y: -100, rows: 2, rowSpacing: 30 },
  ]);
  repeated(
    s,
    { outline: roundedRectangle(320, 25), label: 'Keeper strip', labelAt: { x: 100, y: 10 } },
    'BIRCH-PLY-6mm',
    [{ y: -180, rows: 2, rowSpacing: 40 }],
  );
  put(dxf, s, { outline: roundedRectangle(400, 19), label: 'Runner', labelAt: { x: 150, y: 7 } }, RUNNER, { y: -230 });
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(150, 40),
      holes: [
        { x: 30, y: 20, diameter: 4.5 },
        { x: 120, y: 20, diameter: 4.5 },
      ],
      label: 'Edge stop',
      labelAt: { x: 50, y: 15 },
    },
    'MAPLE-19mm',
    { x: 550 },
  );
  return dxf.stringify();
}

// ---------------------------------------------------------------------------------------------
// shelf-pin-drilling-guide (mm)

/** Guide holes on a 32 mm pitch, 37 mm from the cabinet's front edge (the lip's inner face at y 12). */
function shelfPinGuide(rev: { stripWidth: number; holeDiameter: number; endStop: boolean }): string {
  const s = sheet('mm', [PLY12, 'MAPLE-12mm', 'MAPLE-19mm']);
  const { dxf } = s;
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(800, rev.stripWidth),
      holes: Array.from({ length: 24 }, (_, i) => ({ x: 32 * (i + 1), y: 49, diameter: rev.holeDiameter })),
      label: 'Guide strip',
      labelAt: { x: 40, y: 15 },
    },
    PLY12,
  );
  put(dxf, s, { outline: roundedRectangle(800, 25), label: 'Fence lip', labelAt: { x: 300, y: 10 } }, 'MAPLE-12mm', {
    y: -50,
  });
  if (rev.endStop) {
    put(
      dxf,
      s,
      {
        outline: roundedRectangle(rev.stripWidth, 40),
        holes: [
          { x: 20, y: 20, diameter: 4.5 },
          { x: rev.stripWidth - 20, y: 20, diameter: 4.5 },
        ],
        label: 'End stop',
        labelAt: { x: 5, y: 30 },
      },
      'MAPLE-19mm',
      { x: 850 },
    );
  }
  return dxf.stringify();
}

// ---------------------------------------------------------------------------------------------
// split-router-table-fence (mm)

function routerFence(): string {
  const s = sheet('mm', [PLY18, PLY12, 'MDF-12mm', 'T-TRACK-9.5mm']);
  const { dxf } = s;
  put(
    dxf,
    s,
    {
      // A half-round bit opening of 40 mm radius in the middle of the front edge.
      outline: [
        { x: 0, y: 0, bulge: 0 },
        { x: 410, y: 0, bulge: -1 },
        { x: 490, y: 0, bulge: 0 },
        { x: 900, y: 0, bulge: 0 },
        { x: 900, y: 120, bulge: 0 },
        { x: 0, y: 120, bulge: 0 },
      ],
      cutouts: [moved(slot(80, 8.5), 60, 60), moved(slot(80, 8.5), 840, 60)],
      label: 'Fence base',
      labelAt: { x: 200, y: 60 },
    },
    PLY18,
  );
  put(
    dxf,
    s,
    {
      outline: polygon([
        [0, 0],
        [400, 0],
        [400, 50],
        [500, 50],
        [500, 0],
        [900, 0],
        [900, 100],
        [0, 100],
      ]),
      // Bolts to the sub-faces' threaded inserts: two slots behind each sub-face.
      cutouts: [150, 330, 570, 750].map((x) => moved(slot(50, 8.5), x, 30)),
      label: 'Fence face',
      labelAt: { x: 100, y: 60 },
    },
    PLY18,
    { y: 160 },
  );
  repeated(s, { outline: roundedRectangle(440, 60), label: 'Sub-face', labelAt: { x: 20, y: 25 } }, 'MDF-12mm', [
    { y: 300, columns: 2, columnSpacing: 460 },
  ]);
  put(dxf, s, { outline: roundedRectangle(850, 19), label: 'T-track', labelAt: { x: 300, y: 7 } }, 'T-TRACK-9.5mm', {
    y: 400,
  });
  repeated(s, { outline: brace(100), label: 'Brace', labelAt: { x: 12, y: 15 } }, PLY18, [
    { y: 460, columns: 4, columnSpacing: 120 },
  ]);
  repeated(s, { outline: roundedRectangle(100, 120), label: 'Hood side', labelAt: { x: 10, y: 55 } }, PLY12, [
    { x: 500, y: 460, columns: 2, columnSpacing: 120 },
  ]);
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(140, 120),
      // For a 2-1/2 in hose port.
      holes: [{ x: 70, y: 60, diameter: 64 }],
      label: 'Hood back',
      labelAt: { x: 5, y: 8 },
    },
    PLY12,
    { x: 760, y: 460 },
  );
  return dxf.stringify();
}

// ---------------------------------------------------------------------------------------------
// sprung-panel-cauls (inches)

function panelCauls(): string {
  const s = sheet('in', ['OAK-1-1/16in', 'PINE-1-1/2in', PLY34]);
  // 1/16 in crown over 30 in: bulge = 2 × sagitta / chord; positive (counter-clockwise), so the arc
  // bows to the right of its direction of travel, +Y here, away from the part.
  const crown = (2 * 0.0625) / 30;
  repeated(
    s,
    {
      outline: [
        { x: 0, y: 0, bulge: 0 },
        { x: 30, y: 0, bulge: 0 },
        { x: 30, y: 2, bulge: crown },
        { x: 0, y: 2, bulge: 0 },
      ],
      label: 'Caul',
      labelAt: { x: 1, y: 0.8 },
    },
    'OAK-1-1/16in',
    [{ rows: 6, rowSpacing: 3 }],
  );
  repeated(
    s,
    { outline: roundedRectangle(36, 3.5), label: 'Glue-up rail', labelAt: { x: 1, y: 1.5 } },
    'PINE-1-1/2in',
    [{ y: 19, rows: 2, rowSpacing: 5 }],
  );
  // A half-round notch of 9/16 in radius cradles a 3/4 in pipe clamp.
  repeated(
    s,
    {
      outline: [
        { x: 0, y: 0, bulge: 0 },
        { x: 5, y: 0, bulge: 0 },
        { x: 5, y: 2.5, bulge: 0 },
        { x: 3.0625, y: 2.5, bulge: -1 },
        { x: 1.9375, y: 2.5, bulge: 0 },
        { x: 0, y: 2.5, bulge: 0 },
      ],
      label: 'Clamp cradle',
      labelAt: { x: 0.3, y: 0.4 },
    },
    PLY34,
    [{ x: 40, columns: 2, rows: 2, columnSpacing: 6, rowSpacing: 3.5 }],
  );
  return s.dxf.stringify();
}

// ---------------------------------------------------------------------------------------------
// honing-angle-setting-board (mm)

function honingBoard(): string {
  const s = sheet('mm', ['MDF-18mm', 'MAPLE-12mm', PLY12]);
  const { dxf } = s;
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(400, 160, 6),
      holes: [{ x: 380, y: 140, diameter: 10 }],
      label: 'Setting board',
      labelAt: { x: 20, y: 60 },
    },
    'MDF-18mm',
  );
  repeated(s, { outline: roundedRectangle(160, 20), label: 'Angle stop', labelAt: { x: 5, y: 7 } }, 'MAPLE-12mm', [
    { x: 450, rows: 3, rowSpacing: 35 },
  ]);
  put(dxf, s, { outline: roundedRectangle(400, 25), label: 'Guide rail', labelAt: { x: 150, y: 10 } }, 'MAPLE-12mm', {
    y: -50,
  });
  put(dxf, s, { outline: roundedRectangle(260, 100), label: 'Stone tray', labelAt: { x: 20, y: 40 } }, PLY12, {
    y: -200,
  });
  repeated(s, { outline: roundedRectangle(100, 20), label: 'Tray cleat', labelAt: { x: 5, y: 7 } }, 'MAPLE-12mm', [
    { x: 300, y: -200, rows: 2, rowSpacing: 35 },
  ]);
  return dxf.stringify();
}

// ---------------------------------------------------------------------------------------------
// t-square-dado-guide (mm)

function dadoGuide(): string {
  const s = sheet('mm', [PLY12, 'MAPLE-19mm']);
  const { dxf } = s;
  put(
    dxf,
    s,
    {
      outline: roundedRectangle(760, 100),
      holes: [
        { x: 25, y: 30, diameter: 5 },
        { x: 25, y: 70, diameter: 5 },
      ],
      label: 'Straightedge',
      labelAt: { x: 200, y: 45 },
    },
    PLY12,
  );
  put(dxf, s, { outline: roundedRectangle(400, 50), label: 'Cross head', labelAt: { x: 150, y: 20 } }, 'MAPLE-19mm', {
    y: -80,
  });
  repeated(s, { outline: brace(120), label: 'Corner brace', labelAt: { x: 12, y: 15 } }, PLY12, [
    { x: 450, y: -200, columns: 2, columnSpacing: 150 },
  ]);
  return dxf.stringify();
}

// ---------------------------------------------------------------------------------------------

export interface DemoPlanDrawing {
  slug: string;
  revision: number;
  /** File name without `.dxf`. */
  name: string;
  draw: () => string;
}

/** Every demo drawing, written to `<slug>/r<revision>/<name>.dxf`. */
export const DEMO_PLAN_DRAWINGS: readonly DemoPlanDrawing[] = [
  {
    slug: 'lead-screw-finger-joint-indexer',
    revision: 1,
    name: 'indexer',
    draw: () => indexer({ carriageLength: 200, bearingCentres: 120, limitSwitches: 1 }),
  },
  {
    slug: 'lead-screw-finger-joint-indexer',
    revision: 2,
    name: 'indexer',
    draw: () => indexer({ carriageLength: 240, bearingCentres: 180, limitSwitches: 2 }),
  },
  { slug: 'five-cut-crosscut-sled', revision: 1, name: 'sled', draw: () => crosscutSled(false) },
  { slug: 'five-cut-crosscut-sled', revision: 2, name: 'sled', draw: () => crosscutSled(true) },
  {
    slug: 'hinged-taper-jig',
    revision: 1,
    name: 'taper-jig',
    draw: () => taperJig({ width: 1.25, slotWidth: 0.2656 }),
  },
  {
    slug: 'hinged-taper-jig',
    revision: 2,
    name: 'taper-jig',
    draw: () => taperJig({ width: 1.5, slotWidth: 0.3125 }),
  },
  { slug: 'band-saw-circle-jig', revision: 1, name: 'circle-jig', draw: circleJig },
  {
    slug: 'shelf-pin-drilling-guide',
    revision: 1,
    name: 'shelf-pin-guide',
    draw: () => shelfPinGuide({ stripWidth: 60, holeDiameter: 5, endStop: false }),
  },
  {
    slug: 'shelf-pin-drilling-guide',
    revision: 2,
    name: 'shelf-pin-guide',
    draw: () => shelfPinGuide({ stripWidth: 70, holeDiameter: 10, endStop: true }),
  },
  { slug: 'split-router-table-fence', revision: 1, name: 'router-fence', draw: routerFence },
  { slug: 'sprung-panel-cauls', revision: 1, name: 'cauls', draw: panelCauls },
  { slug: 'honing-angle-setting-board', revision: 1, name: 'setting-board', draw: honingBoard },
  { slug: 't-square-dado-guide', revision: 1, name: 'dado-guide', draw: dadoGuide },
];

/** Where a demo drawing lives below the plans folder. */
export function demoDrawingPath(drawing: Pick<DemoPlanDrawing, 'slug' | 'revision' | 'name'>): string {
  return `${drawing.slug}/r${drawing.revision}/${drawing.name}.dxf`;
}
