import type { Bounds } from './bounds';
import type { Vec } from './vec';

const MAX_CELLS_PER_BOX = 4096;

/**
 * A uniform grid over boxes, answering "which boxes may hold this point". A box too large for
 * the grid is returned for every point rather than stored in thousands of cells.
 */
export class BoxGrid {
  private readonly cells: (number[] | undefined)[];
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
    this.cells = new Array<number[] | undefined>(this.columns * this.columns);
    boxes.forEach((box, index) => {
      const x0 = this.slot(box.minX, this.minX);
      const y0 = this.slot(box.minY, this.minY);
      const x1 = this.slot(box.maxX, this.minX);
      const y1 = this.slot(box.maxY, this.minY);
      if ((x1 - x0 + 1) * (y1 - y0 + 1) > MAX_CELLS_PER_BOX) {
        this.everywhere.push(index);
        return;
      }
      for (let x = x0; x <= x1; x += 1) {
        for (let y = y0; y <= y1; y += 1) {
          const key = y * this.columns + x;
          const list = this.cells[key];
          if (list) list.push(index);
          else this.cells[key] = [index];
        }
      }
    });
  }

  candidates(p: Vec): readonly number[] {
    const list = this.cells[this.slot(p.y, this.minY) * this.columns + this.slot(p.x, this.minX)] ?? [];
    return this.everywhere.length === 0 ? list : list.concat(this.everywhere);
  }

  /** Column (or row) of a coordinate, clamped to the grid. */
  private slot(value: number, min: number): number {
    return Math.min(this.columns - 1, Math.max(0, Math.floor((value - min) / this.size)));
  }
}
