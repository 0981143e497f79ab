/**
 * Weld preparation against the independent dihedral oracle (test/oracle:
 * implicit surfaces, normals by central differences, tangents built square to
 * the weld line; no closed form of any joint) and against a 3D rebuild of the
 * torch angle.
 *
 * Tolerances: dihedral angle 0.01° at every station (the figure; the
 * oracle's differences are good to about 1e-9°, so any failure is a real
 * disagreement). Rebuilt groove 0.05°: the rebuild takes the weld line's
 * direction from a central difference of neighbouring cut points (step 1e-5
 * rad), good to far better than that.
 *
 * Pipe ODs: ASME B36.10M NPS 1/2 to 48 (recalled; REFERENCES.md). Walls 2..40 mm.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { weldPrepForBranch, weldPrepForMiter, weldPrepForPlaneCut, type StationWeldPrep } from '@girth/unroll';
import {
  branchFrame,
  branchRadii,
  branchWeldPoint,
  cross,
  dot,
  miterPiece,
  miterWeldPlane,
  miterWeldPoint,
  norm,
  oracleDihedralDeg,
  oracleMiterDihedralDeg,
  planeCutFrame,
  planeCutWeldPoint,
  scale,
  sub,
  type OracleBranchSpec,
  type OracleMiterSpec,
  type OraclePlaneCutSpec,
  type Vec3,
} from '../oracle/index.js';

const IN = 25.4;
const NPS_OD_IN = [0.84, 1.05, 1.315, 1.66, 1.9, 2.375, 2.875, 3.5, 4, 4.5, 5.563, 6.625, 8.625, 10.75, 12.75, 14, 16, 18, 20, 22, 24, 30, 36, 42, 48] as const;
const DIHEDRAL_TOL_DEG = 0.01;
const GROOVE_TOL_DEG = 0.05;
/** Least distance of a cut generator from the header's silhouette, as a fraction of the host radius (keeps the weld line defined). */
const TANGENCY_MARGIN = 1e-3;
const DEG = 180 / Math.PI;
const wallMm = (odMm: number, frac: number): number => 2 + frac * (Math.min(40, 0.3 * odMm) - 2);
const phiOf = (s: StationWeldPrep): number => s.angleDeg / DEG;

interface BranchCase {
  readonly spec: OracleBranchSpec & { readonly fit: 'set-on' | 'set-in' };
  readonly stations: number;
  readonly grooveAngleDeg: number;
}

const branchCase: fc.Arbitrary<BranchCase> = fc
  .record({
    headerIndex: fc.integer({ min: 0, max: NPS_OD_IN.length - 1 }),
    branchPick: fc.double({ min: 0, max: 1, noNaN: true }),
    headerWall: fc.double({ min: 0, max: 1, noNaN: true }),
    branchWall: fc.double({ min: 0, max: 1, noNaN: true }),
    angleDeg: fc.oneof(fc.constant(90), fc.constant(45), fc.double({ min: 5, max: 90, noNaN: true })),
    offsetFrac: fc.oneof(fc.constant(0), fc.double({ min: -1, max: 1, noNaN: true })),
    fit: fc.constantFrom('set-on' as const, 'set-in' as const),
    gapMm: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 6, noNaN: true })),
    stations: fc.constantFrom(8, 16, 32),
    grooveAngleDeg: fc.oneof(fc.constant(45), fc.double({ min: 10, max: 80, noNaN: true })),
  })
  .map(({ headerIndex, branchPick, headerWall, branchWall, angleDeg, offsetFrac, fit, gapMm, stations, grooveAngleDeg }) => {
    const hOd = NPS_OD_IN[headerIndex]! * IN;
    const bOd = NPS_OD_IN[Math.floor(branchPick * (headerIndex + 1)) % (headerIndex + 1)]! * IN;
    const base = { header: { odMm: hOd, wallMm: wallMm(hOd, headerWall) }, branch: { odMm: bOd, wallMm: wallMm(bOd, branchWall) }, angleDeg, fit, gapMm } as const;
    const r = branchRadii(base);
    const room = Math.min(r.hostRadiusMm - r.cutRadiusMm, r.headerOuterRadiusMm - r.holeRadiusMm) - TANGENCY_MARGIN * r.hostRadiusMm;
    return { spec: { ...base, offsetMm: room > 0 ? offsetFrac * room : 0 }, stations, grooveAngleDeg };
  })
  .filter(({ spec }) => {
    const r = branchRadii(spec);
    const e = Math.abs(spec.offsetMm ?? 0);
    return r.cutRadiusMm + e <= (1 - TANGENCY_MARGIN) * r.hostRadiusMm && r.holeRadiusMm + e <= (1 - TANGENCY_MARGIN) * r.headerOuterRadiusMm;
  });

/** Unit vector. */
const unit = (v: Vec3): Vec3 => scale(v, 1 / norm(v));
/** Unsigned angle between vectors, degrees. */
const angleBetweenDeg = (a: Vec3, b: Vec3): number => Math.atan2(norm(cross(a, b)), dot(a, b)) * DEG;

