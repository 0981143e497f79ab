/**
 * Where the station numbers go: just past the `from` end of each station line,
 * on the line's own direction, sized so neighbours do not run into each other.
 * Station lines that start at the same point (on a hole template, stations
 * phi and 180° - phi can share a girth) get one number together, e.g. `2/8`.
 */
import type { StationLine } from '@girth/unroll';
import { STATION_NUMBER_GAP_MM, FONT_MM, CAP_HEIGHT_EM } from '../style.js';
import { centredText, type CentredText } from '../internal/text-box.js';
import { textWidthMm } from '../internal/text-metrics.js';

/** Smallest station number size, mm: below this it is no longer legible on paper. */
const MIN_STATION_FONT_MM = 1.2;
/** Station lines whose `from` ends are closer than this share one number, mm. */
const SAME_POINT_MM = 0.05;

/** A station number placed: the text (one number, or several joined by `/`) and the stations it names. */
export interface StationNumber extends CentredText {
  readonly stations: readonly number[];
}

interface Group {
  readonly line: StationLine;
  readonly ns: number[];
}

function groupByStart(lines: readonly StationLine[]): Group[] {
  const groups: Group[] = [];
  for (const line of lines) {
    const same = groups.find(
      (g) => Math.hypot(g.line.from[0] - line.from[0], g.line.from[1] - line.from[1]) < SAME_POINT_MM,
    );
    if (same) {
      if (!same.ns.includes(line.n)) same.ns.push(line.n);
    } else {
      groups.push({ line, ns: [line.n] });
    }
  }
  for (const g of groups) g.ns.sort((a, b) => a - b);
  return groups;
}

function numberFontMm(groups: readonly Group[]): number {
  let minGap = Infinity;
  for (let i = 0; i < groups.length; i++) {
    for (let j = i + 1; j < groups.length; j++) {
      const a = (groups[i] as Group).line.from;
      const b = (groups[j] as Group).line.from;
      const d = Math.hypot(a[0] - b[0], a[1] - b[1]);
      if (d < minGap) minGap = d;
    }
  }
  const widestEm = Math.max(1, ...groups.map((g) => textWidthMm(g.ns.join('/'), 1)));
  // Keep a fifth of the gap clear between neighbouring numbers.
  const fit = (0.8 * minGap) / widestEm;
  return Math.min(FONT_MM.stationNumber, Math.max(MIN_STATION_FONT_MM, fit));
}

/**
 * Placements of the station numbers, template mm: one per distinct start point.
 *
 * @example planStationNumbers(template.stationLines)[0].lines // ['1']
 */
export function planStationNumbers(lines: readonly StationLine[]): StationNumber[] {
  if (lines.length === 0) return [];
  const groups = groupByStart(lines);
  const fontMm = numberFontMm(groups);
  return groups.map(({ line, ns }) => {
    const text = ns.join('/');
    const dx = line.from[0] - line.to[0];
    const dy = line.from[1] - line.to[1];
    const len = Math.hypot(dx, dy);
    // A line of no length (a station with no cutback) takes its number below it.
    const [ux, uy] = len > 1e-9 ? [dx / len, dy / len] : [0, -1];
    const halfAlong = (Math.abs(ux) * textWidthMm(text, fontMm)) / 2 + (Math.abs(uy) * CAP_HEIGHT_EM * fontMm) / 2;
    const reach = STATION_NUMBER_GAP_MM + halfAlong;
    return { ...centredText([text], [line.from[0] + ux * reach, line.from[1] + uy * reach], fontMm), stations: ns };
  });
}
