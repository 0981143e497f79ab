import { describe, expect, it } from 'vitest';
import { girthErrorOf } from '../test-support/girth-error-of.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { resolvePipe } from '../pipe/resolve.js';
import { ASME_B36_10M } from './asme-b36-10m.js';
import { findB3610mSize, B36_10M_SCHEDULE_ORDER } from './lookup.js';
import type { B3610mSchedule } from './types.js';

/** Table values are given to 0.001 in; the catalog must match them to the digit. */
const TABLE_TOL_IN = 5e-4;
/** mm are the inch values times 25.4 exactly; slack for floating point only. */
const MM_TOL = 1e-9;

// ASME B36.10M, recalled (REFERENCES.md "Pipe dimensions"): NPS, OD in, and the
// walls of STD, XS, Sch 40, Sch 80, Sch 160, XXS in inches; null where
// REFERENCES.md lists no wall ("–").
const REFERENCE_ROWS: ReadonlyArray<readonly [string, number, number, number, number | null, number | null, number | null, number | null]> = [
  // NPS     OD      STD    XS     40     80     160    XXS
  ['1/2', 0.84, 0.109, 0.147, 0.109, 0.147, 0.188, 0.294],
  ['3/4', 1.05, 0.113, 0.154, 0.113, 0.154, 0.219, 0.308],
  ['1', 1.315, 0.133, 0.179, 0.133, 0.179, 0.25, 0.358],
  ['1-1/4', 1.66, 0.14, 0.191, 0.14, 0.191, 0.25, 0.382],
  ['1-1/2', 1.9, 0.145, 0.2, 0.145, 0.2, 0.281, 0.4],
  ['2', 2.375, 0.154, 0.218, 0.154, 0.218, 0.344, 0.436],
  ['2-1/2', 2.875, 0.203, 0.276, 0.203, 0.276, 0.375, 0.552],
  ['3', 3.5, 0.216, 0.3, 0.216, 0.3, 0.438, 0.6],
  ['3-1/2', 4.0, 0.226, 0.318, 0.226, 0.318, null, null],
  ['4', 4.5, 0.237, 0.337, 0.237, 0.337, 0.531, 0.674],
  ['5', 5.563, 0.258, 0.375, 0.258, 0.375, 0.625, 0.75],
  ['6', 6.625, 0.28, 0.432, 0.28, 0.432, 0.719, 0.864],
  ['8', 8.625, 0.322, 0.5, 0.322, 0.5, 0.906, 0.875],
  ['10', 10.75, 0.365, 0.5, 0.365, 0.594, 1.125, 1.0],
  ['12', 12.75, 0.375, 0.5, 0.406, 0.688, 1.312, 1.0],
  ['14', 14.0, 0.375, 0.5, 0.438, 0.75, 1.406, null],
  ['16', 16.0, 0.375, 0.5, 0.5, 0.844, 1.594, null],
  ['18', 18.0, 0.375, 0.5, 0.562, 0.938, 1.781, null],
  ['20', 20.0, 0.375, 0.5, 0.594, 1.031, 1.969, null],
  ['22', 22.0, 0.375, 0.5, null, 1.125, 2.125, null],
  ['24', 24.0, 0.375, 0.5, 0.688, 1.219, 2.344, null],
  ['30', 30.0, 0.375, 0.5, null, null, null, null],
  ['36', 36.0, 0.375, 0.5, 0.75, null, null, null],
];
const REFERENCE_COLUMNS = ['STD', 'XS', 'Sch 40', 'Sch 80', 'Sch 160', 'XXS'] as const;

describe('ASME B36.10M against REFERENCES.md', () => {
  for (const [nps, odIn, ...walls] of REFERENCE_ROWS) {
    it(`NPS ${nps}: OD ${odIn} in and STD/XS/40/80/160/XXS walls`, () => {
      // ASME B36.10M, recalled (REFERENCES.md)
      const size = findB3610mSize(resolvePipe(`NPS ${nps} STD`).npsIn ?? Number.NaN);
      expect(size?.nps).toBe(nps);
      expectClose(size?.odIn ?? Number.NaN, odIn, TABLE_TOL_IN, `NPS ${nps} OD in`);
      REFERENCE_COLUMNS.forEach((column, i) => {
        const wallIn = walls[i];
        const name = `NPS ${nps} ${column}`;
        if (wallIn === null || wallIn === undefined) {
          expect(girthErrorOf(() => resolvePipe(name)).code, `${name} is not listed`).toBe('UNKNOWN_SCHEDULE');
          return;
        }
        const pipe = resolvePipe(name);
        expect(pipe.label).toBe(name);
        expect(pipe.standard).toBe('ASME B36.10M');
        expectClose(pipe.odMm, odIn * 25.4, MM_TOL + TABLE_TOL_IN * 25.4, `${name} OD mm`);
        expectClose(pipe.wallMm, wallIn * 25.4, TABLE_TOL_IN * 25.4, `${name} wall mm`);
      });
    });
  }

  it('NPS 30 and 36: Sch 10 0.312, Sch 20 0.500, Sch 30 0.625 in', () => {
    // ASME B36.10M, recalled (REFERENCES.md)
    for (const nps of ['30', '36']) {
      expectClose(resolvePipe(`NPS ${nps} Sch 10`).wallMm, 0.312 * 25.4, MM_TOL, `NPS ${nps} Sch 10`);
      expectClose(resolvePipe(`NPS ${nps} Sch 20`).wallMm, 0.5 * 25.4, MM_TOL, `NPS ${nps} Sch 20`);
      expectClose(resolvePipe(`NPS ${nps} Sch 30`).wallMm, 0.625 * 25.4, MM_TOL, `NPS ${nps} Sch 30`);
    }
  });
});

