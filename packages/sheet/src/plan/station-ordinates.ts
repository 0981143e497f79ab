/**
 * Each station's ordinate written along its station line (the template's
 * `ordinates`, worded in the job's unit by `withFitUp`), turned to read along
 * the line, beside it, between the square line it is measured from and the
 * cut. Text that does not fit there goes past the square-line end. No text
 * crosses the cut, a label, a station number or another ordinate: a place
 * that would is not taken.
 */
import type { PathPart, Point2, Template } from '@girth/unroll';
import { ASCENT_EM, CAP_HEIGHT_EM, DESCENT_EM, FONT_MM, LINE_EM } from '../style.js';
import type { Box } from '../internal/box.js';
import { textWidthMm } from '../internal/text-metrics.js';
import type { SheetPath, SheetText } from '../types.js';

/** Smallest ordinate text, mm (font size): below this it is not legible on paper. */
const MIN_FONT_MM = 1.2;
/** Clear space between an ordinate and its line, the cut or a square line, mm. */
const GAP_MM = 0.8;
/** Step between the places tried along a line, mm. */
const STEP_MM = 0.5;
/** How far past the square-line end a text may go looking for room, mm. */
const MAX_PAST_MM = 60;

/** The ordinates of a template placed: the texts and, from the short point, the stretch of each station measured. */
export interface StationOrdinatesPlan {
  readonly texts: readonly SheetText[];
  readonly paths: readonly SheetPath[];
  /** Everything the turned texts cover, template mm. */
  readonly box: Box;
}

const overlaps = (a: Box, b: Box): boolean => a.minX < b.maxX && b.minX < a.maxX && a.minY < b.maxY && b.minY < a.maxY;

/** Whether segment p-q meets the box (Liang–Barsky clipping). */
function segmentHitsBox(p: Point2, q: Point2, b: Box): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = q[0] - p[0];
  const dy = q[1] - p[1];
  const edges: [number, number][] = [
    [-dx, p[0] - b.minX],
    [dx, b.maxX - p[0]],
    [-dy, p[1] - b.minY],
    [dy, b.maxY - p[1]],
  ];
  for (const [pe, qe] of edges) {
    if (pe === 0) {
      if (qe < 0) return false;
      continue;
    }
    const t = qe / pe;
    if (pe < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return false;
  }
  return true;
}

/** Whether any straight run of the cut meets the box (arcs are only on flat patterns, which have no ordinates). */
function cutHitsBox(cut: readonly PathPart[], b: Box): boolean {
  for (const part of cut) {
    if (part.kind === 'segment' && segmentHitsBox(part.from, part.to, b)) return true;
    if (part.kind !== 'polyline') continue;
    const pts = part.points;
    for (let i = 1; i < pts.length; i++) {
      const p = pts[i - 1]!;
      const q = pts[i]!;
      if (Math.max(p[0], q[0]) < b.minX || Math.min(p[0], q[0]) > b.maxX) continue;
      if (segmentHitsBox(p, q, b)) return true;
    }
  }
  return false;
}

/** Font size: the standard station-number size, smaller where stations stand close (half the gap between neighbours for the text's height). */
function ordinateFontMm(xs: readonly number[]): number {
  const sorted = [...new Set(xs)].sort((a, b) => a - b);
  let gap = Infinity;
  for (let i = 1; i < sorted.length; i++) gap = Math.min(gap, sorted[i]! - sorted[i - 1]!);
  const fit = (gap / 2 - GAP_MM) / (ASCENT_EM + DESCENT_EM);
  return Math.min(FONT_MM.stationNumber, Math.max(MIN_FONT_MM, fit));
}

/**
 * Places every station's ordinate of the template along its line.
 *
 * @param template - a template with `ordinates` (others give nothing).
 * @param obstacles - boxes no text may cover (station numbers, labels), template mm.
 * @example planStationOrdinates(template, []).texts[0]?.lines // ['2 3/16"']
 */
export function planStationOrdinates(template: Template, obstacles: readonly Box[]): StationOrdinatesPlan {
  const o = template.ordinates;
  const empty = { texts: [], paths: [], box: { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity } };
  if (o === undefined || o.stations.length === 0) return empty;
  const fontMm = ordinateFontMm(o.stations.map((s) => s.from[0]));
  const asc = ASCENT_EM * fontMm;
  const desc = DESCENT_EM * fontMm;
  const taken: Box[] = [...obstacles];
  const texts: SheetText[] = [];
  const paths: SheetPath[] = [];
  let box: Box = empty.box;
  for (const s of o.stations) {
    const x = s.from[0];
    const dir = s.towardCut;
    // From the short point the stretch measured lies on the pipe-body side of the cut: draw it.
    if (o.reference === 'short-point' && Math.abs(s.to[1] - s.from[1]) > 1e-9) {
      paths.push({ kind: 'path', role: 'ordinate-line', layer: 'mark', part: { kind: 'segment', from: s.from, to: s.to } });
    }
    const half = textWidthMm(s.text, fontMm) / 2;
    // Turned text reads up the line: its glyphs span [baseline − ascent, baseline + descent] across it.
    const turned = (bx: number, cy: number): Box => ({ minX: bx - asc, maxX: bx + desc, minY: cy - half, maxY: cy + half });
    const sides = [x + GAP_MM + asc, x - GAP_MM - desc];
    const lo = Math.min(s.from[1], s.to[1]) + GAP_MM + half;
    const hi = Math.max(s.from[1], s.to[1]) - GAP_MM - half;
    const within: number[] = [];
    if (lo <= hi) {
      const mid = (lo + hi) / 2;
      within.push(mid);
      for (let d = STEP_MM; mid - d >= lo || mid + d <= hi; d += STEP_MM) {
        if (mid + d <= hi) within.push(mid + d);
        if (mid - d >= lo) within.push(mid - d);
      }
    }
    // Past the square-line end, away from the cut.
    const past: number[] = [];
    for (let d = GAP_MM; d <= MAX_PAST_MM; d += STEP_MM) past.push(s.from[1] - dir * (d + half));
    // The right of the line first, along it and then past its end, so each ordinate reads as its own line's;
    // the left only where the right has no room at all.
    const tries: [number, number][] = [];
    for (const bx of sides) for (const cy of [...within, ...past]) tries.push([bx, cy]);
    let placed: { bx: number; cy: number; b: Box } | undefined;
    for (const [bx, cy] of tries) {
      const b = turned(bx, cy);
      if (taken.some((t) => overlaps(t, b)) || cutHitsBox(template.cut, b)) continue;
      placed = { bx, cy, b };
      break;
    }
    if (placed === undefined) continue;
    taken.push(placed.b);
    box = { minX: Math.min(box.minX, placed.b.minX), minY: Math.min(box.minY, placed.b.minY), maxX: Math.max(box.maxX, placed.b.maxX), maxY: Math.max(box.maxY, placed.b.maxY) };
    const at: Point2 = [placed.bx, placed.cy];
    texts.push({
      kind: 'text',
      role: 'station-ordinate',
      layer: 'text',
      lines: [s.text],
      at,
      anchor: 'middle',
      fontMm,
      capHeightMm: CAP_HEIGHT_EM * fontMm,
      lineMm: LINE_EM * fontMm,
      bold: false,
      rotateDeg: 90,
      pivot: at,
      box: { minX: placed.bx - half, maxX: placed.bx + half, minY: placed.cy - desc, maxY: placed.cy + asc },
      stations: [s.n],
    });
  }
  return { texts, paths, box };
}
