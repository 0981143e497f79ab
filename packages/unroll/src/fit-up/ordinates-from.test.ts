import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isGirthError } from '@girth/pipes';
import type { Template } from '../types.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { branchAxialClosedForm } from '../internal/test-support/branch-fixtures.js';
import { layoutBranch } from '../branch/layout-branch.js';
import { layoutPlaneCut } from '../plane-cut/layout-plane-cut.js';
import { layoutMiter } from '../miter/layout-miter.js';
import { branchFitUp } from './branch-fit-up.js';
import { planeCutFitUp } from './plane-cut-fit-up.js';
import { miterFitUp } from './miter-fit-up.js';
import { ordinatesFrom } from './ordinates-from.js';
import { referenceLines } from './reference-lines.js';
import type { CutDepth } from './cut-depth.js';
import { branchArb, maxAround, miterArb, planeCutArb } from './test-support/joints.js';

const IN = 25.4;
const DEG = Math.PI / 180;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

const col = (rows: Template['stations'], key: string): number[] => rows.map((s) => s.values[key]!);

/** Station by station, long-point and short-point readings of every cut column add up to `depthMm[key]` (within `tol` mm). */
function expectReferencesAddUp(t: Template, depths: readonly CutDepth[], depthMm: Readonly<Record<string, number>>, tol: number): void {
  const long = ordinatesFrom(t, 'long-point', depths);
  const short = ordinatesFrom(t, 'short-point', depths);
  expect(long.columns.map((c) => c.cutbackKey).sort()).toEqual(Object.keys(depthMm).sort());
  for (const c of short.columns) {
    const l = col(long.stations, c.cutbackKey);
    const s = col(short.stations, c.key);
    expectClose(c.fullDepthMm, depthMm[c.cutbackKey]!, tol, `${t.id} ${c.cutbackKey} full depth mm`);
    expectClose(l.map((v, i) => v + s[i]!), l.map(() => depthMm[c.cutbackKey]!), tol, `${t.id} ${c.cutbackKey}: long + short = full depth, mm`);
    for (const v of s) expect(v).toBeGreaterThanOrEqual(0);
    // Long-point readings are today's cutbacks, untouched.
    expect(l).toEqual(col(t.stations, c.cutbackKey));
  }
}

