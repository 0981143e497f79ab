import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { frustumConeSurface } from '../cone/frustum-surface.js';
import { frustumElement, frustumNormal, makeConeFrustum } from '../cone/frustum.js';
import { expectNear, reducerArb } from '../cone/test-support/cone-checks.js';
import { hitGenerator } from '../generators.js';
import { findGrazingPhis } from './grazing.js';
import { coneOps, type ConeSurface } from './cone.js';
import type { Vec3 } from '../vec3.js';

const IN = 25.4;
const unitArb = fc
  .tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }))
  .filter(([x, y, z]) => Math.hypot(x, y, z) > 0.1)
  .map(([x, y, z]): Vec3 => {
    const n = Math.hypot(x, y, z);
    return [x / n, y / n, z / n];
  });

/** The cone z ≥ 0 about +z with half angle `a`, apex at the origin. */
const upright = (a: number): ConeSurface => ({ kind: 'cone', apex: [0, 0, 0], axisDirection: [0, 0, 1], halfAngleRad: a });

/** Signed distance-like residual of p from the nappe: (p · u) − |p| cos α (zero on it), written from the definition. */
const residual = (c: ConeSurface, p: Vec3): number => {
  const w = [p[0] - c.apex[0], p[1] - c.apex[1], p[2] - c.apex[2]];
  const wu = w[0]! * c.axisDirection[0] + w[1]! * c.axisDirection[1] + w[2]! * c.axisDirection[2];
  return wu - Math.hypot(w[0]!, w[1]!, w[2]!) * Math.cos(c.halfAngleRad);
};

