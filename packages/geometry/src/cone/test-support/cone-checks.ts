/**
 * Test helpers for cone checks, written independently of the code under test:
 * plain vector arithmetic, a point-to-line distance and a brute-force nearest
 * element search. Lives under `test-support/`, which the build leaves out.
 */
import fc from 'fast-check';

type V = readonly [number, number, number];

/** Throws unless |actual − expected| ≤ tol (absolute); NaN never passes. The shared helper under its older name. */
export { expectClose as expectNear } from '@girth/pipes/test-support';

/** Distance from point p to the infinite line through a and b. */
export function distanceToLine(p: V, a: V, b: V): number {
  const u = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const w = [p[0] - a[0], p[1] - a[1], p[2] - a[2]];
  const uu = u[0]! * u[0]! + u[1]! * u[1]! + u[2]! * u[2]!;
  const s = (w[0]! * u[0]! + w[1]! * u[1]! + w[2]! * u[2]!) / uu;
  return Math.hypot(w[0]! - s * u[0]!, w[1]! - s * u[1]!, w[2]! - s * u[2]!);
}

/**
 * Shortest distance from `p` to the (infinite) cone through the circles
 * (0,0,0) radius R in z = 0 and (e,0,L) radius r in z = L, by scanning the
 * elements and refining by golden section. Independent of the library's normals.
 */
export function distanceToCone(p: V, R: number, r: number, L: number, e: number): number {
  const line = (t: number): [V, V] => [
    [R * Math.cos(t), R * Math.sin(t), 0],
    [e + r * Math.cos(t), r * Math.sin(t), L],
  ];
  const f = (t: number): number => distanceToLine(p, ...line(t));
  const n = 720;
  let best = 0;
  for (let i = 1; i < n; i++) if (f((2 * Math.PI * i) / n) < f((2 * Math.PI * best) / n)) best = i;
  let a = (2 * Math.PI * (best - 1)) / n;
  let b = (2 * Math.PI * (best + 1)) / n;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let k = 0; k < 200 && b - a > 1e-15; k++) {
    const c = b - g * (b - a);
    const d = a + g * (b - a);
    if (f(c) < f(d)) b = d;
    else a = c;
  }
  return f((a + b) / 2);
}

/**
 * A reducer of plausible shop size and within Girth's limits (`@girth/pipes`
 * limits.ts): large diameter 20..3000 mm, small 5..95 % of it but at least
 * 3 mm and at least 1.5 mm below the large end (REDUCER_STEP_MM is 1 mm), length 5..3000 mm but short enough for an included angle of at least
 * 0.5° (L ≤ 100 (D − d), since tan 0.25° ≈ 1 / 229).
 */
export const reducerArb = fc
  .record({
    largeDiameterMm: fc.double({ min: 20, max: 3000, noNaN: true }),
    smallFraction: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
    lengthMm: fc.double({ min: 5, max: 3000, noNaN: true }),
  })
  .map((x) => {
    const smallDiameterMm = Math.min(Math.max(x.largeDiameterMm * x.smallFraction, 3), x.largeDiameterMm - 1.5);
    return { largeDiameterMm: x.largeDiameterMm, smallDiameterMm, lengthMm: Math.min(x.lengthMm, 100 * (x.largeDiameterMm - smallDiameterMm)) };
  });
