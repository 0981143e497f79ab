import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isGirthError } from '@girth/pipes';
import { elementInclinationRad, frustumApex, frustumElement, frustumNormal, makeConeFrustum } from './frustum.js';
import { distanceToLine, expectNear, reducerArb } from './test-support/cone-checks.js';

const dot = (a: readonly number[], b: readonly number[]): number => a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;

describe('makeConeFrustum', () => {
  it('rejects a small end that is not smaller, naming the field', () => {
    try {
      makeConeFrustum({ largeRadiusMm: 50, smallRadiusMm: 50, lengthMm: 10 });
      expect.unreachable();
    } catch (e) {
      expect(isGirthError(e, 'OUT_OF_RANGE')).toBe(true);
      expect((e as { field: string }).field).toBe('smallRadiusMm');
    }
  });
  it('rejects NaN, infinite and non-positive numbers', () => {
    expect(() => makeConeFrustum({ largeRadiusMm: NaN, smallRadiusMm: 1, lengthMm: 1 })).toThrow(/largeRadiusMm/);
    expect(() => makeConeFrustum({ largeRadiusMm: 2, smallRadiusMm: 1, lengthMm: Infinity })).toThrow(/lengthMm/);
    expect(() => makeConeFrustum({ largeRadiusMm: 2, smallRadiusMm: 0, lengthMm: 1 })).toThrow(/smallRadiusMm/);
  });
});

describe('cone frustum geometry (invariants)', () => {
  it('every element passes through the apex, concentric or eccentric', () => {
    fc.assert(
      fc.property(reducerArb, fc.boolean(), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), (c, ecc, t) => {
        const R = c.largeDiameterMm / 2;
        const r = c.smallDiameterMm / 2;
        const f = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: r, lengthMm: c.lengthMm, offsetMm: ecc ? R - r : 0 });
        const e = frustumElement(f, t);
        const apex = frustumApex(f);
        expect(distanceToLine(apex, e.large, e.small)).toBeLessThan(1e-9 * (R + c.lengthMm) * (R / (R - r)));
      }),
    );
  });

  it('the normal is square to the element and to the end circle, and points away from the axis', () => {
    fc.assert(
      fc.property(reducerArb, fc.boolean(), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), (c, ecc, t) => {
        const R = c.largeDiameterMm / 2;
        const r = c.smallDiameterMm / 2;
        const f = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: r, lengthMm: c.lengthMm, offsetMm: ecc ? R - r : 0 });
        const e = frustumElement(f, t);
        const n = frustumNormal(f, t);
        const u = [e.small[0] - e.large[0], e.small[1] - e.large[1], e.small[2] - e.large[2]];
        const un = Math.hypot(u[0]!, u[1]!, u[2]!);
        expectNear(Math.hypot(n[0], n[1], n[2]), 1, 1e-12, '|n|');
        expectNear(dot(n, u) / un, 0, 1e-12, 'n · element');
        expectNear(dot(n, [-Math.sin(t), Math.cos(t), 0]), 0, 1e-12, 'n · circle tangent');
        expect(dot(n, [Math.cos(t), Math.sin(t), 0])).toBeGreaterThan(0);
      }),
    );
  });

  it('concentric: every element leans at the half-apex angle atan((R − r) / L); eccentric: the flat side is parallel to the axis', () => {
    // Right cone: common geometry. Eccentric: the element at theta = 0 is the flat side by construction.
    const f = makeConeFrustum({ largeRadiusMm: 101.6, smallRadiusMm: 63.5, lengthMm: 101.6 });
    for (const t of [0, 1, 2.5, 4]) expectNear(elementInclinationRad(f, t), Math.atan((101.6 - 63.5) / 101.6), 1e-12, 'half angle');
    const g = makeConeFrustum({ largeRadiusMm: 101.6, smallRadiusMm: 63.5, lengthMm: 101.6, offsetMm: 101.6 - 63.5 });
    expectNear(elementInclinationRad(g, 0), 0, 1e-12, 'flat side');
    expectNear(elementInclinationRad(g, Math.PI), Math.atan((203.2 - 127) / 101.6), 1e-12, 'opposite side');
  });
});
