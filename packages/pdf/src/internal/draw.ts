/**
 * Small drawing helpers for page furniture, in page millimetres (y up; the
 * page's content starts by scaling points to mm), written as content text.
 */
import type { PDFFont } from 'pdf-lib';
import { cm, num, polyline, rect, strokeStyle } from './content.js';
import { printable } from './glyphs.js';

/** A stroked polyline (open), black unless `greyLevel` is given. */
export function lineOps(points: readonly (readonly [number, number])[], widthMm: number, greyLevel = 0): string {
  return `q\n${strokeStyle(greyLevel, widthMm)}${polyline(points)}S\nQ\n`;
}

/** Many straight lines stroked as one path, black. */
export function segmentsOps(lines: readonly (readonly (readonly [number, number])[])[], widthMm: number): string {
  return `q\n${strokeStyle(0, widthMm)}${lines.map(polyline).join('')}S\nQ\n`;
}

/** A stroked rectangle. */
export function rectOps(x: number, y: number, w: number, h: number, widthMm: number, greyLevel = 0): string {
  return `q\n${strokeStyle(greyLevel, widthMm, 0)}${rect(x, y, w, h)}S\nQ\n`;
}

/** A filled rectangle. */
export function fillRectOps(x: number, y: number, w: number, h: number, greyLevel: number): string {
  return `q\n${num(greyLevel)} g\n${rect(x, y, w, h)}f\nQ\n`;
}

/** A filled black triangle. */
export function triangleOps(a: readonly [number, number], b: readonly [number, number], c: readonly [number, number]): string {
  return `q\n0 g\n${polyline([a, b, c])}h\nf\nQ\n`;
}

/** A stroked circle (four Bezier quarters). */
export function circleOps(cx: number, cy: number, r: number, widthMm: number): string {
  const k = 0.5522847498 * r;
  const c = (...v: number[]) => `${v.map(num).join(' ')} c\n`;
  return (
    `q\n${strokeStyle(0, widthMm)}${num(cx + r)} ${num(cy)} m\n` +
    c(cx + r, cy + k, cx + k, cy + r, cx, cy + r) +
    c(cx - k, cy + r, cx - r, cy + k, cx - r, cy) +
    c(cx - r, cy - k, cx - k, cy - r, cx, cy - r) +
    c(cx + k, cy - r, cx + r, cy - k, cx + r, cy) +
    'h\nS\nQ\n'
  );
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

/** `Tm` and `Tj` for one line already made printable (inside BT ... ET). */
export function showAt(font: PDFFont, line: string, a: number, b: number, c: number, d: number, e: number, f: number): string {
  return `${num(a)} ${num(b)} ${num(c)} ${num(d)} ${num(e)} ${num(f)} Tm\n${font.encodeText(line).toString()} Tj\n`;
}

/** Text operators (black fill). */
export function textLineOps(t: TextSpec): string {
  const line = printable(t.font, t.text);
  const w = t.font.widthOfTextAtSize(line, t.sizeMm);
  const shift = t.anchor === 'middle' ? w / 2 : t.anchor === 'end' ? w : 0;
  const show = t.turned === true ? showAt(t.font, line, 0, 1, -1, 0, t.x, t.y - shift) : showAt(t.font, line, 1, 0, 0, 1, t.x - shift, t.y);
  return `q\n0 g\nBT\n/${t.fontKey} ${num(t.sizeMm)} Tf\n${show}ET\nQ\n`;
}

/** Draws a form XObject named `name` with its origin at (x, y), scaled by `s`. */
export function placeForm(name: string, x: number, y: number, s = 1): string {
  return `q\n${cm(s, 0, 0, s, x, y)}/${name} Do\nQ\n`;
}
