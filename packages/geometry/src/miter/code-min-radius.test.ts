import { describe, expect, it } from 'vitest';
import { codeMinMiterRadiusMm, miterRadiusConstantAMm } from './code-min-radius.js';
import { expectClose } from '../plane-cut/test-support/expect-close.js';

describe('ASME B31.3 eq. (5) minimum miter radius (recalled, not checked against the printed code)', () => {
  it('takes A = 25 mm up to a 13 mm wall, 2T below 22 mm, 2T/3 + 30 mm from 22 mm (recalled)', () => {
    expect(miterRadiusConstantAMm(6)).toBe(25);
    expect(miterRadiusConstantAMm(13)).toBe(25);
    expect(miterRadiusConstantAMm(15)).toBe(30);
    expectClose(miterRadiusConstantAMm(24), 46, 1e-12, 'A at 24 mm');
  });

  it('changes rule exactly at T = 22 mm and just above T = 13 mm (recalled boundaries)', () => {
    // 13 < T < 22: A = 2T; T >= 22: A = 2T/3 + 30. The two rules give 44 and
    // 44.667 mm at 22 mm, so the boundary itself decides which applies.
    expectClose(miterRadiusConstantAMm(22), (2 * 22) / 3 + 30, 1e-12, 'A at 22 mm');
    expectClose(miterRadiusConstantAMm(21.99), 2 * 21.99, 1e-12, 'A just below 22 mm');
    expectClose(miterRadiusConstantAMm(22.01), (2 * 22.01) / 3 + 30, 1e-12, 'A just above 22 mm');
    expectClose(miterRadiusConstantAMm(13.01), 26.02, 1e-12, 'A just above 13 mm');
    // R1 at the boundary: A / tan 11.25° + D/2 for a 22 mm wall on a 610 mm OD (NPS 24, ASME B36.10M, recalled).
    expectClose(codeMinMiterRadiusMm(609.6, 22, 11.25), ((2 * 22) / 3 + 30) / Math.tan((11.25 * Math.PI) / 180) + 304.8, 1e-9, 'R1 at T = 22 mm');
  });

  it('gives R1 = A / tan(theta) + D/2 (recalled)', () => {
    // NPS 12 STD: OD 12.75 in = 323.85 mm, wall 0.375 in = 9.525 mm (ASME B36.10M, recalled).
    // theta 15°: 25 / tan 15° = 93.30127019 mm; + 161.925 mm.
    expectClose(codeMinMiterRadiusMm(323.85, 9.525, 15), 255.22627019, 1e-6, 'R1 NPS 12 STD at 15°');
    // theta 7.5°: 25 / tan 7.5° = 189.893853 mm; + 161.925 mm.
    expectClose(codeMinMiterRadiusMm(323.85, 9.525, 7.5), 351.818853, 1e-5, 'R1 NPS 12 STD at 7.5°');
  });

  it('rejects a cut angle outside (0, 90)', () => {
    expect(() => codeMinMiterRadiusMm(100, 5, 90)).toThrow(/cutAngleDeg/);
    expect(() => codeMinMiterRadiusMm(100, 5, 0)).toThrow(/cutAngleDeg/);
  });
});
