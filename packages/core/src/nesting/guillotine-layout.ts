/** Which way a part may lie on a sheet whose grain runs along its length. */
export type GrainRule = 'length' | 'width' | 'any';

export interface SheetPiece {
  name: string;
  length: number;
  width: number;
  /** `length`: the part's length along the sheet's grain; `width`: across it; `any`: free to turn. */
  grain: GrainRule;
}

export interface SheetSize {
  length: number;
  width: number;
}

export interface SheetLayoutOptions {
  /** Sheet sizes on sale, mm; default one 2440 × 1220 sheet (metric trade size of PS 1 panels). */
  sheets?: readonly SheetSize[];
  kerf?: number;
  /** Taken off every edge of a sheet before cutting (factory edges are rarely square or clean). */
  edgeTrim?: number;
}

export interface Placement {
  name: string;
  /** Corner nearest the sheet's origin, mm from the sheet's corner (trim included). */
  x: number;
  y: number;
  /** Extent along the sheet's length (x) and width (y) as placed. */
  length: number;
  width: number;
  /** True when the part's length runs across the sheet. */
  rotated: boolean;
}

export interface SheetLayout {
  sheet: SheetSize;
  placements: Placement[];
  usedArea: number;
  wasteArea: number;
  /** Used area over sheet area. */
  yield: number;
}

export interface SheetPlan {
  sheets: SheetLayout[];
  unplaced: SheetPiece[];
  /** Fewest sheets by area alone: total part area over usable sheet area, rounded up. */
  lowerBound: number;
}

export const DEFAULT_SHEET: SheetSize = { length: 2440, width: 1220 };

interface FreeRect {
  x: number;
  y: number;
  w: number;
  h: number;
}

interface Bin {
  placements: Placement[];
  free: FreeRect[];
}

type Score = (rect: FreeRect, w: number, h: number) => number;
type Split = (rect: FreeRect, w: number, h: number) => boolean;

const SCORES: readonly Score[] = [
  (r, w, h) => Math.min(r.w - w, r.h - h),
  (r, w, h) => r.w * r.h - w * h,
  (r, w, h) => Math.max(r.w - w, r.h - h),
];
// true: cut along x first (the leftover to the right keeps the part's height).
const SPLITS: readonly Split[] = [(r, w, h) => r.w - w < r.h - h, (r, w, h) => r.w - w >= r.h - h];
const ORDERS: readonly ((p: SheetPiece) => number)[] = [
  (p) => p.length * p.width,
  (p) => Math.max(p.length, p.width),
  (p) => p.width,
  (p) => p.length + p.width,
];

/**
 * Lays parts out on sheets with guillotine cuts only (every cut runs edge to edge of the piece it
 * divides, as a panel or table saw cuts), a kerf between neighbours and a trim round the edges.
 * Each part takes its size plus one kerf and the usable sheet its size less the trims plus one
 * kerf, so parts end up a kerf apart and inside the trim. Several orders and fitting rules of a
 * free-rectangle packer are tried (Jylänki 2010, guillotine family [memory]); the plan with the
 * fewest sheets, then the emptiest last sheet, wins, on whichever sheet size needs least area.
 */
export function layoutSheets(pieces: readonly SheetPiece[], options: SheetLayoutOptions = {}): SheetPlan {
  const sizes = options.sheets && options.sheets.length > 0 ? options.sheets : [DEFAULT_SHEET];
  let best: SheetPlan | undefined;
  let bestArea = Infinity;
  for (const sheet of sizes) {
    const plan = layoutOnSheet(pieces, sheet, options.kerf ?? 0, options.edgeTrim ?? 0);
    const area = plan.sheets.length * sheet.length * sheet.width;
    if (
      !best ||
      plan.unplaced.length < best.unplaced.length ||
      (plan.unplaced.length === best.unplaced.length && area < bestArea)
    ) {
      best = plan;
      bestArea = area;
    }
  }
  return best as SheetPlan;
}

