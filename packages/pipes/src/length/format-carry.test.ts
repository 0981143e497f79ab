/**
 * Property tests drawn where formatting can go wrong: just either side of the
 * half-step that decides a fraction's rounding, next to the carries into the
 * next inch (15/16 -> 1") and the next foot (11 15/16 -> 1'-0"), and next to
 * decimal carries (0.9995 -> 1.000). The oracle is independent of the code:
 * a length (k + 1/2 + d) steps long with d != 0 rounds to k + 1 steps when d > 0
 * and to k when d < 0 (nearest step; common practice for a tape reading), and
 * feet-inch text keeps inches under 12 and fractions proper (common practice).
 * The offsets d are at least 1e-6 of a step, far above double rounding noise
 * (about 1e-13 of a step at 1 km). The formatter deliberately takes a value
 * within 1e-12 (decimals) or 1e-14 (fractions) of itself from a tie as the
 * tie, so that decimal ties stored inexactly in binary round away from zero
 * (decimal.ts, fraction.ts); draws stay at least ten times outside that band.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatLength } from './format.js';
import { parseLength } from './parse.js';
import { MM_PER_INCH } from './units.js';

const denominator = fc.constantFrom<8 | 16 | 32>(8, 16, 32);
/** Whole inches that sit at a carry: end of a foot (11, 23, ...), start of one (0, 12, ...), or any. */
const wholeInches = fc.oneof(
  fc.integer({ min: 0, max: 80 }).map((f) => 12 * f + 11),
  fc.integer({ min: 0, max: 80 }).map((f) => 12 * f),
  fc.integer({ min: 0, max: 1000 }),
);
/** A signed offset from the half-step, as a share of a step: 1e-6 to 0.45 either way. */
const offset = fc.tuple(fc.boolean(), fc.double({ min: -6, max: Math.log10(0.45), noNaN: true })).map(([up, e]) => (up ? 1 : -1) * 10 ** e);

/** A length near a fraction or inch carry: steps k = inches × den + j with j near the inch's end, plus 1/2 + d. */
const nearCarry = fc
  .record({ den: denominator, inches: wholeInches, j: fc.integer({ min: -2, max: 1 }), d: offset, negative: fc.boolean() })
  .map(({ den, inches, j, d, negative }) => {
    const k = inches * den + j;
    const stepMm = MM_PER_INCH / den;
    const sign = negative ? -1 : 1;
    return { den, mm: sign * (k + 0.5 + d) * stepMm, expectedSteps: sign * (d > 0 ? k + 1 : k), stepMm };
  });

const FT_IN = /^(-?)(?:(\d+)'-)?(?:(\d+)(?: (\d+)\/(\d+))?|(\d+)\/(\d+))"$/;

describe('formatLength near carries (fast-check)', () => {
  it('the draws really are near carries: most are longer than an inch, none within 1e-6 step of a tie', () => {
    const draws = fc.sample(nearCarry, 2000);
    expect(draws.filter((x) => Math.abs(x.mm) > MM_PER_INCH).length / draws.length).toBeGreaterThan(0.9);
    for (const x of draws) {
      const fromTie = Math.abs(Math.abs(x.mm) / x.stepMm - Math.floor(Math.abs(x.mm) / x.stepMm) - 0.5);
      expect(fromTie).toBeGreaterThan(0.99e-6);
    }
  });

  it('ft-in rounds to the nearest step on either side of the half-step, carrying into inches and feet', () => {
    fc.assert(
      fc.property(nearCarry, ({ den, mm, expectedSteps, stepMm }) => {
        const text = formatLength(mm, { format: 'ft-in', fraction: den });
        const back = parseLength(text, { allowNegative: true });
        expect(Math.abs(back / stepMm - expectedSteps), `${mm} mm -> ${text}`).toBeLessThan(1e-6);
        const m = FT_IN.exec(text);
        expect(m, text).not.toBeNull();
        const inches = m?.[3];
        if (inches !== undefined) expect(Number(inches), text).toBeLessThan(12);
        const num = Number(m?.[4] ?? m?.[6] ?? 0);
        const d = Number(m?.[5] ?? m?.[7] ?? 1);
        if (num > 0) expect(num, text).toBeLessThan(d);
        if (expectedSteps === 0) expect(text).toBe('0"');
      }),
      { numRuns: 5000 },
    );
  });

  it('decimal inches and millimetres round to the nearest last digit on either side of the half-digit', () => {
    const nearDecimalCarry = fc
      .record({
        format: fc.constantFrom<'mm' | 'in'>('mm', 'in'),
        decimals: fc.integer({ min: 0, max: 4 }),
        // Whole units ending in 9s (…9.99|5) carry through every digit.
        whole: fc.oneof(fc.integer({ min: 0, max: 99 }).map((w) => 100 * w + 99), fc.integer({ min: 0, max: 20000 })),
        d: offset,
        negative: fc.boolean(),
      })
      .map(({ format, decimals, whole, d: drawn, negative }) => {
        let d = drawn;
        const unitMm = format === 'in' ? MM_PER_INCH : 1;
        const digits = 10 ** decimals;
        const k = (whole + 1) * digits - 1; // the last step before the next whole unit: x.999…
        const sign = negative ? -1 : 1;
        d = Math.sign(d) * Math.max(Math.abs(d), 1e-11 * (k + 1)); // outside the tie band (see above)
        return { format, decimals, mm: (sign * (k + 0.5 + d) * unitMm) / digits, expected: sign * (d > 0 ? k + 1 : k), stepMm: unitMm / digits };
      });
    fc.assert(
      fc.property(nearDecimalCarry, ({ format, decimals, mm, expected, stepMm }) => {
        const text = formatLength(mm, { format, decimals });
        const back = parseLength(text, { allowNegative: true, unit: format === 'in' ? 'mm' : 'in' });
        expect(Math.abs(back / stepMm - expected), `${mm} mm -> ${text}`).toBeLessThan(1e-6);
        const digitsShown = /\.(\d+)/.exec(text)?.[1]?.length ?? 0;
        expect(digitsShown, text).toBe(decimals);
      }),
      { numRuns: 5000 },
    );
  });
});
