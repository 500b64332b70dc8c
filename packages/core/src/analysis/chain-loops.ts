import type { EdgeRange, EdgeStore } from '../geometry/edge-store';
import type { FlatPiece } from './flatten-drawing';
import type { SourceRef } from './types';

/** A closed outline: edges head to tail in the edge store, the last ending where the first begins. */
export interface Loop {
  range: EdgeRange;
  sources: SourceRef[];
}

export interface ChainResult {
  loops: Loop[];
  /** Chains of pieces that did not close. */
  openPaths: number;
  /** End points where three or more pieces meet, which makes the chaining a guess. */
  branchPoints: number;
}

/**
 * Chains pieces end to end into closed loops. End points within `tolerance` are one node (found
 * through a hash grid of cell size `tolerance`, so the work stays linear); the pieces' own end
 * points are snapped to it so that a loop closes exactly. Chained and snapped edges are appended
 * to the store; a piece that closes exactly on its own is its own loop, sharing its edges.
 */
export function chainLoops(pieces: readonly FlatPiece[], store: EdgeStore, tolerance: number): ChainResult {
  const loops: Loop[] = [];
  const open: { piece: FlatPiece; start: number; end: number }[] = [];
  for (const piece of pieces) {
    const { start, end } = piece.range;
    if (end <= start) continue;
    const last = end - 1;
    if (piece.closed || near(store.ax(start), store.ay(start), store.bx(last), store.by(last), tolerance))
      loops.push({ range: closeExactly(store, piece.range), sources: [piece.source] });
    else open.push({ piece, start, end: last });
  }

  const nodes = new NodeIndex(tolerance);
  const ends = open.map(
    (entry) =>
      [
        nodes.find(store.ax(entry.start), store.ay(entry.start)),
        nodes.find(store.bx(entry.end), store.by(entry.end)),
      ] as const,
  );
  const incident = new Map<number, number[]>();
  ends.forEach(([s, e], i) => {
    for (const node of [s, e]) {
      const list = incident.get(node);
      if (list) list.push(i);
      else incident.set(node, [i]);
    }
  });
  let branchPoints = 0;
  for (const list of incident.values()) if (list.length > 2) branchPoints += 1;

  const used = new Uint8Array(open.length);
  let openPaths = 0;
  for (let i = 0; i < open.length; i += 1) {
    if (used[i]) continue;
    used[i] = 1;
    const [startNode, firstEnd] = ends[i] as readonly [number, number];
    const chain: { index: number; forward: boolean }[] = [{ index: i, forward: true }];
    let current = firstEnd;
    let closed = current === startNode;
    while (!closed) {
      const next = (incident.get(current) ?? []).find((j) => !used[j]);
      if (next === undefined) break;
      used[next] = 1;
      const [s, e] = ends[next] as readonly [number, number];
      const forward = s === current;
      chain.push({ index: next, forward });
      current = forward ? e : s;
      closed = current === startNode;
    }
    if (!closed) {
      openPaths += 1;
      continue;
    }
    const start = store.count;
    for (const link of chain) {
      const { range } = (open[link.index] as { piece: FlatPiece }).piece;
      if (link.forward) store.pushCopy(range);
      else store.pushReversed(range);
    }
    loops.push({
      range: closeExactly(store, { start, end: store.count }),
      sources: chain.map((link) => (open[link.index] as { piece: FlatPiece }).piece.source),
    });
  }
  return { loops, openPaths, branchPoints };
}

function near(px: number, py: number, qx: number, qy: number, tolerance: number): boolean {
  return Math.abs(px - qx) <= tolerance && Math.abs(py - qy) <= tolerance && Math.hypot(px - qx, py - qy) <= tolerance;
}

/**
 * Joins each edge's start to the previous edge's end, removing the tolerance-sized gaps, in a
 * copy appended to the store; a loop already closed exactly (most closed entities) keeps its range.
 */
function closeExactly(store: EdgeStore, range: EdgeRange): EdgeRange {
  const { start, end } = range;
  let exact = store.bx(end - 1) === store.ax(start) && store.by(end - 1) === store.ay(start);
  for (let i = start + 1; i < end && exact; i += 1)
    exact = store.bx(i - 1) === store.ax(i) && store.by(i - 1) === store.ay(i);
  if (exact) return range;
  const from = store.count;
  for (let i = start; i < end; i += 1) {
    const p = i === start ? end - 1 : i - 1;
    if (store.bx(p) === store.ax(i) && store.by(p) === store.ay(i))
      store.push(store.ax(i), store.ay(i), store.bx(i), store.by(i), store.bulge(i));
    else store.push(store.bx(p), store.by(p), store.bx(i), store.by(i), store.bulge(i));
  }
  return { start: from, end: store.count };
}

class NodeIndex {
  private readonly cells = new Map<string, { x: number; y: number; id: number }[]>();
  private count = 0;

  constructor(private readonly tolerance: number) {}

  find(x: number, y: number): number {
    const size = this.tolerance > 0 ? this.tolerance : 1e-9;
    const cx = Math.floor(x / size);
    const cy = Math.floor(y / size);
    for (let dx = -1; dx <= 1; dx += 1) {
      for (let dy = -1; dy <= 1; dy += 1) {
        for (const node of this.cells.get(`${cx + dx},${cy + dy}`) ?? []) {
          if (near(node.x, node.y, x, y, this.tolerance)) return node.id;
        }
      }
    }
    const id = this.count;
    this.count += 1;
    const key = `${cx},${cy}`;
    const cell = this.cells.get(key);
    if (cell) cell.push({ x, y, id });
    else this.cells.set(key, [{ x, y, id }]);
    return id;
  }
}