describe('cone host', () => {
  it('an 8 in to 5 in cone 4 in long develops to radii 11.39 and 7.12 in and a 126.4° sweep (REFERENCES.md "Drawing Nets" worked example)', () => {
    const f = makeConeFrustum({ largeRadiusMm: 4 * IN, smallRadiusMm: 2.5 * IN, lengthMm: 4 * IN });
    const cone = frustumConeSurface(f);
    const large = coneOps.develop!(cone, frustumElement(f, 0).large);
    const small = coneOps.develop!(cone, frustumElement(f, 0).small);
    // Published to 0.01 in and 0.1°.
    expect(Math.abs(Math.hypot(...large) / IN - 11.39)).toBeLessThan(0.005);
    expect(Math.abs(Math.hypot(...small) / IN - 7.12)).toBeLessThan(0.005);
    const edge = (theta: number): number => {
      const [u, v] = coneOps.develop!(cone, frustumElement(f, theta).large);
      return (Math.atan2(u, v) * 180) / Math.PI;
    };
    expect(Math.abs(edge(Math.PI - 1e-12) - edge(-Math.PI + 1e-12) - 126.4)).toBeLessThan(0.05);
  });

  it('develop keeps slant lengths and end-circle arcs (invariant: a cone rolls out without stretching), and undevelop inverts it', () => {
    fc.assert(
      fc.property(reducerArb, fc.double({ min: -3.1, max: 3.1, noNaN: true }), (c, theta) => {
        const f = makeConeFrustum({ largeRadiusMm: c.largeDiameterMm / 2, smallRadiusMm: c.smallDiameterMm / 2, lengthMm: c.lengthMm });
        const cone = frustumConeSurface(f);
        const e = frustumElement(f, theta);
        const a = coneOps.develop!(cone, e.large);
        const b = coneOps.develop!(cone, e.small);
        const scale = c.largeDiameterMm + c.lengthMm;
        expectNear(Math.hypot(a[0] - b[0], a[1] - b[1]), Math.hypot(e.large[0] - e.small[0], e.large[1] - e.small[1], c.lengthMm), 1e-9 * scale, 'element');
        // Arc on the flat from theta = 0 to theta: radius × flat angle = R × theta along the end circle.
        const flatAngle = Math.abs(Math.atan2(a[0], a[1]));
        expectNear(Math.hypot(...a) * flatAngle, (c.largeDiameterMm / 2) * Math.abs(theta), 1e-9 * scale, 'arc');
        const back = coneOps.undevelop!(cone, a);
        expectNear(Math.hypot(back[0] - e.large[0], back[1] - e.large[1], back[2] - e.large[2]), 0, 1e-9 * scale, 'round trip');
      }),
    );
  });

  it('its normal is the frustum normal (frustum.ts, found independently) on every element', () => {
    fc.assert(
      fc.property(reducerArb, fc.double({ min: 0, max: 6.28, noNaN: true }), (c, theta) => {
        const f = makeConeFrustum({ largeRadiusMm: c.largeDiameterMm / 2, smallRadiusMm: c.smallDiameterMm / 2, lengthMm: c.lengthMm });
        const n = coneOps.normal(frustumConeSurface(f), frustumElement(f, theta).large);
        const m = frustumNormal(f, theta);
        expectNear(Math.hypot(n[0] - m[0], n[1] - m[1], n[2] - m[2]), 0, 1e-9, 'normal');
      }),
    );
  });

  it('every root of a line lies on the nappe, and a brute-force scan finds no other (invariant)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 1.4, noNaN: true }),
        fc.tuple(fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: -50, max: 50, noNaN: true })),
        unitArb,
        (a, o, d) => {
          // Lines through (or within 1 mm of) the apex are left out: every root there is the apex itself.
          const od = o[0] * d[0] + o[1] * d[1] + o[2] * d[2];
          fc.pre(Math.hypot(o[0] - od * d[0], o[1] - od * d[1], o[2] - od * d[2]) > 1);
          const cone = upright(a);
          const roots = coneOps.intersectLine(cone, { origin: o, direction: d }, 1e-12);
          const at = (t: number): Vec3 => [o[0] + t * d[0], o[1] + t * d[1], o[2] + t * d[2]];
          for (const r of roots) expect(Math.abs(residual(cone, at(r.tMm)))).toBeLessThan(1e-7);
          for (let i = 1; i < roots.length; i++) expect(roots[i]!.tMm).toBeGreaterThanOrEqual(roots[i - 1]!.tMm);
          // Sign changes of the residual along t in [-300, 300], away from the roots found.
          let changes = 0;
          const n = 6000;
          for (let i = 0; i < n; i++) {
            const t0 = -300 + (600 * i) / n;
            const t1 = t0 + 600 / n;
            if (Math.sign(residual(cone, at(t0))) !== Math.sign(residual(cone, at(t1)))) changes++;
          }
          const inside = roots.filter((r) => Math.abs(r.tMm) < 299 && !r.tangent).length;
          // The scan may merge two roots closer than its step (0.1 mm), or split one at a near-graze.
          expect(changes).toBeLessThanOrEqual(inside + 1);
          expect(changes).toBeGreaterThanOrEqual(inside - 1);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('a line in the tangent plane through a point of the cone touches it there once, flagged tangent', () => {
    const a = Math.PI / 6;
    const cone = upright(a);
    const p: Vec3 = [Math.sin(a) * 10, 0, Math.cos(a) * 10]; // on the element in the x-z plane, 10 mm from the apex
    const roots = coneOps.intersectLine(cone, { origin: [p[0], p[1] - 7, p[2]], direction: [0, 1, 0] }, 1e-12);
    expect(roots).toEqual([{ tMm: 7, tangent: true }]);
  });

  it('offset by d lies d from the cone, measured square to its element in the meridian plane (invariant)', () => {
    fc.assert(
      fc.property(reducerArb, fc.double({ min: -0.3, max: 0.3, noNaN: true }), fc.double({ min: 0, max: 6.28, noNaN: true }), (c, k, theta) => {
        const R = c.largeDiameterMm / 2;
        const r = c.smallDiameterMm / 2;
        const f = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: r, lengthMm: c.lengthMm });
        const d = k * r;
        const moved = coneOps.offset(frustumConeSurface(f), d);
        // A point of the moved cone as far from its apex as the large end is from the original apex
        // (away from the apex, where an offset of a cone is a cone; near the apex on its inside it is not).
        const a = moved.halfAngleRad;
        const ell = R / Math.sin(a);
        const p: Vec3 = [
          moved.apex[0] + ell * Math.sin(a) * Math.cos(theta),
          moved.apex[1] + ell * Math.sin(a) * Math.sin(theta),
          moved.apex[2] - ell * Math.cos(a),
        ];
        expect(Math.abs(residual(moved, p))).toBeLessThan(1e-9 * ell);
        // Distance in the meridian plane from (ρ, z) to the element through (R, 0) and (r, L): |cross| / length.
        const rho = Math.hypot(p[0], p[1]);
        const dist = Math.abs((r - R) * (p[2] - 0) - c.lengthMm * (rho - R)) / Math.hypot(r - R, c.lengthMm);
        expectNear(dist, Math.abs(d), 1e-9 * (R + c.lengthMm), 'distance');
      }),
      { numRuns: 40 },
    );
  });

  it('a pipe on the cone axis is cut square: every generator meets it at the same axial place, with no graze (common geometry)', () => {
    const f = makeConeFrustum({ largeRadiusMm: 150, smallRadiusMm: 60, lengthMm: 200 });
    const cone = frustumConeSurface(f);
    // A pipe of radius 100 coming up the axis from below the large end: it meets the cone where its radius is 100.
    const bundle = { radius: 100, axisPoint: [0, 0, -500] as Vec3, axisDirection: [0, 0, 1] as Vec3, heelDirection: [1, 0, 0] as Vec3, sideDirection: [0, 1, 0] as Vec3 };
    const zWhere100 = (200 * (150 - 100)) / (150 - 60);
    for (let i = 0; i < 16; i++) {
      const hit = hitGenerator(bundle, cone, (2 * Math.PI * i) / 16)!;
      expectNear(hit.point[2], zWhere100, 1e-9, `z at station ${i + 1}`);
    }
    expect(findGrazingPhis(bundle, cone)).toEqual([]);
  });

  it('an eccentric frustum is not a right circular cone host', () => {
    expect(() => frustumConeSurface(makeConeFrustum({ largeRadiusMm: 100, smallRadiusMm: 50, lengthMm: 100, offsetMm: 50 }))).toThrow(/offsetMm/);
  });
});
