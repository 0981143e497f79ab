import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ASME_B36_10M } from '../catalog/asme-b36-10m.js';
import { EN_10220 } from '../catalog/en-10220.js';
import { GirthError } from '../errors.js';
import { girthErrorOf } from '../test-support/girth-error-of.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { resolvePipe } from './resolve.js';
import { pipesForNps } from './schedules-for.js';

const IN = 25.4;
const MM_TOL = 1e-9;

describe('resolvePipe: what a fitter types', () => {
  // Dimensions: ASME B36.10M / B36.19M, recalled (REFERENCES.md), in inches x 25.4;
  // EN 10220 OD recalled (REFERENCES.md).
  const cases: ReadonlyArray<readonly [string, string, number, number, string]> = [
    ['NPS 16 STD', 'NPS 16 STD', 16 * IN, 0.375 * IN, 'ASME B36.10M'],
    ['16" sch 40', 'NPS 16 Sch 40', 16 * IN, 0.5 * IN, 'ASME B36.10M'],
    ['16 sch40', 'NPS 16 Sch 40', 16 * IN, 0.5 * IN, 'ASME B36.10M'],
    ['16in Schedule 40', 'NPS 16 Sch 40', 16 * IN, 0.5 * IN, 'ASME B36.10M'],
    ['NPS 1-1/2 XS', 'NPS 1-1/2 XS', 1.9 * IN, 0.2 * IN, 'ASME B36.10M'],
    ['1 1/2" xs', 'NPS 1-1/2 XS', 1.9 * IN, 0.2 * IN, 'ASME B36.10M'],
    ['1½" XH', 'NPS 1-1/2 XS', 1.9 * IN, 0.2 * IN, 'ASME B36.10M'],
    ['1.5 XXS', 'NPS 1-1/2 XXS', 1.9 * IN, 0.4 * IN, 'ASME B36.10M'],
    ['NPS 6 sch 80', 'NPS 6 Sch 80', 6.625 * IN, 0.432 * IN, 'ASME B36.10M'],
    ['nps6 SCH-80', 'NPS 6 Sch 80', 6.625 * IN, 0.432 * IN, 'ASME B36.10M'],
    ['6" 80S', 'NPS 6 Sch 80S', 6.625 * IN, 0.432 * IN, 'ASME B36.19M'],
    ['NPS 4 Sch 10S', 'NPS 4 Sch 10S', 4.5 * IN, 0.12 * IN, 'ASME B36.19M'],
    ['4 sch 10s', 'NPS 4 Sch 10S', 4.5 * IN, 0.12 * IN, 'ASME B36.19M'],
    ['NPS 12 40S', 'NPS 12 Sch 40S', 12.75 * IN, 0.375 * IN, 'ASME B36.19M'],
    ['NPS 12 Sch 40', 'NPS 12 Sch 40', 12.75 * IN, 0.406 * IN, 'ASME B36.10M'],
    ['3/4 std wt', 'NPS 3/4 STD', 1.05 * IN, 0.113 * IN, 'ASME B36.10M'],
    ['.5 Sch 160', 'NPS 1/2 Sch 160', 0.84 * IN, 0.188 * IN, 'ASME B36.10M'],
    ['DN 150 x 7.1', 'DN 150 x 7.1', 168.3, 7.1, 'EN 10220'],
    ['DN150x7.1', 'DN 150 x 7.1', 168.3, 7.1, 'EN 10220'],
    ['dn 150 × 7.1 mm', 'DN 150 x 7.1', 168.3, 7.1, 'EN 10220'],
    ['DN 65 x 5', 'DN 65 x 5', 76.1, 5, 'EN 10220'],
    ['DN 65 Sch 40', 'NPS 2-1/2 Sch 40', 2.875 * IN, 0.203 * IN, 'ASME B36.10M'],
    ['NPS 6 x 0.5in', 'NPS 6 x 0.500 in', 6.625 * IN, 12.7, 'ASME B36.10M'],
    ['NPS 6 x 12.7', 'NPS 6 x 12.7 mm', 6.625 * IN, 12.7, 'ASME B36.10M'],
    ['406.4x9.53mm', '406.4 x 9.53 mm', 406.4, 9.53, 'custom'],
    ['406.4 x 9.53', '406.4 x 9.53 mm', 406.4, 9.53, 'custom'],
    ['40.64cm x 0.953', '406.4 x 9.53 mm', 406.4, 9.53, 'custom'],
    ['24" OD x 3/8"', '24.000 OD x 0.375 in', 24 * IN, 0.375 * IN, 'custom'],
    ['24 od x .375 in', '24.000 OD x 0.375 in', 24 * IN, 0.375 * IN, 'custom'],
    ['16in x 0.5in', '16.000 OD x 0.500 in', 16 * IN, 0.5 * IN, 'custom'],
    ['OD 273 x 6.35 wall', '273 x 6.35 mm', 273, 6.35, 'custom'],
  ];
  for (const [text, label, odMm, wallMm, standard] of cases) {
    it(`reads ${JSON.stringify(text)} as ${label}`, () => {
      const p = resolvePipe(text);
      expect(p.kind).toBe('pipe');
      expect(p.label).toBe(label);
      expect(p.standard).toBe(standard);
      expectClose(p.odMm, odMm, MM_TOL, `${text} OD`);
      expectClose(p.wallMm, wallMm, MM_TOL, `${text} wall`);
      expectClose(p.idMm, odMm - 2 * wallMm, 1e-8, `${text} ID`); // ID = OD - 2 x wall (common practice)
    });
  }

  it('reads a bare OD x wall in the job unit', () => {
    const p = resolvePipe('24 od x .375', { unit: 'in' });
    expect(p.label).toBe('24.000 OD x 0.375 in');
    expectClose(p.odMm, 609.6, MM_TOL, 'OD');
    expect(resolvePipe('24 od x .375').label).toBe('24 x 0.375 mm');
    // A mark on one side carries to the bare side, whatever the job unit.
    expectClose(resolvePipe('406.4 x 9.53mm', { unit: 'in' }).odMm, 406.4, MM_TOL, 'mm carried');
    expectClose(resolvePipe('16 x 1/2"').odMm, 406.4, MM_TOL, 'in carried');
    // EN 10220 walls are millimetres, even in an inch job.
    expectClose(resolvePipe('DN 150 x 7.1', { unit: 'in' }).wallMm, 7.1, MM_TOL, 'DN wall');
    expectClose(resolvePipe('NPS 6 x 0.5', { unit: 'in' }).wallMm, 12.7, MM_TOL, 'NPS wall in inch job');
  });

  it('carries NPS, its value in inches, DN and schedule', () => {
    const p = resolvePipe('NPS 1-1/2 XS');
    expect(p).toMatchObject({ nps: '1-1/2', npsIn: 1.5, dn: 40, schedule: 'XS' });
    // ASME B16.9 long-radius elbow: centre to end 1.5 x NPS (REFERENCES.md): the
    // number callers use for it.
    expect(1.5 * (resolvePipe('NPS 6 Sch 40').npsIn ?? Number.NaN)).toBe(9);
    expect(resolvePipe('NPS 3/4 STD').npsIn).toBe(0.75);
    expect(resolvePipe('DN 150 Sch 40')).toMatchObject({ nps: '6', dn: 150, schedule: 'Sch 40' });
    const custom = resolvePipe('406.4 x 9.53');
    expect(custom.nps).toBeUndefined();
    expect(custom.schedule).toBeUndefined();
    expect('nps' in custom).toBe(false);
  });
});

