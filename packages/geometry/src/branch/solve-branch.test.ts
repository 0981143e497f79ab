import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { girthErrorOf } from '@girth/pipes/test-support';
import { cross } from '../vec3.js';
import { hitGenerator } from '../generators.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { solveBranch } from './solve-branch.js';
import type { BranchSpec } from './types.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in, NPS 14 STD 14.000 x 0.375 in, NPS 16 STD 16.000 x 0.375 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };
const NPS14 = { odMm: 14 * IN, wallMm: 0.375 * IN, label: 'NPS 14 STD' };
const NPS16 = { odMm: 16 * IN, wallMm: 0.375 * IN, label: 'NPS 16 STD' };

describe('solveBranch', () => {
  it('fills in the defaults: tee, centred, set-on, no gap', () => {
    const g = solveBranch({ header: NPS12, branch: NPS6 });
    expect(g.spec).toMatchObject({ angleDeg: 90, offsetMm: 0, fit: 'set-on', gapMm: 0, contact: { branch: 'inside', header: 'outside' } });
    expect(g.spec.branch.idMm).toBeCloseTo((6.625 - 2 * 0.28) * IN, 12); // ID = OD − 2 × wall (common practice)
    expect(g.warnings).toEqual([]);
  });

  it('meets branch ID to header OD when set-on, branch OD to header ID when set-in (common practice)', () => {
    const on = solveBranch({ header: NPS12, branch: NPS6, fit: 'set-on' });
    expect(on.cutRadiusMm).toBeCloseTo(((6.625 - 0.56) * IN) / 2, 12);
    expect(on.cutHost).toMatchObject({ kind: 'cylinder', radius: (12.75 * IN) / 2 });
    const inserted = solveBranch({ header: NPS12, branch: NPS6, fit: 'set-in' });
    expect(inserted.cutRadiusMm).toBeCloseTo((6.625 * IN) / 2, 12);
    expect(inserted.cutHost).toMatchObject({ radius: ((12.75 - 0.75) * IN) / 2 });
    // The hole is the same branch surface on the header OD.
    expect(inserted.holeBundle.radius).toBe(inserted.cutRadiusMm);
    expect(inserted.holeHost).toMatchObject({ radius: (12.75 * IN) / 2 });
    const over = solveBranch({ header: NPS12, branch: NPS6, contact: { branch: 'outside', header: 'outside' } });
    expect(over.cutRadiusMm).toBeCloseTo((6.625 * IN) / 2, 12);
    expect(over.cutHost).toMatchObject({ radius: (12.75 * IN) / 2 });
  });

  it('offsets the host by the root gap', () => {
    const g = solveBranch({ header: NPS12, branch: NPS6, gapMm: 1.6 });
    expect(g.cutHost).toMatchObject({ radius: (12.75 * IN) / 2 + 1.6 });
    expect(g.holeHost).toMatchObject({ radius: (12.75 * IN) / 2 });
  });

  it('sets up the frame of DESIGN.md: heel on the obtuse side, phi toward +y, axis toward the header', () => {
    const a = (45 * Math.PI) / 180;
    const g = solveBranch({ header: NPS12, branch: NPS6, angleDeg: 45, offsetMm: 20 });
    const b = g.cutBundle;
    expectClose([...g.branchAxisDirection], [Math.cos(a), 0, Math.sin(a)], 1e-15, 'b');
    expectClose([...b.axisDirection], [-Math.cos(a), 0, -Math.sin(a)], 1e-15, 'axis toward header');
    expectClose([...b.heelDirection], [-Math.sin(a), 0, Math.cos(a)], 1e-15, 'heel u');
    expectClose([...b.sideDirection], [0, 1, 0], 0, 'side');
    expectClose([...cross(b.axisDirection, b.heelDirection)], [0, 1, 0], 1e-15, 'axis × heel');
    expectClose([...b.axisPoint], [0, 20, 0], 0, 'axis point');
  });

  it('sets up the same frame at 30°, where sin and cos differ (45° would hide a swap)', () => {
    // Invariants of DESIGN.md's frame, stated without the library's formulas:
    // the axis b makes the joint's angle with the header axis x; the heel
    // direction u is a unit vector square to b in the plane of both axes, on
    // the obtuse side (toward −x); the side direction is +y.
    const g = solveBranch({ header: NPS12, branch: NPS6, angleDeg: 30 });
    const b = g.branchAxisDirection;
    const u = g.cutBundle.heelDirection;
    expect(Math.acos(b[0]) / (Math.PI / 180)).toBeCloseTo(30, 12);
    expect(b[2]).toBeGreaterThan(0); // away from the header
    expect(b[1]).toBe(0);
    expect(Math.hypot(...u)).toBeCloseTo(1, 15);
    expect(u[0] * b[0] + u[1] * b[1] + u[2] * b[2]).toBeCloseTo(0, 15);
    expect(u[1]).toBe(0);
    expect(u[0]).toBeLessThan(0);
    expectClose([...g.cutBundle.axisDirection], [-b[0], -b[1], -b[2]], 1e-15, 'axis toward header');
    // Leaning toward +x, the branch meets the header at its heel (phi = 0) nearer −x than at its toe (phi = 180°).
    const heel = hitGenerator(g.cutBundle, g.cutHost, 0)!.point;
    const toe = hitGenerator(g.cutBundle, g.cutHost, Math.PI)!.point;
    expect(heel[0]).toBeLessThan(toe[0]);
  });

  it('gives the saddle depth of two cylinders crossing at 90°', () => {
    // MathWorld, "Cylinder-Cylinder Intersection": h(phi) = R − sqrt(R² − r² sin² phi) below the header top.
    const g = solveBranch({ header: NPS12, branch: NPS6 });
    const R = (12.75 * IN) / 2;
    const r = g.cutRadiusMm;
    const phis = Array.from({ length: 24 }, (_, i) => (2 * Math.PI * i) / 24);
    const depth = phis.map((phi) => R - hitGenerator(g.cutBundle, g.cutHost, phi)!.point[2]);
    expectClose(depth, phis.map((phi) => R - Math.sqrt(R * R - r * r * Math.sin(phi) ** 2)), 1e-9, 'saddle depth mm');
  });

  it('cuts equal cylinders at 90° on the planes x = ±z (Steinmetz curve)', () => {
    // Wikipedia, "Steinmetz curve": two equal cylinders crossing at 90° meet in two ellipses in the planes x = ±z.
    const g = solveBranch({ header: NPS12, branch: NPS12, contact: { branch: 'outside', header: 'outside' } });
    expect(g.cutKinkPhisRad).toEqual([Math.PI / 2, (3 * Math.PI) / 2]);
    for (let i = 0; i < 64; i++) {
      const p = hitGenerator(g.cutBundle, g.cutHost, (2 * Math.PI * i) / 64)!.point;
      expectClose(Math.abs(p[0]), p[2], 1e-9, `|x| = z at sample ${i}`);
    }
  });

  it('lists kinks only where generators graze, in closed form', () => {
    // Invariant: at each listed angle the generator grazes the host; flush offset branch, |e| + r = R.
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 600, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.double({ min: 20, max: 90, noNaN: true }),
        fc.boolean(),
        (headerOd, ratio, angleDeg, plus) => {
          const R = headerOd / 2;
          const r = ratio * R;
          const e = (plus ? 1 : -1) * (R - r);
          const spec: BranchSpec = {
            header: { odMm: headerOd, wallMm: headerOd / 20 },
            branch: { odMm: 2 * r, wallMm: r / 10 },
            angleDeg,
            offsetMm: e,
            contact: { branch: 'outside', header: 'outside' },
          };
          const g = solveBranch(spec);
          expect(g.cutKinkPhisRad.length).toBeGreaterThanOrEqual(1);
          for (const phi of g.cutKinkPhisRad) {
            const hit = hitGenerator(g.cutBundle, g.cutHost, phi);
            expect(hit?.grazing).toBe(true);
          }
        },
      ),
      { numRuns: 50 },
    );
    expect(solveBranch({ header: NPS12, branch: NPS6, angleDeg: 30, offsetMm: 40 }).cutKinkPhisRad).toEqual([]);
  });

  it('warns about shallow laterals and joints outside the B31.3 reinforcement rules', () => {
    // ASME B31.3 para. 304.3.1(b) (REFERENCES.md): rules cover branches at 45° or more whose axis meets the run axis.
    const codes = (s: BranchSpec): string[] => solveBranch(s).warnings.map((w) => w.code);
    expect(codes({ header: NPS12, branch: NPS6, angleDeg: 45 })).toEqual([]);
    expect(codes({ header: NPS12, branch: NPS6, angleDeg: 44.9 })).toEqual(['REINFORCEMENT_RULES_ANGLE']);
    expect(codes({ header: NPS12, branch: NPS6, angleDeg: 14 })).toEqual(['SHALLOW_LATERAL', 'REINFORCEMENT_RULES_ANGLE']);
    expect(codes({ header: NPS12, branch: NPS6, offsetMm: -25 })).toEqual(['REINFORCEMENT_RULES_OFFSET']);
    expect(solveBranch({ header: NPS12, branch: NPS6, offsetMm: -25 }).warnings[0]!.message).toMatch(/does not size reinforcement/);
  });

  it('rejects a branch wider than the header, naming sizes in mm and inches', () => {
    // NPS 16 STD ID 15.250 in on NPS 14 STD OD 14.000 in (ASME B36.10M, recalled).
    const err = girthErrorOf(() => solveBranch({ header: NPS14, branch: NPS16 }));
    expect(err).toMatchObject({ code: 'BRANCH_TOO_LARGE', field: 'branch' });
    expect(err.message).toBe('branch: branch ID 387.4 mm (15.250 in) is larger than header OD 355.6 mm (14.000 in)');
    // Set-in: branch OD must fit the header ID.
    const big = { odMm: 12.5 * IN, wallMm: 0.375 * IN };
    expect(girthErrorOf(() => solveBranch({ header: NPS12, branch: big, fit: 'set-in' }))).toMatchObject({ code: 'BRANCH_TOO_LARGE', field: 'branch' });
    expect(() => solveBranch({ header: NPS12, branch: big, fit: 'set-on' })).not.toThrow();
  });

  it('rejects an offset that takes the branch past the header side, and allows the flush case', () => {
    const R = (12.75 * IN) / 2;
    const r = ((6.625 - 0.56) * IN) / 2;
    const err = girthErrorOf(() => solveBranch({ header: NPS12, branch: NPS6, offsetMm: R - r + 0.01 }));
    expect(err).toMatchObject({ code: 'OFFSET_MISSES', field: 'offsetMm' });
    expect(err.message).toMatch(/at most 84\.9 mm \(3\.343 in\) \(branch side flush/);
    expect(girthErrorOf(() => solveBranch({ header: NPS12, branch: NPS6, offsetMm: -(R - r + 0.01) })).code).toBe('OFFSET_MISSES');
    const flush = solveBranch({ header: NPS12, branch: NPS6, offsetMm: R - r });
    expect(flush.cutKinkPhisRad).toHaveLength(1);
    expectClose(flush.cutKinkPhisRad[0]!, Math.PI / 2, 1e-12, 'flush kink at 90°');
  });

  it('rejects bad input with stable codes and fields', () => {
    const ok: BranchSpec = { header: NPS12, branch: NPS6 };
    const cases: [BranchSpec, string, string][] = [
      [{ ...ok, angleDeg: 0 }, 'OUT_OF_RANGE', 'angleDeg'],
      [{ ...ok, angleDeg: 90.0001 }, 'OUT_OF_RANGE', 'angleDeg'],
      [{ ...ok, angleDeg: -30 }, 'OUT_OF_RANGE', 'angleDeg'],
      [{ ...ok, angleDeg: Number.NaN }, 'NOT_A_NUMBER', 'angleDeg'],
      [{ ...ok, offsetMm: Number.POSITIVE_INFINITY }, 'NOT_FINITE', 'offsetMm'],
      [{ ...ok, gapMm: -1 }, 'NEGATIVE', 'gapMm'],
      [{ ...ok, gapMm: Number.NaN }, 'NOT_A_NUMBER', 'gapMm'],
      [{ ...ok, header: { odMm: 100, wallMm: 50 } }, 'WALL_TOO_THICK', 'header.wallMm'],
      [{ ...ok, branch: { odMm: 60, wallMm: 31 } }, 'WALL_TOO_THICK', 'branch.wallMm'],
      [{ ...ok, branch: { odMm: Number.NaN, wallMm: 3 } }, 'NOT_A_NUMBER', 'branch.odMm'],
      [{ ...ok, header: { odMm: 300, wallMm: Number.NEGATIVE_INFINITY } }, 'NOT_FINITE', 'header.wallMm'],
      [{ ...ok, header: { odMm: -300, wallMm: 3 } }, 'NEGATIVE', 'header.odMm'],
      [{ ...ok, fit: 'welded' as never }, 'BAD_CHOICE', 'fit'],
      [{ ...ok, contact: { branch: 'inside', header: 'middle' as never } }, 'BAD_CHOICE', 'contact.header'],
      [{ branch: NPS6 } as never, 'EMPTY_INPUT', 'header'],
    ];
    for (const [spec, code, field] of cases) {
      expect(girthErrorOf(() => solveBranch(spec)), `${code} ${field}`).toMatchObject({ code, field });
    }
    expect(girthErrorOf(() => solveBranch({ ...ok, angleDeg: 120 })).message).toMatch(/at most 90°, got 120° \(from 1° to 90°/);
  });
});

describe('the shallowest lateral', () => {
  it('lays out 1° and refuses anything shallower, naming the limit', () => {
    // MIN_JOINT_ANGLE_DEG: at 1° the cut runs out cot(1°) ≈ 57.3 diameters; below it the numbers overflow toward 0°.
    const spec = { header: { odMm: 323.85, wallMm: 9.525 }, branch: { odMm: 168.275, wallMm: 7.112 } };
    expect(() => solveBranch({ ...spec, angleDeg: 1 })).not.toThrow();
    const error = girthErrorOf(() => solveBranch({ ...spec, angleDeg: 0.999 }));
    expect([error.code, error.field]).toEqual(['OUT_OF_RANGE', 'angleDeg']);
    expect(error.message).toMatch(/from 1° to 90°/);
  });
});
