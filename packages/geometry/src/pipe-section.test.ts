import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { resolvePipeSection } from './pipe-section.js';
import { expectClose } from './internal/test-support/expect-close.js';

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
    expect(p.kind).toBe('pipe-section');
    expect(p.label).toBe('NPS 8 STD');
    expect(p.npsIn).toBe(8);
  });

  it('names an unlabelled pipe by its OD and wall in mm, and leaves out a nominal size not given', () => {
    const p = resolvePipeSection({ odMm: 168.3, wallMm: 7.11 });
    expect(p.label).toBe('168.3 mm OD x 7.11 mm wall');
    expect('npsIn' in p).toBe(false);
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

  it('names the field it is given (header, branch) and states the wall limit in both units', () => {
    expect(codeOf(() => resolvePipeSection(null as never, 'header'))).toBe('EMPTY_INPUT:header');
    expect(codeOf(() => resolvePipeSection({ odMm: 'x' as never, wallMm: 5 }, 'branch'))).toBe('NOT_A_NUMBER:branch.odMm');
    // 1 in = 25.4 mm by definition (NIST SP 811; common practice): a 2 in OD allows a wall below 1 in.
    expect(() => resolvePipeSection({ odMm: 50.8, wallMm: 25.4 }, 'branch')).toThrow(
      'branch.wallMm: a wall of 25.4 mm (1.000 in) leaves no bore in OD 50.8 mm (2.000 in); the wall must be less than 25.4 mm (1.000 in)',
    );
  });
});
