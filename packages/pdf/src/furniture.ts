/**
 * What every page carries besides the drawing: the band with the page's
 * label, what the page is, how to print it and the calibration square
 * (ticked in inches on two sides and millimetres on the other two); on tiles,
 * trim marks and arrows naming the neighbours.
 */
import { CALIBRATION_SQUARE_MM, GUTTER_MM, type Rect, type Tile } from './tile-plan.js';
import { FONT_KEYS, type Fonts } from './internal/fonts.js';
import { lineOps, placeForm, segmentsOps, textLineOps, textWidth, triangleOps } from './internal/draw.js';

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

/**
 * The calibration square and its ticks, its bottom-left corner at (0, 0):
 * 1/8 in ticks outward on the top and left, 1 mm ticks on the bottom and
 * right, the caption inside. Drawn once per document and placed on every page.
 * @example const ops = calibrationSquareOps(fonts, 'in');
 */
export function calibrationSquareOps(fonts: Fonts, units: 'in' | 'mm'): string {
  const s = CALIBRATION_SQUARE_MM;
  let ops = lineOps([[0, 0], [s, 0], [s, s], [0, s], [0, 0]], SQUARE_STROKE_MM);
  const ticks: [number, number][][] = [];
  for (let i = 1; i < 8; i++) {
    const d = (i * 25.4) / 8;
    const len = i === 4 ? 2 : 1.2;
    ticks.push([[d, s], [d, s + len]], [[0, s - d], [-len, s - d]]);
  }
  for (let i = 1; i < 25; i++) {
    const len = i % 10 === 0 ? 2 : i % 5 === 0 ? 1.5 : 0.8;
    ticks.push([[i, 0], [i, -Math.min(len, SQUARE_INSET_MM - 0.5)]], [[s, i], [s + len, i]]);
  }
  ops += segmentsOps(ticks, 0.15);
  const caption = units === 'in' ? ['1 in square', '= 25.4 mm'] : ['25.4 mm square', '= 1 in'];
  caption.forEach((line, i) => {
    ops += textLineOps({ text: line, x: s / 2, y: s / 2 + 1 - i * 3.4, sizeMm: 2.6, font: fonts.regular, fontKey: FONT_KEYS.regular, anchor: 'middle' });
  });
  return ops;
}

/** Room the calibration square's form needs around its corner, mm (ticks and outline). */
export const SQUARE_FORM_BOX = [-3, -3, CALIBRATION_SQUARE_MM + 3, CALIBRATION_SQUARE_MM + 3] as const;

/** What the band says. */
export interface BandText {
  /** Large: `A1`, `MAP`, `1`. */
  readonly label: string;
  /** Up to three lines beside it. */
  readonly lines: readonly string[];
}

/**
 * The band: label, lines, and the calibration square at its right.
 * @param square - the name of the calibration square's form on the page.
 * @example bandOps(plan.band, { label: 'A1', lines: ['Tee, page 2 of 7'] }, fonts, 'GCal')
 */
export function bandOps(band: Rect, text: BandText, fonts: Fonts, square: string): string {
  const labelMm = 11;
  let ops = textLineOps({ text: text.label, x: band.x + 1, y: band.y + band.height - 3 - labelMm * 0.72, sizeMm: labelMm, font: fonts.bold, fontKey: FONT_KEYS.bold });
  const left = band.x + 2 + Math.max(16, textWidth(fonts.bold, text.label, labelMm) + 3);
  const room = calibrationSquareAt(band).x - 4 - left;
  text.lines.slice(0, 4).forEach((line, i) => {
    let size = i === 0 ? 3.4 : 2.8;
    const w = textWidth(i === 0 ? fonts.bold : fonts.regular, line, size);
    if (w > room) size = Math.max(1.6, (size * room) / w);
    ops += textLineOps({
        text: line,
        x: left,
        y: band.y + band.height - 6 - i * 5.6,
        sizeMm: size,
        font: i === 0 ? fonts.bold : fonts.regular,
        fontKey: i === 0 ? FONT_KEYS.bold : FONT_KEYS.regular,
      });
  });
  const at = calibrationSquareAt(band);
  return ops + placeForm(square, at.x, at.y);
}

/** Trim marks at the window's four corners, in the gutter, 1 mm clear of the corner. */
export function trimMarkOps(content: Rect): string {
  const { x, y, width: w, height: h } = content;
  const far = GUTTER_MM - 1;
  const lines: [number, number][][] = [];
  for (const [cx, cy, sx, sy] of [
    [x, y, -1, -1],
    [x + w, y, 1, -1],
    [x, y + h, -1, 1],
    [x + w, y + h, 1, 1],
  ] as const) {
    lines.push([[cx + sx * 1, cy], [cx + sx * far, cy]], [[cx, cy + sy * 1], [cx, cy + sy * far]]);
  }
  return segmentsOps(lines, 0.2);
}

/** Arrows in the gutter at the middle of each side that has a neighbour, with the neighbour's label. */
export function neighbourOps(content: Rect, tile: Tile, fonts: Fonts): string {
  const { x, y, width: w, height: h } = content;
  let ops = '';
  const size = 3.6;
  const g = GUTTER_MM;
  const text = (t: string, tx: number, ty: number, turned: boolean, anchor: 'start' | 'end') =>
    textLineOps({ text: t, x: tx, y: ty, sizeMm: size, font: fonts.bold, fontKey: FONT_KEYS.bold, anchor, turned });
  const n = tile.neighbours;
  if (n.up !== undefined) {
    const cx = x + w / 2;
    ops += triangleOps([cx - 2, y + h + 1.5], [cx + 2, y + h + 1.5], [cx, y + h + g - 1.5]); ops += text(`${n.up}`, cx + 3, y + h + 2, false, 'start');
  }
  if (n.down !== undefined) {
    const cx = x + w / 2;
    ops += triangleOps([cx - 2, y - 1.5], [cx + 2, y - 1.5], [cx, y - g + 1.5]); ops += text(`${n.down}`, cx + 3, y - g + 2, false, 'start');
  }
  if (n.left !== undefined) {
    const cy = y + h / 2;
    ops += triangleOps([x - 1.5, cy - 2], [x - 1.5, cy + 2], [x - g + 1.5, cy]); ops += text(`${n.left}`, x - 2, cy + 3, true, 'start');
  }
  if (n.right !== undefined) {
    const cy = y + h / 2;
    ops += triangleOps([x + w + 1.5, cy - 2], [x + w + 1.5, cy + 2], [x + w + g - 1.5, cy]); ops += text(`${n.right}`, x + w + g - 1.2, cy + 3, true, 'start');
  }
  return ops;
}
