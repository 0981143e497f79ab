/**
 * The typed error an async file operation rejects with, for tests.
 */
import { GirthError } from '@girth/pipes';
import { expect } from 'vitest';

/**
 * The GirthError a promise rejects with; fails the test when it resolves or
 * rejects with anything else.
 * @example expect((await girthError(readJobFile('missing.json'))).code).toBe('CANNOT_READ')
 */
export async function girthError(promise: Promise<unknown>): Promise<GirthError> {
  try {
    await promise;
  } catch (error) {
    expect(error).toBeInstanceOf(GirthError);
    return error as GirthError;
  }
  throw new Error('expected a GirthError, but it resolved');
}
