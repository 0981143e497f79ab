import { describe, expect, it } from 'vitest';
import { GirthError } from '../errors.js';
import { expectGirthError } from '../test-support/girth-error-of.js';
import { dnSizes, npsSizes, pipesForNps, schedulesFor } from './schedules-for.js';
import { resolvePipe } from './resolve.js';

describe('schedulesFor', () => {
  it('lists the schedules of a size, carbon first, in the standards’ order', () => {
    // ASME B36.10M and B36.19M, recalled (REFERENCES.md): NPS 3-1/2 has no Sch 160
    // or XXS; 5S/10S and 40S/80S exist for it.
    expect(schedulesFor('3-1/2')).toEqual(['Sch 10', 'Sch 30', 'Sch 40', 'Sch 80', 'STD', 'XS', 'Sch 5S', 'Sch 10S', 'Sch 40S', 'Sch 80S']);
    // NPS 30: Sch 10, 20, 30, STD, XS (REFERENCES.md) and 5S/10S (B36.19M).
    expect(schedulesFor('NPS 30')).toEqual(['Sch 10', 'Sch 20', 'Sch 30', 'STD', 'XS', 'Sch 5S', 'Sch 10S']);
  });

  it('reads the size however it is written', () => {
    const expected = schedulesFor('1-1/2');
    for (const nps of ['1 1/2', '1 1/2"', '1.5', 'NPS 1-1/2', 'nps 1.5in']) expect(schedulesFor(nps)).toEqual(expected);
  });

  it('lists only schedules resolvePipe accepts for the size', () => {
    for (const nps of npsSizes()) {
      const names = schedulesFor(nps);
      expect(names.length, `NPS ${nps}`).toBeGreaterThanOrEqual(2);
      for (const sch of names) expect(resolvePipe(`NPS ${nps} ${sch}`).schedule).toBe(sch);
    }
  });

  it('refuses sizes that are not there, with typed errors on field nps', () => {
    expectGirthError(() => schedulesFor('7'), 'UNKNOWN_SIZE');
    expectGirthError(() => schedulesFor('sixteen'), 'BAD_PIPE_NAME');
    expectGirthError(() => schedulesFor('16 std'), 'BAD_PIPE_NAME');
    try {
      schedulesFor('7');
    } catch (e) {
      expect((e as GirthError).field).toBe('nps');
      expect((e as GirthError).message).toMatch(/NPS 6, NPS 8/);
    }
  });
});

describe('pipesForNps, npsSizes, dnSizes', () => {
  it('gives one pipe per listed schedule, thinnest walls first within each standard', () => {
    const pipes = pipesForNps('16');
    expect(pipes.map((p) => p.schedule)).toEqual(schedulesFor('16'));
    for (const p of pipes) expect(p.odMm).toBe(406.4); // NPS 16 OD = 16 in (REFERENCES.md)
  });

  it('lists NPS 1/8 to 48 and DN 15 to 1200', () => {
    expect(npsSizes()[0]).toBe('1/8');
    expect(npsSizes().at(-1)).toBe('48');
    expect(npsSizes()).toContain('3-1/2');
    expect(dnSizes()[0]).toBe(15);
    expect(dnSizes().at(-1)).toBe(1200);
  });
});
