/**
 * Random joints of every kind with a cut from a square line, and small
 * independent helpers for the fit-up tests (no use of the code under test).
 */
import fc from 'fast-check';
import type { BranchSpec, MiterSpec, PlaneCutSpec } from '@girth/geometry';

/** Random valid branch joints: header 50–900 mm, branch up to the header, 15–90°, offsets within the header side, set-on or set-in. */
export const branchArb = fc
  .record({
    headerOd: fc.double({ min: 50, max: 900, noNaN: true }),
    headerWallShare: fc.double({ min: 0.01, max: 0.2, noNaN: true }),
    branchShare: fc.double({ min: 0.1, max: 0.95, noNaN: true }),
    branchWallShare: fc.double({ min: 0.01, max: 0.2, noNaN: true }),
    angleDeg: fc.double({ min: 15, max: 90, noNaN: true }),
    offsetShare: fc.double({ min: -0.9, max: 0.9, noNaN: true }),
    fit: fc.constantFrom('set-on' as const, 'set-in' as const),
    gapMm: fc.constantFrom(0, 1.6, 3.2),
  })
  .map((j) => {
    const header = { odMm: j.headerOd, wallMm: j.headerOd * j.headerWallShare };
    const R = j.fit === 'set-on' ? header.odMm / 2 : header.odMm / 2 - header.wallMm;
    const branchOd = Math.min(header.odMm, j.fit === 'set-on' ? (2 * R * j.branchShare) / (1 - 2 * j.branchWallShare) : 2 * R * j.branchShare);
    const branch = { odMm: branchOd, wallMm: branchOd * j.branchWallShare };
    const r = j.fit === 'set-on' ? branch.odMm / 2 - branch.wallMm : branch.odMm / 2;
    const offsetMm = j.offsetShare * Math.max(0, Math.min(R, header.odMm / 2) - r);
    const spec: BranchSpec = { header, branch, angleDeg: j.angleDeg, offsetMm, fit: j.fit, gapMm: j.gapMm };
    return { spec, R, r };
  });

/** Random plane cuts on the OD: pipe 20–900 mm, 5–90°. */
export const planeCutArb = fc
  .record({ od: fc.double({ min: 20, max: 900, noNaN: true }), angleDeg: fc.double({ min: 5, max: 90, noNaN: true }), gapMm: fc.constantFrom(0, 1.6) })
  .map((p): PlaneCutSpec => ({ pipe: { odMm: p.od, wallMm: p.od * 0.05 }, angleDeg: p.angleDeg, gapMm: p.gapMm }));

/** Random miter elbows on the OD: pipe 20–900 mm, 10–170° in 1 to 6 welds, radius 0.75–3 OD, tangent 0–200 mm. */
export const miterArb = fc
  .record({
    od: fc.double({ min: 20, max: 900, noNaN: true }),
    bendDeg: fc.double({ min: 10, max: 170, noNaN: true }),
    welds: fc.integer({ min: 1, max: 6 }),
    radiusShare: fc.double({ min: 0.75, max: 3, noNaN: true }),
    tangentMm: fc.constantFrom(0, 50, 200),
  })
  .map((m): MiterSpec => ({ pipe: { odMm: m.od, wallMm: m.od * 0.05 }, bendDeg: m.bendDeg, welds: m.welds, radiusMm: m.radiusShare * m.od, tangentMm: m.tangentMm }));

/**
 * The largest value of `f` on [0, 2π): a dense grid, then ternary search
 * around the best grid point. Independent of the library's search.
 */
export function maxAround(f: (phi: number) => number, grid = 4000): number {
  const step = (2 * Math.PI) / grid;
  let bestI = 0;
  let best = -Infinity;
  for (let i = 0; i < grid; i++) {
    const v = f(i * step);
    if (v > best) [best, bestI] = [v, i];
  }
  let lo = (bestI - 1) * step;
  let hi = (bestI + 1) * step;
  for (let k = 0; k < 200 && hi - lo > 1e-13; k++) {
    const m1 = lo + (hi - lo) / 3;
    const m2 = hi - (hi - lo) / 3;
    if (f(m1) >= f(m2)) hi = m2;
    else lo = m1;
  }
  return Math.max(best, f((lo + hi) / 2));
}
