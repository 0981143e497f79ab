import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { formatDxfNumber } from './format-number.js';

describe('formatDxfNumber', () => {
  it('writes plain decimals without exponent, trailing zeros or -0', () => {
    expect(formatDxfNumber(1e-7, 6)).toBe('0');
    expect(formatDxfNumber(-1e-7, 6)).toBe('0');
    expect(formatDxfNumber(1e-10, 10)).toBe('0.0000000001');
    expect(formatDxfNumber(25.4, 6)).toBe('25.4');
    expect(formatDxfNumber(0.1 + 0.2, 6)).toBe('0.3');
    expect(formatDxfNumber(-12, 6)).toBe('-12');
  });

  it('refuses NaN and infinities with a typed error', () => {
    for (const v of [Number.NaN, Infinity, -Infinity]) {
      expect(() => formatDxfNumber(v, 6)).toThrow();
      try {
        formatDxfNumber(v, 6);
      } catch (e) {
        expect(isGirthError(e, 'NOT_FINITE')).toBe(true);
      }
    }
  });

  // Invariant: the text reads back within half a unit of the last place.
  it('round-trips within 0.5e-6 for coordinates up to 1 km', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (v) => {
        const s = formatDxfNumber(v, 6);
        return /^-?\d+(\.\d+)?$/.test(s) && Math.abs(Number(s) - v) <= 0.5e-6 + 1e-9;
      }),
    );
  });
});
