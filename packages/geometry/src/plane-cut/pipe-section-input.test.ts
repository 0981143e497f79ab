import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { resolvePipeSection } from './pipe-section-input.js';
import { fitRadiusMm } from './fit-surface.js';
import { expectClose } from './test-support/expect-close.js';

function codeOf(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    if (isGirthError(e)) return `${e.code}:${e.field}`;
    throw e;
  }
  return 'no error';
}

describe('resolvePipeSection', () => {
  it('gives ID = OD − 2 × wall (REFERENCES.md, facts of the trade, common practice)', () => {
    // NPS 8 STD: OD 8.625 in, wall 0.322 in (ASME B36.10M, recalled, REFERENCES.md) -> ID 7.981 in.
    const p = resolvePipeSection({ odMm: 8.625 * 25.4, wallMm: 0.322 * 25.4, label: 'NPS 8 STD', npsIn: 8 });
    expectClose(p.idMm, 7.981 * 25.4, 1e-9, 'ID of NPS 8 STD');
    expect(p.label).toBe('NPS 8 STD');
    expect(p.npsIn).toBe(8);
  });

  it('names an unlabelled pipe by its OD and wall in mm', () => {
    expect(resolvePipeSection({ odMm: 168.3, wallMm: 7.11 }).label).toBe('168.3 mm OD x 7.11 mm wall');
  });

  it('rejects bad pipes with typed errors naming the field', () => {
    expect(codeOf(() => resolvePipeSection(undefined as never))).toBe('EMPTY_INPUT:pipe');
    expect(codeOf(() => resolvePipeSection({ odMm: 0, wallMm: 1 }))).toBe('NEGATIVE:pipe.odMm');
    expect(codeOf(() => resolvePipeSection({ odMm: Number.NaN, wallMm: 1 }))).toBe('NOT_A_NUMBER:pipe.odMm');
    expect(codeOf(() => resolvePipeSection({ odMm: 100, wallMm: Number.POSITIVE_INFINITY }))).toBe('NOT_FINITE:pipe.wallMm');
    expect(codeOf(() => resolvePipeSection({ odMm: 100, wallMm: 50 }))).toBe('WALL_TOO_THICK:pipe.wallMm');
    expect(codeOf(() => resolvePipeSection({ odMm: 100, wallMm: 5, npsIn: -1 }))).toBe('NEGATIVE:pipe.npsIn');
    expect(codeOf(() => resolvePipeSection({ odMm: 100, wallMm: 5, label: 7 as never }))).toBe('BAD_OPTION:pipe.label');
  });
});

describe('fitRadiusMm', () => {
  it('takes the OD or the bore', () => {
    const p = resolvePipeSection({ odMm: 100, wallMm: 5 });
    expect(fitRadiusMm(p, 'od')).toBe(50);
    expect(fitRadiusMm(p, 'id')).toBe(45);
    expect(codeOf(() => fitRadiusMm(p, 'mid' as never))).toBe('BAD_OPTION:fitSurface');
  });
});
