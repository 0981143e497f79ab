/**
 * Arc fitting: a sampled curve (points on the exact curve, chords within the
 * chord tolerance) replaced by as few circular arcs as stay within a given
 * distance of every sample, so a cutting table gets a few smooth arcs instead
 * of hundreds of chords. Kinks (corners, grazing points) stay vertices: no arc
 * runs across one.
 *
 * Method: between kinks, greedily the longest run of samples that one circle
 * through the run's first, middle and last sample holds within the tolerance
 * (every sample of the run checked, and the samples must run along the arc
 * in order); a run of two samples stays a straight segment.
 * Plain arcs (not tangent biarcs): each arc ends on a sample of the exact
 * curve, so the deviation is bounded by the samples, not by a tangent guess.
 */
import type { Point2 } from '@girth/unroll';
import type { SheetVertex } from './sheet.js';

/** A sample is a kink when the chord turns by more than this there, degrees. */
export const KINK_TURN_DEG = 25;
/** ...or by more than this and more than {@link KINK_RATIO} times both neighbours' turns (a grazing point), degrees. */
export const KINK_MIN_TURN_DEG = 4;
/** See {@link KINK_MIN_TURN_DEG}. */
export const KINK_RATIO = 3;
/** No fitted arc sweeps more than this, degrees (a half turn: a bulge of at most 1). */
const MAX_SWEEP_RAD = Math.PI;

/** Result of {@link fitArcs}. */
export interface ArcFit {
  /** The fitted run: each vertex's bulge is that of the segment starting there (0 straight); the last vertex's bulge is 0. Same unit as the input. */
  readonly vertices: readonly SheetVertex[];
  /** Largest distance of any input sample from the fitted run, input unit. */
  readonly maxDeviation: number;
}

interface Circle {
  readonly cx: number;
  readonly cy: number;
  readonly r: number;
}

function circleThrough(a: Point2, b: Point2, c: Point2): Circle | null {
  const ax = a[0];
  const ay = a[1];
  const bx = b[0] - ax;
  const by = b[1] - ay;
  const cx = c[0] - ax;
  const cy = c[1] - ay;
  const d = 2 * (bx * cy - by * cx);
  if (d === 0) return null;
  const b2 = bx * bx + by * by;
  const c2 = cx * cx + cy * cy;
  const ux = (cy * b2 - by * c2) / d;
  const uy = (bx * c2 - cx * b2) / d;
  return { cx: ax + ux, cy: ay + uy, r: Math.hypot(ux, uy) };
}

/** Signed sweep from a to b through m, radians (positive counter-clockwise). */
function sweepThrough(c: Circle, a: Point2, m: Point2, b: Point2): number {
  const turn = (m[0] - a[0]) * (b[1] - m[1]) - (m[1] - a[1]) * (b[0] - m[0]);
  const a0 = Math.atan2(a[1] - c.cy, a[0] - c.cx);
  const a1 = Math.atan2(b[1] - c.cy, b[0] - c.cx);
  const TAU = 2 * Math.PI;
  if (turn > 0) return (((a1 - a0) % TAU) + TAU) % TAU;
  return -((((a0 - a1) % TAU) + TAU) % TAU);
}

function distToSegment(p: Point2, a: Point2, b: Point2): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/**
 * The worst distance of samples i..j from one arc (or the chord when the three
 * points are in line), with the arc's bulge; null when the samples do not run
 * along the arc in order.
 */
function tryArc(pts: readonly Point2[], i: number, j: number): { bulge: number; dev: number } | null {
  const a = pts[i]!;
  const b = pts[j]!;
  const m = pts[(i + j) >> 1]!;
  const c = circleThrough(a, m, b);
  const chord = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (c === null || c.r > 1e6 * Math.max(chord, 1e-9)) {
    let dev = 0;
    for (let k = i + 1; k < j; k++) dev = Math.max(dev, distToSegment(pts[k]!, a, b));
    return { bulge: 0, dev };
  }
  const sweep = sweepThrough(c, a, m, b);
  if (Math.abs(sweep) > MAX_SWEEP_RAD) return null;
  const a0 = Math.atan2(a[1] - c.cy, a[0] - c.cx);
  let dev = 0;
  let prevT = 0;
  for (let k = i + 1; k <= j; k++) {
    const p = pts[k]!;
    // Where the sample sits along the sweep, 0..1; samples must advance along it.
    const ang = Math.atan2(p[1] - c.cy, p[0] - c.cx) - a0;
    const TAU = 2 * Math.PI;
    const rel = sweep > 0 ? ((ang % TAU) + TAU) % TAU : -((((-ang) % TAU) + TAU) % TAU);
    const t = k === j ? 1 : rel / sweep;
    if (t < prevT - 1e-12 || t > 1 + 1e-12) return null;
    prevT = t;
    dev = Math.max(dev, Math.abs(Math.hypot(p[0] - c.cx, p[1] - c.cy) - c.r));
  }
  return { bulge: Math.tan(sweep / 4), dev };
}

function turnRad(pts: readonly Point2[], k: number): number {
  const a = pts[k - 1]!;
  const b = pts[k]!;
  const c = pts[k + 1]!;
  const t1 = Math.atan2(b[1] - a[1], b[0] - a[0]);
  const t2 = Math.atan2(c[1] - b[1], c[0] - b[0]);
  let d = Math.abs(t2 - t1);
  if (d > Math.PI) d = 2 * Math.PI - d;
  return d;
}

