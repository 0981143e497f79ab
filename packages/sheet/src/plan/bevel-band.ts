/**
 * The bevel band: rows of words written beside a wrap, one cell under each
 * station (the weld preparation's torch and dihedral angles), below
 * everything else drawn, so the band never crosses the cut line. Decided once
 * for every writer.
 */
import type { Point2, StationBand, StationLine } from '@girth/unroll';
import { ASCENT_EM, CAP_HEIGHT_EM, DESCENT_EM, FONT_MM, LINE_EM } from '../style.js';
import type { Box, SheetText } from '../types.js';
import { EMPTY_BOX, unionBox } from '../internal/box.js';
import { centredText } from '../internal/text-box.js';
import { textLines } from '../internal/text-lines.js';
import { textWidthMm } from '../internal/text-metrics.js';

/** Gap between what is drawn above and the band's first row, and between the heading and the first cell, mm. */
export const BEVEL_BAND_GAP_MM = 3;
/** Smallest cell text, mm: below it the band writes every second (third, ...) station instead. */
const MIN_BAND_FONT_MM = 1.2;
/** Cells fill at most this share of the distance between stations. */
const CELL_FILL = 0.85;

/** The band placed: its text items and the box they cover, template mm. */
export interface BevelBandPlan {
  readonly items: readonly SheetText[];
  readonly box: Box;
}

const oneLine = (s: unknown): string => textLines(String(s)).join(' ');

/** Font size and station step (every k-th station) so neighbouring cells do not touch. */
function fitCells(xs: readonly number[], widestAt1Mm: number): { readonly fontMm: number; readonly step: number } {
  const sorted = [...xs].sort((a, b) => a - b);
  let spacing = Infinity;
  for (let i = 1; i < sorted.length; i++) spacing = Math.min(spacing, (sorted[i] as number) - (sorted[i - 1] as number));
  if (!Number.isFinite(spacing) || widestAt1Mm <= 0) return { fontMm: FONT_MM.stationNumber, step: 1 };
  for (let step = 1; step <= xs.length; step++) {
    const fontMm = Math.min(FONT_MM.stationNumber, (CELL_FILL * step * spacing) / widestAt1Mm);
    if (fontMm >= MIN_BAND_FONT_MM) return { fontMm, step };
  }
  return { fontMm: MIN_BAND_FONT_MM, step: xs.length };
}

/**
 * Plans the bands of a wrap under `belowY` (the lowest y of everything drawn so
 * far, station numbers and glue tab included): one row per band, the first
 * nearest the wrap; the rows' headings on the left, ending together
 * {@link BEVEL_BAND_GAP_MM} before the leftmost cell; each cell centred under its
 * station line's `from` end. Text is sized (at most the station numbers' size)
 * so cells do not run into each other; where even the smallest legible size
 * does not fit, every second (third, ...) station is written.
 *
 * @param bands - the template's bands (already worded by the layout).
 * @param stationLines - the template's station lines (x of each station).
 * @param belowY - template mm, y-up.
 * @example planBevelBands([{ key: 'torch', heading: 'Torch angle (deg)', cells: [{ n: 1, text: '45.0' }] }], lines, -6).items.length // 2
 */
export function planBevelBands(bands: readonly StationBand[], stationLines: readonly StationLine[], belowY: number): BevelBandPlan {
  const xOf = new Map<number, number>();
  for (const s of stationLines) if (!xOf.has(s.n)) xOf.set(s.n, s.from[0]);
  const rows = bands
    .map((band) => {
      const cells = band.cells.filter((c) => xOf.has(c.n)).map((c) => ({ n: c.n, x: xOf.get(c.n) as number, text: oneLine(c.text) }));
      if (cells.length === 0) return undefined;
      const { fontMm, step } = fitCells(cells.map((c) => c.x), Math.max(...cells.map((c) => textWidthMm(c.text, 1))));
      const shown = cells.filter((_, i) => i % step === 0);
      const left = Math.min(...shown.map((c) => c.x - textWidthMm(c.text, fontMm) / 2));
      return { heading: oneLine(band.heading), shown, fontMm, left };
    })
    .filter((r) => r !== undefined);
  // Every heading ends at the same x, clear of the leftmost cell of any row.
  const headingEnd = Math.min(...rows.map((r) => r.left)) - BEVEL_BAND_GAP_MM;
  const items: SheetText[] = [];
  let box = EMPTY_BOX;
  let top = belowY - BEVEL_BAND_GAP_MM;
  for (const { heading, shown, fontMm } of rows) {
    const baselineY = top - ASCENT_EM * fontMm;
    const centreY = baselineY + (CAP_HEIGHT_EM * fontMm) / 2;
    for (const c of shown) {
      const t = centredText([c.text], [c.x, centreY], fontMm);
      items.push({
        kind: 'text',
        role: 'bevel-band',
        layer: 'text',
        lines: t.lines,
        at: t.baseline,
        anchor: 'middle',
        fontMm,
        capHeightMm: CAP_HEIGHT_EM * fontMm,
        lineMm: LINE_EM * fontMm,
        bold: false,
        rotateDeg: 0,
        pivot: t.baseline,
        box: t.box,
        stations: [c.n],
      });
      box = unionBox(box, t.box);
    }
    const headingW = textWidthMm(heading, fontMm, true);
    const x = headingEnd - headingW;
    const at: Point2 = [x, baselineY];
    const headingBox: Box = { minX: x, maxX: headingEnd, minY: baselineY - DESCENT_EM * fontMm, maxY: baselineY + ASCENT_EM * fontMm };
    items.push({
      kind: 'text',
      role: 'bevel-band-heading',
      layer: 'text',
      lines: [heading],
      at,
      anchor: 'start',
      fontMm,
      capHeightMm: CAP_HEIGHT_EM * fontMm,
      lineMm: LINE_EM * fontMm,
      bold: true,
      rotateDeg: 0,
      pivot: at,
      box: headingBox,
    });
    box = unionBox(box, headingBox);
    top -= LINE_EM * fontMm + (DESCENT_EM * fontMm) / 2;
  }
  return { items, box };
}
