import { describe, expect, it } from 'vitest';
import { formatAngleDeg, formatLengthMm } from './format-length.js';

describe('formatLengthMm', () => {
  it('gives mm to 0.1 and inches to 0.001 (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    expect(formatLengthMm(15.25 * 25.4)).toBe('387.4 mm (15.250 in)');
    expect(formatLengthMm(12.75 * 25.4)).toBe('323.9 mm (12.750 in)');
    expect(formatLengthMm(-25.4)).toBe('-25.4 mm (-1.000 in)');
    expect(formatLengthMm(0)).toBe('0.0 mm (0.000 in)');
  });
  it('trims angles', () => {
    expect(formatAngleDeg(45)).toBe('45°');
    expect(formatAngleDeg(22.5)).toBe('22.5°');
    expect(formatAngleDeg(100 / 3)).toBe('33.33°');
  });
});
