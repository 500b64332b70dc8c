import type { EdgeRange, EdgeStore } from '../geometry/edge-store';
import type { MeasuredLoop } from './loop-geometry';

interface Shape {
  range: EdgeRange;
  reversed: boolean;
  angle: number;
}

/**
 * Directions of the minimum-area rectangles of the outlines measured so far, found again for a
 * copy of an outline moved without turning (array cells, repeated parts, inserts at other
 * points), so that the polygon, hull and calipers run once per shape instead of once per copy.
 * An outline is a copy when each of its edges, less its first point, equals the other's to the
 * bit; each copy's sides are still measured on its own edges.
 */
export class OutlineDirections {
  private readonly shapes = new Map<number, Shape[]>();
  private readonly bits = new Float64Array(1);
  private readonly words = new Uint32Array(this.bits.buffer);

  constructor(private readonly store: EdgeStore) {}

  /** The direction found for an earlier copy of `outline`, if any. */
  find(outline: MeasuredLoop): number | undefined {
    const range = outline.loop.range;
    for (const shape of this.shapes.get(this.hash(range)) ?? []) {
      if (shape.reversed === outline.reversed && this.sameShape(shape.range, range)) return shape.angle;
    }
    return undefined;
  }

  /** Keeps the direction measured for `outline` for its later copies. */
  add(outline: MeasuredLoop, angle: number): void {
    const range = outline.loop.range;
    const hash = this.hash(range);
    const shape = { range, reversed: outline.reversed, angle };
    const known = this.shapes.get(hash);
    if (known) known.push(shape);
    else this.shapes.set(hash, [shape]);
  }

  /** FNV-1a over the bits of every edge less the first point. */
  private hash({ start, end }: EdgeRange): number {
    const store = this.store;
    const x0 = store.ax(start);
    const y0 = store.ay(start);
    let hash = Math.imul(0x811c9dc5 ^ (end - start), 0x01000193);
    for (let i = start; i < end; i += 1) {
      hash = this.mix(hash, store.ax(i) - x0);
      hash = this.mix(hash, store.ay(i) - y0);
      hash = this.mix(hash, store.bx(i) - x0);
      hash = this.mix(hash, store.by(i) - y0);
      hash = this.mix(hash, store.bulge(i));
    }
    return hash;
  }

  private mix(hash: number, value: number): number {
    this.bits[0] = value;
    const low = Math.imul(hash ^ (this.words[0] as number), 0x01000193);
    return Math.imul(low ^ (this.words[1] as number), 0x01000193);
  }

  private sameShape(p: EdgeRange, q: EdgeRange): boolean {
    const store = this.store;
    if (p.end - p.start !== q.end - q.start) return false;
    const px = store.ax(p.start);
    const py = store.ay(p.start);
    const qx = store.ax(q.start);
    const qy = store.ay(q.start);
    for (let k = 0; k < p.end - p.start; k += 1) {
      const i = p.start + k;
      const j = q.start + k;
      if (
        store.ax(i) - px !== store.ax(j) - qx ||
        store.ay(i) - py !== store.ay(j) - qy ||
        store.bx(i) - px !== store.bx(j) - qx ||
        store.by(i) - py !== store.by(j) - qy ||
        store.bulge(i) !== store.bulge(j)
      )
        return false;
    }
    return true;
  }
}