/**
 * The groove a torch held at `torchDeg` makes, rebuilt in 3D: at the cut point
 * P, the cut line's direction T from neighbouring cut points; the pipe's radial
 * n from its axis; the torch turned from n about T by `torchDeg` toward the
 * pipe body; the bevel face is the plane through P spanned by T and the torch.
 * The groove is the angle in the plane square to T between that face and the
 * host's tangent plane (leaving P away from the pipe).
 */
function rebuiltGrooveDeg(
  cutPoint: (phiRad: number) => Vec3,
  phiRad: number,
  pipeAxisPoint: Vec3,
  bodyDirection: Vec3,
  hostNormalAt: (p: Vec3) => Vec3,
  torchDeg: number,
): number {
  const p = cutPoint(phiRad);
  const h = 1e-5;
  const t = unit(sub(cutPoint(phiRad + h), cutPoint(phiRad - h)));
  const rel = sub(p, pipeAxisPoint);
  const n = unit(sub(rel, scale(bodyDirection, dot(rel, bodyDirection))));
  const w0 = unit(cross(t, n));
  const w = dot(w0, bodyDirection) >= 0 ? w0 : scale(w0, -1);
  const torch: Vec3 = [
    Math.cos(torchDeg / DEG) * n[0] + Math.sin(torchDeg / DEG) * w[0],
    Math.cos(torchDeg / DEG) * n[1] + Math.sin(torchDeg / DEG) * w[1],
    Math.cos(torchDeg / DEG) * n[2] + Math.sin(torchDeg / DEG) * w[2],
  ];
  const th0 = unit(cross(t, hostNormalAt(p)));
  const th = dot(th0, n) >= 0 ? th0 : scale(th0, -1);
  return angleBetweenDeg(torch, th);
}

describe('weldPrepForBranch against the dihedral oracle (fast-check sweep)', () => {
  it('local dihedral angle at every station within 0.01°, over NPS 1/2..48, angles 5..90°, offsets, both fits, gaps 0..6 mm', () => {
    let worst = 0;
    fc.assert(
      fc.property(branchCase, (c) => {
        const prep = weldPrepForBranch(c.spec, { grooveAngleDeg: c.grooveAngleDeg }, { stations: c.stations });
        expect(prep.stations).toHaveLength(c.stations);
        for (const s of prep.stations) {
          const exact = oracleDihedralDeg(branchWeldPoint(c.spec, phiOf(s)));
          worst = Math.max(worst, Math.abs(s.dihedralDeg - exact));
          expect(Math.abs(s.dihedralDeg - exact), `station ${s.n} of ${JSON.stringify(c)}`).toBeLessThan(DIHEDRAL_TOL_DEG);
        }
      }),
      { numRuns: 200 },
    );
    console.log(`branch dihedral: worst difference from the oracle ${worst.toExponential(2)}°`);
  });

  it('the torch angle, rebuilt as a plane through the branch wall, makes the groove asked for within 0.05° (open stations at least that)', () => {
    let worst = 0;
    fc.assert(
      fc.property(branchCase, (c) => {
        const prep = weldPrepForBranch(c.spec, { grooveAngleDeg: c.grooveAngleDeg }, { stations: c.stations });
        const frame = branchFrame(c.spec.angleDeg ?? 90, c.spec.offsetMm ?? 0);
        const header = (p: Vec3): Vec3 => unit([0, p[1], p[2]]);
        for (const s of prep.stations) {
          if (s.bevel === 'closed') {
            expect(s.torchDeg).toBeUndefined();
            continue;
          }
          const g = rebuiltGrooveDeg((phi) => branchWeldPoint(c.spec, phi).pointMm, phiOf(s), frame.axisPointMm, frame.b, header, s.torchDeg!);
          if (s.bevel === 'bevel') {
            worst = Math.max(worst, Math.abs(g - c.grooveAngleDeg));
            expect(Math.abs(g - c.grooveAngleDeg), `station ${s.n} of ${JSON.stringify(c)}`).toBeLessThan(GROOVE_TOL_DEG);
          } else {
            expect(g, `open station ${s.n} of ${JSON.stringify(c)}`).toBeGreaterThan(c.grooveAngleDeg - GROOVE_TOL_DEG);
          }
        }
      }),
      { numRuns: 100 },
    );
    console.log(`branch groove rebuilt: worst difference ${worst.toExponential(2)}°`);
  });
});

interface PlaneCase {
  readonly spec: OraclePlaneCutSpec & { readonly gapMm: number; readonly fitSurface: 'od' | 'id' };
  readonly stations: number;
  readonly grooveAngleDeg: number;
}

