/**
 * Where the station numbers go: just past the `from` end of each station line,
 * on the line's own direction, sized so neighbours do not run into each other.
 */
import type { StationLine } from '@girth/unroll';
import { STATION_NUMBER_GAP_MM, FONT_MM, CAP_HEIGHT_EM } from '../style.js';
import { centredText, type CentredText } from '../internal/text-box.js';
import { textWidthMm } from '../internal/text-metrics.js';

/** Smallest station number size, mm: below this it is no longer legible on paper. */
const MIN_STATION_FONT_MM = 1.2;

function numberFontMm(lines: readonly StationLine[]): number {
  let minGap = Infinity;
  for (let i = 0; i < lines.length; i++) {
    for (let j = i + 1; j < lines.length; j++) {
      const a = (lines[i] as StationLine).from;
      const b = (lines[j] as StationLine).from;
      const d = Math.hypot(a[0] - b[0], a[1] - b[1]);
      if (d > 1e-9 && d < minGap) minGap = d;
    }
  }
  const widestEm = Math.max(1, ...lines.map((l) => textWidthMm(String(l.n), 1)));
  // Keep a fifth of the gap clear between neighbouring numbers.
  const fit = (0.8 * minGap) / widestEm;
  return Math.min(FONT_MM.stationNumber, Math.max(MIN_STATION_FONT_MM, fit));
}

/**
 * Placements of the station numbers, template mm.
 *
 * @example planStationNumbers(template.stationLines)[0].lines // ['1']
 */
export function planStationNumbers(lines: readonly StationLine[]): CentredText[] {
  if (lines.length === 0) return [];
  const fontMm = numberFontMm(lines);
  return lines.map((line) => {
    const text = String(line.n);
    const dx = line.from[0] - line.to[0];
    const dy = line.from[1] - line.to[1];
    const len = Math.hypot(dx, dy);
    // A line of no length (a station with no cutback) takes its number below it.
    const [ux, uy] = len > 1e-9 ? [dx / len, dy / len] : [0, -1];
    const halfAlong = (Math.abs(ux) * textWidthMm(text, fontMm)) / 2 + (Math.abs(uy) * CAP_HEIGHT_EM * fontMm) / 2;
    const reach = STATION_NUMBER_GAP_MM + halfAlong;
    return centredText([text], [line.from[0] + ux * reach, line.from[1] + uy * reach], fontMm);
  });
}
