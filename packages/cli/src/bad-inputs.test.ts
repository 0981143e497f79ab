/**
 * Every bad input of the catalog (test-support/bad-inputs.ts) is refused with its
 * stable code and the field as the user wrote it; the message starts with
 * that field, names no internal field (`offsetMm`, `template.cut[0]`), does
 * not print a closed limit as the value it refuses ("84.9 mm may be at most 84.9 mm"; "more than 0°, got 0°" is right), and
 * carries no control character. Nothing is written: every case fails before
 * any file is planned.
 */
import { describe, expect, it } from 'vitest';
import { GirthError } from '@girth/pipes';
import { BAD_JOBS, BAD_OPTIONS, GOOD_JOB } from './test-support/bad-inputs.js';
import { parseJob } from './job/schema.js';
import { planJob } from './job/run-job.js';
import { runCommand } from './run-cli.js';
import { runCaptured } from './test-support/capture.js';

const INTERNAL_NAME = /\b[a-z]+(Mm|Deg|Rad|In)\b|\btemplate\.|\bspec\b/;
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/u;

async function errorOf(run: () => unknown): Promise<GirthError> {
  try {
    await run();
  } catch (error) {
    if (error instanceof GirthError) return error;
    throw new Error(`expected a GirthError, got ${String(error)}`, { cause: error });
  }
  throw new Error('expected a GirthError, nothing was thrown');
}

function checkMessage(error: GirthError): void {
  expect(error.message.startsWith(`${error.field}:`) || error.field === 'command' || error.field === 'job' || error.field === 'arguments', error.message).toBe(true);
  expect(error.message, 'no internal field names').not.toMatch(INTERNAL_NAME);
  expect(CONTROL.test(error.message), 'no raw control characters').toBe(false);
  const same = /must be (?:at least|at most) ([\d.]+ ?\S*), got \1(?:\s|$|\))/.exec(error.message);
  expect(same, `a limit printed as the value: ${error.message}`).toBeNull();
}

describe('the catalog', () => {
  it('holds at least 100 bad inputs, each with a distinct name', () => {
    expect(BAD_OPTIONS.length + BAD_JOBS.length).toBeGreaterThanOrEqual(100);
    expect(new Set(BAD_OPTIONS.map((c) => c.name)).size).toBe(BAD_OPTIONS.length);
    expect(new Set(BAD_JOBS.map((c) => c.name)).size).toBe(BAD_JOBS.length);
  });
});

describe('bad command lines', () => {
  const io = { out: () => undefined, err: () => undefined };
  for (const c of BAD_OPTIONS) {
    it(`${c.name}: ${c.code} on ${c.field}`, async () => {
      const error = await errorOf(() => runCommand(c.argv, io));
      expect([error.code, error.field], error.message).toEqual([c.code, c.field]);
      checkMessage(error);
    });
  }

  it('prints the message with control characters escaped and exits 2', async () => {
    const run = await runCaptured(['cutback', '--pipe', 'NPS 6 STD\u001b[31m', '--angle', '60']);
    expect(run.code).toBe(2);
    expect(CONTROL.test(run.err)).toBe(false);
    expect(run.err).toContain('\\u001B[31m');
  });
});

describe('bad job files', () => {
  for (const c of BAD_JOBS) {
    it(`${c.name}: ${c.code} on ${c.field}`, async () => {
      const error = await errorOf(() => planJob(parseJob(c.job(GOOD_JOB)), '/nowhere'));
      expect([error.code, error.field], error.message).toEqual([c.code, c.field]);
      checkMessage(error);
    });
  }

  it('the good job the cases start from is accepted', () => {
    expect(planJob(parseJob(GOOD_JOB), '/nowhere').results).toHaveLength(1);
  });
});
