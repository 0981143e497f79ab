import { describe, expect, it } from 'vitest';
import { expectGirthError } from '@girth/pipes/test-support';
import { weldPrepForBranch } from './weld-prep-branch.js';
import { weldPrepForMiter, weldPrepForPlaneCut } from './weld-prep-cuts.js';
import type { StationWeldPrep } from './types.js';

const IN = 25.4;
const DEG = 180 / Math.PI;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 12 Sch 10 0.180 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS12_S10 = { odMm: 12.75 * IN, wallMm: 0.18 * IN, label: 'NPS 12 Sch 10' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const TOL = 1e-9;
const at = (stations: readonly StationWeldPrep[], angleDeg: number): StationWeldPrep => stations.find((s) => s.angleDeg === angleDeg)!;

describe('weldPrepForBranch: closed values (AWS D1.1 local dihedral angle, recalled; values derived in REFERENCES.md)', () => {
  it('a lateral at A: 180 − A at the heel, A at the toe', () => {
    for (const a of [30, 45, 60]) {
      const prep = weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: a }, { grooveAngleDeg: 20 });
      expect(Math.abs(at(prep.stations, 0).dihedralDeg - (180 - a))).toBeLessThan(TOL);
      expect(Math.abs(at(prep.stations, 180).dihedralDeg - a)).toBeLessThan(TOL);
    }
  });
  it('a tee: 90 at the crown, 90 + asin(d/D) at the sides, d and D the diameters that meet (set-on: branch ID on header OD; set-in: branch OD on header ID)', () => {
    const on = weldPrepForBranch({ header: NPS12, branch: NPS6 }, { grooveAngleDeg: 45 });
    const dOn = NPS6.odMm - 2 * NPS6.wallMm;
    expect(Math.abs(at(on.stations, 0).dihedralDeg - 90)).toBeLessThan(TOL);
    expect(Math.abs(at(on.stations, 180).dihedralDeg - 90)).toBeLessThan(TOL);
    for (const side of [90, 270]) expect(Math.abs(at(on.stations, side).dihedralDeg - (90 + Math.asin(dOn / NPS12.odMm) * DEG))).toBeLessThan(TOL);
    const inserted = weldPrepForBranch({ header: NPS12, branch: NPS6, fit: 'set-in' }, { grooveAngleDeg: 45 });
    const dIn = NPS12.odMm - 2 * NPS12.wallMm;
    expect(Math.abs(at(inserted.stations, 90).dihedralDeg - (90 + Math.asin(NPS6.odMm / dIn) * DEG))).toBeLessThan(TOL);
  });
  it('bevels the groove angle at the crown of a tee and nothing at the heel of a 45° lateral against a 40° groove', () => {
    const tee = weldPrepForBranch({ header: NPS12, branch: NPS6 }, { grooveAngleDeg: 45, landMm: 1.6 });
    expect(at(tee.stations, 0)).toMatchObject({ bevel: 'bevel' });
    expect(at(tee.stations, 0).torchDeg).toBeCloseTo(45, 9);
    expect(at(tee.stations, 0).bevelWidthMm).toBeCloseTo(NPS6.wallMm - 1.6, 9); // (wall − land) tan 45°
    const lateral = weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: 45 }, { grooveAngleDeg: 40 });
    expect(at(lateral.stations, 0)).toMatchObject({ bevel: 'open', torchDeg: 0 });
    expect(at(lateral.stations, 180)).toMatchObject({ bevel: 'bevel' });
    expect(at(lateral.stations, 180).torchDeg).toBeCloseTo(40 + 90 - 45, 9);
  });
  it('numbers stations as the layout does and never writes NaN', () => {
    const prep = weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: 30, offsetMm: 40, gapMm: 1.6 }, { grooveAngleDeg: 45, landMm: 1.6 }, { stations: 32 });
    expect(prep.stations.map((s) => s.n)).toEqual(Array.from({ length: 32 }, (_, i) => i + 1));
    expect(prep.stations.map((s) => s.angleDeg)).toEqual(Array.from({ length: 32 }, (_, i) => (360 * i) / 32));
    for (const row of [...prep.stations, ...prep.hole]) for (const v of Object.values(row)) if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
  });
});

