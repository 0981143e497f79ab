import { describe, expect, it } from 'vitest';
import { resolvePipeSection } from './pipe-section.js';
import { expectClose } from './internal/test-support/expect-close.js';

/** A GirthError with this code and field (any message). */
const girthError = (code: string, field: string) => expect.objectContaining({ name: 'GirthError', code, field });

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
    expect(() => resolvePipeSection(undefined as never)).toThrow(girthError('EMPTY_INPUT', 'pipe'));
    expect(() => resolvePipeSection({ odMm: 0, wallMm: 1 })).toThrow(girthError('NEGATIVE', 'pipe.odMm'));
    expect(() => resolvePipeSection({ odMm: Number.NaN, wallMm: 1 })).toThrow(girthError('NOT_A_NUMBER', 'pipe.odMm'));
    expect(() => resolvePipeSection({ odMm: 100, wallMm: Number.POSITIVE_INFINITY })).toThrow(girthError('NOT_FINITE', 'pipe.wallMm'));
    expect(() => resolvePipeSection({ odMm: 100, wallMm: 50 })).toThrow(girthError('WALL_TOO_THICK', 'pipe.wallMm'));
    expect(() => resolvePipeSection({ odMm: 100, wallMm: 5, npsIn: -1 })).toThrow(girthError('NEGATIVE', 'pipe.npsIn'));
    expect(() => resolvePipeSection({ odMm: 100, wallMm: 5, label: 7 as never })).toThrow(girthError('BAD_OPTION', 'pipe.label'));
  });

  it('names the field it is given (header, branch) and states the wall limit in both units', () => {
    expect(() => resolvePipeSection(null as never, 'header')).toThrow(girthError('EMPTY_INPUT', 'header'));
    expect(() => resolvePipeSection({ odMm: 'x' as never, wallMm: 5 }, 'branch')).toThrow(girthError('NOT_A_NUMBER', 'branch.odMm'));
    // 1 in = 25.4 mm by definition (NIST SP 811; common practice): a 2 in OD allows a wall below 1 in.
    expect(() => resolvePipeSection({ odMm: 50.8, wallMm: 25.4 }, 'branch')).toThrow(
      'branch.wallMm: a wall of 25.4 mm (1.000 in) leaves no bore in OD 50.8 mm (2.000 in); the wall must be less than 25.4 mm (1.000 in)',
    );
  });
});
