/**
 * Small drawing helpers for page furniture, in page millimetres (y up; the
 * page's content starts by scaling points to mm).
 */
import {
  appendBezierCurve,
  beginText,
  closePath,
  endText,
  fill,
  lineTo,
  moveTo,
  popGraphicsState,
  pushGraphicsState,
  rectangle,
  setFillingGrayscaleColor,
  setFontAndSize,
  setLineWidth,
  setStrokingGrayscaleColor,
  setTextMatrix,
  showText,
  stroke,
  type PDFFont,
  type PDFOperator,
} from 'pdf-lib';
import { printable } from './glyphs.js';

/** A stroked polyline (open), black unless `greyLevel` is given. */
export function lineOps(points: readonly (readonly [number, number])[], widthMm: number, greyLevel = 0): PDFOperator[] {
  return [
    pushGraphicsState(),
    setStrokingGrayscaleColor(greyLevel),
    setLineWidth(widthMm),
    ...points.map((p, i) => (i === 0 ? moveTo(p[0], p[1]) : lineTo(p[0], p[1]))),
    stroke(),
    popGraphicsState(),
  ];
}

/** A stroked rectangle. */
export function rectOps(x: number, y: number, w: number, h: number, widthMm: number, greyLevel = 0): PDFOperator[] {
  return [pushGraphicsState(), setStrokingGrayscaleColor(greyLevel), setLineWidth(widthMm), rectangle(x, y, w, h), stroke(), popGraphicsState()];
}

/** A filled rectangle. */
export function fillRectOps(x: number, y: number, w: number, h: number, greyLevel: number): PDFOperator[] {
  return [pushGraphicsState(), setFillingGrayscaleColor(greyLevel), rectangle(x, y, w, h), fill(), popGraphicsState()];
}

/** A filled triangle. */
export function triangleOps(a: readonly [number, number], b: readonly [number, number], c: readonly [number, number]): PDFOperator[] {
  return [pushGraphicsState(), setFillingGrayscaleColor(0), moveTo(a[0], a[1]), lineTo(b[0], b[1]), lineTo(c[0], c[1]), closePath(), fill(), popGraphicsState()];
}

/** A stroked circle (four Bezier quarters). */
export function circleOps(cx: number, cy: number, r: number, widthMm: number): PDFOperator[] {
  const k = 0.5522847498 * r;
  return [
    pushGraphicsState(),
    setStrokingGrayscaleColor(0),
    setLineWidth(widthMm),
    moveTo(cx + r, cy),
    appendBezierCurve(cx + r, cy + k, cx + k, cy + r, cx, cy + r),
    appendBezierCurve(cx - k, cy + r, cx - r, cy + k, cx - r, cy),
    appendBezierCurve(cx - r, cy - k, cx - k, cy - r, cx, cy - r),
    appendBezierCurve(cx + k, cy - r, cx + r, cy - k, cx + r, cy),
    closePath(),
    stroke(),
    popGraphicsState(),
  ];
}

/** One line of text, mm; `anchor` start, middle or end; turned 90° counter-clockwise when `turned`. */
export interface TextSpec {
  readonly text: string;
  readonly x: number;
  readonly y: number;
  readonly sizeMm: number;
  readonly font: PDFFont;
  readonly fontKey: string;
  readonly anchor?: 'start' | 'middle' | 'end';
  readonly turned?: boolean;
}

/** Width of `text` as printed in `font` at `sizeMm`, mm. */
export function textWidth(font: PDFFont, text: string, sizeMm: number): number {
  return font.widthOfTextAtSize(printable(font, text), sizeMm);
}

/** Text operators (black fill). */
export function textLineOps(t: TextSpec): PDFOperator[] {
  const line = printable(t.font, t.text);
  const w = t.font.widthOfTextAtSize(line, t.sizeMm);
  const shift = t.anchor === 'middle' ? w / 2 : t.anchor === 'end' ? w : 0;
  const matrix = t.turned === true ? setTextMatrix(0, 1, -1, 0, t.x, t.y - shift) : setTextMatrix(1, 0, 0, 1, t.x - shift, t.y);
  return [pushGraphicsState(), setFillingGrayscaleColor(0), beginText(), setFontAndSize(t.fontKey, t.sizeMm), matrix, showText(t.font.encodeText(line)), endText(), popGraphicsState()];
}
