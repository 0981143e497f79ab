import { describe, expect, it } from 'vitest';
import { GirthError } from '@girth/pipes';
import { layoutBranch } from '../branch/layout-branch.js';
import { layoutWye, type WyeSpec } from './layout-wye.js';

// NPS 12 STD header, NPS 4 STD branches: ASME B36.10M OD 323.85 / 114.3 mm, wall 9.525 / 6.02 mm (recalled).
const header = { odMm: 323.85, wallMm: 9.525, label: 'NPS 12 STD' };
const branch = { odMm: 114.3, wallMm: 6.02, label: 'NPS 4 STD' };
const R = header.odMm / 2;
const rHole = (branch.odMm - 2 * branch.wallMm) / 2; // set-on: the hole is the branch ID on the header OD
const CHORD_MM = 0.05;

const twoTees = (spacingMm: number): WyeSpec => ({
  header,
  branches: [
    { branch, stationMm: 0, clockDeg: 0 },
    { branch, stationMm: spacingMm, clockDeg: 0 },
  ],
});

function girthErrorOf(f: () => unknown): GirthError {
  try {
    f();
  } catch (e) {
    if (e instanceof GirthError) return e;
    throw e;
  }
  throw new Error('no error thrown');
}

describe('layoutWye', () => {
  it('each branch cut equals the branch laid out alone (invariant)', () => {
    const wye = layoutWye({ header, branches: [{ branch, angleDeg: 45, stationMm: 0, clockDeg: 0 }, { branch, angleDeg: 45, stationMm: 600, clockDeg: 0, facing: 'back' }] });
    const alone = layoutBranch({ header, branch, angleDeg: 45 });
    expect(wye.branches[0].templates[0]).toEqual(alone.templates[0]);
    expect(wye.branches[1].templates[0]).toEqual(alone.templates[0]);
    // The back-facing hole is the lone hole mirrored along the header about its station (a lateral's hole sits toeward of where the axes cross, so the stations are 600 mm apart).
    const lone = alone.templates[1].stations;
    wye.holes[1].stations.forEach((r, i) => {
      expect(r.values.girth).toBeCloseTo(lone[i]!.values.girth!, 9);
      expect(r.values.axial).toBeCloseTo(600 - lone[i]!.values.axial!, 9);
    });
  });

  it("a cross's holes, rebuilt on the header, lie on each branch's own bore round its turned axis", () => {
    const cross = layoutWye({ header, branches: [{ branch, stationMm: 250, clockDeg: 0 }, { branch, stationMm: 250, clockDeg: 180 }] });
    for (const [k, hole] of cross.holes.entries()) {
      const clock = k === 0 ? 0 : Math.PI;
      const c = hole.cut[0]!;
      if (c.kind !== 'polyline') throw new Error('polyline expected');
      for (const p of c.points) {
        const th = p[0] / R;
        const q = [p[1] - 250, R * Math.sin(th), R * Math.cos(th)];
        const axis = [0, Math.sin(clock), Math.cos(clock)]; // a tee's axis, turned about the header axis
        const along = q[1]! * axis[1]! + q[2]! * axis[2]!;
        const d = Math.hypot(q[0]!, q[1]! - along * axis[1]!, q[2]! - along * axis[2]!);
        expect(Math.abs(d - rHole)).toBeLessThan(1e-6);
      }
    }
    expect(cross.warnings).toEqual([]);
  });

  it('two tees along the top line: clearance = spacing - 2 r (closed form of a tee hole); a warning only when the welds come closer than the two walls', () => {
    const clear = layoutWye(twoTees(130));
    expect(Math.abs(clear.clearanceMm - (130 - 2 * rHole))).toBeLessThan(CHORD_MM);
    expect(clear.warnings.map((w) => w.code)).toEqual([]);
    const close = layoutWye(twoTees(2 * rHole + 8)); // 8 mm apart, walls 12.04 mm
    expect(close.warnings.map((w) => [w.code, w.field])).toEqual([['WYE_WELDS_CLOSE', 'branches']]);
  });

  it('overlapping holes are a typed error; bad placement names its field', () => {
    const e = girthErrorOf(() => layoutWye(twoTees(2 * rHole - 5)));
    expect([e.code, e.field]).toEqual(['HOLES_OVERLAP', 'branches']);
    expect(girthErrorOf(() => layoutWye({ header, branches: [{ branch, stationMm: Number.NaN, clockDeg: 0 }, { branch, stationMm: 0, clockDeg: 90 }] })).field).toBe('branches[0].stationMm');
    expect(girthErrorOf(() => layoutWye({ header, branches: [{ branch, stationMm: 0, clockDeg: 0 }, { branch: { odMm: 406.4, wallMm: 9.525 }, stationMm: 0, clockDeg: 90 }] })).field).toMatch(/^branches\[1\]\./);
  });
});
