/**
 * Plain 3D vectors as readonly tuples, in millimetres where they are points.
 * Pure helpers only; nothing here mutates its arguments.
 */

/** A point or direction in 3D: `[x, y, z]`. Lengths in mm. */
export type Vec3 = readonly [number, number, number];

/** `a + b`. */
export const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
/** `a - b`. */
export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
/** `a * k`. */
export const scale = (a: Vec3, k: number): Vec3 => [a[0] * k, a[1] * k, a[2] * k];
/** `a + b * k`, the point reached from `a` after `k` steps of `b`. */
export const addScaled = (a: Vec3, b: Vec3, k: number): Vec3 => [a[0] + b[0] * k, a[1] + b[1] * k, a[2] + b[2] * k];
/** Dot product. */
export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
/** Cross product `a × b`. */
export const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
/** Euclidean length. */
export const norm = (a: Vec3): number => Math.hypot(a[0], a[1], a[2]);
/** `a` scaled to unit length; a zero vector stays zero. */
export const normalize = (a: Vec3): Vec3 => {
  const n = norm(a);
  return n === 0 ? a : scale(a, 1 / n);
};
