/**
 * Marks never on a cut: a stretch of a mark (station line, square line) that
 * lies on a straight cut edge is left to the cut layer, so a table never
 * scribes along a line it also cuts (a closed wrap's station 1 runs along its
 * seam edge; a square cut puts the square line on the cut).
 */
import type { SheetEntity, SheetVertex } from './sheet.js';

type Xy = readonly [number, number];
type Seg = readonly [Xy, Xy];

/** Straight segments of the cut layer: lines and unbulged polyline sides. */
function cutSegments(entities: readonly SheetEntity[]): Seg[] {
  const out: Seg[] = [];
  for (const e of entities) {
    if (e.layer !== 'cut') continue;
    if (e.kind === 'line') out.push([e.from, e.to]);
    if (e.kind === 'polyline') {
      const n = e.vertices.length;
      const last = e.closed ? n : n - 1;
      for (let i = 0; i < last; i++) {
        const a = e.vertices[i]!;
        if (a[2] !== 0) continue;
        const b = e.vertices[(i + 1) % n]!;
        out.push([[a[0], a[1]], [b[0], b[1]]]);
      }
    }
  }
  return out;
}

/** The parts of segment `m` (as parameter intervals in [0, 1]) not lying on any cut segment within `eps`. */
function freeIntervals(m: Seg, cuts: readonly Seg[], eps: number): Array<[number, number]> {
  const [a, b] = m;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  // A mark no longer than eps is a point: nothing to scribe.
  if (len <= eps) return [];
  const ux = dx / len;
  const uy = dy / len;
  const covered: Array<[number, number]> = [];
  for (const [p, q] of cuts) {
    // Both ends of the cut segment within eps of the mark's line: collinear.
    const dp = (p[0] - a[0]) * uy - (p[1] - a[1]) * ux;
    const dq = (q[0] - a[0]) * uy - (q[1] - a[1]) * ux;
    if (Math.abs(dp) > eps || Math.abs(dq) > eps) continue;
    const tp = ((p[0] - a[0]) * ux + (p[1] - a[1]) * uy) / len;
    const tq = ((q[0] - a[0]) * ux + (q[1] - a[1]) * uy) / len;
    const lo = Math.max(0, Math.min(tp, tq));
    const hi = Math.min(1, Math.max(tp, tq));
    if (hi - lo > eps / len) covered.push([lo, hi]);
  }
  if (covered.length === 0) return [[0, 1]];
  covered.sort((x, y) => x[0] - y[0]);
  const free: Array<[number, number]> = [];
  let at = 0;
  for (const [lo, hi] of covered) {
    if (lo - at > eps / len) free.push([at, lo]);
    at = Math.max(at, hi);
  }
  if (1 - at > eps / len) free.push([at, 1]);
  return free;
}

const lerp = (a: Xy, b: Xy, t: number): [number, number] => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];

/**
 * Mark lines and unbulged mark polylines with every stretch that lies on a
 * straight cut edge (within `eps`, in the sheet's unit) taken out. A mark
 * that touches nothing is returned as it was; one that does is split into
 * LINEs of what is left.
 *
 * @example clipMarksOnCut(entities, 1e-4)
 */
export function clipMarksOnCut(entities: readonly SheetEntity[], eps: number): SheetEntity[] {
  const cuts = cutSegments(entities);
  if (cuts.length === 0) return [...entities];
  const out: SheetEntity[] = [];
  for (const e of entities) {
    if (e.layer !== 'mark') {
      out.push(e);
      continue;
    }
    const segs: Seg[] = [];
    if (e.kind === 'line') segs.push([e.from, e.to]);
    else if (e.kind === 'polyline' && e.vertices.every((v: SheetVertex) => v[2] === 0)) {
      const n = e.vertices.length;
      for (let i = 0; i < (e.closed ? n : n - 1); i++) {
        const p = e.vertices[i]!;
        const q = e.vertices[(i + 1) % n]!;
        segs.push([[p[0], p[1]], [q[0], q[1]]]);
      }
    } else {
      out.push(e);
      continue;
    }
    const pieces = segs.map((s) => ({ s, free: freeIntervals(s, cuts, eps) }));
    if (pieces.every((p) => p.free.length === 1 && p.free[0]![0] === 0 && p.free[0]![1] === 1)) {
      out.push(e);
      continue;
    }
    for (const { s, free } of pieces) {
      for (const [lo, hi] of free) out.push({ kind: 'line', layer: 'mark', from: lerp(s[0], s[1], lo), to: lerp(s[0], s[1], hi) });
    }
  }
  return out;
}
