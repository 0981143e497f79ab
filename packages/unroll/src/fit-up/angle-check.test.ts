import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { angleCheck, ARC_RADIUS_UNITS_PER_DEGREE } from './angle-check.js';
import { codeOf } from './test-support/code-of.js';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe('angleCheck', () => {
  it('rise over run is tan A, the chord at radius L is 2 L sin(A/2), and 57.3 units of radius give one unit of arc per degree', () => {
    // Right-triangle trigonometry (rise/run = tan A); isosceles triangle (chord = 2 L sin(A/2)); common practice:
    // on a radius of 180/π ≈ 57.3 units one unit of arc spans one degree (REFERENCES.md). Each within 1e-9 relative.
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 179.5, noNaN: true }),
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.constantFrom(1, 10, 25.4, 304.8),
        (A, run, L, unit) => {
          const c = angleCheck(A, { runMm: run, chordRadiusMm: L, arcUnitMm: unit });
          const rad = (A * Math.PI) / 180;
          // Tolerance 1e-9 relative, widened by 1e-15 × tan A next to 90°, where rounding of the angle itself is amplified by tan A.
          if (A < 90) expect(rel(c.riseMm! / c.runMm, Math.tan(rad))).toBeLessThanOrEqual(1e-9 + 1e-15 * Math.tan(rad));
          else expect(c.riseMm).toBeUndefined();
          expect(rel(c.chordMm, 2 * L * Math.sin(rad / 2))).toBeLessThanOrEqual(1e-9);
          // One unit of arc per degree: the arc, in units, reads the angle in degrees.
          expect(rel(c.arcLengthMm / unit, A)).toBeLessThanOrEqual(1e-9);
          expect(rel(c.arcRadiusMm / unit, 57.29577951308232)).toBeLessThanOrEqual(1e-9);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('reads worked values: 45° rises one for one, 60° has a chord equal to its radius, a tee is checked with a square', () => {
    // Right triangle: tan 45° = 1; equilateral triangle: the chord of 60° equals the radius.
    const c45 = angleCheck(45, { runMm: 300 });
    expect(rel(c45.riseMm!, 300)).toBeLessThanOrEqual(1e-12);
    expect(rel(angleCheck(60, { chordRadiusMm: 500 }).chordMm, 500)).toBeLessThanOrEqual(1e-12);
    expect(angleCheck(90).riseMm).toBeUndefined();
    // Defaults: a foot of run and radius, inches for the arc (57.3 in radius, 1 in of arc per degree).
    const d = angleCheck(30);
    expect([d.runMm, d.chordRadiusMm, d.arcUnitMm]).toEqual([304.8, 304.8, 25.4]);
    expect(rel(d.arcRadiusMm, ARC_RADIUS_UNITS_PER_DEGREE * 25.4)).toBeLessThanOrEqual(1e-15);
  });

  it('rejects a run, radius or unit of zero or below and an angle outside (0°, 180°), naming the option', () => {
    expect(codeOf(() => angleCheck(45, { runMm: 0 }))).toBe('NEGATIVE:runMm');
    expect(codeOf(() => angleCheck(45, { runMm: -300 }))).toBe('NEGATIVE:runMm');
    expect(codeOf(() => angleCheck(45, { chordRadiusMm: 0 }))).toBe('NEGATIVE:chordRadiusMm');
    expect(codeOf(() => angleCheck(45, { chordRadiusMm: -1 }))).toBe('NEGATIVE:chordRadiusMm');
    expect(codeOf(() => angleCheck(45, { arcUnitMm: 0 }))).toBe('NEGATIVE:arcUnitMm');
    expect(codeOf(() => angleCheck(45, { runMm: Number.NaN }))).toBe('NOT_A_NUMBER:runMm');
    expect(codeOf(() => angleCheck(45, { runMm: Infinity }))).toBe('NOT_FINITE:runMm');
    expect(codeOf(() => angleCheck(0))).toBe('OUT_OF_RANGE:angleDeg');
    expect(codeOf(() => angleCheck(180))).toBe('OUT_OF_RANGE:angleDeg');
    expect(codeOf(() => angleCheck(45, null as never))).toBe('BAD_OPTION:options');
    expect(codeOf(() => angleCheck(45, { runMm: 1e-3 }))).toBeUndefined();
    expect(codeOf(() => angleCheck(89.999999, { runMm: 1e6 }))).toBeUndefined();
    expect(codeOf(() => angleCheck(45, { runMm: 1e308 }))).toBe('OUT_OF_RANGE:runMm');
  });
});