describe('weldPrepForBranch: the header hole', () => {
  it('torch tilt from the header radial is 90 − A at the heel and toe and 0 at the crown of a tee (torch parallel to the branch axis)', () => {
    const prep = weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: 60 }, { grooveAngleDeg: 45 });
    const heel = prep.hole.find((h) => h.angleDeg === 0)!;
    const toe = prep.hole.find((h) => h.angleDeg === 180)!;
    expect(heel.torchTiltDeg).toBeCloseTo(30, 9);
    expect(toe.torchTiltDeg).toBeCloseTo(30, 9);
    expect(weldPrepForBranch({ header: NPS12, branch: NPS6 }, { grooveAngleDeg: 45 }).hole[0]!.torchTiltDeg).toBeCloseTo(0, 9);
  });
  it('gives the hole line on the header ID: at the crown and sides of a centred tee by circle geometry, at the heel and toe of a lateral by the section y = 0', () => {
    const tee = weldPrepForBranch({ header: NPS12, branch: NPS6, fit: 'set-in' }, { grooveAngleDeg: 45 });
    const r = NPS6.odMm / 2; // set-in: the hole is the branch OD
    const rId = NPS12.odMm / 2 - NPS12.wallMm;
    const row = (deg: number) => tee.hole.find((h) => h.angleDeg === deg)!;
    expect(row(0).idGirthMm).toBeCloseTo(0, 9);
    expect(row(0).idAxialMm).toBeCloseTo(-r, 9); // heel toward −x for a tee (DESIGN.md frame)
    expect(row(90).idGirthMm).toBeCloseTo(rId * Math.asin(r / rId), 9); // arc on the ID to y = r
    expect(row(90).idAxialMm).toBeCloseTo(0, 9);
    expect(tee.holeOnId?.closed).toBe(true);
    // Lateral at A: in the plane y = 0 the ID is the line z = R_id; the generator from ±r u along b meets it.
    const a = 50 / DEG;
    const lateral = weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: 50 }, { grooveAngleDeg: 45 });
    const rc = NPS6.odMm / 2 - NPS6.wallMm; // set-on: the hole is the branch ID
    for (const [deg, sign] of [[0, 1], [180, -1]] as const) {
      const s = (rId - sign * rc * Math.cos(a)) / Math.sin(a);
      const x = -sign * rc * Math.sin(a) + s * Math.cos(a);
      expect(lateral.hole.find((h) => h.angleDeg === deg)!.idAxialMm).toBeCloseTo(x, 9);
    }
  });
  it('leaves the ID line out when the hole is wider than the bore (a thin-wall equal branch set on)', () => {
    const prep = weldPrepForBranch({ header: NPS12, branch: NPS12_S10 }, { grooveAngleDeg: 45 });
    expect(prep.holeOnId).toBeUndefined();
    expect(prep.hole.every((h) => h.idGirthMm === undefined && h.idAxialMm === undefined)).toBe(true);
  });
});

describe('weld-prep warnings', () => {
  it('warns of a tangent joint at the sides of a near-equal set-on tee, not of a set-in one or a smaller branch', () => {
    const codes = (spec: Parameters<typeof weldPrepForBranch>[0]): string[] => weldPrepForBranch(spec, { grooveAngleDeg: 45 }).warnings.map((w) => w.code);
    expect(codes({ header: NPS12, branch: NPS12_S10 })).toContain('TANGENT_JOINT');
    expect(codes({ header: NPS12, branch: NPS6 })).toEqual([]);
  });
  it('warns below the AWS D1.1 prequalified dihedral angle (30°, recalled) at the toe of a 25° lateral, naming the toe station', () => {
    const w = weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: 25 }, { grooveAngleDeg: 20 }).warnings;
    const low = w.find((x) => x.code === 'DIHEDRAL_BELOW_PREQUALIFIED');
    expect(low?.message).toMatch(/stations? .*\b9\b/);
  });
  it('warns where the groove cannot be opened by beveling the branch (toe of a 45° lateral against a 50° groove)', () => {
    const prep = weldPrepForBranch({ header: NPS12, branch: NPS6, angleDeg: 45 }, { grooveAngleDeg: 50 });
    expect(at(prep.stations, 180)).toMatchObject({ bevel: 'closed' });
    expect(at(prep.stations, 180).torchDeg).toBeUndefined();
    expect(prep.warnings.map((x) => x.code)).toContain('GROOVE_CLOSED');
  });
});

