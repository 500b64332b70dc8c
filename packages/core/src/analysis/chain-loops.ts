import { reverseEdge, type Edge } from '../geometry/edge';
import type { Vec } from '../geometry/vec';
import type { FlatPiece } from './flatten-drawing';
import type { SourceRef } from './types';

/** A closed outline: edges head to tail, the last ending where the first begins. */
export interface Loop {
  edges: readonly Edge[];
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
 * points are snapped to it so that a loop closes exactly.
 */
export function chainLoops(pieces: readonly FlatPiece[], tolerance: number): ChainResult {
  const loops: Loop[] = [];
  const open: { piece: FlatPiece; start: Vec; end: Vec }[] = [];
  for (const piece of pieces) {
    const first = piece.edges[0];
    const last = piece.edges[piece.edges.length - 1];
    if (!first || !last) continue;
    if (piece.closed || near(first.a, last.b, tolerance))
      loops.push({ edges: closeExactly(piece.edges), sources: [piece.source] });
    else open.push({ piece, start: first.a, end: last.b });
  }

  const nodes = new NodeIndex(tolerance);
  const ends = open.map((entry) => [nodes.find(entry.start), nodes.find(entry.end)] as const);
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
    const edges: Edge[] = [];
    for (const link of chain) {
      const piece = (open[link.index] as { piece: FlatPiece }).piece;
      const oriented = link.forward ? piece.edges : [...piece.edges].reverse().map(reverseEdge);
      edges.push(...oriented);
    }
    loops.push({
      edges: closeExactly(edges),
      sources: chain.map((link) => (open[link.index] as { piece: FlatPiece }).piece.source),
    });
  }
  return { loops, openPaths, branchPoints };
}

function near(p: Vec, q: Vec, tolerance: number): boolean {
  return (
    Math.abs(p.x - q.x) <= tolerance &&
    Math.abs(p.y - q.y) <= tolerance &&
    Math.hypot(p.x - q.x, p.y - q.y) <= tolerance
  );
}

/**
 * Joins each edge's start to the previous edge's end, removing the tolerance-sized gaps; a loop
 * already closed exactly (most closed entities) keeps its own list.
 */
function closeExactly(edges: readonly Edge[]): readonly Edge[] {
  let out: Edge[] | undefined;
  for (let i = 0; i < edges.length; i += 1) {
    const edge = edges[i] as Edge;
    const a = (edges[(i + edges.length - 1) % edges.length] as Edge).b;
    if (a.x === edge.a.x && a.y === edge.a.y) out?.push(edge);
    else {
      out ??= edges.slice(0, i);
      out.push({ a, b: edge.b, bulge: edge.bulge });
    }
  }
  return out ?? edges;
}

class NodeIndex {
  private readonly cells = new Map<string, { p: Vec; id: number }[]>();
  private count = 0;

  constructor(private readonly tolerance: number) {}

  find(p: Vec): number {
    const size = this.tolerance > 0 ? this.tolerance : 1e-9;
    const cx = Math.floor(p.x / size);
    const cy = Math.floor(p.y / size);
    for (let dx = -1; dx <= 1; dx += 1) {
      for (let dy = -1; dy <= 1; dy += 1) {
        for (const node of this.cells.get(`${cx + dx},${cy + dy}`) ?? []) {
          if (near(node.p, p, this.tolerance)) return node.id;
        }
      }
    }
    const id = this.count;
    this.count += 1;
    const key = `${cx},${cy}`;
    const cell = this.cells.get(key);
    if (cell) cell.push({ p, id });
    else this.cells.set(key, [{ p, id }]);
    return id;
  }
}
