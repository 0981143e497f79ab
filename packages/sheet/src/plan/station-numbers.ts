/**
 * Where the station numbers go, decided once for every writer. Every station
 * gets its own number (never two joined, which would read as a fraction), at
 * one legible size, at the end of its line away from the cut: past the square
 * line end of a wrap or the seam-side end of a flat pattern, past the hole edge
 * of a hole. A number steps further out along its line until it is clear of
 * the cut, the square line and every number or label already placed, so close
 * stations are set in staggered rows instead of overlapping.
 */
import type { Point2, StationLine, TemplateKind } from '@girth/unroll';
import { STATION_NUMBER_GAP_MM, FONT_MM, CAP_HEIGHT_EM, ASCENT_EM, DESCENT_EM } from '../style.js';
import type { CentredText } from '../internal/text-box.js';
import { textWidthMm } from '../internal/text-metrics.js';
import type { Box } from '../types.js';
import type { Obstacles } from './obstacles.js';
import { placeText, stepsAlong, TEXT_CLEARANCE_MM } from './place-text.js';

/** A station number placed: the text and the station it names. */
export interface StationNumber extends CentredText {
  readonly stations: readonly number[];
}

/** Most rows tried outward before a number is set at the last one regardless (never reached on a sane sheet). */
const MAX_ROWS = 4000;

/** Unit vector from `a` to `b`, or `fallback` when they coincide. */
function unit(a: Point2, b: Point2, fallback: Point2): Point2 {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.sqrt(dx * dx + dy * dy);
  return len > 1e-9 ? [dx / len, dy / len] : fallback;
}

/** Station numbers and the names of the quarter lines, placed. */
export interface StationTexts {
  readonly numbers: readonly StationNumber[];
  /** A quarter line's name (bold), just past its number. */
  readonly names: readonly CentredText[];
}

/**
 * Placements of the station numbers, template mm: one per station line, each
 * registered in `obstacles` as it is placed; a line named in `names` (a quarter
 * line) has its name set just past its number.
 *
 * @param kind - the template's kind: a hole numbers the hole-edge (`to`) end, others the `from` end.
 * @param drawing - the box of the template's lines: a line of no length points away from its middle.
 * @example planStationNumbers(template.stationLines, 'wrap', box, obstacles, new Map([[1, 'HEEL']])).numbers[0].lines // ['1']
 */
export function planStationNumbers(
  lines: readonly StationLine[],
  kind: TemplateKind,
  drawing: Box,
  obstacles: Obstacles,
  names: ReadonlyMap<number, string> = new Map(),
): StationTexts {
  const fontMm = FONT_MM.stationNumber;
  const mid: Point2 = [(drawing.minX + drawing.maxX) / 2, (drawing.minY + drawing.maxY) / 2];
  const out: StationNumber[] = [];
  const named: CentredText[] = [];
  for (const line of lines) {
    const text = String(line.n);
    const anchor = kind === 'hole' ? line.to : line.from;
    const other = kind === 'hole' ? line.from : line.to;
    const away = unit(mid, anchor, [0, -1]);
    const u = unit(other, anchor, kind === 'wrap' ? [0, -1] : away);
    const w = textWidthMm(text, fontMm);
    const h = (ASCENT_EM + DESCENT_EM) * fontMm;
    const halfAlong = (Math.abs(u[0]) * w) / 2 + (Math.abs(u[1]) * CAP_HEIGHT_EM * fontMm) / 2;
    const step = Math.abs(u[0]) * w + Math.abs(u[1]) * h + TEXT_CLEARANCE_MM;
    const candidates = stepsAlong(anchor, u, STATION_NUMBER_GAP_MM, halfAlong, Math.max(step, 1), MAX_ROWS);
    const placed = placeText(obstacles, [text], fontMm, false, candidates, true);
    if (placed) out.push({ ...placed, stations: [line.n] });
    const name = names.get(line.n);
    if (name !== undefined) {
      const nw = textWidthMm(name, fontMm, true);
      const nHalf = (Math.abs(u[0]) * nw) / 2 + (Math.abs(u[1]) * CAP_HEIGHT_EM * fontMm) / 2;
      const nStep = Math.abs(u[0]) * nw + Math.abs(u[1]) * h + TEXT_CLEARANCE_MM;
      const t = placeText(obstacles, [name], fontMm, true, stepsAlong(anchor, u, STATION_NUMBER_GAP_MM, nHalf, Math.max(nStep, 1), MAX_ROWS), true);
      if (t) named.push(t);
    }
  }
  return { numbers: out, names: named };
}