describe('weldPrepForPlaneCut and weldPrepForMiter: closed values', () => {
  it('a cut-back at a to the plane: a at the heel, 180 − a opposite, 90 at the sides', () => {
    const prep = weldPrepForPlaneCut({ pipe: NPS6, angleDeg: 55, gapMm: 2 }, { grooveAngleDeg: 45 });
    expect(Math.abs(at(prep.stations, 0).dihedralDeg - 55)).toBeLessThan(TOL);
    expect(Math.abs(at(prep.stations, 180).dihedralDeg - 125)).toBeLessThan(TOL);
    expect(Math.abs(at(prep.stations, 90).dihedralDeg - 90)).toBeLessThan(TOL);
  });
  it('a miter with cut angle c: 180 − 2c on the throat, 180 + 2c on the back; each piece takes half the groove, so a 75° groove bevels 37.5° where the pieces meet square (ASME B16.25, recalled)', () => {
    const prep = weldPrepForMiter({ pipe: NPS12, bendDeg: 90, welds: 3, radiusMm: 1.5 * 12 * IN }, { grooveAngleDeg: 75, landMm: 1.6 });
    const c = 15; // 90 / (2 x 3), ASME B31.3 para. 304.2.3 definition
    expect(Math.abs(at(prep.stations, 0).dihedralDeg - (180 - 2 * c))).toBeLessThan(TOL);
    expect(Math.abs(at(prep.stations, 180).dihedralDeg - (180 + 2 * c))).toBeLessThan(TOL);
    expect(at(prep.stations, 90).torchDeg).toBeCloseTo(37.5, 9);
    expect(at(prep.stations, 0).torchDeg).toBeCloseTo(37.5 + c, 9);
    expect(at(prep.stations, 180).torchDeg).toBeCloseTo(37.5 - c, 9);
    expect(prep.squareEnds).toMatchObject({ kind: 'single', bevelDeg: 37.5, bevelTolDeg: 2.5, landMm: 25.4 / 16, landTolMm: 25.4 / 32 });
    expect(prep.warnings).toEqual([]);
  });
});

describe('bad input', () => {
  const spec = { header: NPS12, branch: NPS6, angleDeg: 45 };
  it('names the option: groove angle outside (0, 90), land as thick as the wall, negative land or gap, bad stations', () => {
    expectGirthError(() => weldPrepForBranch(spec, { grooveAngleDeg: 90 }), 'OUT_OF_RANGE', 'grooveAngleDeg');
    expectGirthError(() => weldPrepForBranch(spec, { grooveAngleDeg: 0 }), 'OUT_OF_RANGE', 'grooveAngleDeg');
    expectGirthError(() => weldPrepForBranch(spec, { grooveAngleDeg: 45, landMm: NPS6.wallMm }), 'OUT_OF_RANGE', 'landMm');
    expectGirthError(() => weldPrepForBranch(spec, { grooveAngleDeg: 45, landMm: -1 }), 'NEGATIVE', 'landMm');
    expectGirthError(() => weldPrepForBranch({ ...spec, gapMm: -1 }, { grooveAngleDeg: 45 }), 'NEGATIVE', 'gapMm');
    expectGirthError(() => weldPrepForPlaneCut({ pipe: NPS6, angleDeg: 60, gapMm: -0.5 }, { grooveAngleDeg: 45 }), 'NEGATIVE', 'gapMm');
    expectGirthError(() => weldPrepForMiter({ pipe: NPS6, bendDeg: 90, welds: 2, radiusMm: 300 }, { grooveAngleDeg: 95 }), 'OUT_OF_RANGE', 'grooveAngleDeg');
    expectGirthError(() => weldPrepForBranch(spec, { grooveAngleDeg: 45 }, { stations: 3 }), 'OUT_OF_RANGE', 'stations');
    expectGirthError(() => weldPrepForBranch(spec, { grooveAngleDeg: 45 }, null as never), 'BAD_OPTION', 'options');
    expect(() => weldPrepForBranch(spec, { grooveAngleDeg: 45, landMm: NPS6.wallMm - 0.01 })).not.toThrow();
  });
});
