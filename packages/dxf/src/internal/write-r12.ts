/**
 * Sheet -> DXF R12 (AC1009) text, written here group by group: a comment
 * naming the unit in words (R12 defines no unit variable: $INSUNITS and
 * $MEASUREMENT came later), HEADER with $ACADVER and $EXTMIN / $EXTMAX, LTYPE / LAYER / STYLE tables, an empty BLOCKS
 * section, and ENTITIES as POLYLINE / VERTEX / SEQEND (bulges in group 42),
 * ARC, CIRCLE, LINE and TEXT. No handles (R12 does not need them). Group codes
 * are right-aligned in three columns and lines end in CR LF, as R12-era
 * software wrote and expects.
 */
import { DXF_LAYER_ORDER, DXF_LAYERS } from '../layers.js';
import { ANGLE_DECIMALS, BULGE_DECIMALS, COORD_DECIMALS } from '../tolerances.js';
import type { DxfLayerRole } from '../types.js';
import { formatDxfNumber } from './format-number.js';
import type { Sheet, SheetEntity } from './sheet.js';
import { sheetExtents } from './extents.js';
import { unitComment } from './units-header.js';


/** Group codes right-aligned in three columns, made once. */
const CODE_TEXT: readonly string[] = Array.from({ length: 1072 }, (_, code) => String(code).padStart(3, ' '));

function groups(): { push(code: number, value: string): void; coord(code: number, v: number): void; text(): string } {
  const lines: string[] = [];
  return {
    push(code, value) {
      // Values here are layer names, keywords, numbers and dxfSafeText output: never a line break.
      lines.push(CODE_TEXT[code]!, value);
    },
    coord(code, v) {
      lines.push(CODE_TEXT[code]!, formatDxfNumber(v, COORD_DECIMALS));
    },
    text() {
      return lines.join('\r\n') + '\r\n';
    },
  };
}

type Groups = ReturnType<typeof groups>;

const layerName = (role: DxfLayerRole): string => DXF_LAYERS[role].name;

function point(g: Groups, x: number, y: number, base = 10): void {
  g.coord(base, x);
  g.coord(base + 10, y);
  g.push(base + 20, '0'); // flat: z is always 0
}

function writeEntity(g: Groups, e: SheetEntity): void {
  const layer = layerName(e.layer);
  switch (e.kind) {
    case 'polyline':
      g.push(0, 'POLYLINE');
      g.push(8, layer);
      g.push(66, '1');
      point(g, 0, 0);
      g.push(70, e.closed ? '1' : '0');
      for (const [x, y, bulge] of e.vertices) {
        g.push(0, 'VERTEX');
        g.push(8, layer);
        point(g, x, y);
        if (bulge !== 0) g.push(42, formatDxfNumber(bulge, BULGE_DECIMALS));
      }
      g.push(0, 'SEQEND');
      g.push(8, layer);
      return;
    case 'line':
      g.push(0, 'LINE');
      g.push(8, layer);
      point(g, e.from[0], e.from[1]);
      point(g, e.to[0], e.to[1], 11);
      return;
    case 'arc':
      g.push(0, 'ARC');
      g.push(8, layer);
      point(g, e.center[0], e.center[1]);
      g.coord(40, e.radius);
      g.push(50, formatDxfNumber(e.startDeg, ANGLE_DECIMALS));
      g.push(51, formatDxfNumber(e.endDeg, ANGLE_DECIMALS));
      return;
    case 'circle':
      g.push(0, 'CIRCLE');
      g.push(8, layer);
      point(g, e.center[0], e.center[1]);
      g.coord(40, e.radius);
      return;
    case 'text':
      g.push(0, 'TEXT');
      g.push(8, layer);
      point(g, e.at[0], e.at[1]);
      g.coord(40, e.height);
      g.push(1, e.text);
      if (e.rotationDeg !== undefined && e.rotationDeg !== 0) g.coord(50, e.rotationDeg);
      if (e.align === 'center') {
        g.push(72, '1'); // centred horizontally on the baseline (vertical alignment 0, the default)
        point(g, e.at[0], e.at[1], 11);
      }
      return;
  }
}

/** The R12 DXF text of a sheet (ASCII, CR LF line ends, ends with `EOF`). */
export function writeR12(sheet: Sheet): string {
  const g = groups();
  // R12 defines neither $INSUNITS nor $MEASUREMENT (both came with later versions): the unit is said in words
  // in this comment line and in the title block's text.
  g.push(999, unitComment(sheet.units));
  g.push(0, 'SECTION');
  g.push(2, 'HEADER');
  g.push(9, '$ACADVER');
  g.push(1, 'AC1009');
  const ext = sheetExtents(sheet.entities);
  g.push(9, '$EXTMIN');
  point(g, ext.min[0], ext.min[1]);
  g.push(9, '$EXTMAX');
  point(g, ext.max[0], ext.max[1]);
  g.push(0, 'ENDSEC');

  g.push(0, 'SECTION');
  g.push(2, 'TABLES');
  g.push(0, 'TABLE');
  g.push(2, 'LTYPE');
  g.push(70, '1');
  g.push(0, 'LTYPE');
  g.push(2, 'CONTINUOUS');
  g.push(70, '0');
  g.push(3, 'Solid line');
  g.push(72, '65');
  g.push(73, '0');
  g.push(40, '0');
  g.push(0, 'ENDTAB');
  g.push(0, 'TABLE');
  g.push(2, 'LAYER');
  g.push(70, String(DXF_LAYER_ORDER.length + 1));
  for (const [name, color] of [['0', 7] as const, ...DXF_LAYER_ORDER.map((r) => [DXF_LAYERS[r].name, DXF_LAYERS[r].colorAci] as const)]) {
    g.push(0, 'LAYER');
    g.push(2, name);
    g.push(70, '0');
    g.push(62, String(color));
    g.push(6, 'CONTINUOUS');
  }
  g.push(0, 'ENDTAB');
  g.push(0, 'TABLE');
  g.push(2, 'STYLE');
  g.push(70, '1');
  g.push(0, 'STYLE');
  g.push(2, 'STANDARD');
  g.push(70, '0');
  g.push(40, '0');
  g.push(41, '1');
  g.push(50, '0');
  g.push(71, '0');
  g.push(42, '2.5');
  g.push(3, 'txt');
  g.push(4, '');
  g.push(0, 'ENDTAB');
  g.push(0, 'ENDSEC');

  g.push(0, 'SECTION');
  g.push(2, 'BLOCKS');
  g.push(0, 'ENDSEC');

  g.push(0, 'SECTION');
  g.push(2, 'ENTITIES');
  for (const e of sheet.entities) writeEntity(g, e);
  g.push(0, 'ENDSEC');
  g.push(0, 'EOF');
  return g.text();
}
