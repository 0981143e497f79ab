/**
 * Golden-section search for a local minimum of a function on an interval.
 */

const INV_PHI = (Math.sqrt(5) - 1) / 2; // 0.618...

/**
 * A local minimum of `f` on [`lo`, `hi`], to within `tolX` in x. `f` should
 * have a single dip in the interval (a V-shaped dip is fine: no derivative is
 * used). Pure; calls `f` about log(width / tolX) / 0.48 times.
 *
 * @param tolX width of the final bracket, in the unit of x (> 0).
 * @example minimizeOnInterval((x) => Math.abs(x - 1), 0, 3, 1e-12).x // ≈ 1
 */
export function minimizeOnInterval(
  f: (x: number) => number,
  lo: number,
  hi: number,
  tolX: number,
): { readonly x: number; readonly fx: number } {
  let a = lo;
  let b = hi;
  let c = b - INV_PHI * (b - a);
  let d = a + INV_PHI * (b - a);
  let fc = f(c);
  let fd = f(d);
  while (b - a > tolX) {
    if (fc <= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - INV_PHI * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + INV_PHI * (b - a);
      fd = f(d);
    }
  }
  return fc <= fd ? { x: c, fx: fc } : { x: d, fx: fd };
}
