/**
 * How far a smooth curve strays from a chord, modelled from the chord's ends
 * and three probes at a quarter, half and three quarters of its parameter.
 */
import type { Point2 } from '../types.js';

/** Model points per span: the quartic is evaluated at every 1/32 of it. */
const GRID_STEPS = 32;

/**
 * For each interior grid point k/32: its fraction s and the Lagrange weights
 * of the probes at 1/4, 1/2, 3/4 for the quartic through (0, 0), the three
 * probes and (1, 0). Flat typed arrays: this runs for every span probed.
 */
const GRID_S = new Float64Array(GRID_STEPS - 1);
const W1 = new Float64Array(GRID_STEPS - 1);
const W2 = new Float64Array(GRID_STEPS - 1);
const W3 = new Float64Array(GRID_STEPS - 1);
for (let k = 0; k < GRID_STEPS - 1; k++) {
  const s = (k + 1) / GRID_STEPS;
  GRID_S[k] = s;
  W1[k] = (s * (s - 0.5) * (s - 0.75) * (s - 1)) / (0.25 * -0.25 * -0.5 * -0.75);
  W2[k] = (s * (s - 0.25) * (s - 0.75) * (s - 1)) / (0.5 * 0.25 * -0.25 * -0.5);
  W3[k] = (s * (s - 0.25) * (s - 0.5) * (s - 1)) / (0.75 * 0.5 * 0.25 * -0.25);
}

/** Modelled largest deviations, mm. */
export interface ChordDeviation {
  /** Of the chord itself: the quartic model, or the end check when larger. */
  readonly whole: number;
  /** Of the two half chords through the midpoint probe, by the quartic model. */
  readonly halves: number;
  /**
   * The end check: the deviation the probes' trend reaches at each end
   * (2 d(1/4) − d(1/2) and 2 d(3/4) − d(1/2)), where it is truly zero. Large
   * when the curve turns sharply next to an end (a near-graze), which no
   * polynomial through the probes shows.
   */
  readonly endTrend: number;
}

/**
 * Models the deviation of a curve from the chord `p0`–`p4`, given the curve
 * at the quarter points `p1`, `p2`, `p3` of its parameter: signed distances
 * square to the chord at the probes, interpolated by the quartic that is
 * zero at both ends. Returns the largest modelled deviation of the chord and
 * of the half chords `p0`–`p2`, `p2`–`p4`, and the end check (mm). A
 * degenerate chord (p0 = p4) gives the probes' distances from p0 for all three.
 * @example chordDeviationModel([0,0],[1,0.75],[2,1],[3,0.75],[4,0]).whole // 1 (a parabola, end check 0.5)
 */
export function chordDeviationModel(p0: Point2, p1: Point2, p2: Point2, p3: Point2, p4: Point2): ChordDeviation {
  const dx = p4[0] - p0[0];
  const dy = p4[1] - p0[1];
  const len = Math.hypot(dx, dy);
  if (len === 0) {
    const r = Math.max(dist(p1, p0), dist(p2, p0), dist(p3, p0));
    return { whole: r, halves: r, endTrend: r };
  }
  const nx = -dy / len;
  const ny = dx / len;
  const d1 = (p1[0] - p0[0]) * nx + (p1[1] - p0[1]) * ny;
  const d2 = (p2[0] - p0[0]) * nx + (p2[1] - p0[1]) * ny;
  const d3 = (p3[0] - p0[0]) * nx + (p3[1] - p0[1]) * ny;
  const endTrend = Math.max(Math.abs(2 * d1 - d2), Math.abs(2 * d3 - d2));
  let whole = Math.max(Math.abs(d1), Math.abs(d2), Math.abs(d3), endTrend);
  let halves = 0;
  for (let k = 0; k < GRID_S.length; k++) {
    const s = GRID_S[k] as number;
    const d = d1 * (W1[k] as number) + d2 * (W2[k] as number) + d3 * (W3[k] as number);
    const ad = d < 0 ? -d : d;
    if (ad > whole) whole = ad;
    const half = s <= 0.5 ? d - 2 * s * d2 : d - 2 * (1 - s) * d2;
    const ah = half < 0 ? -half : half;
    if (ah > halves) halves = ah;
  }
  return { whole, halves, endTrend };
}

function dist(a: Point2, b: Point2): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}
