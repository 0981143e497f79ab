import { describe, expect, it } from 'vitest';
import { weldPrepForBranch } from './weld-prep-branch.js';
import { weldPrepForMiter, weldPrepForPlaneCut } from './weld-prep-cuts.js';
import type { BranchWeldPrep } from './types.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN };

/** Invariant: every number written is finite (Girth never writes NaN). */
function allFinite(prep: BranchWeldPrep): boolean {
  const rows = [...prep.stations, ...prep.hole];
  const nums = rows.flatMap((r) => Object.values(r).filter((v): v is number => typeof v === 'number'));
  const pts = prep.holeOnId?.points.flat() ?? [];
  return [...nums, ...pts].every((v) => Number.isFinite(v));
}

describe('weld prep at the edges of the joints a layout accepts', () => {
  it('an equal tee cut OD to OD (the sides graze): 180° at the sides, a tangent joint', () => {
    // Invariant: where the branch side is flush with the header side the two outsides are one surface (dihedral 180°).
    const prep = weldPrepForBranch({ header: NPS12, branch: NPS12, contact: { branch: 'outside', header: 'outside' } }, { grooveAngleDeg: 45 });
    expect(prep.stations.find((s) => s.angleDeg === 90)!.dihedralDeg).toBeCloseTo(180, 6);
    expect(prep.warnings.map((w) => w.code)).toContain('TANGENT_JOINT');
    expect(allFinite(prep)).toBe(true);
  });
  it('a set-in branch flush with the header bore on one side, a 1° lateral and 360 stations all give finite data', () => {
    const rId = NPS12.odMm / 2 - NPS12.wallMm;
    const flush = weldPrepForBranch({ header: NPS12, branch: NPS6, fit: 'set-in', offsetMm: rId - NPS6.odMm / 2 }, { grooveAngleDeg: 45 });
    expect(flush.holeOnId).toBeDefined();
    expect(allFinite(flush)).toBe(true);
    expect(allFinite(weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: 1 }, { grooveAngleDeg: 30 }))).toBe(true);
    expect(weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: 60 }, { grooveAngleDeg: 30 }, { stations: 360 }).stations).toHaveLength(360);
  });
  it('a square cut-back and a one-weld 180° miter', () => {
    const square = weldPrepForPlaneCut({ pipe: NPS6, angleDeg: 90 }, { grooveAngleDeg: 45 });
    // A pipe square to a plate meets it at 90° all round (a T-joint).
    for (const s of square.stations) expect(s.dihedralDeg).toBeCloseTo(90, 9);
    const u = weldPrepForMiter({ pipe: NPS6, bendDeg: 180, welds: 4, radiusMm: 300 }, { grooveAngleDeg: 60 });
    expect(u.stations.every((s) => Number.isFinite(s.dihedralDeg))).toBe(true);
  });
});