describe('ordinatesFrom', () => {
  it('gives a 90° tee the saddle depth R − sqrt(R² − r²) at the sides from the short point, and at the crown from the long point', () => {
    // MathWorld, "Cylinder-Cylinder Intersection": h(phi) = R − sqrt(R² − r² sin² phi), the depth of the saddle; set-on: branch ID on header OD (common practice).
    const spec = { header: NPS12, branch: NPS6 };
    const layout = layoutBranch(spec, { stations: 16 });
    const fit = branchFitUp(spec);
    const R = NPS12.odMm / 2;
    const r = (NPS6.odMm - 2 * NPS6.wallMm) / 2;
    const saddle = R - Math.sqrt(R * R - r * r);
    const cut = layout.templates[0];
    const short = ordinatesFrom(cut, 'short-point', fit.cutDepths);
    const long = ordinatesFrom(cut, 'long-point', fit.cutDepths);
    // Station 5 (90°) and 13 (270°) are the sides; station 1 (0°, heel) and 9 (180°, toe) the crown.
    for (const n of [5, 13]) expectClose(short.stations[n - 1]!.values.ordinate!, saddle, 1e-9 * R, `short-point ordinate at station ${n}, mm`);
    for (const n of [1, 9]) expectClose(long.stations[n - 1]!.values.cutback!, saddle, 1e-9 * R, `long-point cutback at station ${n}, mm`);
    for (const n of [1, 9]) expectClose(short.stations[n - 1]!.values.ordinate!, 0, 1e-9 * R, `short-point ordinate at the crown, station ${n}, mm`);
    expectClose(short.columns[0]!.fullDepthMm, saddle, 1e-9 * R, 'full depth = saddle depth, mm');
    expectClose(short.columns[0]!.stockPastShortPointMm, saddle, 1e-9 * R, 'stock past the short point, mm');
    expect(short.columns[0]!.referenceWords).toBe('measured from the square line through the short point');
    expect(long.columns[0]!.referenceWords).toBe('measured from the square line through the long point');
    expect(short.stationColumns.map((c) => c.key)).toEqual(['girth', 'ordinate']);
    expect(long.stationColumns.map((c) => c.key)).toEqual(['girth', 'cutback']);
    expectClose(col(short.stations, 'girth'), col(cut.stations, 'girth'), 0, 'girth passes through');
  });

  it('branch joints: the two references add up to the full depth of the closed form, any lateral, offset, fit and gap', () => {
    // Closed form of two cylinders from y² + z² = R² (branch-fixtures); depth = max − min of the axial position round the branch,
    // found here on a dense grid refined by ternary search (independent of the library's search).
    fc.assert(
      fc.property(branchArb, fc.integer({ min: 4, max: 48 }), ({ spec, R, r }, stations) => {
        const layout = layoutBranch(spec, { stations });
        const fit = branchFitUp(spec);
        const t = (phi: number): number => branchAxialClosedForm(R + spec.gapMm!, r, spec.angleDeg!, spec.offsetMm!, phi);
        const depth = maxAround(t) + maxAround((phi) => -t(phi));
        expectReferencesAddUp(layout.templates[0], fit.cutDepths, { cutback: depth }, 1e-7 * (R + 1));
        // The hole has no square line: nothing to re-reference.
        expect(ordinatesFrom(layout.templates[1], 'short-point', fit.cutDepths).columns).toEqual([]);
      }),
      { numRuns: 60 },
    );
  });

  it('finds the full depth at a kink: a branch side flush with the header side, tee and 60° lateral', () => {
    // Closed form (branch-fixtures) with |e| + r = R: the generator at 90° grazes the header side (a kink of the cut).
    const R = NPS12.odMm / 2;
    const r = (NPS6.odMm - 2 * NPS6.wallMm) / 2;
    for (const angleDeg of [90, 60]) {
      const spec = { header: NPS12, branch: NPS6, angleDeg, offsetMm: R - r };
      const t = (phi: number): number => branchAxialClosedForm(R, r, angleDeg, R - r, phi);
      const depth = maxAround(t) + maxAround((phi) => -t(phi));
      expectReferencesAddUp(layoutBranch(spec, { stations: 12 }).templates[0], branchFitUp(spec).cutDepths, { cutback: depth }, 1e-7 * R);
    }
  });

  it('plane cuts: the two references add up to D tan(c), c = 90° − angle', () => {
    // REFERENCES.md, "Geometry with published statements": the ordinate of a plane cut is (D/2) tan(cut)(1 − cos phi), so its full depth is D tan(cut).
    fc.assert(
      fc.property(planeCutArb, fc.integer({ min: 4, max: 48 }), (spec, stations) => {
        const layout = layoutPlaneCut(spec, { stations });
        const fit = planeCutFitUp(spec);
        const depth = spec.pipe.odMm * Math.tan((90 - spec.angleDeg) * DEG);
        expectReferencesAddUp(layout.templates[0], fit.cutDepths, { cutback: depth }, 1e-9 * spec.pipe.odMm * (1 + Math.tan((90 - spec.angleDeg) * DEG)));
      }),
      { numRuns: 60 },
    );
  });

  it('miters: end and middle pieces, both ends, add up to D tan(c), c = bend / (2 × welds)', () => {
    // ASME B31.3 para. 304.2.3: cut angle = change of direction at a joint / 2; REFERENCES.md: plane-cut ordinate (D/2) tan(cut)(1 − cos phi).
    fc.assert(
      fc.property(miterArb, fc.integer({ min: 4, max: 32 }), (spec, stations) => {
        const layout = layoutMiter(spec, { stations });
        const fit = miterFitUp(spec);
        const c = (spec.bendDeg / (2 * spec.welds!)) * DEG;
        const depth = spec.pipe.odMm * Math.tan(c);
        const tol = 1e-9 * spec.pipe.odMm * (1 + Math.tan(c));
        const [end, middle] = layout.templates;
        expectReferencesAddUp(end!, fit.cutDepths, { cutback: depth }, tol);
        if (spec.welds! >= 2) expectReferencesAddUp(middle!, fit.cutDepths, { cutback: depth, cutbackFar: depth }, tol);
        else expect(middle).toBeUndefined();
      }),
      { numRuns: 60 },
    );
  });

  it('rejects an unknown reference and a depth for a column the template lacks, naming the option', () => {
    const layout = layoutBranch({ header: NPS12, branch: NPS6 });
    const fit = branchFitUp({ header: NPS12, branch: NPS6 });
    const codeOf = (f: () => unknown): string | undefined => {
      try {
        f();
      } catch (e) {
        if (isGirthError(e)) return `${e.code}:${e.field}`;
        throw e;
      }
      return undefined;
    };
    expect(codeOf(() => ordinatesFrom(layout.templates[0], 'short' as never, fit.cutDepths))).toBe('BAD_OPTION:ordinatesFrom');
    expect(codeOf(() => ordinatesFrom(layout.templates[0], undefined as never, fit.cutDepths))).toBe('BAD_OPTION:ordinatesFrom');
    const wrong = fit.cutDepths.map((d) => ({ ...d, columnKey: 'cutbackFar' }));
    expect(codeOf(() => ordinatesFrom(layout.templates[0], 'long-point', wrong))).toBe('BAD_OPTION:depths');
  });
});

