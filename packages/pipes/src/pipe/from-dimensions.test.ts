import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { girthErrorOf } from '../test-support/girth-error-of.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { DIAMETER_MM, WALL_MM } from '../limits.js';
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

  it('keeps ID = OD - 2 x wall and 0 < wall < OD/2 for any accepted pipe (fast-check; OD and wall within DIAMETER_MM and WALL_MM)', () => {
    fc.assert(
      fc.property(fc.double({ min: DIAMETER_MM.min, max: DIAMETER_MM.max, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (od, t) => {
        const wall = WALL_MM.min + (Math.min(od * 0.4999, WALL_MM.max) - WALL_MM.min) * t;
        const p = pipeFromDimensions(od, wall);
        expect(p.wallMm).toBe(wall);
        expect(p.idMm).toBe(od - 2 * wall);
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
      // Degenerate sizes (limits.ts): a 0.000001 mm pipe gave an all-zero template before these bounds.
      [0.000001, 0.0000001, 'OUT_OF_RANGE', /OD of a custom pipe must be at least 3 mm, got 0\.000001 mm/],
      [2.99, 0.5, 'OUT_OF_RANGE', /at least 3 mm, got 2\.99 mm/],
      [20_000.4, 10, 'OUT_OF_RANGE', /at most 20000 mm, got 20000\.4 mm/],
      [406.4, 0.05, 'OUT_OF_RANGE', /wall of a custom pipe must be at least 0\.1 mm, got 0\.05 mm \(.*foil/],
      [3000, 600, 'OUT_OF_RANGE', /wall of a custom pipe must be at most 500 mm/],
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
