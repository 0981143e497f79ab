/**
 * A sheet plan as PDF drawing operators, in the plan's own coordinates (mm,
 * y-up): the same items, roles, weights and greys as the SVG writer, in the
 * plan's drawing order. Written once per sheet as a form XObject that every
 * page of the sheet (and the assembly map) draws through its own window.
 */
import {
  beginText,
  endText,
  fill,
  LineCapStyle,
  popGraphicsState,
  pushGraphicsState,
  rectangle,
  setDashPattern,
  setFillingGrayscaleColor,
  setFontAndSize,
  setLineCap,
  setLineJoin,
  LineJoinStyle,
  setLineWidth,
  setStrokingGrayscaleColor,
  setTextMatrix,
  setTextRenderingMode,
  showText,
  stroke,
  TextRenderingMode,
  type PDFFont,
  type PDFOperator,
} from 'pdf-lib';
import { DASH_MM, INK, STROKE_MM, type SheetItem, type SheetPath, type SheetPathRole, type SheetPlan, type SheetText } from '@girth/sheet';
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
};

/** Weight of the halo behind the words on the glue tab, mm (as the SVG). */
const HALO_MM = 0.6;

function strokeOps(style: Stroke, body: readonly PDFOperator[]): PDFOperator[] {
  return [
    pushGraphicsState(),
    setStrokingGrayscaleColor(style.grey),
    setLineWidth(style.widthMm),
    setLineCap(style.butt === true ? LineCapStyle.Butt : LineCapStyle.Round),
    setLineJoin(LineJoinStyle.Round),
    ...(style.dashMm ? [setDashPattern([...style.dashMm], 0)] : []),
    ...body,
    stroke(),
    popGraphicsState(),
  ];
}

function pathItem(item: SheetPath): PDFOperator[] {
  const body: PDFOperator[] = [];
  partOps(item.part, body);
  return strokeOps(PATH_STYLE[item.role], body);
}

function boldText(t: SheetText): boolean {
  return t.bold || t.role === 'label' || t.role === 'caution';
}

/**
 * Text operators for one block of text at `at` (first baseline), mm y-up,
 * anchored and turned as the plan says. The font resource is `fontKey`.
 */
export function textOps(t: SheetText, font: PDFFont, fontKey: string): PDFOperator[] {
  const ops: PDFOperator[] = [setFontAndSize(fontKey, t.fontMm)];
  const turned = t.rotateDeg === 90;
  t.lines.forEach((raw, i) => {
    const line = printable(font, raw);
    if (line === '') return;
    const width = font.widthOfTextAtSize(line, t.fontMm);
    const x = t.at[0] - (t.anchor === 'middle' ? width / 2 : 0);
    const y = t.at[1] - i * t.lineMm;
    if (turned) {
      const [px, py] = t.pivot;
      ops.push(setTextMatrix(0, 1, -1, 0, px - (y - py), py + (x - px)));
    } else {
      ops.push(setTextMatrix(1, 0, 0, 1, x, y));
    }
    ops.push(showText(font.encodeText(line)));
  });
  return ops;
}

function textItem(t: SheetText, fonts: Fonts): PDFOperator[] {
  const bold = boldText(t);
  const font = bold ? fonts.bold : fonts.regular;
  const key = bold ? FONT_KEYS.bold : FONT_KEYS.regular;
  const body = textOps(t, font, key);
  const halo =
    t.role === 'overlap'
      ? [setStrokingGrayscaleColor(1), setLineWidth(HALO_MM), setLineJoin(LineJoinStyle.Round), setTextRenderingMode(TextRenderingMode.Outline), beginText(), ...body, endText()]
      : [];
  return [pushGraphicsState(), ...halo, setFillingGrayscaleColor(0), setTextRenderingMode(TextRenderingMode.Fill), beginText(), ...body, endText(), popGraphicsState()];
}

function rectItem(item: Extract<SheetItem, { kind: 'rect' }>): PDFOperator[] {
  const b = item.box;
  const r = rectangle(b.minX, b.minY, b.maxX - b.minX, b.maxY - b.minY);
  if (item.filled) return [pushGraphicsState(), setFillingGrayscaleColor(0), r, fill(), popGraphicsState()];
  return strokeOps({ grey: grey(INK.mid), widthMm: STROKE_MM.overlapOutline, butt: true }, [r]);
}

/**
 * Every item of the plan as PDF operators, in the plan's coordinates (mm, y-up).
 * @example const ops = sheetOps(planSheet(template), fonts);
 */
export function sheetOps(plan: SheetPlan, fonts: Fonts): PDFOperator[] {
  const out: PDFOperator[] = [];
  for (const item of plan.items) {
    if (item.kind === 'path') out.push(...pathItem(item));
    else if (item.kind === 'text') out.push(...textItem(item, fonts));
    else out.push(...rectItem(item));
  }
  return out;
}
