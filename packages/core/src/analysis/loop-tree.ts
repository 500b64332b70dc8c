import { containsBounds } from '../geometry/bounds';
import { BoxGrid } from '../geometry/box-grid';
import type { EdgeStore } from '../geometry/edge-store';
import { pointInLoop } from '../geometry/point-in-loop';
import type { MeasuredLoop } from './loop-geometry';

/** For each loop, the loop that most closely encloses it (-1 for none) and its nesting depth. */
export interface LoopTree {
  parent: Int32Array;
  depth: Int32Array;
  /** The loops' boxes on a grid, for later point queries against the same loops. */
  grid: BoxGrid;
}

/**
 * Finds the nearest enclosing loop of every loop: a loop inside a loop is a hole of it, a loop
 * inside a hole a new part. Candidates come from a uniform grid over the loops' boxes, so a
 * drawing of many small parts does not compare every loop with every other.
 */
export function buildLoopTree(store: EdgeStore, loops: readonly MeasuredLoop[]): LoopTree {
  const n = loops.length;
  const parent = new Int32Array(n).fill(-1);
  const depth = new Int32Array(n);
  const grid = new BoxGrid(loops.map((loop) => loop.bounds));
  if (n === 0) return { parent, depth, grid };
  const areas = Float64Array.from(loops, (loop) => Math.abs(loop.signedArea));
  const order = [...loops.keys()].sort((i, j) => (areas[j] as number) - (areas[i] as number));
  for (const i of order) {
    const loop = loops[i] as MeasuredLoop;
    const first = loop.loop.range.start;
    if (loop.loop.range.end <= first) continue;
    const px = store.ax(first);
    const py = store.ay(first);
    const area = areas[i] as number;
    let best = -1;
    let bestArea = Infinity;
    const candidates = grid.candidates(px, py);
    for (let k = 0; k < candidates.length; k += 1) {
      const j = candidates[k] as number;
      if (j === i) continue;
      const other = loops[j] as MeasuredLoop;
      const otherArea = areas[j] as number;
      if (otherArea <= area || otherArea >= bestArea) continue;
      if (!containsBounds(other.bounds, loop.bounds, 1e-9)) continue;
      if (pointInLoop(px, py, store, other.loop.range)) {
        best = j;
        bestArea = otherArea;
      }
    }
    parent[i] = best;
  }
  // Larger loops come first in `order`, and a parent is always larger, so depths fill in one pass.
  for (const i of order) {
    const p = parent[i] as number;
    depth[i] = p < 0 ? 0 : (depth[p] as number) + 1;
  }
  return { parent, depth, grid };
}
