import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatAngleDeg, formatLengthBoth } from './format-both.js';

describe('formatLengthBoth', () => {
  it('writes 25.4 mm as exactly one inch (1 in = 25.4 mm by definition, NIST SP 811; common practice)', () => {
    expect(formatLengthBoth(25.4)).toBe('25.4 mm (1.000 in)');
    expect(formatLengthBoth(-25.4)).toBe('-25.4 mm (-1.000 in)');
  });

  it('writes pipe ODs to 0.1 mm and 0.001 in (ASME B36.10M ODs, recalled: NPS 12 12.750 in, NPS 16 16.000 in)', () => {
    // 12.75 x 25.4 = 323.85 exactly, stored as 323.84999999999997: a decimal tie, rounded up.
    expect(formatLengthBoth(12.75 * 25.4)).toBe('323.9 mm (12.750 in)');
    expect(formatLengthBoth(16 * 25.4)).toBe('406.4 mm (16.000 in)');
    expect(formatLengthBoth(15.25 * 25.4)).toBe('387.4 mm (15.250 in)');
  });

  it('writes zero, and anything that rounds to zero, without a minus sign', () => {
    expect(formatLengthBoth(0)).toBe('0.0 mm (0.000 in)');
    expect(formatLengthBoth(-0)).toBe('0.0 mm (0.000 in)');
    expect(formatLengthBoth(-0.01)).toBe('0.0 mm (0.000 in)');
  });

  it('reads back within half a unit of its last place in both units (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (mm) => {
        const m = /^(-?\d+\.\d) mm \((-?\d+\.\d{3}) in\)$/.exec(formatLengthBoth(mm));
        expect(m).not.toBeNull();
        // Half the last place, plus float noise that grows with the magnitude.
        expect(Math.abs(Number(m![1]) - mm)).toBeLessThanOrEqual(0.05 + 1e-9 * Math.abs(mm));
        expect(Math.abs(Number(m![2]) - mm / 25.4)).toBeLessThanOrEqual(0.0005 + 1e-9 * Math.abs(mm));
      }),
    );
  });
});

describe('formatAngleDeg', () => {
  it('keeps at most two decimals and drops trailing zeros', () => {
    expect(formatAngleDeg(45)).toBe('45°');
    expect(formatAngleDeg(22.5)).toBe('22.5°');
    expect(formatAngleDeg(100 / 3)).toBe('33.33°');
    expect(formatAngleDeg(0)).toBe('0°');
  });
});
