import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { maximizeOnInterval } from './golden-max.js';

describe('maximizeOnInterval', () => {
  it('finds the vertex of a parabola (invariant: the peak of -(x-p)² is p)', () => {
    fc.assert(
      fc.property(fc.double({ min: -5, max: 5, noNaN: true }), (p) => {
        const r = maximizeOnInterval((x) => -((x - p) ** 2), p - 3, p + 4, 1e-10);
        expect(Math.abs(r.x - p)).toBeLessThan(1e-8);
      }),
    );
  });

  it('finds a peak at an end of the interval', () => {
    const r = maximizeOnInterval((x) => x, 0, 1, 1e-12);
    expect(1 - r.x).toBeLessThan(1e-11);
  });
});
