/**
 * A minimal 3D vector kit for the test oracles. Written apart from the
 * library's own vector code on purpose, so that a mistake there cannot hide
 * itself here. Plain readonly tuples; lengths in mm where they are positions.
 */

/** A vector or point in 3D, `[x, y, z]` (mm for positions, unitless for directions). */
export type Vec3 = readonly [number, number, number];

/**
 * Sum `a + b`.
 * @example add([1, 0, 0], [0, 2, 0]) // [1, 2, 0]
 */
export function add(a: Vec3, b: Vec3): Vec3 {
  return [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
}

/**
 * Difference `a - b`.
 * @example sub([1, 2, 3], [1, 1, 1]) // [0, 1, 2]
 */
export function sub(a: Vec3, b: Vec3): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

/**
 * Scaled vector `k * a`.
 * @example scale([1, 2, 3], 2) // [2, 4, 6]
 */
export function scale(a: Vec3, k: number): Vec3 {
  return [a[0] * k, a[1] * k, a[2] * k];
}

/**
 * Dot product.
 * @example dot([1, 0, 0], [0, 1, 0]) // 0
 */
export function dot(a: Vec3, b: Vec3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/**
 * Cross product `a × b`.
 * @example cross([1, 0, 0], [0, 1, 0]) // [0, 0, 1]
 */
export function cross(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/**
 * Euclidean length.
 * @example norm([3, 4, 0]) // 5
 */
export function norm(a: Vec3): number {
  return Math.hypot(a[0], a[1], a[2]);
}

/**
 * `sum_i k_i * v_i`, for building points from a frame.
 * @example combine([[2, [1, 0, 0]], [3, [0, 1, 0]]]) // [2, 3, 0]
 */
export function combine(terms: readonly (readonly [number, Vec3])[]): Vec3 {
  let x = 0;
  let y = 0;
  let z = 0;
  for (const [k, v] of terms) {
    x += k * v[0];
    y += k * v[1];
    z += k * v[2];
  }
  return [x, y, z];
}
