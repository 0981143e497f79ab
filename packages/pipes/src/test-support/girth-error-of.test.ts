import { describe, expect, it } from 'vitest';
import { GirthError } from '../errors.js';
import { expectGirthError, girthErrorOf } from './girth-error-of.js';

const refuse = (): never => {
  throw new GirthError('OUT_OF_RANGE', 'angleDeg', 'angleDeg: the angle must be more than 0° and at most 90°, got 0°', 0);
};

describe('girthErrorOf', () => {
  it('returns the very GirthError the function throws', () => {
    let thrown: unknown;
    const e = girthErrorOf(() => {
      try {
        refuse();
      } catch (err) {
        thrown = err;
        throw err;
      }
    });
    expect(e).toBe(thrown);
    expect(e.code).toBe('OUT_OF_RANGE');
    expect(e.field).toBe('angleDeg');
  });

  it('fails when nothing is thrown', () => {
    expect(() => girthErrorOf(() => 42)).toThrowError('expected a GirthError, nothing was thrown');
  });

  it('fails when something else is thrown, naming it and keeping it as the cause', () => {
    const other = new RangeError('index 7 out of range');
    let failure: unknown;
    try {
      girthErrorOf(() => {
        throw other;
      });
    } catch (err) {
      failure = err;
    }
    expect(failure).toBeInstanceOf(Error);
    expect(failure).not.toBeInstanceOf(GirthError);
    expect((failure as Error).message).toBe('expected a GirthError, got RangeError: index 7 out of range');
    expect((failure as Error).cause).toBe(other);
    expect(() =>
      girthErrorOf(() => {
        throw 'plain text';
      }),
    ).toThrowError('expected a GirthError, got string plain text');
  });
});

describe('expectGirthError', () => {
  it('returns the error when code and field match, and checks the code alone when no field is given', () => {
    expect(expectGirthError(refuse, 'OUT_OF_RANGE', 'angleDeg').value).toBe(0);
    expect(expectGirthError(refuse, 'OUT_OF_RANGE').field).toBe('angleDeg');
  });

  it('fails on another code or another field, naming both', () => {
    expect(() => expectGirthError(refuse, 'NEGATIVE', 'angleDeg')).toThrowError(/^expected GirthError NEGATIVE on angleDeg, got OUT_OF_RANGE on angleDeg \(angleDeg: /);
    expect(() => expectGirthError(refuse, 'OUT_OF_RANGE', 'gapMm')).toThrowError(/^expected GirthError OUT_OF_RANGE on gapMm, got OUT_OF_RANGE on angleDeg/);
    expect(() => expectGirthError(refuse, 'NOT_A_NUMBER')).toThrowError(/^expected GirthError NOT_A_NUMBER, got OUT_OF_RANGE on angleDeg/);
  });

  it('fails as girthErrorOf does when nothing or something else is thrown', () => {
    expect(() => expectGirthError(() => undefined, 'OUT_OF_RANGE', 'angleDeg')).toThrowError('expected a GirthError, nothing was thrown');
    expect(() =>
      expectGirthError(() => {
        throw new TypeError('x is not a function');
      }, 'OUT_OF_RANGE'),
    ).toThrowError('expected a GirthError, got TypeError: x is not a function');
  });
});
