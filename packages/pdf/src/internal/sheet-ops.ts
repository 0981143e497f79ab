/**
 * A sheet plan as PDF drawing operators, in the plan's own coordinates (mm,
 * y-up): the same items, roles, weights and greys as the SVG writer, in the
 * plan's drawing order. Written once per sheet as a form XObject that every
 * page of the sheet (and the assembly map) draws through its own window.
 */
import type { PDFFont } from 'pdf-lib';
import { DASH_MM, INK, STROKE_MM, type SheetItem, type SheetPath, type SheetPathRole, type SheetPlan, type SheetText } from '@girth/sheet';
import { num, rect, strokeStyle } from './content.js';
import { showAt } from './draw.js';
import { FONT_KEYS, type Fonts } from './fonts.js';
import { printable } from './glyphs.js';
import { partOps } from './path-ops.js';

/** Grey level (0 black, 1 white) of a `#rrggbb` grey. */
export function grey(hex: string): number {
  return parseInt(hex.slice(1, 3), 16) / 255;
}

interface Stroke {
  readonly grey: number;
  readonly widthMm: number;
  readonly dashMm?: readonly number[];
  readonly butt?: boolean;
}

const PATH_STYLE: Readonly<Record<SheetPathRole, Stroke>> = {
  cut: { grey: grey(INK.black), widthMm: STROKE_MM.cut },
  'square-line': { grey: grey(INK.black), widthMm: STROKE_MM.squareLine },
  'station-line': { grey: grey(INK.dark), widthMm: STROKE_MM.stations },
  mark: { grey: grey(INK.mid), widthMm: STROKE_MM.marks, dashMm: DASH_MM.marks },
  'overlap-hatch': { grey: grey(INK.light), widthMm: STROKE_MM.overlapHatch, butt: true },
  'overlap-align': { grey: grey(INK.black), widthMm: STROKE_MM.overlapAlign, dashMm: DASH_MM.overlapAlign, butt: true },
  'title-rule': { grey: grey(INK.mid), widthMm: 0.25 },
  'reference-line': { grey: grey(INK.black), widthMm: STROKE_MM.squareLine, dashMm: DASH_MM.marks },
  'ordinate-line': { grey: grey(INK.dark), widthMm: STROKE_MM.stations },
};

/** Weight of the halo behind the words on the glue tab, mm (as the SVG). */
const HALO_MM = 0.6;

function stroked(style: Stroke, body: string): string {
  return `q\n${strokeStyle(style.grey, style.widthMm, style.butt === true ? 0 : 1, style.dashMm)}${body}S\nQ\n`;
}

function boldText(t: SheetText): boolean {
  return t.bold || t.role === 'label' || t.role === 'caution';
}

/**
 * Text operators for one block of text at `at` (first baseline), mm y-up,
 * anchored and turned as the plan says (inside BT ... ET). The font resource is `fontKey`.
 */
export function textOps(t: SheetText, font: PDFFont, fontKey: string): string {
  let s = `/${fontKey} ${num(t.fontMm)} Tf\n`;
  const turned = t.rotateDeg === 90;
  t.lines.forEach((raw, i) => {
    const line = printable(font, raw);
    if (line === '') return;
    const width = font.widthOfTextAtSize(line, t.fontMm);
    const x = t.at[0] - (t.anchor === 'middle' ? width / 2 : 0);
    const y = t.at[1] - i * t.lineMm;
    if (turned) {
      const [px, py] = t.pivot;
      s += showAt(font, line, 0, 1, -1, 0, px - (y - py), py + (x - px));
    } else {
      s += showAt(font, line, 1, 0, 0, 1, x, y);
    }
  });
  return s;
}

function textItem(t: SheetText, fonts: Fonts): string {
  const bold = boldText(t);
  const body = textOps(t, bold ? fonts.bold : fonts.regular, bold ? FONT_KEYS.bold : FONT_KEYS.regular);
  const halo = t.role === 'overlap' ? `1 G ${num(HALO_MM)} w 1 j 1 Tr\nBT\n${body}ET\n` : '';
  return `q\n${halo}0 g 0 Tr\nBT\n${body}ET\nQ\n`;
}

function rectItem(item: Extract<SheetItem, { kind: 'rect' }>): string {
  const b = item.box;
  const r = rect(b.minX, b.minY, b.maxX - b.minX, b.maxY - b.minY);
  if (item.filled) return `q\n0 g\n${r}f\nQ\n`;
  return stroked({ grey: grey(INK.mid), widthMm: STROKE_MM.overlapOutline, butt: true }, r);
}

function pathItem(item: SheetPath): string {
  return stroked(PATH_STYLE[item.role], partOps(item.part));
}

/**
 * Every item of the plan as PDF content, in the plan's coordinates (mm, y-up).
 * @example const content = sheetOps(planSheet(template), fonts);
 */
export function sheetOps(plan: SheetPlan, fonts: Fonts): string {
  const out: string[] = [];
  for (const item of plan.items) {
    if (item.kind === 'path') out.push(pathItem(item));
    else if (item.kind === 'text') out.push(textItem(item, fonts));
    else out.push(rectItem(item));
  }
  return out.join('');
}
