/**
 * What every page carries besides the drawing: the band with the page's
 * label, what the page is, how to print it and the calibration square
 * (ticked in inches on two sides and millimetres on the other two); on tiles,
 * trim marks and arrows naming the neighbours.
 */
import type { PDFOperator } from 'pdf-lib';
import { CALIBRATION_SQUARE_MM, GUTTER_MM, type Rect, type Tile } from './tile-plan.js';
import { FONT_KEYS, type Fonts } from './internal/fonts.js';
import { lineOps, textLineOps, textWidth, triangleOps } from './internal/draw.js';

/** Weight of the calibration square's outline, mm. */
export const SQUARE_STROKE_MM = 0.3;
/** Gap between the square's ticks and the band's edge, mm. */
const SQUARE_INSET_MM = 3;

/**
 * Where the calibration square sits in a band: its bottom-left corner, page mm
 * (y up), measured to the middle of its outline.
 * @example calibrationSquareAt({ x: 6.35, y: 6.35, width: 203.2, height: 31 })
 */
export function calibrationSquareAt(band: Rect): { readonly x: number; readonly y: number; readonly sideMm: number } {
  return {
    x: band.x + band.width - SQUARE_INSET_MM - CALIBRATION_SQUARE_MM,
    y: band.y + SQUARE_INSET_MM,
    sideMm: CALIBRATION_SQUARE_MM,
  };
}

/** The calibration square and its ticks: 1/8 in outward on the top and left, 1 mm on the bottom and right. */
function squareOps(band: Rect, fonts: Fonts, units: 'in' | 'mm'): PDFOperator[] {
  const { x, y, sideMm: s } = calibrationSquareAt(band);
  const ops: PDFOperator[] = lineOps([[x, y], [x + s, y], [x + s, y + s], [x, y + s], [x, y]], SQUARE_STROKE_MM);
  const tick = 0.15;
  for (let i = 1; i < 8; i++) {
    const d = (i * 25.4) / 8;
    const len = i === 4 ? 2 : 1.2;
    ops.push(...lineOps([[x + d, y + s], [x + d, y + s + len]], tick));
    ops.push(...lineOps([[x, y + s - d], [x - len, y + s - d]], tick));
  }
  for (let i = 1; i < 25; i++) {
    const len = i % 10 === 0 ? 2 : i % 5 === 0 ? 1.5 : 0.8;
    ops.push(...lineOps([[x + i, y], [x + i, y - Math.min(len, SQUARE_INSET_MM - 0.5)]], tick));
    ops.push(...lineOps([[x + s, y + i], [x + s + len, y + i]], tick));
  }
  const caption = units === 'in' ? ['1 in square', '= 25.4 mm'] : ['25.4 mm square', '= 1 in'];
  caption.forEach((line, i) =>
    ops.push(...textLineOps({ text: line, x: x + s / 2, y: y + s / 2 + 1 - i * 3.4, sizeMm: 2.6, font: fonts.regular, fontKey: FONT_KEYS.regular, anchor: 'middle' })),
  );
  return ops;
}

/** What the band says. */
export interface BandText {
  /** Large: `A1`, `MAP`, `1`. */
  readonly label: string;
  /** Up to three lines beside it. */
  readonly lines: readonly string[];
}

/**
 * The band: label, lines, and the calibration square at its right.
 * @example bandOps(plan.band, { label: 'A1', lines: ['Tee, page 2 of 7'] }, fonts, 'in')
 */
export function bandOps(band: Rect, text: BandText, fonts: Fonts, units: 'in' | 'mm'): PDFOperator[] {
  const ops: PDFOperator[] = [];
  const labelMm = 11;
  ops.push(...textLineOps({ text: text.label, x: band.x + 1, y: band.y + band.height - 3 - labelMm * 0.72, sizeMm: labelMm, font: fonts.bold, fontKey: FONT_KEYS.bold }));
  const left = band.x + 2 + Math.max(16, textWidth(fonts.bold, text.label, labelMm) + 3);
  const room = calibrationSquareAt(band).x - 4 - left;
  text.lines.slice(0, 4).forEach((line, i) => {
    let size = i === 0 ? 3.4 : 2.8;
    const w = textWidth(i === 0 ? fonts.bold : fonts.regular, line, size);
    if (w > room) size = Math.max(1.6, (size * room) / w);
    ops.push(
      ...textLineOps({
        text: line,
        x: left,
        y: band.y + band.height - 6 - i * 5.6,
        sizeMm: size,
        font: i === 0 ? fonts.bold : fonts.regular,
        fontKey: i === 0 ? FONT_KEYS.bold : FONT_KEYS.regular,
      }),
    );
  });
  ops.push(...squareOps(band, fonts, units));
  return ops;
}

/** Trim marks at the window's four corners, in the gutter, 1 mm clear of the corner. */
export function trimMarkOps(content: Rect): PDFOperator[] {
  const { x, y, width: w, height: h } = content;
  const far = GUTTER_MM - 1;
  const ops: PDFOperator[] = [];
  for (const [cx, cy, sx, sy] of [
    [x, y, -1, -1],
    [x + w, y, 1, -1],
    [x, y + h, -1, 1],
    [x + w, y + h, 1, 1],
  ] as const) {
    ops.push(...lineOps([[cx + sx * 1, cy], [cx + sx * far, cy]], 0.2));
    ops.push(...lineOps([[cx, cy + sy * 1], [cx, cy + sy * far]], 0.2));
  }
  return ops;
}

/** Arrows in the gutter at the middle of each side that has a neighbour, with the neighbour's label. */
export function neighbourOps(content: Rect, tile: Tile, fonts: Fonts): PDFOperator[] {
  const { x, y, width: w, height: h } = content;
  const ops: PDFOperator[] = [];
  const size = 3.6;
  const g = GUTTER_MM;
  const text = (t: string, tx: number, ty: number, turned: boolean, anchor: 'start' | 'end') =>
    textLineOps({ text: t, x: tx, y: ty, sizeMm: size, font: fonts.bold, fontKey: FONT_KEYS.bold, anchor, turned });
  const n = tile.neighbours;
  if (n.up !== undefined) {
    const cx = x + w / 2;
    ops.push(...triangleOps([cx - 2, y + h + 1.5], [cx + 2, y + h + 1.5], [cx, y + h + g - 1.5]), ...text(`${n.up}`, cx + 3, y + h + 2, false, 'start'));
  }
  if (n.down !== undefined) {
    const cx = x + w / 2;
    ops.push(...triangleOps([cx - 2, y - 1.5], [cx + 2, y - 1.5], [cx, y - g + 1.5]), ...text(`${n.down}`, cx + 3, y - g + 2, false, 'start'));
  }
  if (n.left !== undefined) {
    const cy = y + h / 2;
    ops.push(...triangleOps([x - 1.5, cy - 2], [x - 1.5, cy + 2], [x - g + 1.5, cy]), ...text(`${n.left}`, x - 2, cy + 3, true, 'start'));
  }
  if (n.right !== undefined) {
    const cy = y + h / 2;
    ops.push(...triangleOps([x + w + 1.5, cy - 2], [x + w + 1.5, cy + 2], [x + w + g - 1.5, cy]), ...text(`${n.right}`, x + w + g - 1.2, cy + 3, true, 'start'));
  }
  return ops;
}