describe('resolvePipe: labels read back to the same pipe', () => {
  it('for every catalog pipe', () => {
    let count = 0;
    for (const size of ASME_B36_10M) {
      for (const p of pipesForNps(size.nps)) {
        expect(resolvePipe(p.label)).toEqual(p);
        count++;
      }
    }
    expect(count).toBeGreaterThan(300);
    for (const r of EN_10220) {
      const p = resolvePipe(`DN ${r.dn} x 4.5`);
      expect(resolvePipe(p.label)).toEqual(p);
    }
  });

  it('for custom pipes, to the label’s resolution (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 0.01, max: 0.49, noNaN: true }),
        fc.constantFrom<'mm' | 'in'>('mm', 'in'),
        (odMm, wallShare, unit) => {
          const wallMm = odMm * wallShare;
          const text = unit === 'mm' ? `${odMm} x ${wallMm}` : `${odMm / IN}" x ${wallMm / IN}"`;
          let first;
          try {
            first = resolvePipe(text);
          } catch (e) {
            // Only a wall that rounds to nothing may fail, and then with a typed error.
            expect(e).toBeInstanceOf(GirthError);
            return;
          }
          expectClose(first.odMm, odMm, 1e-9 * odMm, 'OD');
          expectClose(first.wallMm, wallMm, 1e-9 * odMm, 'wall');
          let again;
          try {
            again = resolvePipe(first.label);
          } catch (e) {
            expect(e).toBeInstanceOf(GirthError);
            // The label is rounded: a wall that rounds to nothing, or an OD at the 3 mm limit that rounds just under it.
            expect((e as GirthError).code).toMatch(/NEGATIVE|WALL_TOO_THICK|OUT_OF_RANGE/);
            return;
          }
          const resolution = unit === 'mm' ? 0.0005 : 0.0005 * IN;
          expectClose(again.odMm, odMm, resolution + 1e-9 * odMm, `${first.label} OD`);
          expectClose(again.wallMm, wallMm, resolution + 1e-9 * odMm, `${first.label} wall`);
          expect(again.label).toBe(first.label);
        },
      ),
      { numRuns: 1000 },
    );
  });
});

