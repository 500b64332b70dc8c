import type { Edge } from './edge';

/** Numbers kept per edge: start x, start y, end x, end y, DXF bulge. */
const STRIDE = 5;

/** A run of consecutive edges in an `EdgeStore`: indices `start` up to, not including, `end`. */
export interface EdgeRange {
  start: number;
  end: number;
}

/**
 * The edges of a whole drawing in one growing Float64Array, five numbers each. As objects, every
 * edge would cost an edge, two points and their boxed numbers for the collector to trace; a
 * drawing of 100k entities holds about half a million edges. The store only grows: a range once
 * written never changes, so that pieces, loops and their measures can share it.
 */
export class EdgeStore {
  private data: Float64Array;
  private size = 0;

  constructor(capacity = 1024) {
    this.data = new Float64Array(Math.max(1, capacity) * STRIDE);
  }

  /** A store holding the given edges, in order, at indices 0, 1, 2… */
  static of(edges: readonly Edge[]): EdgeStore {
    const store = new EdgeStore(edges.length);
    for (const edge of edges) store.push(edge.a.x, edge.a.y, edge.b.x, edge.b.y, edge.bulge);
    return store;
  }

  /** Number of edges written so far: the index the next edge gets. */
  get count(): number {
    return this.size;
  }

  /** Appends an edge; returns its index. */
  push(ax: number, ay: number, bx: number, by: number, bulge: number): number {
    if ((this.size + 1) * STRIDE > this.data.length) {
      const grown = new Float64Array(this.data.length * 2);
      grown.set(this.data);
      this.data = grown;
    }
    const at = this.size * STRIDE;
    const data = this.data;
    data[at] = ax;
    data[at + 1] = ay;
    data[at + 2] = bx;
    data[at + 3] = by;
    data[at + 4] = bulge;
    this.size += 1;
    return this.size - 1;
  }

  /** Appends the edges of `range` running the other way: last first, ends swapped, bulges negated. */
  pushReversed(range: EdgeRange): EdgeRange {
    const start = this.size;
    for (let i = range.end - 1; i >= range.start; i -= 1) {
      this.push(this.bx(i), this.by(i), this.ax(i), this.ay(i), -this.bulge(i));
    }
    return { start, end: this.size };
  }

  /** Appends a copy of the edges of `range`, in order. */
  pushCopy(range: EdgeRange): EdgeRange {
    const start = this.size;
    for (let i = range.start; i < range.end; i += 1) {
      this.push(this.ax(i), this.ay(i), this.bx(i), this.by(i), this.bulge(i));
    }
    return { start, end: this.size };
  }

  ax(i: number): number {
    return this.data[i * STRIDE] as number;
  }

  ay(i: number): number {
    return this.data[i * STRIDE + 1] as number;
  }

  bx(i: number): number {
    return this.data[i * STRIDE + 2] as number;
  }

  by(i: number): number {
    return this.data[i * STRIDE + 3] as number;
  }

  bulge(i: number): number {
    return this.data[i * STRIDE + 4] as number;
  }

  /** Edge `i` as a plain object, for output and tests. */
  edge(i: number): Edge {
    return { a: { x: this.ax(i), y: this.ay(i) }, b: { x: this.bx(i), y: this.by(i) }, bulge: this.bulge(i) };
  }

  /** The edges of `range` as plain objects. */
  edges(range: EdgeRange): Edge[] {
    const out: Edge[] = [];
    for (let i = range.start; i < range.end; i += 1) out.push(this.edge(i));
    return out;
  }
}
