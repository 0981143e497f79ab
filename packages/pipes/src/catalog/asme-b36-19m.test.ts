import { describe, expect, it } from 'vitest';
import { expectClose } from '../internal/test-support/expect-close.js';
import { resolvePipe } from '../pipe/resolve.js';
import { ASME_B36_10M } from './asme-b36-10m.js';
import { ASME_B36_19M } from './asme-b36-19m.js';
import { findB3610mSize } from './lookup.js';

const TABLE_TOL_IN = 5e-4;

// ASME B36.19M, recalled (REFERENCES.md "Pipe dimensions"): Sch 5S / 10S walls,
// inches, given there for groups of sizes; expanded here one row per NPS.
const GROUPS: ReadonlyArray<readonly [readonly string[], number, number]> = [
  [['1/2', '3/4'], 0.065, 0.083],
  [['1', '1-1/4', '1-1/2', '2'], 0.065, 0.109],
  [['2-1/2', '3', '3-1/2', '4'], 0.083, 0.12],
  [['5', '6'], 0.109, 0.134],
  [['8'], 0.109, 0.148],
  [['10'], 0.134, 0.165],
  [['12'], 0.156, 0.18],
  [['14'], 0.156, 0.188],
  [['16', '18'], 0.165, 0.188],
  [['20', '22'], 0.188, 0.218],
  [['24'], 0.218, 0.25],
  [['30'], 0.25, 0.312],
];

describe('ASME B36.19M against REFERENCES.md', () => {
  for (const [sizes, w5s, w10s] of GROUPS) {
    for (const nps of sizes) {
      it(`NPS ${nps}: 5S ${w5s} in, 10S ${w10s} in`, () => {
        // ASME B36.19M, recalled (REFERENCES.md)
        const p5 = resolvePipe(`NPS ${nps} Sch 5S`);
        const p10 = resolvePipe(`NPS ${nps} 10S`);
        expect(p5.standard).toBe('ASME B36.19M');
        expect(p5.label).toBe(`NPS ${nps} Sch 5S`);
        expect(p10.label).toBe(`NPS ${nps} Sch 10S`);
        expectClose(p5.wallMm, w5s * 25.4, TABLE_TOL_IN * 25.4, `NPS ${nps} 5S`);
        expectClose(p10.wallMm, w10s * 25.4, TABLE_TOL_IN * 25.4, `NPS ${nps} 10S`);
        expectClose(p5.idMm, p5.odMm - 2 * p5.wallMm, 1e-9, `NPS ${nps} 5S ID`);
      });
    }
  }

  it('40S and 80S equal Sch 40 and 80 except 40S at NPS 12 (0.375) and 80S at NPS 10-12 (0.500)', () => {
    // ASME B36.19M, recalled (REFERENCES.md)
    const withS = ASME_B36_19M.filter((r) => r.wallsIn['40S'] !== undefined || r.wallsIn['80S'] !== undefined);
    expect(withS.map((r) => r.nps)).toContain('12');
    for (const r of withS) {
      const carbon = findB3610mSize(r.npsIn);
      const expected40 = r.nps === '12' ? 0.375 : carbon?.wallsIn['40'];
      const expected80 = r.nps === '10' || r.nps === '12' ? 0.5 : carbon?.wallsIn['80'];
      expect(r.wallsIn['40S'], `NPS ${r.nps} 40S`).toBe(expected40);
      expect(r.wallsIn['80S'], `NPS ${r.nps} 80S`).toBe(expected80);
    }
  });
});

describe('ASME B36.19M invariants', () => {
  it('shares the ODs and DNs of ASME B36.10M', () => {
    // Common practice: stainless and carbon pipe of one NPS have the same OD.
    for (const r of ASME_B36_19M) {
      const carbon = ASME_B36_10M.find((c) => c.nps === r.nps);
      expect(carbon, `NPS ${r.nps}`).toBeDefined();
      expect(r.odIn, `NPS ${r.nps}`).toBe(carbon?.odIn);
      expect(r.dn, `NPS ${r.nps}`).toBe(carbon?.dn);
      expect(r.npsIn).toBe(carbon?.npsIn);
    }
  });

  it('walls grow 5S < 10S < 40S < 80S and stay under half the OD', () => {
    for (const r of ASME_B36_19M) {
      const walls = (['5S', '10S', '40S', '80S'] as const).map((s) => r.wallsIn[s]).filter((w): w is number => w !== undefined);
      expect(walls.length, `NPS ${r.nps}`).toBeGreaterThanOrEqual(2);
      for (let i = 1; i < walls.length; i++) expect(walls[i]).toBeGreaterThan(walls[i - 1] ?? 0);
      for (const w of walls) expect(2 * w).toBeLessThan(r.odIn);
    }
  });
});
