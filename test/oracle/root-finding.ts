/**
 * One-dimensional root finding and minimisation for the test oracles:
 * bisection carried to full double precision, and golden-section search on a
 * convex function. Nothing here knows about pipes; the callers supply the
 * signed-distance functions.
 */

/** Result of searching a convex function for a point where it is at or below zero. */
export type ConvexDipResult =
  | { readonly kind: 'found'; readonly x: number; readonly fx: number }
  | { readonly kind: 'none'; readonly xMin: number; readonly fMin: number };

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/**
 * Bisection for the boundary between `f(x) <= 0` (at `lo`) and `f(x) > 0` (at
 * `hi`). Runs until no double lies strictly between the two ends, so the
 * answer is as exact as `f` can be evaluated. `lo` may be above or below `hi`.
 *
 * @param f the function (any units); must satisfy `f(lo) <= 0 < f(hi)`.
 * @returns the end of the final bracket where `|f|` is smaller.
 * @throws Error when the bracket does not straddle the sign change, or an end is not finite.
 * @example bisectSignChange((x) => x * x - 2, 0, 2) // 1.4142135623730951 (to the last bit or so)
 */
export function bisectSignChange(f: (x: number) => number, lo: number, hi: number): number {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) throw new Error(`bisectSignChange: bracket ends must be finite, got ${lo}, ${hi}`);
  let fLo = f(lo);
  let fHi = f(hi);
  if (!(fLo <= 0) || !(fHi > 0)) throw new Error(`bisectSignChange: need f(lo) <= 0 < f(hi), got f(${lo}) = ${fLo}, f(${hi}) = ${fHi}`);
  // At most ~2100 halvings separate any two doubles; the cap only guards against a broken f.
  for (let i = 0; i < 2200; i++) {
    const mid = lo + (hi - lo) / 2;
    if (mid === lo || mid === hi) break;
    const fMid = f(mid);
    if (fMid <= 0) {
      lo = mid;
      fLo = fMid;
    } else {
      hi = mid;
      fHi = fMid;
    }
  }
  return Math.abs(fLo) <= Math.abs(fHi) ? lo : hi;
}

/**
 * Golden-section search on a convex function over `[a, b]`, stopping at the
 * first point where `f <= 0`. When there is none, returns the located minimum.
 * Convexity makes the set `{f <= 0}` one interval, so any point found in it
 * brackets both of its ends together with points where `f > 0`.
 *
 * @param f a convex function on `[a, b]`.
 * @param a left end, `a < b`.
 * @param b right end.
 * @param options `relTol`: stop once the bracket is narrower than this times `|b - a|` (default 1e-15).
 * @returns `found` with a point where `f <= 0`, or `none` with the best point seen.
 * @throws Error when `a >= b` or an end is not finite.
 * @example findDipOfConvex((x) => (x - 1) ** 2 - 0.25, -10, 10) // { kind: 'found', x: ≈1, ... }
 */
export function findDipOfConvex(
  f: (x: number) => number,
  a: number,
  b: number,
  options: { readonly relTol?: number } = {},
): ConvexDipResult {
  if (!Number.isFinite(a) || !Number.isFinite(b) || !(a < b)) throw new Error(`findDipOfConvex: need finite a < b, got ${a}, ${b}`);
  const relTol = options.relTol ?? 1e-15;
  const stopWidth = (b - a) * relTol;
  let x1 = b - GOLDEN * (b - a);
  let x2 = a + GOLDEN * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (const [x, fx] of [[a, f(a)], [b, f(b)], [x1, f1], [x2, f2]] as const) {
    if (fx <= 0) return { kind: 'found', x, fx };
  }
  for (let i = 0; i < 400 && b - a > stopWidth; i++) {
    if (f1 <= f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - GOLDEN * (b - a);
      f1 = f(x1);
      if (f1 <= 0) return { kind: 'found', x: x1, fx: f1 };
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + GOLDEN * (b - a);
      f2 = f(x2);
      if (f2 <= 0) return { kind: 'found', x: x2, fx: f2 };
    }
  }
  return f1 <= f2 ? { kind: 'none', xMin: x1, fMin: f1 } : { kind: 'none', xMin: x2, fMin: f2 };
}

/**
 * Golden-section minimisation of a function that is unimodal on `[a, b]`.
 * Used to refine a minimum found on a grid (the heel-to-toe cut length).
 *
 * @param f the function to minimise.
 * @param a left end, `a < b`.
 * @param b right end.
 * @param options `absTol`: stop once the bracket is narrower than this (default 1e-12, in the units of x).
 * @returns the best point and its value.
 * @throws Error when `a >= b` or an end is not finite.
 * @example minimiseUnimodal((x) => (x - 2) ** 2, 0, 5) // { x: ≈2, fx: ≈0 }
 */
export function minimiseUnimodal(
  f: (x: number) => number,
  a: number,
  b: number,
  options: { readonly absTol?: number } = {},
): { readonly x: number; readonly fx: number } {
  if (!Number.isFinite(a) || !Number.isFinite(b) || !(a < b)) throw new Error(`minimiseUnimodal: need finite a < b, got ${a}, ${b}`);
  const absTol = options.absTol ?? 1e-12;
  let x1 = b - GOLDEN * (b - a);
  let x2 = a + GOLDEN * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  let best = { x: a, fx: f(a) };
  const fb = f(b);
  if (fb < best.fx) best = { x: b, fx: fb };
  for (let i = 0; i < 400 && b - a > absTol; i++) {
    if (f1 <= f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - GOLDEN * (b - a);
      f1 = f(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + GOLDEN * (b - a);
      f2 = f(x2);
    }
    if (f1 < best.fx) best = { x: x1, fx: f1 };
    if (f2 < best.fx) best = { x: x2, fx: f2 };
  }
  return best;
}
