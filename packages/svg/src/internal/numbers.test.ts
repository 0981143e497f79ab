import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { GirthError } from '@girth/pipes';
import { numberWriter } from './numbers.js';

describe('numberWriter', () => {
  test('mm: 0.001 mm, no -0, no exponent', () => {
    const w = numberWriter('mm');
    expect(w.len(528.65234)).toBe('528.652');
    expect(w.len(-0.0004)).toBe('0');
    expect(w.len(1e-9)).toBe('0');
    expect(w.len(999999.9999)).toBe('1000000');
  });

  test('in: 25.4 mm is exactly 1 in (definition of the inch), 5 decimals', () => {
    const w = numberWriter('in');
    expect(w.len(25.4)).toBe('1');
    expect(w.len(100)).toBe('3.93701');
  });

  test('refuses non-finite numbers with a GirthError', () => {
    expect(() => numberWriter('mm').len(NaN)).toThrow(GirthError);
  });

  test('never more than 0.0005 mm off, and reads back as a number', () => {
    const w = numberWriter('mm');
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (v) => {
        const s = w.len(v);
        expect(s).toMatch(/^-?\d+(\.\d{1,3})?$/);
        expect(Math.abs(Number(s) - v)).toBeLessThanOrEqual(0.0005 + 1e-9);
      }),
    );
  });
});