describe('referenceLines', () => {
  it('draws the short-point line where the drawn cut reaches furthest from the long-point line, on both ends of a middle piece', () => {
    // Invariant: the sampled cut points lie exactly on the curve, so none passes the short-point line, and the
    // farthest comes within the chord tolerance of it (0.05 mm default: the curve stays that close to its chords).
    const spec = { pipe: { odMm: 323.85, wallMm: 9.525 }, bendDeg: 90, welds: 3, radiusMm: 457.2 };
    const [, middle] = layoutMiter(spec).templates;
    const lines = referenceLines(middle!, miterFitUp(spec).cutDepths);
    expect(lines.map((l) => l.columnKey)).toEqual(['cutback', 'cutbackFar']);
    const [near, far] = middle!.cut.map((p) => (p.kind === 'polyline' ? p.points.map((q) => q[1]) : []));
    const nearShort = lines[0]!.shortPointLine.from[1];
    const farShort = lines[1]!.shortPointLine.from[1];
    expect(Math.max(...near!)).toBeLessThanOrEqual(nearShort + 1e-9);
    expect(Math.max(...near!)).toBeGreaterThanOrEqual(nearShort - 0.05);
    expect(Math.min(...far!)).toBeGreaterThanOrEqual(farShort - 1e-9);
    expect(Math.min(...far!)).toBeLessThanOrEqual(farShort + 0.05);
    // The long-point lines are the template's square line and its far square line (mark drawn at the span).
    expect(lines[0]!.longPointLine.from[1]).toBe(0);
    const far0 = middle!.marks[0]!;
    expectClose(lines[1]!.longPointLine.from[1], far0.kind === 'segment' ? far0.from[1] : NaN, 1e-9, 'far square line y, mm');
    expect(lines[0]!.labels.map((l) => l.text)).toEqual(['SQUARE LINE, LONG POINT', 'SQUARE LINE, SHORT POINT']);
    expectClose([lines[0]!.shortPointLine.from[0], lines[0]!.shortPointLine.to[0]], [0, Math.PI * 323.85], 1e-9, 'line spans the stretch-out, mm');
  });
});
