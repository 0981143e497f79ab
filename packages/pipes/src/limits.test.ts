import { describe, expect, it } from 'vitest';
import { expectGirthError } from './test-support/girth-error-of.js';
import { BEND_DEG, CONE_APEX_ANGLE_DEG, DIAMETER_MM, formatPair, isWithin, LIMITS, rangeText, requireWithin, STATIONS } from './limits.js';

describe('limits', () => {
  it('every bound is a real range with a unit, words and a reason', () => {
    for (const [name, limit] of Object.entries(LIMITS)) {
      expect(limit.min < limit.max, name).toBe(true);
      expect(limit.what.length, name).toBeGreaterThan(3);
      expect(limit.reason.length, name).toBeGreaterThan(10);
    }
  });

  it('accepts the ends of a closed range and refuses the open ends (invariant)', () => {
    expect(isWithin(4, STATIONS) && isWithin(360, STATIONS)).toBe(true);
    expect(isWithin(3, STATIONS) || isWithin(361, STATIONS) || isWithin(16.5, STATIONS)).toBe(false);
    expect(isWithin(0, BEND_DEG)).toBe(false);
    expect(isWithin(180, BEND_DEG)).toBe(true);
    expect(isWithin(180, CONE_APEX_ANGLE_DEG)).toBe(false);
    expect(isWithin(Number.NaN, DIAMETER_MM)).toBe(false);
  });

  it('words the range as a person reads it', () => {
    expect(rangeText(STATIONS)).toBe('a whole number from 4 to 360');
    expect(rangeText(BEND_DEG)).toBe('more than 0° and at most 180°');
    expect(rangeText(DIAMETER_MM)).toBe('from 3 mm to 20000 mm');
  });

  it('prints a value and its limit so they never read the same when they differ', () => {
    expect(formatPair(84.93, 84.9)).toEqual(['84.93', '84.9']);
    expect(formatPair(84.9001, 84.9)).toEqual(['84.9001', '84.9']);
    expect(formatPair(0.000001, 3)).toEqual(['0.000001', '3']);
    expect(formatPair(5, 5)).toEqual(['5', '5']);
    expect(formatPair(500.00000000000006, 500)).toEqual(['500.00000000000006', '500']);
  });

  it('refuses a value outside with OUT_OF_RANGE naming the field, the limit and the reason', () => {
    expect(requireWithin(16, 'stations', STATIONS)).toBe(16);
    const low = expectGirthError(() => requireWithin(3, '--stations', STATIONS), 'OUT_OF_RANGE', '--stations');
    expect(low.message).toBe('--stations: the number of stations must be at least 4, got 3 (a whole number from 4 to 360: at least one every 90° and at most one every degree)');
    expect(expectGirthError(() => requireWithin(16.5, 'stations', STATIONS), 'OUT_OF_RANGE').message).toMatch(/^stations: must be a whole number, got 16\.5/);
    expect(expectGirthError(() => requireWithin(0, 'bendDeg', BEND_DEG), 'OUT_OF_RANGE').message).toMatch(/the bend must be more than 0°, got 0°/);
    expectGirthError(() => requireWithin('45', 'angle', BEND_DEG), 'NOT_A_NUMBER', 'angle');
    // A shown value that rounds onto the limit gets more decimals instead ("84.9 mm may be at most 84.9 mm").
    const shown = (mm: number): string => `${mm.toFixed(1)} mm`;
    const e = expectGirthError(() => requireWithin(20_000.04, 'large', DIAMETER_MM, shown), 'OUT_OF_RANGE', 'large');
    expect(e.message).toMatch(/at most 20000 mm, got 20000\.04 mm/);
  });
});
