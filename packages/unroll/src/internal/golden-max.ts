/**
 * Golden-section search for a local maximum of a function on an interval: the
 * geometry package's minimum search run on -f. Negation is exact, so every
 * bracket step and the result are the same as a search for the maximum itself.
 */
import { minimizeOnInterval } from '@girth/geometry';

/**
 * A local maximum of `f` on [`lo`, `hi`], to within `tolX` in x. `f` should
 * have a single peak in the interval (a bracket whose interior point is at
 * least as high as both ends contains one). Pure; calls `f` about
 * log(width / tolX) / 0.48 times.
 *
 * @param tolX width of the final bracket, in the unit of x (> 0).
 * @example maximizeOnInterval((x) => -(x - 1) ** 2, 0, 3, 1e-9).x // ≈ 1
 */
export function maximizeOnInterval(
  f: (x: number) => number,
  lo: number,
  hi: number,
  tolX: number,
): { readonly x: number; readonly fx: number } {
  const min = minimizeOnInterval((x) => -f(x), lo, hi, tolX);
  return { x: min.x, fx: -min.fx };
}