const planeCase: fc.Arbitrary<PlaneCase> = fc
  .record({
    odIndex: fc.integer({ min: 0, max: NPS_OD_IN.length - 1 }),
    wallFrac: fc.double({ min: 0, max: 1, noNaN: true }),
    angleDeg: fc.oneof(fc.constant(90), fc.constant(45), fc.double({ min: 5, max: 90, noNaN: true })),
    gapMm: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 6, noNaN: true })),
    fitSurface: fc.constantFrom('od' as const, 'id' as const),
    stations: fc.constantFrom(8, 16, 32),
    grooveAngleDeg: fc.double({ min: 10, max: 80, noNaN: true }),
  })
  .map(({ odIndex, wallFrac, angleDeg, gapMm, fitSurface, stations, grooveAngleDeg }) => {
    const odMm = NPS_OD_IN[odIndex]! * IN;
    return { spec: { pipe: { odMm, wallMm: wallMm(odMm, wallFrac) }, angleDeg, gapMm, fitSurface }, stations, grooveAngleDeg };
  });

describe('weldPrepForPlaneCut against the dihedral oracle (fast-check sweep)', () => {
  it('local dihedral angle within 0.01° and the rebuilt groove within 0.05° at every station', () => {
    fc.assert(
      fc.property(planeCase, (c) => {
        const prep = weldPrepForPlaneCut(c.spec, { grooveAngleDeg: c.grooveAngleDeg }, { stations: c.stations });
        const frame = planeCutFrame(c.spec);
        for (const s of prep.stations) {
          const exact = oracleDihedralDeg(planeCutWeldPoint(c.spec, phiOf(s)));
          expect(Math.abs(s.dihedralDeg - exact), `station ${s.n} of ${JSON.stringify(c)}`).toBeLessThan(DIHEDRAL_TOL_DEG);
          if (s.bevel !== 'bevel') continue;
          const g = rebuiltGrooveDeg((phi) => planeCutWeldPoint(c.spec, phi).pointMm, phiOf(s), frame.axisPointMm, scale(frame.axis, -1), () => frame.host.normal, s.torchDeg!);
          expect(Math.abs(g - c.grooveAngleDeg), `groove at station ${s.n} of ${JSON.stringify(c)}`).toBeLessThan(GROOVE_TOL_DEG);
        }
      }),
      { numRuns: 150 },
    );
  });
});

interface MiterCase {
  readonly spec: OracleMiterSpec & { readonly fitSurface: 'od' | 'id' };
  readonly stations: number;
  readonly grooveAngleDeg: number;
}

const miterCase: fc.Arbitrary<MiterCase> = fc
  .record({
    odIndex: fc.integer({ min: 0, max: NPS_OD_IN.length - 1 }),
    wallFrac: fc.double({ min: 0, max: 1, noNaN: true }),
    bendDeg: fc.oneof(fc.constant(90), fc.double({ min: 1, max: 180, noNaN: true })),
    welds: fc.integer({ min: 1, max: 6 }),
    radiusOds: fc.double({ min: 0.6, max: 4, noNaN: true }),
    fitSurface: fc.constantFrom('od' as const, 'id' as const),
    stations: fc.constantFrom(8, 16, 32),
    grooveAngleDeg: fc.oneof(fc.constant(75), fc.double({ min: 10, max: 89, noNaN: true })),
  })
  .filter(({ bendDeg, welds }) => bendDeg / (2 * welds) <= 60)
  .map(({ odIndex, wallFrac, bendDeg, welds, radiusOds, fitSurface, stations, grooveAngleDeg }) => {
    const odMm = NPS_OD_IN[odIndex]! * IN;
    return { spec: { pipe: { odMm, wallMm: wallMm(odMm, wallFrac) }, bendDeg, welds, radiusMm: radiusOds * odMm, fitSurface }, stations, grooveAngleDeg };
  });

describe('weldPrepForMiter against the dihedral oracle (fast-check sweep)', () => {
  it('dihedral angle between the pieces within 0.01° and each piece\'s rebuilt half-groove against the weld plane within 0.05°', () => {
    fc.assert(
      fc.property(miterCase, (c) => {
        const prep = weldPrepForMiter(c.spec, { grooveAngleDeg: c.grooveAngleDeg }, { stations: c.stations });
        const piece = miterPiece(c.spec, 0);
        const plane = miterWeldPlane(c.spec, 1);
        for (const s of prep.stations) {
          const onBendAxis = s.angleDeg === 90 || s.angleDeg === 270;
          // On the bend axis the two pieces are flush (invariant: both generators lie in the plane of the bend axis).
          const exact = onBendAxis ? 180 : oracleMiterDihedralDeg(c.spec, phiOf(s));
          expect(Math.abs(s.dihedralDeg - exact), `station ${s.n} of ${JSON.stringify(c)}`).toBeLessThan(DIHEDRAL_TOL_DEG);
          if (s.bevel !== 'bevel') continue;
          const g = rebuiltGrooveDeg((phi) => miterWeldPoint(c.spec, phi).pointMm, phiOf(s), piece.tangentPointMm, scale(piece.direction, -1), () => plane.normal, s.torchDeg!);
          expect(Math.abs(g - c.grooveAngleDeg / 2), `half groove at station ${s.n} of ${JSON.stringify(c)}`).toBeLessThan(GROOVE_TOL_DEG);
        }
      }),
      { numRuns: 150 },
    );
  });
});
