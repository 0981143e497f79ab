import { describe, expect, it } from 'vitest';
import { expectClose } from './expect-close.js';

describe('expectClose', () => {
  it('passes values within the tolerance', () => {
    expect(() => expectClose([1, 2.0004], [1, 2], 1e-3, 'v')).not.toThrow();
    expect(() => expectClose(5, 5.01, 0.02, 'v')).not.toThrow();
  });

  it('names the first index that differs', () => {
    expect(() => expectClose([1, 2, 3.5, 9], [1, 2, 3, 4], 0.1, 'cutback')).toThrow(/cutback at index 2: got 3.5, expected 3/);
  });

  it('never passes NaN, and checks lengths', () => {
    expect(() => expectClose(Number.NaN, 0, 1, 'x')).toThrow(/x: got NaN/);
    expect(() => expectClose([1], [1, 2], 1, 'y')).toThrow(/length 1, expected 2/);
  });
});
