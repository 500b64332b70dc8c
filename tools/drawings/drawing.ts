import { DxfWriter, LWPolylineFlags, point3d, Units } from '@tarikjabiri/dxf';
import { place, placePoint, type Placement, type Vertex } from './shapes';

/** Anything entities can be added to: the model space of a drawing or a block. */
type Target = Pick<DxfWriter, 'addLWPolyline' | 'addCircle' | 'addText' | 'addInsert' | 'addLine' | 'addArc'>;

export type DrawingUnits = 'mm' | 'in' | 'unitless';

/** A new drawing declaring its units in $INSUNITS. */
export function newDrawing(units: DrawingUnits = 'mm'): DxfWriter {
  const writer = new DxfWriter();
  writer.setUnits(units === 'mm' ? Units.Millimeters : units === 'in' ? Units.Inches : Units.Unitless);
  return writer;
}

export function addLayer(writer: DxfWriter, name: string): void {
  if (!writer.layer(name)) writer.addLayer(name, 7, 'CONTINUOUS');
}

export interface PartDrawing {
  outline: Vertex[];
  /** Round holes: centre and diameter, in the part's own coordinates. */
  holes?: { x: number; y: number; diameter: number }[];
  /** Other closed cut-outs (slots, pockets) in the part's own coordinates. */
  cutouts?: Vertex[][];
  /** A label placed inside the outline, at `labelAt`. */
  label?: string;
  labelAt?: { x: number; y: number };
}

/** Draws a part (outline, holes, cut-outs, label) at a placement on a layer. */
export function drawPart(target: Target, part: PartDrawing, placement: Placement = {}, layerName = '0'): void {
  const options = { flags: LWPolylineFlags.Closed, layerName };
  const vertices = (list: Vertex[]) =>
    place(list, placement).map((v) => ({ point: { x: v.x, y: v.y }, bulge: v.bulge }));
  target.addLWPolyline(vertices(part.outline), options);
  for (const hole of part.holes ?? []) {
    const c = placePoint(hole.x, hole.y, placement);
    target.addCircle(point3d(c.x, c.y, 0), hole.diameter / 2, { layerName });
  }
  for (const cutout of part.cutouts ?? []) target.addLWPolyline(vertices(cutout), options);
  if (part.label && part.labelAt) {
    const at = placePoint(part.labelAt.x, part.labelAt.y, placement);
    target.addText(point3d(at.x, at.y, 0), 5, part.label, { layerName });
  }
}

/** Defines a block holding one part drawn at its base point. */
export function definePartBlock(writer: DxfWriter, name: string, part: PartDrawing, layerName = '0'): void {
  drawPart(writer.addBlock(name), part, {}, layerName);
}

export interface InsertPlacement extends Placement {
  scale?: number;
  columns?: number;
  rows?: number;
  columnSpacing?: number;
  rowSpacing?: number;
  layerName?: string;
}

export function insertBlock(target: Target, name: string, at: InsertPlacement = {}): void {
  target.addInsert(name, point3d(at.x ?? 0, at.y ?? 0, 0), {
    rotationAngle: at.angle ?? 0,
    scaleFactor: { x: at.scale ?? 1, y: at.scale ?? 1, z: 1 },
    columnCount: at.columns ?? 1,
    rowCount: at.rows ?? 1,
    columnSpacing: at.columnSpacing ?? 0,
    rowSpacing: at.rowSpacing ?? 0,
    ...(at.layerName ? { layerName: at.layerName } : {}),
  });
}
