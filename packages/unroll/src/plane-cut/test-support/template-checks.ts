/**
 * Checks of wrap templates shared by the plane-cut and miter tests.
 */
import { expect } from 'vitest';
import type { PathPart, Point2, Template } from '../../types.js';

/** A template's station table column as numbers, in station order. */
export function column(t: Template, key: string): number[] {
  return t.stations.map((s) => {
    const v = s.values[key];
    if (v === undefined) throw new Error(`${t.id}: no column ${key} at station ${s.n}`);
    return v;
  });
}

/** The points of the template's cut polylines, one array per polyline. */
export function cutPolylines(t: Template): Point2[][] {
  return t.cut.map((part: PathPart) => {
    if (part.kind !== 'polyline') throw new Error(`${t.id}: cut part is a ${part.kind}`);
    return [...part.points];
  });
}

/** Asserts nothing in the template is NaN or infinite (walks every number in it). */
export function expectAllFinite(value: unknown, path = 'template'): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) expect.fail(`${path} is ${value}`);
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((v, i) => expectAllFinite(v, `${path}[${i}]`));
    return;
  }
  if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) expectAllFinite(v, `${path}.${k}`);
  }
}

/** Station angles (radians) of n equal stations from phi = 0. */
export function stationPhis(n: number): number[] {
  return Array.from({ length: n }, (_, i) => (2 * Math.PI * i) / n);
}

/**
 * Largest distance on the flat between the true curve y = f(x) and the chords
 * of `points`: for each chord, points of the true curve between its ends
 * (at 1/8 steps) and their distance to the chord segment.
 */
export function maxChordDistance(points: readonly Point2[], f: (x: number) => number): number {
  let worst = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1] as Point2;
    const b = points[i] as Point2;
    for (let k = 1; k < 8; k++) {
      const x = a[0] + ((b[0] - a[0]) * k) / 8;
      worst = Math.max(worst, distanceToSegment([x, f(x)], a, b));
    }
  }
  return worst;
}

function distanceToSegment(p: Point2, a: Point2, b: Point2): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const s = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - a[0] - s * dx, p[1] - a[1] - s * dy);
}
