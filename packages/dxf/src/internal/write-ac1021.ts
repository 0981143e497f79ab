/**
 * Sheet -> DXF AC1021 (AutoCAD 2007 format) text through dxf-writer: closed
 * contours as LWPOLYLINE with bulges, ARC, CIRCLE, LINE, TEXT, layers with
 * explicit colours, `$INSUNITS` and `$MEASUREMENT` for the unit, `$EXTMIN` /
 * `$EXTMAX`. dxf-writer supplies the handles, owner
 * pointers, block records and objects a modern reader expects.
 */
import Drawing from 'dxf-writer';
import { DXF_LAYER_ORDER, DXF_LAYERS } from '../layers.js';
import { ANGLE_DECIMALS, BULGE_DECIMALS, COORD_DECIMALS } from '../tolerances.js';
import { formatDxfNumber } from './format-number.js';
import type { Sheet, SheetEntity } from './sheet.js';
import { sheetExtents } from './extents.js';
import { MEASUREMENT_CODE } from './units-header.js';

/**
 * dxf-writer prints whatever it is given with `String()`, which turns small
 * numbers into exponent notation (`1e-7`). Passing our fixed-decimal text keeps
 * every number plain; the cast only satisfies its number-typed signatures.
 */
const c = (v: number): number => formatDxfNumber(v, COORD_DECIMALS) as unknown as number;
const a = (v: number): number => formatDxfNumber(v, ANGLE_DECIMALS) as unknown as number;
const b = (v: number): number => formatDxfNumber(v, BULGE_DECIMALS) as unknown as number;

function draw(d: Drawing, e: SheetEntity): void {
  d.setActiveLayer(DXF_LAYERS[e.layer].name);
  switch (e.kind) {
    case 'polyline':
      d.drawPolyline(
        e.vertices.map(([x, y, bulge]) => (bulge === 0 ? [c(x), c(y)] : [c(x), c(y), b(bulge)])) as Array<[number, number]>,
        e.closed,
      );
      return;
    case 'line':
      d.drawLine(c(e.from[0]), c(e.from[1]), c(e.to[0]), c(e.to[1]));
      return;
    case 'arc':
      d.drawArc(c(e.center[0]), c(e.center[1]), c(e.radius), a(e.startDeg), a(e.endDeg));
      return;
    case 'circle':
      d.drawCircle(c(e.center[0]), c(e.center[1]), c(e.radius));
      return;
    case 'text':
      if (e.align === 'center') d.drawText(c(e.at[0]), c(e.at[1]), c(e.height), e.rotationDeg ?? 0, e.text, 'center', 'baseline');
      else d.drawText(c(e.at[0]), c(e.at[1]), c(e.height), e.rotationDeg ?? 0, e.text);
      return;
  }
}

/** The AC1021 DXF text of a sheet (ASCII, LF line ends, ends with `EOF`). */
export function writeAc1021(sheet: Sheet): string {
  const d = new Drawing();
  d.setUnits(sheet.units === 'in' ? 'Inches' : 'Millimeters');
  d.header('MEASUREMENT', [[70, MEASUREMENT_CODE[sheet.units]]]);
  const ext = sheetExtents(sheet.entities);
  d.header('EXTMIN', [[10, c(ext.min[0])], [20, c(ext.min[1])], [30, 0]]);
  d.header('EXTMAX', [[10, c(ext.max[0])], [20, c(ext.max[1])], [30, 0]]);
  for (const role of DXF_LAYER_ORDER) d.addLayer(DXF_LAYERS[role].name, DXF_LAYERS[role].colorAci, 'CONTINUOUS');
  for (const e of sheet.entities) draw(d, e);
  return d.toDxfString() + '\n';
}
