import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GirthError } from '../errors.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { feetInchParts, roundToFraction } from './fraction.js';
import { MM_PER_INCH } from './units.js';

const lengthMm = fc.double({ min: -1e6, max: 1e6, noNaN: true });
const denominator = fc.constantFrom<8 | 16 | 32>(8, 16, 32);
const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
/** True when `x` is a whole number up to floating-point noise that grows with |x|. */
const nearInteger = (x: number): boolean => Math.abs(x - Math.round(x)) <= 1e-6 + 1e-12 * Math.abs(x);

describe('roundToFraction', () => {
  it('rounds to the nearest sixteenth as read on a tape', () => {
    // Ordinates are read to the nearest 1/16 in in the field (common practice, REFERENCES.md).
    expectClose(roundToFraction(42.9, 16), 1.6875 * MM_PER_INCH, 1e-9, '42.9 mm -> 1 11/16 in'); // 42.9 / 25.4 x 16 = 27.02 sixteenths
    expectClose(roundToFraction(25.4 * (1 / 32), 16), 25.4 / 16, 1e-9, 'a half step rounds up');
    expectClose(roundToFraction(-25.4 * (1 / 32), 16), -25.4 / 16, 1e-9, 'and a negative half step down');
    expect(Object.is(roundToFraction(-0.1, 16), 0)).toBe(true);
  });

  it('gives a multiple of 1/denominator inch within half a step of the input (fast-check)', () => {
    fc.assert(
      fc.property(lengthMm, denominator, (mm, den) => {
        const r = roundToFraction(mm, den);
        const step = MM_PER_INCH / den;
        expect(nearInteger(r / step), `${r} / ${step}`).toBe(true);
        expect(Math.abs(r - mm)).toBeLessThanOrEqual(step / 2 + 1e-9 * Math.max(1, Math.abs(mm)));
      }),
      { numRuns: 5000 },
    );
  });

  it('is idempotent, odd-symmetric and monotone (fast-check)', () => {
    fc.assert(
      fc.property(lengthMm, lengthMm, denominator, (a, b, den) => {
        const r = roundToFraction(a, den);
        expectClose(roundToFraction(r, den), r, 1e-9 * Math.max(1, Math.abs(r)), 'idempotent');
        expect(roundToFraction(-a, den)).toBe(-r === 0 ? 0 : -r);
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        expect(roundToFraction(lo, den)).toBeLessThanOrEqual(roundToFraction(hi, den));
      }),
      { numRuns: 3000 },
    );
  });

  it('refuses NaN, infinity and other denominators', () => {
    expect(() => roundToFraction(Number.NaN, 16)).toThrow(GirthError);
    expect(() => roundToFraction(Number.NEGATIVE_INFINITY, 16)).toThrow(/must be finite/);
    expect(() => roundToFraction(1, 10 as 16)).toThrow(/8, 16 or 32/);
  });
});

describe('feetInchParts', () => {
  it('carries a full inch and a full foot', () => {
    // 11 15/16 in + 1/16 in = 1 ft exactly: arithmetic.
    expect(feetInchParts((11 + 15 / 16 + 1 / 16) * MM_PER_INCH)).toEqual({
      kind: 'feet-inch-parts', negative: false, feet: 1, inches: 0, numerator: 0, denominator: 1,
    });
    expect(feetInchParts(5.999 * MM_PER_INCH)).toMatchObject({ feet: 0, inches: 6, numerator: 0, denominator: 1 });
    expect(feetInchParts(25.6875 * MM_PER_INCH)).toMatchObject({ feet: 2, inches: 1, numerator: 11, denominator: 16 });
    expect(feetInchParts(-0.5 * MM_PER_INCH, 32)).toMatchObject({ negative: true, feet: 0, inches: 0, numerator: 1, denominator: 2 });
  });

  it('is always normalised and adds back up to the rounded length (fast-check)', () => {
    fc.assert(
      fc.property(lengthMm, denominator, (mm, den) => {
        const p = feetInchParts(mm, den);
        expect(p.inches).toBeGreaterThanOrEqual(0);
        expect(p.inches).toBeLessThan(12);
        expect(p.numerator).toBeGreaterThanOrEqual(0);
        expect(p.numerator).toBeLessThan(p.denominator);
        if (p.numerator === 0) expect(p.denominator).toBe(1);
        else expect(gcd(p.numerator, p.denominator)).toBe(1);
        expect(den % p.denominator).toBe(0);
        const total = (p.negative ? -1 : 1) * ((p.feet * 12 + p.inches + p.numerator / p.denominator) * MM_PER_INCH);
        expectClose(total, roundToFraction(mm, den), 1e-9 * Math.max(1, Math.abs(mm)), 'parts sum');
        if (p.negative) expect(p.feet + p.inches + p.numerator).toBeGreaterThan(0);
      }),
      { numRuns: 5000 },
    );
  });
});
