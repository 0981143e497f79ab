/**
 * What text must keep clear of on a sheet: cut lines, the square line and the
 * text already placed, held in a uniform grid of cells so that asking "is this
 * box free?" looks only at the few cells the box covers.
 *
 * Any planner can register more obstacles (a new line kind, a new label) with
 * {@link addSegment}, {@link addPart} and {@link addBox}; every later placement
 * keeps clear of them.
 *
 * Cost: registering a segment touches the cells its box covers; a query reads the
 * entries of the cells its box covers. With text a few mm high and lines
 * sampled at sub-mm chords, both are bounded by the local density, so placing n
 * labels among m line pieces takes O((n + m) k) for k candidates tried per label
 * (no pass over all placed labels per label).
 */
import type { PathPart, Point2 } from '@girth/unroll';
import type { Box } from '../types.js';
import { arcSweepDeg } from '../check-template.js';

/** A straight piece of a line to keep clear of, mm. */
interface SegmentEntry {
  readonly ax: number;
  readonly ay: number;
  readonly bx: number;
  readonly by: number;
}

/** The grid: cell size and, per cell key, the segments and boxes touching it. */
export interface Obstacles {
  readonly cellMm: number;
  readonly segments: Map<number, SegmentEntry[]>;
  readonly boxes: Map<number, Box[]>;
}

/** Largest sagitta of the chords an arc is broken into for the grid, mm. */
const ARC_SAGITTA_MM = 0.05;
/** Most cells along one side of the grid's span: bounds the work of a very long line. */
const MAX_CELLS_ALONG = 4096;

/**
 * An empty grid for a drawing spanning `extent` (mm); cells of at least `minCellMm`.
 *
 * @example newObstacles({ minX: 0, minY: 0, maxX: 500, maxY: 200 }).cellMm // 5
 */
export function newObstacles(extent: Box, minCellMm = 5): Obstacles {
  const span = Math.max(extent.maxX - extent.minX, extent.maxY - extent.minY, 0);
  const cellMm = Math.max(minCellMm, Number.isFinite(span) ? span / MAX_CELLS_ALONG : minCellMm);
  return { cellMm, segments: new Map(), boxes: new Map() };
}

/** Cell key: exact in a double for any coordinate within 1 km; a rare collision only costs an extra exact test. */
function key(cx: number, cy: number): number {
  return cx * 67108864 + cy;
}

function push<T>(m: Map<number, T[]>, k: number, v: T): void {
  const list = m.get(k);
  if (list) list.push(v);
  else m.set(k, [v]);
}

/** Registers a straight segment (template mm). */
export function addSegment(o: Obstacles, a: Point2, b: Point2): void {
  const s: SegmentEntry = { ax: a[0], ay: a[1], bx: b[0], by: b[1] };
  const c = o.cellMm;
  const x0 = Math.floor(Math.min(s.ax, s.bx) / c);
  const x1 = Math.floor(Math.max(s.ax, s.bx) / c);
  const y0 = Math.floor(Math.min(s.ay, s.by) / c);
  const y1 = Math.floor(Math.max(s.ay, s.by) / c);
  for (let cx = x0; cx <= x1; cx++) for (let cy = y0; cy <= y1; cy++) push(o.segments, key(cx, cy), s);
}

/** Registers a path part: a polyline's runs, a segment, or an arc as chords within 0.05 mm of it. */
export function addPart(o: Obstacles, part: PathPart): void {
  switch (part.kind) {
    case 'segment':
      addSegment(o, part.from, part.to);
      return;
    case 'polyline': {
      const p = part.points;
      for (let i = 1; i < p.length; i++) addSegment(o, p[i - 1] as Point2, p[i] as Point2);
      if (part.closed && p.length > 2) addSegment(o, p[p.length - 1] as Point2, p[0] as Point2);
      return;
    }
    case 'arc': {
      const sweepRad = (arcSweepDeg(part.startDeg, part.endDeg) * Math.PI) / 180;
      const r = part.radiusMm;
      const stepRad = r > ARC_SAGITTA_MM ? 2 * Math.acos(1 - ARC_SAGITTA_MM / r) : Math.PI / 2;
      const n = Math.max(1, Math.ceil(sweepRad / stepRad));
      const start = (part.startDeg * Math.PI) / 180;
      let prev: Point2 = [part.center[0] + r * Math.cos(start), part.center[1] + r * Math.sin(start)];
      for (let i = 1; i <= n; i++) {
        const a = start + (sweepRad * i) / n;
        const next: Point2 = [part.center[0] + r * Math.cos(a), part.center[1] + r * Math.sin(a)];
        addSegment(o, prev, next);
        prev = next;
      }
    }
  }
}

/** Registers a box (placed text, a tab). */
export function addBox(o: Obstacles, b: Box): void {
  const c = o.cellMm;
  for (let cx = Math.floor(b.minX / c); cx <= Math.floor(b.maxX / c); cx++) {
    for (let cy = Math.floor(b.minY / c); cy <= Math.floor(b.maxY / c); cy++) push(o.boxes, key(cx, cy), b);
  }
}

/**
 * True when segment a-b meets the closed box (Liang-Barsky clipping).
 *
 * @example segmentMeetsBox(0, 0, 10, 10, { minX: 4, minY: 4, maxX: 6, maxY: 6 }) // true
 */
export function segmentMeetsBox(ax: number, ay: number, bx: number, by: number, b: Box): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = bx - ax;
  const dy = by - ay;
  const clip = (p: number, q: number): boolean => {
    if (p === 0) return q >= 0;
    const r = q / p;
    if (p < 0) {
      if (r > t1) return false;
      if (r > t0) t0 = r;
    } else {
      if (r < t0) return false;
      if (r < t1) t1 = r;
    }
    return true;
  };
  return clip(-dx, ax - b.minX) && clip(dx, b.maxX - ax) && clip(-dy, ay - b.minY) && clip(dy, b.maxY - ay) && t0 <= t1;
}

/** True when two closed boxes share a point. */
export function boxesMeet(a: Box, b: Box): boolean {
  return a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY;
}

/**
 * True when the box meets no registered segment or box.
 *
 * @example isFree(o, { minX: 0, minY: 0, maxX: 10, maxY: 4 })
 */
export function isFree(o: Obstacles, b: Box): boolean {
  const c = o.cellMm;
  const x0 = Math.floor(b.minX / c);
  const x1 = Math.floor(b.maxX / c);
  const y0 = Math.floor(b.minY / c);
  const y1 = Math.floor(b.maxY / c);
  for (let cx = x0; cx <= x1; cx++) {
    for (let cy = y0; cy <= y1; cy++) {
      const k = key(cx, cy);
      const segs = o.segments.get(k);
      if (segs) for (const s of segs) if (segmentMeetsBox(s.ax, s.ay, s.bx, s.by, b)) return false;
      const boxes = o.boxes.get(k);
      if (boxes) for (const other of boxes) if (boxesMeet(other, b)) return false;
    }
  }
  return true;
}