function layoutOnSheet(pieces: readonly SheetPiece[], sheet: SheetSize, kerf: number, trim: number): SheetPlan {
  const usableW = sheet.length - 2 * trim + kerf;
  const usableH = sheet.width - 2 * trim + kerf;
  const fits = (p: SheetPiece): boolean =>
    orientations(p).some(([w, h]) => w + kerf <= usableW + 1e-9 && h + kerf <= usableH + 1e-9);
  const placeable = pieces.filter(fits);
  const unplaced = pieces.filter((p) => !fits(p));
  let best: Bin[] | undefined;
  for (const order of ORDERS) {
    const sorted = [...placeable].sort((p, q) => order(q) - order(p));
    for (const score of SCORES) {
      for (const split of SPLITS) {
        const bins = pack(sorted, usableW, usableH, kerf, trim, score, split);
        if (!best || better(bins, best)) best = bins;
      }
    }
  }
  const area = sheet.length * sheet.width;
  const sheets = (best ?? []).map((bin) => {
    const usedArea = bin.placements.reduce((sum, p) => sum + p.length * p.width, 0);
    return { sheet, placements: bin.placements, usedArea, wasteArea: area - usedArea, yield: usedArea / area };
  });
  const partArea = placeable.reduce((sum, p) => sum + p.length * p.width, 0);
  return {
    sheets,
    unplaced,
    lowerBound: Math.ceil(partArea / ((sheet.length - 2 * trim) * (sheet.width - 2 * trim)) - 1e-9),
  };
}

function better(bins: Bin[], than: Bin[]): boolean {
  if (bins.length !== than.length) return bins.length < than.length;
  return lastUse(bins) < lastUse(than);
}

function lastUse(bins: Bin[]): number {
  return (bins[bins.length - 1]?.placements ?? []).reduce((sum, p) => sum + p.length * p.width, 0);
}

function orientations(p: SheetPiece): [number, number, boolean][] {
  if (p.grain === 'length') return [[p.length, p.width, false]];
  if (p.grain === 'width') return [[p.width, p.length, true]];
  return p.length === p.width
    ? [[p.length, p.width, false]]
    : [
        [p.length, p.width, false],
        [p.width, p.length, true],
      ];
}

function pack(
  pieces: readonly SheetPiece[],
  usableW: number,
  usableH: number,
  kerf: number,
  trim: number,
  score: Score,
  split: Split,
): Bin[] {
  const bins: Bin[] = [];
  for (const piece of pieces) {
    let choice: { bin: Bin; index: number; w: number; h: number; rotated: boolean } | undefined;
    let bestScore = Infinity;
    for (const bin of bins) {
      bin.free.forEach((rect, index) => {
        for (const [pw, ph, rotated] of orientations(piece)) {
          const w = pw + kerf;
          const h = ph + kerf;
          if (w > rect.w + 1e-9 || h > rect.h + 1e-9) continue;
          const s = score(rect, w, h);
          if (s < bestScore) {
            bestScore = s;
            choice = { bin, index, w, h, rotated };
          }
        }
      });
    }
    if (!choice) {
      const bin: Bin = { placements: [], free: [{ x: 0, y: 0, w: usableW, h: usableH }] };
      bins.push(bin);
      const [pw, ph, rotated] = orientations(piece).find(
        ([w, h]) => w + kerf <= usableW + 1e-9 && h + kerf <= usableH + 1e-9,
      ) as [number, number, boolean];
      choice = { bin, index: 0, w: pw + kerf, h: ph + kerf, rotated };
    }
    const { bin, index, w, h, rotated } = choice;
    const rect = bin.free[index] as FreeRect;
    bin.placements.push({
      name: piece.name,
      x: rect.x + trim,
      y: rect.y + trim,
      length: w - kerf,
      width: h - kerf,
      rotated,
    });
    const alongX = split(rect, w, h);
    const right = { x: rect.x + w, y: rect.y, w: rect.w - w, h: alongX ? h : rect.h };
    const top = { x: rect.x, y: rect.y + h, w: alongX ? rect.w : w, h: rect.h - h };
    bin.free.splice(index, 1, ...[right, top].filter((r) => r.w > 1e-9 && r.h > 1e-9));
  }
  return bins;
}