describe('resolvePipe: bad input gets a typed error naming the field', () => {
  const cases: ReadonlyArray<readonly [string, string, RegExp]> = [
    ['', 'EMPTY_INPUT', /no pipe given/],
    ['   ', 'EMPTY_INPUT', /no pipe given/],
    ['banana', 'BAD_PIPE_NAME', /NPS 16 STD, 6" sch 80/],
    ['NPS', 'BAD_PIPE_NAME', /no size after NPS/],
    ['16 heavy', 'BAD_PIPE_NAME', /"heavy" is not a schedule; NPS 16 comes in Sch 10/],
    ['16 40', 'BAD_PIPE_NAME', /"40" is not a schedule/],
    ['406.4 x nine', 'BAD_PIPE_NAME', /the wall "nine" is not a length/],
    ['NPS 7 STD', 'UNKNOWN_SIZE', /NPS 7 is not a size of ASME B36.10M; nearby sizes: NPS 6, NPS 8/],
    ['NPS 50 STD', 'UNKNOWN_SIZE', /nearby sizes: NPS 48/],
    ['2.25 sch 40', 'UNKNOWN_SIZE', /NPS 2, NPS 2-1\/2/],
    ['DN 175 x 5', 'UNKNOWN_SIZE', /DN 175 is not a size of EN 10220 series 1; nearby sizes: DN 150, DN 200/],
    ['DN 175 sch 40', 'UNKNOWN_SIZE', /DN 150, DN 200/],
    ['NPS 3-1/2 XXS', 'UNKNOWN_SCHEDULE', /NPS 3-1\/2 has no XXS .* it comes in Sch 10, Sch 30, Sch 40, Sch 80, STD, XS, Sch 5S/],
    ['NPS 16 sch 45', 'UNKNOWN_SCHEDULE', /NPS 16 has no "sch 45"/],
    ['NPS 16 XXS', 'UNKNOWN_SCHEDULE', /NPS 16 has no XXS/],
    ['NPS 1/4 5S', 'UNKNOWN_SCHEDULE', /NPS 1\/4 has no Sch 5S/],
    ['NPS 26 10S', 'UNKNOWN_SCHEDULE', /NPS 26 has no Sch 10S/],
    ['NPS 16', 'MISSING_SCHEDULE', /gives no schedule or wall; NPS 16 comes in/],
    ['DN 150', 'MISSING_SCHEDULE', /DN 150 x 7.1 .*DN 150 is NPS 6/],
    ['10 x 5', 'WALL_TOO_THICK', /wall 5 mm is half the OD 10 mm or more/],
    ['DN 15 x 11', 'WALL_TOO_THICK', /less than 10.65 mm/],
    ['NPS 1/8 x 1/4in', 'WALL_TOO_THICK', /half the OD/],
    ['-406.4 x 9.53', 'NEGATIVE', /OD .*must not be negative/],
    ['406.4 x -9.53', 'NEGATIVE', /wall .*must not be negative/],
    ['406.4 x 0', 'NEGATIVE', /the wall of 406.4 x 0 mm must be greater than 0/],
    ['0 x 0', 'NEGATIVE', /OD/],
    ['1/0 x 1', 'DIVIDE_BY_ZERO', /divides by zero/],
    ['406.4 inn x 9.53', 'UNKNOWN_UNIT', /did you mean in\?/],
    ['406.4 x 9.53 mmm', 'UNKNOWN_UNIT', /did you mean mm\?/],
    [`${'9'.repeat(400)} x 1`, 'NOT_FINITE', /too large/],
  ];
  for (const [text, code, message] of cases) {
    it(`refuses ${JSON.stringify(text)} with ${code}`, () => {
      const e = girthErrorOf(() => resolvePipe(text));
      expect(e.code).toBe(code);
      expect(e.field).toBe('pipe');
      expect(e.message).toMatch(/^pipe: /);
      expect(e.message).toMatch(message);
    });
  }

  it('uses the caller’s field name', () => {
    for (const text of ['', 'banana', 'NPS 7 STD', 'NPS 16 XXS', '10 x 5', '406.4 x 0', '12 inn x 1']) {
      const e = girthErrorOf(() => resolvePipe(text, { field: 'jobs[1].branch' }));
      expect(e.field).toBe('jobs[1].branch');
      expect(e.message.startsWith('jobs[1].branch: ')).toBe(true);
    }
  });

  it('refuses non-text input with a typed error', () => {
    expect(girthErrorOf(() => resolvePipe(42 as unknown as string)).code).toBe('BAD_PIPE_NAME');
  });

  it('never returns NaN or throws anything but GirthError for any text (fast-check)', () => {
    const pieces = fc.constantFrom('nps', 'dn', ' ', 'x', '1', '6', '16', '/', '-', '.', '"', "'", 'sch', '40', 's', 'xs', 'std', 'mm', 'in', 'od', '0', '1/2');
    fc.assert(
      fc.property(fc.oneof(fc.string({ maxLength: 20 }), fc.array(pieces, { maxLength: 8 }).map((a) => a.join(''))), (text) => {
        try {
          const p = resolvePipe(text);
          for (const v of [p.odMm, p.wallMm, p.idMm]) expect(Number.isFinite(v)).toBe(true);
          expect(p.wallMm).toBeGreaterThan(0);
          expect(2 * p.wallMm).toBeLessThan(p.odMm);
          expect(p.idMm).toBeGreaterThan(0);
        } catch (e) {
          expect(e).toBeInstanceOf(GirthError);
        }
      }),
      { numRuns: 3000 },
    );
  });
});
