import { addLayer, definePartBlock, drawPart, insertBlock, newDrawing } from './drawing';
import { roundedRectangle, slot } from './shapes';

/** The golden drawings: name → DXF text. Invented parts of an invented crosscut sled. */
export const FIXTURE_DRAWINGS: Record<string, () => string> = {
  rectangle: () => {
    const dxf = newDrawing('mm');
    addLayer(dxf, 'base-18mm');
    drawPart(dxf, { outline: roundedRectangle(600, 400) }, {}, 'base-18mm');
    return dxf.stringify();
  },
  'rounded-corners': () => {
    const dxf = newDrawing('mm');
    drawPart(dxf, { outline: roundedRectangle(300, 120, 20), label: 'Runner cap', labelAt: { x: 150, y: 60 } });
    return dxf.stringify();
  },
  'holes-and-slots': () => {
    const dxf = newDrawing('mm');
    drawPart(dxf, {
      outline: roundedRectangle(500, 200, 10),
      holes: [
        { x: 40, y: 40, diameter: 8 },
        { x: 460, y: 40, diameter: 8 },
        { x: 250, y: 160, diameter: 35 },
      ],
      cutouts: [slot(120, 10).map((v) => ({ ...v, x: v.x + 250, y: v.y + 80 }))],
      label: 'Fence',
      labelAt: { x: 100, y: 100 },
    });
    return dxf.stringify();
  },
  'rotated-parts': () => {
    const dxf = newDrawing('mm');
    for (const [i, angle] of [0, 30, 45, 90, 137].entries()) {
      drawPart(
        dxf,
        { outline: roundedRectangle(250, 60, 5), holes: [{ x: 30, y: 30, diameter: 6 }] },
        { x: i * 400, y: 0, angle },
      );
    }
    return dxf.stringify();
  },
  'nested-arrayed-blocks': () => {
    const dxf = newDrawing('mm');
    definePartBlock(dxf, 'Spacer', { outline: roundedRectangle(40, 20, 3), holes: [{ x: 20, y: 10, diameter: 5 }] });
    const rack = dxf.addBlock('Spacer rack');
    insertBlock(rack, 'Spacer', { columns: 3, rows: 2, columnSpacing: 50, rowSpacing: 30 });
    insertBlock(dxf, 'Spacer rack', { x: 0, y: 0 });
    insertBlock(dxf, 'Spacer rack', { x: 300, y: 0, angle: 90 });
    insertBlock(dxf, 'Spacer', { x: 0, y: -100, scale: 2 });
    return dxf.stringify();
  },
  'inch-drawing': () => {
    const dxf = newDrawing('in');
    addLayer(dxf, 'oak 3/4in');
    drawPart(dxf, { outline: roundedRectangle(24, 3.5), holes: [{ x: 2, y: 1.75, diameter: 0.25 }] }, {}, 'oak 3/4in');
    drawPart(dxf, { outline: roundedRectangle(12, 12, 0.5), label: 'Stop block', labelAt: { x: 6, y: 6 } }, { x: 30 });
    return dxf.stringify();
  },
};
