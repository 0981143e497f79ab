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

/** The text as written before the integer fast path (kept here as the reference it must match). */
function referenceFormat(value: number, decimals: number): string {
  if (decimals <= 6) {
    const scale = 10 ** decimals;
    const r = Math.round(value * scale) / scale;
    if (Math.abs(r) < 1e21) return r === 0 ? '0' : String(r);
  }
  let s = value.toFixed(decimals);
  if (s.includes('.')) s = s.replace(/\.?0+$/, '');
  return s === '-0' ? '0' : s;
}

describe('formatDxfNumber integer fast path', () => {
  // Invariant: the same bytes as String() of the rounded value, for every decimals 0–6.
  it('writes exactly the text of the plain rounding over random values', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.double({ min: -1e6, max: 1e6, noNaN: true }),
          fc.double({ min: -1e12, max: 1e12, noNaN: true }),
          fc.double({ min: -1, max: 1, noNaN: true }),
          fc.integer({ min: -1e9, max: 1e9 }).map((k) => k / 1e6),
          fc.integer({ min: -1e9, max: 1e9 }).map((k) => k / 1e6 + 5e-7),
        ),
        fc.integer({ min: 0, max: 6 }),
        (v, d) => formatDxfNumber(v, d) === referenceFormat(v, d),
      ),
      { numRuns: 20000 },
    );
  });

  it('matches at the edges: halves, carries and the 1e15 bound', () => {
    const values = [0.5e-6, -0.5e-6, 1.5e-6, 0.9999995, -0.9999995, 999999.9999996, 1e-6, 123.000001, 9.99e8, 999999999.999999, 1e9 + 0.5e-6, 5e14, 2e15, -0, 0.1 + 0.2];
    for (const v of values) for (let d = 0; d <= 6; d++) expect(formatDxfNumber(v, d)).toBe(referenceFormat(v, d));
  });
});
