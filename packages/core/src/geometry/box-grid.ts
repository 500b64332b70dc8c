import type { Bounds } from './bounds';

const MAX_CELLS_PER_BOX = 4096;

/**
 * A uniform grid over boxes, answering "which boxes may hold this point". The cells' lists sit
 * one after the other in one Int32Array (offsets by cell, as a compressed sparse row), built by
 * counting first, so a drawing of many parts makes no array per cell. A box too large for the
 * grid is returned for every point rather than stored in thousands of cells.
 */
export class BoxGrid {
  private readonly offsets: Int32Array;
  private readonly items: Int32Array;
  private readonly everywhere: number[] = [];
  private readonly minX: number;
  private readonly minY: number;
  private readonly size: number;
  private readonly columns: number;

  constructor(boxes: readonly Bounds[]) {
    let minX = Infinity;
    let minY = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    for (const box of boxes) {
      minX = Math.min(minX, box.minX);
      minY = Math.min(minY, box.minY);
      maxX = Math.max(maxX, box.maxX);
      maxY = Math.max(maxY, box.maxY);
    }
    const span = Math.max(maxX - minX, maxY - minY, 1e-9);
    const perSide = Math.max(1, Math.min(1024, Math.ceil(Math.sqrt(boxes.length))));
    this.minX = minX;
    this.minY = minY;
    this.size = span / perSide;
    this.columns = perSide + 1;
    // Each box's cell span, once: x0, y0, x1, y1, or x0 = -1 for a box stored everywhere.
    const spans = new Int32Array(boxes.length * 4);
    const counts = new Int32Array(this.columns * this.columns + 1);
    boxes.forEach((box, index) => {
      const x0 = this.slot(box.minX, this.minX);
      const y0 = this.slot(box.minY, this.minY);
      const x1 = this.slot(box.maxX, this.minX);
      const y1 = this.slot(box.maxY, this.minY);
      if ((x1 - x0 + 1) * (y1 - y0 + 1) > MAX_CELLS_PER_BOX) {
        this.everywhere.push(index);
        spans[4 * index] = -1;
        return;
      }
      spans.set([x0, y0, x1, y1], 4 * index);
      for (let x = x0; x <= x1; x += 1) {
        for (let y = y0; y <= y1; y += 1) {
          const cell = y * this.columns + x + 1;
          counts[cell] = (counts[cell] as number) + 1;
        }
      }
    });
    for (let cell = 1; cell < counts.length; cell += 1)
      counts[cell] = (counts[cell] as number) + (counts[cell - 1] as number);
    this.offsets = counts;
    this.items = new Int32Array(counts[counts.length - 1] as number);
    const filled = counts.slice(0, counts.length - 1);
    for (let index = 0; index < boxes.length; index += 1) {
      const x0 = spans[4 * index] as number;
      if (x0 < 0) continue;
      const y0 = spans[4 * index + 1] as number;
      const x1 = spans[4 * index + 2] as number;
      const y1 = spans[4 * index + 3] as number;
      for (let x = x0; x <= x1; x += 1) {
        for (let y = y0; y <= y1; y += 1) {
          const cell = y * this.columns + x;
          const at = filled[cell] as number;
          this.items[at] = index;
          filled[cell] = at + 1;
        }
      }
    }
  }

  /** Indices of the boxes that may hold the point (x, y), in increasing order of box within a cell. */
  candidates(x: number, y: number): ArrayLike<number> {
    const cell = this.slot(y, this.minY) * this.columns + this.slot(x, this.minX);
    const list = this.items.subarray(this.offsets[cell], this.offsets[cell + 1]);
    return this.everywhere.length === 0 ? list : [...list, ...this.everywhere];
  }

  /** Column (or row) of a coordinate, clamped to the grid. */
  private slot(value: number, min: number): number {
    return Math.min(this.columns - 1, Math.max(0, Math.floor((value - min) / this.size)));
  }
}
