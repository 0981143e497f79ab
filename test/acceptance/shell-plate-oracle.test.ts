/**
 * The library's shell plate checked against the independent branch oracle
 * (test/oracle/branch-oracle.ts: every hole point found by bracketing and
 * bisection in 3D, written from the stated conventions without reading the
 * library). The oracle gives each hole on the header OD (girth from the top
 * line, axial from where the axes cross); the shell plate's own rules, stated
 * in its notes, move it: girth measured on the mid-thickness diameter OD - t
 * (common practice: a rolled plate keeps its length at mid-thickness), turned
 * to the branch's clock position less the seam's (30° an hour, clockwise from
 * the seam), axial moved to the branch's station. Those three steps are
 * written here from the rule, not from the library.
 *
 * An invented header, NPS 24 STD (ASME B36.10M, recalled: OD 24.000 in, wall
 * 0.375 in), 3000 mm long, seam at 3 o'clock, with three branches at
 * different stations and clock positions: a tee, a 45° lateral and an offset
 * set-in tee.
 */
import { describe, expect, it } from 'vitest';
import { layoutShellPlate, type ShellPlateBranch } from '@girth/unroll';
import { exactHoleStations, holeContourDistanceMm, type OracleBranchSpec } from '../oracle/index.js';

const IN = 25.4;
const HEADER = { odMm: 24 * IN, wallMm: 0.375 * IN, label: 'NPS 24 STD' };
// ASME B36.10M, recalled: NPS 8 STD 8.625 x .322 in, NPS 6 STD 6.625 x .280 in, NPS 4 STD 4.500 x .237 in.
const NPS8 = { odMm: 8.625 * IN, wallMm: 0.322 * IN, label: 'NPS 8 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const NPS4 = { odMm: 4.5 * IN, wallMm: 0.237 * IN, label: 'NPS 4 STD' };
const SEAM_HOURS = 3;

const branches: ShellPlateBranch[] = [
  { name: 'N1', branch: NPS8, stationMm: 500, clockHours: 12 },
  { name: 'N2', branch: NPS6, angleDeg: 45, stationMm: 1500, clockHours: 7.5 },
  { name: 'N3', branch: NPS4, offsetMm: 60, fit: 'set-in', stationMm: 2500, clockHours: 10 },
];

const oracleSpec = (b: ShellPlateBranch): OracleBranchSpec => ({
  header: HEADER,
  branch: b.branch,
  ...(b.angleDeg === undefined ? {} : { angleDeg: b.angleDeg }),
  ...(b.offsetMm === undefined ? {} : { offsetMm: b.offsetMm }),
  ...(b.fit === undefined ? {} : { fit: b.fit }),
});

const rOd = HEADER.odMm / 2;
const rMid = (HEADER.odMm - HEADER.wallMm) / 2;
/** Turn from the seam to the branch's clock, radians in [0, 2π): 30° an hour, clockwise. */
const turnRad = (hours: number): number => ((((hours - SEAM_HOURS) * Math.PI) / 6) % (2 * Math.PI) + 2 * Math.PI) % (2 * Math.PI);

describe('shell plate holes against the branch oracle (three branches, different stations and clock positions)', () => {
  const layout = layoutShellPlate({ header: HEADER, lengthMm: 3000, seamClockHours: SEAM_HOURS, branches });
  const plate = layout.templates[0]!;
  const holes = plate.cut.slice(1);

  it('is one plate, pi x (OD - t) wide (common practice: mid-thickness), three inner contours', () => {
    expect(layout.templates).toHaveLength(1);
    expect(layout.plateWidthMm).toBeCloseTo(Math.PI * (HEADER.odMm - HEADER.wallMm), 9);
    expect(holes).toHaveLength(3);
  });

  branches.forEach((b, i) => {
    it(`${b.name}: every oracle station lands on a hole vertex at its girth and axial place (1e-6 mm)`, () => {
      const hole = holes[i]!;
      if (hole.kind !== 'polyline') throw new Error('hole is not a polyline');
      for (const s of exactHoleStations(oracleSpec(b), 16)) {
        const x = (s.girthMm / rOd) * rMid + turnRad(b.clockHours) * rMid;
        const y = s.axialMm + b.stationMm;
        const nearest = Math.min(...hole.points.map((p) => Math.hypot(p[0] - x, p[1] - y)));
        expect(nearest, `station ${s.n}`).toBeLessThan(1e-6);
      }
    });

    it(`${b.name}: every drawn vertex, rolled back to the OD, lies on the exact hole (1e-6 mm: vertices are points of the true curve, only the chords between them are approximate)`, () => {
      const hole = holes[i]!;
      if (hole.kind !== 'polyline') throw new Error('hole is not a polyline');
      for (const p of hole.points) {
        const girthOd = (p[0] / rMid - turnRad(b.clockHours)) * rOd;
        expect(holeContourDistanceMm(oracleSpec(b), girthOd, p[1] - b.stationMm)).toBeLessThan(1e-6);
      }
    });
  });

  it('reports each hole centre at its station (tees: the branch axis) and clock position', () => {
    expect(layout.holes[0]!.axialMm).toBeCloseTo(500, 9);
    expect(layout.holes[0]!.girthMm).toBeCloseTo(turnRad(12) * rMid, 9);
    expect(layout.holes[2]!.girthMm).toBeGreaterThan(turnRad(10) * rMid); // offset +60 mm: clockwise of 10 o'clock
  });
});
