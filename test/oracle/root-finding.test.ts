import { describe, expect, it } from 'vitest';
import { bisectSignChange, findDipOfConvex, minimiseUnimodal } from './root-finding.js';

describe('bisectSignChange', () => {
  it('closes a bracket to the last bits: sqrt(2) against Math.SQRT2 (ECMAScript constant, correctly rounded)', () => {
    const x = bisectSignChange((t) => t * t - 2, 0, 2);
    // Within 2 ulp of sqrt(2) (ulp at 1.41 is 2.2e-16): the bracket is closed to adjacent doubles.
    expect(Math.abs(x - Math.SQRT2)).toBeLessThanOrEqual(4.5e-16);
  });

  it('works with the bracket given high-to-low (lo above hi)', () => {
    // f(t) = 3 - t is <= 0 for t >= 3: lo = 10, hi = 0; root 3 exactly representable.
    expect(bisectSignChange((t) => 3 - t, 10, 0)).toBe(3);
  });

  it('refuses a bracket without a sign change', () => {
    expect(() => bisectSignChange((t) => t * t + 1, -1, 1)).toThrow(/f\(lo\) <= 0 < f\(hi\)/);
  });
});

describe('findDipOfConvex', () => {
  it('finds a point inside a narrow dip of a convex function', () => {
    // (t - 0.123)^2 - 1e-8 is <= 0 only on |t - 0.123| <= 1e-4, a width 1e-5 of the search interval.
    const r = findDipOfConvex((t) => (t - 0.123) ** 2 - 1e-8, -10, 10);
    expect(r.kind).toBe('found');
    if (r.kind === 'found') expect(Math.abs(r.x - 0.123)).toBeLessThanOrEqual(1e-4);
  });

  it('reports none, with the minimum, when the function stays positive', () => {
    const r = findDipOfConvex((t) => (t - 2) ** 2 + 1, -10, 10);
    expect(r.kind).toBe('none');
    if (r.kind === 'none') {
      expect(Math.abs(r.xMin - 2)).toBeLessThanOrEqual(1e-7);
      expect(r.fMin).toBeGreaterThanOrEqual(1);
    }
  });
});

describe('minimiseUnimodal', () => {
  it('locates the minimum of cos on [2, 4] at pi (value -1)', () => {
    const r = minimiseUnimodal(Math.cos, 2, 4, { absTol: 1e-12 });
    // Near a smooth minimum the argument is found to about sqrt(eps) and the value to eps.
    expect(Math.abs(r.x - Math.PI)).toBeLessThanOrEqual(1e-7);
    expect(Math.abs(r.fx + 1)).toBeLessThanOrEqual(1e-15);
  });
});
