/**
 * Where the station numbers go, decided once for every writer: just past the
 * `from` end of each station line (the square line or girth line end, away
 * from the cut),
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

/** Distance between two points, mm (a square root: Math.hypot is several times slower in V8). */
function dist2(a: readonly [number, number], b: readonly [number, number]): number {
  const dx = a[0] - b[0];
  const dy = a[1] - b[1];
  return Math.sqrt(dx * dx + dy * dy);
}

interface Group {
  readonly line: StationLine;
  readonly ns: number[];
}

function groupByStart(lines: readonly StationLine[]): Group[] {
  // Hash the start points on a grid of SAME_POINT_MM cells: a match lies in this
  // cell or a neighbour, so grouping takes time linear in the number of lines.
  const groups: Group[] = [];
  // Cell keys as numbers (cx · 2^26 + cy, exact in a double for any coordinate within 1 km);
  // a collision of two cells is harmless, since every match is checked by distance.
  const cells = new Map<number, number[]>();
  const keyOf = (cx: number, cy: number): number => cx * 67108864 + cy;
  const cellOf = (v: number): number => Math.floor(v / SAME_POINT_MM);
  for (const line of lines) {
    const cx = cellOf(line.from[0]);
    const cy = cellOf(line.from[1]);
    let found = -1;
    for (let dx = -1; dx <= 1; dx++) {
      for (let dy = -1; dy <= 1; dy++) {
        const list = cells.get(keyOf(cx + dx, cy + dy));
        if (list === undefined) continue;
        for (const gi of list) {
          const g = groups[gi] as Group;
          const near = dist2(g.line.from, line.from) < SAME_POINT_MM;
          // The earliest group within reach, as a first-match search in order would find.
          if (near && (found < 0 || gi < found)) found = gi;
        }
      }
    }
    if (found >= 0) {
      const same = groups[found] as Group;
      if (!same.ns.includes(line.n)) same.ns.push(line.n);
    } else {
      const key = keyOf(cx, cy);
      const list = cells.get(key);
      if (list) list.push(groups.length);
      else cells.set(key, [groups.length]);
      groups.push({ line, ns: [line.n] });
    }
  }
  for (const g of groups) g.ns.sort((a, b) => a - b);
  return groups;
}

/** Smallest distance between two start points: sorted by x, each compared only with those less than the best distance away in x. */
function closestStartsMm(groups: readonly Group[]): number {
  const pts = groups.map((g) => g.line.from).sort((a, b) => a[0] - b[0]);
  let best = Infinity;
  for (let i = 0; i < pts.length; i++) {
    const a = pts[i] as readonly [number, number];
    for (let j = i + 1; j < pts.length; j++) {
      const b = pts[j] as readonly [number, number];
      if (b[0] - a[0] >= best) break;
      const d = dist2(a, b);
      if (d < best) best = d;
    }
  }
  return best;
}

function numberFontMm(groups: readonly Group[]): number {
  const minGap = closestStartsMm(groups);
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
    const len = Math.sqrt(dx * dx + dy * dy);
    // A line of no length (a station with no cutback) takes its number below it.
    const [ux, uy] = len > 1e-9 ? [dx / len, dy / len] : [0, -1];
    const halfAlong = (Math.abs(ux) * textWidthMm(text, fontMm)) / 2 + (Math.abs(uy) * CAP_HEIGHT_EM * fontMm) / 2;
    const reach = STATION_NUMBER_GAP_MM + halfAlong;
    return { ...centredText([text], [line.from[0] + ux * reach, line.from[1] + uy * reach], fontMm), stations: ns };
  });
}
