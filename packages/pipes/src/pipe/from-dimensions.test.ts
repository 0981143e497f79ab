import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { girthErrorOf } from '../test-support/girth-error-of.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { pipeFromDimensions } from './from-dimensions.js';

describe('pipeFromDimensions', () => {
  it('makes a custom pipe with ID = OD - 2 x wall', () => {
    // ID = OD - 2 x wall (common practice, REFERENCES.md).
    const p = pipeFromDimensions(406.4, 9.53);
    expect(p).toEqual({ kind: 'pipe', label: '406.4 x 9.53 mm', odMm: 406.4, wallMm: 9.53, idMm: 406.4 - 2 * 9.53, standard: 'custom' });
    expectClose(p.idMm, 387.34, 1e-9, 'ID');
    expect(pipeFromDimensions(273.05, 9.271, '  spool 7 run  ').label).toBe('spool 7 run');
    expect(pipeFromDimensions(100, 3, '').label).toBe('100 x 3 mm');
  });

  it('keeps ID = OD - 2 x wall and 0 < wall < OD/2 for any accepted pipe (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e5, noNaN: true }), fc.double({ min: 1e-6, max: 0.4999, noNaN: true }), (od, share) => {
        const p = pipeFromDimensions(od, od * share);
        expect(p.idMm).toBe(od - 2 * od * share);
        expect(p.idMm).toBeGreaterThan(0);
      }),
    );
  });

  it('refuses bad dimensions with typed errors', () => {
    const cases: ReadonlyArray<readonly [number, number, string, RegExp]> = [
      [Number.NaN, 9.53, 'NOT_A_NUMBER', /OD/],
      [406.4, Number.NaN, 'NOT_A_NUMBER', /wall/],
      [Number.POSITIVE_INFINITY, 9.53, 'NOT_FINITE', /OD/],
      [0, 9.53, 'NEGATIVE', /OD of a custom pipe must be greater than 0 mm/],
      [-406.4, 9.53, 'NEGATIVE', /OD/],
      [406.4, 0, 'NEGATIVE', /wall/],
      [406.4, -1, 'NEGATIVE', /wall/],
      [406.4, 203.2, 'WALL_TOO_THICK', /wall 203.2 mm is half the OD 406.4 mm or more/],
      [406.4, 300, 'WALL_TOO_THICK', /less than 203.2 mm/],
    ];
    for (const [od, wall, code, message] of cases) {
      const e = girthErrorOf(() => pipeFromDimensions(od, wall));
      expect(e.code, `${od} x ${wall}`).toBe(code);
      expect(e.field).toBe('pipe');
      expect(e.message).toMatch(message);
    }
    expect(girthErrorOf(() => pipeFromDimensions(10, 6, undefined, { field: 'header' })).field).toBe('header');
    expect(girthErrorOf(() => pipeFromDimensions('406.4' as unknown as number, 9.53)).code).toBe('NOT_A_NUMBER');
  });
});
