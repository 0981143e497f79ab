import { describe, expect, it } from 'vitest';
import { expectClose, findFirstMismatch } from './expect-close.js';

describe('expectClose', () => {
  it('accepts values within the tolerance (invariant: |a - e| <= tol passes)', () => {
    expect(() => expectClose([1, 2, 3], [1, 2 + 1e-10, 3], 1e-9, 'near')).not.toThrow();
    expect(() => expectClose(5, 5.05, 0.1, 'scalar')).not.toThrow();
  });

  it('names the first index that differs, both values and the tolerance', () => {
    const m = findFirstMismatch([1, 2, 3, 4], [1, 2, 3.5, 9], 0.1, 'cutback');
    expect(m?.index).toBe(2);
    expect(m?.actual).toBe(3);
    expect(m?.expected).toBe(3.5);
    expect(() => expectClose([1, 2, 3, 4], [1, 2, 3.5, 9], 0.1, 'cutback')).toThrow(/cutback\[2\]: got 3, expected 3.5.*tolerance 0.1/);
  });

  it('never lets NaN pass, and reports a length mismatch', () => {
    expect(() => expectClose(Number.NaN, Number.NaN, 1, 'nan')).toThrow(/nan/);
    expect(() => expectClose([1, Number.NaN], [1, 0], 1e6, 'nan-in-array')).toThrow(/\[1\]/);
    expect(() => expectClose([1, 2], [1], 1, 'len')).toThrow(/length 2, expected 1/);
  });

  it('refuses a negative or non-finite tolerance', () => {
    expect(() => expectClose(1, 1, -1, 'neg')).toThrow(/tolerance/);
    expect(() => expectClose(1, 1, Number.POSITIVE_INFINITY, 'inf')).toThrow(/tolerance/);
  });
});
