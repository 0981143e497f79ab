import { describe, expect, it } from 'vitest';
import { expectClose } from '../internal/test-support/expect-close.js';
import { resolvePipe } from '../pipe/resolve.js';
import { EN_10220 } from './en-10220.js';

/** REFERENCES.md: published copies of the table differ by 0.1 mm at DN 250/300, so ODs are checked to 0.1 mm. */
const OD_TOL_MM = 0.1 + 1e-9;

// EN 10220 / ISO 4200 series 1 outside diameters, mm, recalled (REFERENCES.md).
const REFERENCE_ODS: ReadonlyArray<readonly [number, number]> = [
  [15, 21.3], [20, 26.9], [25, 33.7], [32, 42.4], [40, 48.3], [50, 60.3], [65, 76.1],
  [80, 88.9], [100, 114.3], [125, 139.7], [150, 168.3], [200, 219.1], [250, 273.0],
  [300, 323.9], [350, 355.6], [400, 406.4], [450, 457.0], [500, 508.0], [600, 610.0],
];

describe('EN 10220 against REFERENCES.md', () => {
  for (const [dn, odMm] of REFERENCE_ODS) {
    it(`DN ${dn}: OD ${odMm} mm`, () => {
      // EN 10220 / ISO 4200 series 1, recalled (REFERENCES.md)
      const p = resolvePipe(`DN ${dn} x 3.2`);
      expect(p.standard).toBe('EN 10220');
      expect(p.dn).toBe(dn);
      expect(p.label).toBe(`DN ${dn} x 3.2`);
      expectClose(p.odMm, odMm, OD_TOL_MM, `DN ${dn} OD`);
      expectClose(p.wallMm, 3.2, 1e-12, `DN ${dn} wall`);
      expectClose(p.idMm, p.odMm - 6.4, 1e-9, `DN ${dn} ID`); // ID = OD - 2 x wall (common practice)
    });
  }
});

describe('EN 10220 table', () => {
  it('runs from DN 15 to DN 1200 with increasing DN and OD', () => {
    expect(EN_10220[0]?.dn).toBe(15);
    expect(EN_10220.at(-1)?.dn).toBe(1200);
    for (let i = 1; i < EN_10220.length; i++) {
      expect(EN_10220[i]?.dn).toBeGreaterThan(EN_10220[i - 1]?.dn ?? 0);
      expect(EN_10220[i]?.odMm).toBeGreaterThan(EN_10220[i - 1]?.odMm ?? 0);
    }
  });

  it('gives each DN an OD above the DN itself, within 45% of it', () => {
    // Common practice: a DN is a round number near (and below) the OD in mm; the
    // small sizes run furthest above it (DN 15 is 21.3 mm).
    for (const r of EN_10220) {
      expect(r.odMm, `DN ${r.dn}`).toBeGreaterThan(r.dn);
      expect(r.odMm / r.dn, `DN ${r.dn}`).toBeLessThan(1.45);
    }
  });
});
