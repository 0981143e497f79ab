import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isGirthError } from '@girth/pipes';
import { frustumElement, makeConeFrustum } from './frustum.js';
import { makeConeSheet, maxEndShiftFactor, maxPlateThicknessMm, sheetElement } from './sheet.js';
import { distanceToCone, expectNear, reducerArb } from './test-support/cone-checks.js';

const len = (a: readonly number[], b: readonly number[]): number => Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);

describe('mean surface of a rolled cone', () => {
  it('concentric: the mean end radius is R − (t/2) / cos(half angle), and the mean cone lies t/2 inside (invariant)', () => {
    // The rule of sheet.ts, checked against a brute-force distance to the outside cone.
    fc.assert(
      fc.property(reducerArb, fc.double({ min: 0, max: 0.9, noNaN: true }), fc.double({ min: 0, max: 6.2, noNaN: true }), (c, tf, theta) => {
        const R = c.largeDiameterMm / 2;
        const r = c.smallDiameterMm / 2;
        const f = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: r, lengthMm: c.lengthMm });
        const t = tf * maxPlateThicknessMm(f, 'outside');
        const m = sheetElement(makeConeSheet(f, t, 'outside'), theta);
        const cosA = c.lengthMm / Math.hypot(c.lengthMm, R - r);
        expectNear(Math.hypot(m.large[0], m.large[1]), R - t / 2 / cosA, 1e-9 * R, 'mean large radius');
        expectNear(Math.hypot(m.small[0], m.small[1]), r - t / 2 / cosA, 1e-9 * R, 'mean small radius');
        expectNear(distanceToCone(m.large, R, r, c.lengthMm, 0), t / 2, 1e-7 * R, 'distance to outside');
      }),
      { numRuns: 60 },
    );
  });

  it('eccentric: each mean end point lies t/2 from the outside cone and in its end plane; elements keep their true length', () => {
    fc.assert(
      fc.property(reducerArb, fc.double({ min: 0, max: 0.9, noNaN: true }), fc.double({ min: 0, max: 6.2, noNaN: true }), (c, tf, theta) => {
        const R = c.largeDiameterMm / 2;
        const r = c.smallDiameterMm / 2;
        const f = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: r, lengthMm: c.lengthMm, offsetMm: R - r });
        const t = tf * maxPlateThicknessMm(f, 'outside');
        const m = sheetElement(makeConeSheet(f, t, 'outside'), theta);
        const g = frustumElement(f, theta);
        expect(m.large[2]).toBe(0);
        expect(m.small[2]).toBe(c.lengthMm);
        expectNear(distanceToCone(m.large, R, r, c.lengthMm, R - r), t / 2, 1e-7 * R, 'large end to outside');
        expectNear(distanceToCone(m.small, R, r, c.lengthMm, R - r), t / 2, 1e-7 * R, 'small end to outside');
        expectNear(len(m.large, m.small), len(g.large, g.small), 1e-9 * R, 'element length');
      }),
      { numRuns: 60 },
    );
  });

  it('eccentric: the flat side stays flat and moves t/2 in; inside diameters move the mean surface out', () => {
    const f = makeConeFrustum({ largeRadiusMm: 150, smallRadiusMm: 80, lengthMm: 250, offsetMm: 70 });
    const m = sheetElement(makeConeSheet(f, 10, 'outside'), 0);
    expectNear(m.large[0], 145, 1e-12, 'flat side large x');
    expectNear(m.small[0], 145, 1e-12, 'flat side small x');
    const i = sheetElement(makeConeSheet(f, 10, 'inside'), 0);
    expectNear(i.large[0], 155, 1e-12, 'inside given: mean is outward');
    expect(sheetElement(makeConeSheet(f, 10, 'mean'), 1)).toEqual(frustumElement(f, 1));
  });

  it('concentric: the largest end shift factor is 1 / cos(half angle)', () => {
    const f = makeConeFrustum({ largeRadiusMm: 2, smallRadiusMm: 1, lengthMm: 1 });
    expectNear(maxEndShiftFactor(f), Math.SQRT2, 1e-12, 'factor');
  });

  it('any offset: the closed-form factor is the largest over a dense sweep of elements, and never below it (invariant)', () => {
    // Independent check: the factor's definition (sheet.ts rule) evaluated on 20 000 elements
    // from the vectors alone, against the closed form. Offsets reach past R − r and below 0,
    // where the largest factor need not sit at theta = 0 or π. Tolerance 1e-9 relative: the
    // sweep's step (3e-4 rad) leaves its maximum at most ~1e-7 · f'' below the true one.
    const sweep = (R: number, r: number, L: number, o: number): number => {
      let worst = 1;
      for (let i = 0; i <= 20_000; i++) {
        const th = (2 * Math.PI * i) / 20_000;
        const c = Math.cos(th);
        const s = Math.sin(th);
        const u = [o + (r - R) * c, (r - R) * s, L];
        const nz = R - r - o * c; // (tangent × u)_z / R, with (tangent × u)_{x,y} / R = (L c, L s)
        const k = (nz / Math.hypot(L * c, L * s, nz)) * Math.hypot(u[0]!, u[1]!, u[2]!) / L;
        worst = Math.max(worst, Math.sqrt(1 + k * k));
      }
      return worst;
    };
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 1000, noNaN: true }),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        (R, rf, lf, of) => {
          const r = rf * R;
          const f = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: r, lengthMm: lf * R, offsetMm: of * (R - r) });
          const closed = maxEndShiftFactor(f);
          const dense = sweep(R, r, lf * R, of * (R - r));
          expect(closed).toBeGreaterThanOrEqual(dense * (1 - 1e-12));
          expectNear(closed, dense, 1e-9 * dense, 'largest end shift factor');
        },
      ),
      { numRuns: 80 },
    );
  });

  it('eccentric: the thickest plate is r cos(lean of the element opposite the flat side)', () => {
    fc.assert(
      fc.property(reducerArb, (c) => {
        const R = c.largeDiameterMm / 2;
        const r = c.smallDiameterMm / 2;
        const f = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: r, lengthMm: c.lengthMm, offsetMm: R - r });
        const lean = Math.atan((2 * (R - r)) / c.lengthMm);
        expectNear(maxPlateThicknessMm(f, 'outside'), r * Math.cos(lean), 1e-9 * r, 'limit, outside');
        expectNear(maxPlateThicknessMm(f, 'mean'), Math.min(r, 2 * r * Math.cos(lean)), 1e-9 * r, 'limit, mean');
        expect(maxPlateThicknessMm(f, 'inside')).toBe(r);
      }),
    );
  });

  it('plate too thick for the small end: WALL_TOO_THICK on thicknessMm, with the limit in the message', () => {
    const f = makeConeFrustum({ largeRadiusMm: 100, smallRadiusMm: 10, lengthMm: 200 });
    const limit = maxPlateThicknessMm(f, 'outside');
    expect(limit).toBeLessThan(10);
    expect(() => makeConeSheet(f, limit * 0.999, 'outside')).not.toThrow();
    try {
      makeConeSheet(f, limit, 'outside');
      expect.unreachable();
    } catch (e) {
      expect(isGirthError(e, 'WALL_TOO_THICK')).toBe(true);
      expect((e as { field: string }).field).toBe('thicknessMm');
      expect((e as Error).message).toContain(limit.toFixed(3));
    }
    expect(() => makeConeSheet(f, 9.9, 'inside')).not.toThrow();
    expect(() => makeConeSheet(f, 10, 'inside')).toThrow(/thinner than 10\.000 mm/);
    expect(() => makeConeSheet(f, -1, 'outside')).toThrow(/thicknessMm/);
    expect(() => makeConeSheet(f, 1, 'middle' as never)).toThrow(/diametersAt/);
  });
});