/**
 * Indices of the kinks of a sampled run: its two ends, every sample where the
 * chord turns by more than {@link KINK_TURN_DEG}, and every sample whose turn
 * exceeds {@link KINK_MIN_TURN_DEG} and {@link KINK_RATIO} times both neighbours'.
 *
 * @example kinkIndices([[0, 0], [1, 0], [1, 1]]) // [0, 1, 2]
 */
export function kinkIndices(points: readonly Point2[]): number[] {
  const n = points.length;
  const turns = points.map((_, k) => (k === 0 || k === n - 1 ? 0 : turnRad(points, k)));
  const out = [0];
  const big = (KINK_TURN_DEG * Math.PI) / 180;
  const min = (KINK_MIN_TURN_DEG * Math.PI) / 180;
  for (let k = 1; k < n - 1; k++) {
    const t = turns[k]!;
    const sharp = t > big;
    const lone = t > min && t > KINK_RATIO * turns[k - 1]! && t > KINK_RATIO * turns[k + 1]!;
    if (sharp || lone) out.push(k);
  }
  if (n > 1) out.push(n - 1);
  return out;
}

/** The midpoint of the minor arc of circle c over chord a-b; null when c is (nearly) a line. */
function arcMidpoint(c: Circle | null, a: Point2, b: Point2): Point2 | null {
  if (c === null) return null;
  const mx = (a[0] + b[0]) / 2;
  const my = (a[1] + b[1]) / 2;
  const d = Math.hypot(mx - c.cx, my - c.cy);
  if (d === 0 || c.r > 1e9) return null;
  return [c.cx + ((mx - c.cx) * c.r) / d, c.cy + ((my - c.cy) * c.r) / d];
}

/**
 * The samples with an estimated curve point between each two: the midpoint of
 * the arc through the neighbouring samples (averaged over both sides, never
 * across a kink); the chord midpoint between two kinks. The fit is then held
 * to the curve between samples, not only at them.
 */
function densify(points: readonly Point2[], kinks: ReadonlySet<number>): Point2[] {
  const n = points.length;
  const out: Point2[] = [points[0]!];
  for (let k = 0; k + 1 < n; k++) {
    const a = points[k]!;
    const b = points[k + 1]!;
    const guesses: Point2[] = [];
    if (k > 0 && !kinks.has(k)) {
      const m = arcMidpoint(circleThrough(points[k - 1]!, a, b), a, b);
      if (m !== null) guesses.push(m);
    }
    if (k + 2 < n && !kinks.has(k + 1)) {
      const m = arcMidpoint(circleThrough(a, b, points[k + 2]!), a, b);
      if (m !== null) guesses.push(m);
    }
    const mid: Point2 =
      guesses.length === 0
        ? [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2]
        : [guesses.reduce((s, g) => s + g[0], 0) / guesses.length, guesses.reduce((s, g) => s + g[1], 0) / guesses.length];
    out.push(mid, b);
  }
  return out;
}

/**
 * Fits an open run of samples with circular arcs and straight segments, each
 * within `tolerance` of every sample it replaces, kinks kept as vertices.
 * Between each two samples the curve is estimated (the arc through the
 * neighbouring samples) and held to the same tolerance; a fitted arc may end
 * at such an estimated point.
 *
 * @param samples samples along the exact curve, in order (any unit; at least 2).
 * @param tolerance largest allowed distance of a sample from its fitted arc, same unit, > 0.
 * @returns vertices with DXF bulges and the largest deviation found.
 * @example fitArcs(quarterCircleSamples, 0.025).vertices.length // 2: one arc
 */
export function fitArcs(samples: readonly Point2[], tolerance: number): ArcFit {
  let points = samples;
  if (points.length < 3) return { vertices: points.map((p) => [p[0], p[1], 0] as const), maxDeviation: 0 };
  const origKinks = kinkIndices(points);
  const kinks = origKinks.map((k) => 2 * k);
  points = densify(points, new Set(origKinks));
  const n = points.length;
  const out: SheetVertex[] = [];
  let worst = 0;
  for (let s = 0; s + 1 < kinks.length; s++) {
    const end = kinks[s + 1]!;
    let i = kinks[s]!;
    while (i < end) {
      // Longest j with a fitting arc: grow by doubling, then bisect between the last fit and the first miss.
      let good = i + 1;
      let goodFit = { bulge: 0, dev: 0 };
      let step = 1;
      let bad = -1;
      while (good < end) {
        const j = Math.min(end, good + step);
        const f = tryArc(points, i, j);
        if (f === null || f.dev > tolerance) {
          bad = j;
          break;
        }
        good = j;
        goodFit = f;
        step *= 2;
      }
      if (bad !== -1) {
        let lo = good;
        let hi = bad;
        while (hi - lo > 1) {
          const mid = (lo + hi) >> 1;
          const f = tryArc(points, i, mid);
          if (f === null || f.dev > tolerance) hi = mid;
          else {
            lo = mid;
            goodFit = f;
          }
        }
        good = lo;
        if (good === i + 1) goodFit = { bulge: 0, dev: 0 };
      }
      const p = points[i]!;
      out.push([p[0], p[1], goodFit.bulge]);
      worst = Math.max(worst, goodFit.dev);
      i = good;
    }
  }
  const last = points[n - 1]!;
  out.push([last[0], last[1], 0]);
  return { vertices: out, maxDeviation: worst };
}