describe('ASME B36.10M invariants over the whole table', () => {
  it('from NPS 14 up the OD equals the NPS', () => {
    // REFERENCES.md: "From NPS 14 up the OD equals the NPS" (ASME B36.10M, recalled).
    const large = ASME_B36_10M.filter((r) => r.npsIn >= 14);
    expect(large.length).toBeGreaterThan(10);
    for (const r of large) expect(r.odIn, `NPS ${r.nps}`).toBe(r.npsIn);
    for (const r of ASME_B36_10M.filter((x) => x.npsIn < 14)) expect(r.odIn, `NPS ${r.nps}`).toBeGreaterThan(r.npsIn);
  });

  it('STD equals Sch 40 through NPS 10, and differs above', () => {
    // REFERENCES.md: "STD = Sch 40 through NPS 10" (ASME B36.10M, recalled).
    for (const r of ASME_B36_10M) {
      const { STD: std, '40': s40 } = r.wallsIn;
      if (r.npsIn <= 10) {
        expect(std, `NPS ${r.nps} STD`).toBeDefined();
        expect(std, `NPS ${r.nps}`).toBe(s40);
      } else if (s40 !== undefined) {
        expect(std, `NPS ${r.nps}`).not.toBe(s40);
      }
    }
  });

  it('XS equals Sch 80 through NPS 8, and differs above', () => {
    // REFERENCES.md: "XS = Sch 80 through NPS 8" (ASME B36.10M, recalled).
    for (const r of ASME_B36_10M) {
      const { XS: xs, '80': s80 } = r.wallsIn;
      if (r.npsIn <= 8) {
        expect(xs, `NPS ${r.nps} XS`).toBeDefined();
        expect(xs, `NPS ${r.nps}`).toBe(s80);
      } else if (s80 !== undefined) {
        expect(xs, `NPS ${r.nps}`).not.toBe(s80);
      }
    }
  });

  it('every size lists STD and XS, sizes and DNs increase, walls are under half the OD', () => {
    // Common practice: every NPS of B36.10M comes in standard and extra-strong weight.
    let previous = 0;
    let previousDn = 0;
    for (const r of ASME_B36_10M) {
      expect(r.wallsIn.STD, `NPS ${r.nps}`).toBeDefined();
      expect(r.wallsIn.XS, `NPS ${r.nps}`).toBeDefined();
      expect(r.npsIn).toBeGreaterThan(previous);
      expect(r.dn).toBeGreaterThan(previousDn);
      previous = r.npsIn;
      previousDn = r.dn;
      for (const [sch, wall] of Object.entries(r.wallsIn)) {
        expect(wall, `NPS ${r.nps} ${sch}`).toBeGreaterThan(0);
        expect(2 * (wall ?? 0), `NPS ${r.nps} ${sch}`).toBeLessThan(r.odIn);
      }
    }
    expect(ASME_B36_10M[0]?.nps).toBe('1/8');
    expect(ASME_B36_10M.at(-1)?.nps).toBe('48');
  });

  it('walls grow with the schedule number, and STD < XS < XXS', () => {
    // Common practice: a higher schedule number of one size has a thicker wall.
    const numbered = B36_10M_SCHEDULE_ORDER.filter((s) => /^\d+$/.test(s));
    for (const r of ASME_B36_10M) {
      const walls = numbered.map((s) => r.wallsIn[s as B3610mSchedule]).filter((w): w is number => w !== undefined);
      for (let i = 1; i < walls.length; i++) expect(walls[i], `NPS ${r.nps} schedules`).toBeGreaterThan(walls[i - 1] ?? 0);
      expect(r.wallsIn.XS ?? 0).toBeGreaterThan(r.wallsIn.STD ?? 0);
      if (r.wallsIn.XXS !== undefined) expect(r.wallsIn.XXS).toBeGreaterThan(r.wallsIn.XS ?? 0);
    }
  });

  it('ID = OD - 2 x wall for every pipe of the table', () => {
    // Common practice (REFERENCES.md): ID = OD - 2 x wall.
    for (const r of ASME_B36_10M) {
      for (const sch of Object.keys(r.wallsIn)) {
        const name = `NPS ${r.nps} ${sch === 'STD' || sch === 'XS' || sch === 'XXS' ? sch : `Sch ${sch}`}`;
        const p = resolvePipe(name);
        expectClose(p.idMm, p.odMm - 2 * p.wallMm, MM_TOL, `${name} ID`);
        expectClose(p.wallMm, (r.wallsIn[sch as B3610mSchedule] ?? Number.NaN) * 25.4, MM_TOL, `${name} wall`);
      }
    }
  });
});
