/** An axis-aligned box; an empty box has min > max. */
export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export const EMPTY_BOUNDS: Bounds = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };

export function unionBounds(p: Bounds, q: Bounds): Bounds {
  return {
    minX: Math.min(p.minX, q.minX),
    minY: Math.min(p.minY, q.minY),
    maxX: Math.max(p.maxX, q.maxX),
    maxY: Math.max(p.maxY, q.maxY),
  };
}

export function isEmptyBounds(box: Bounds): boolean {
  return !(box.minX <= box.maxX && box.minY <= box.maxY);
}

/** Whether `outer` contains `inner`, allowing `slack` on every side. */
export function containsBounds(outer: Bounds, inner: Bounds, slack = 0): boolean {
  return (
    inner.minX >= outer.minX - slack &&
    inner.minY >= outer.minY - slack &&
    inner.maxX <= outer.maxX + slack &&
    inner.maxY <= outer.maxY + slack
  );
}
