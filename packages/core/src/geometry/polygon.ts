/**
 * Polygons as flat lists of coordinates, [x0, y0, x1, y1, …], closed back to the first point:
 * the form large drawings keep their many outlines in.
 */
export type FlatPolygon = readonly number[];

/** Even-odd ray test; points on the boundary may fall either way. */
export function pointInPolygon(x: number, y: number, polygon: FlatPolygon): boolean {
  let inside = false;
  const n = polygon.length;
  for (let i = 0, j = n - 2; i < n; j = i, i += 2) {
    const ax = polygon[i] as number;
    const ay = polygon[i + 1] as number;
    const bx = polygon[j] as number;
    const by = polygon[j + 1] as number;
    if (ay > y !== by > y && x < ((bx - ax) * (y - ay)) / (by - ay) + ax) inside = !inside;
  }
  return inside;
}

/** Shoelace area, positive counter-clockwise. */
export function polygonSignedArea(polygon: FlatPolygon): number {
  let sum = 0;
  const n = polygon.length;
  for (let i = 0, j = n - 2; i < n; j = i, i += 2) {
    sum += (polygon[j] as number) * (polygon[i + 1] as number) - (polygon[i] as number) * (polygon[j + 1] as number);
  }
  return sum / 2;
}
