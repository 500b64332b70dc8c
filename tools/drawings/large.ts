import { drawPart, newDrawing } from './drawing';
import { roundedRectangle } from './shapes';

/**
 * A drawing of about `entities` entities for benchmarks: a grid of parts, each a rounded
 * rectangle with two holes and a label (4 entities), with lines and arcs of an open frame filling
 * any remainder.
 */
export function largeDrawing(entities: number): string {
  const dxf = newDrawing('mm');
  const parts = Math.floor(entities / 4);
  const columns = Math.max(1, Math.ceil(Math.sqrt(parts)));
  for (let i = 0; i < parts; i += 1) {
    const x = (i % columns) * 120;
    const y = Math.floor(i / columns) * 80;
    drawPart(
      dxf,
      {
        outline: roundedRectangle(100, 60, 6),
        holes: [
          { x: 20, y: 30, diameter: 8 },
          { x: 80, y: 30, diameter: 8 },
        ],
        label: `P${i % 50}`,
        labelAt: { x: 50, y: 20 },
      },
      { x, y },
    );
  }
  for (let i = parts * 4; i < entities; i += 1) dxf.addLine({ x: -50, y: i, z: 0 }, { x: -20, y: i, z: 0 });
  return dxf.stringify();
}
