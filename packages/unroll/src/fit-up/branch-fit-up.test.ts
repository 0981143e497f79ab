import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../internal/test-support/expect-close.js';
import { holeClosedForm } from '../internal/test-support/branch-fixtures.js';
import { layoutBranch } from '../branch/layout-branch.js';
import { branchFitUp } from './branch-fit-up.js';
import { branchArb } from './test-support/joints.js';
import { codeOf } from './test-support/code-of.js';

const IN = 25.4;
const DEG = Math.PI / 180;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

describe('branchFitUp', () => {
  it('header marks agree with the header-hole template at the heel and toe stations, for any joint', () => {
    // Invariant (the two templates agree): the hole's heel (station 1, 0°) and toe (station N/2 + 1, 180°) on the
    // header-hole table are the hole marks; the crossing point is where the branch axis pierces the header OD.
    fc.assert(
      fc.property(branchArb, fc.integer({ min: 2, max: 24 }), ({ spec }, half) => {
        const stations = 2 * half;
        const hole = layoutBranch(spec, { stations }).templates[1];
        const fit = branchFitUp(spec);
        const heel = hole.stations[0]!.values;
        const toe = hole.stations[half]!.values;
        expect(hole.stations[half]!.angleDeg).toBe(180);
        const R = spec.header.odMm / 2;
        expectClose([fit.hole.heel.axialMm, fit.hole.toe.axialMm], [heel.axial!, toe.axial!], 1e-9 * R, 'hole heel/toe axial, mm');
        expectClose([fit.hole.heel.girthMm, fit.hole.toe.girthMm], [heel.girth!, toe.girth!], 1e-9 * R, 'hole heel/toe girth, mm');
        expectClose(
          [fit.hole.heel.fromCentreMm, fit.hole.toe.fromCentreMm],
          [fit.centre.axialMm - heel.axial!, toe.axial! - fit.centre.axialMm],
          1e-9 * R,
          'distance along the header line from the crossing point to the hole heel/toe, mm',
        );
      }),
      { numRuns: 60 },
    );
  });

  it('marks the hole and weld heel and toe ρ / sin A from the crossing point, on the top or offset line', () => {
    // Closed form (holeClosedForm, from y² + z² = R²): the heel and toe generators lie in the plane y = e, which cuts the
    // header in a straight line; there a surface of radius ρ crossing at angle A spans ρ / sin A each side of its axis.
    fc.assert(
      fc.property(branchArb, ({ spec, r }) => {
        const fit = branchFitUp(spec);
        const A = spec.angleDeg!;
        const e = spec.offsetMm!;
        const R = spec.header.odMm / 2;
        const holeR = spec.fit === 'set-in' ? spec.branch.odMm / 2 : r;
        const weldR = spec.branch.odMm / 2;
        const s = Math.sin(A * DEG);
        expectClose([fit.hole.heel.fromCentreMm, fit.hole.toe.fromCentreMm], [holeR / s, holeR / s], 1e-9 * R, 'hole heel/toe from the crossing, mm');
        expectClose([fit.weld.heel.fromCentreMm, fit.weld.toe.fromCentreMm], [weldR / s, weldR / s], 1e-9 * R, 'weld heel/toe from the crossing, mm');
        expectClose(fit.hole.heel.axialMm, holeClosedForm(R, holeR, A, e, 0)[1], 1e-9 * R, 'hole heel axial (closed form), mm');
        expectClose(fit.weld.toe.axialMm, holeClosedForm(R, weldR, A, e, Math.PI)[1], 1e-9 * R, 'weld toe axial (closed form), mm');
        // All four marks lie on the line through the crossing point: same girth.
        for (const m of [fit.hole.heel, fit.hole.toe, fit.weld.heel, fit.weld.toe]) expectClose(m.girthMm, fit.centre.girthMm, 1e-9 * R, 'mark on the header line, girth mm');
        // Offset round the header OD from the top line: R asin(e/R) (arc of a circle); straight across: 2R sin(θ/2), θ = asin(e/R).
        if (e === 0) {
          expect(fit.markLine).toBe('top-line');
          expect(fit.offset).toBeUndefined();
        } else {
          expect(fit.markLine).toBe('offset-line');
          const theta = Math.asin(e / R);
          expectClose(fit.offset!.girthFromTopLineMm, R * theta, 1e-9 * R, 'offset round the header, mm');
          expectClose(fit.offset!.chordFromTopLineMm, 2 * R * Math.sin(theta / 2), 1e-9 * R, 'offset straight across, mm');
          expect(fit.offset!.offsetMm).toBe(e);
        }
      }),
      { numRuns: 100 },
    );
  });

  it('puts a 45° lateral crossing R cot 45° = R along the header and checks its angle', () => {
    // Right-triangle geometry: a 45° lateral's axis reaches the header top R · cot 45° = R from where the axes cross.
    const fit = branchFitUp({ header: NPS12, branch: NPS6, angleDeg: 45 }, { runMm: 300, chordRadiusMm: 500, arcUnitMm: 25.4 });
    const R = NPS12.odMm / 2;
    expectClose([fit.centre.girthMm, fit.centre.axialMm], [0, R], 1e-9, 'crossing point, mm');
    expectClose(fit.angleCheck.riseMm!, 300, 1e-9, 'rise over 300 mm at 45°, mm');
    expectClose(fit.angleCheck.chordMm, 2 * 500 * Math.sin(22.5 * DEG), 1e-9, 'chord at 500 mm, mm');
    expect(fit.cutDepths.map((d) => [d.templateId, d.columnKey])).toEqual([['branch-cut', 'cutback']]);
  });

  it('rejects bad check lengths naming the option, and passes on the joint errors', () => {
    const ok = { header: NPS12, branch: NPS6 };
    expect(codeOf(() => branchFitUp(ok, { runMm: 0 }))).toBe('NEGATIVE:runMm');
    expect(codeOf(() => branchFitUp(ok, { chordRadiusMm: -5 }))).toBe('NEGATIVE:chordRadiusMm');
    expect(codeOf(() => branchFitUp({ header: NPS6, branch: NPS12 }))).toBe('BRANCH_TOO_LARGE:branch');
    expect(codeOf(() => branchFitUp({ ...ok, offsetMm: 100 }))).toBe('OFFSET_MISSES:offsetMm');
    expect(codeOf(() => branchFitUp(ok))).toBeUndefined();
  });
});
