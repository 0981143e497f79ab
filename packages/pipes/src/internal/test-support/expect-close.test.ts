import { describe, expect, it } from 'vitest';
import { expectClose } from './expect-close.js';

describe('expectClose', () => {
  it('passes values within the tolerance and fails others', () => {
    expect(() => expectClose(2.0004, 2, 1e-3, 'v')).not.toThrow();
    expect(() => expectClose(2.01, 2, 1e-3, 'wall')).toThrow(/wall: got 2.01, expected 2/);
  });

  it('never passes NaN', () => {
    expect(() => expectClose(Number.NaN, 0, 1, 'x')).toThrow(/NaN never passes/);
    expect(() => expectClose(0, 0, Number.NaN, 'x')).toThrow(/tolerance/);
  });
});
