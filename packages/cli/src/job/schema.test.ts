/**
 * The job file schema: the demo job passes; every mistake is a GirthError
 * with the code the command line gives for the same kind of mistake
 * (codes.ts in @girth/pipes) and a field that is the path of the bad value, as a fitter would look
 * for it in the file (`pieces[1].header`).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { GirthError } from '@girth/pipes';
import { fieldPath, parseJob } from './schema.js';
import { DEMO_JOB } from '../test-support/paths.js';

function demo(): Record<string, unknown> & { pieces: Record<string, unknown>[] } {
  return JSON.parse(readFileSync(DEMO_JOB, 'utf8')) as Record<string, unknown> & { pieces: Record<string, unknown>[] };
}

/** The GirthError parseJob throws for `data`. */
function jobError(data: unknown): GirthError {
  try {
    parseJob(data);
  } catch (error) {
    expect(error).toBeInstanceOf(GirthError);
    return error as GirthError;
  }
  throw new Error('parseJob accepted it');
}

describe('parseJob', () => {
  it('accepts the demo job as written', () => {
    const job = parseJob(demo());
    expect(job.units).toBe('in');
    expect(job.pieces.map((p) => p.joint)).toEqual(['branch', 'branch', 'branch', 'miter', 'cutback', 'reducer']);
  });

  it('accepts the smallest job: a title, units and one piece', () => {
    const job = parseJob({ job: 'J', units: 'mm', pieces: [{ piece: 'P', joint: 'cutback', pipe: 'DN 150 x 7.1', angle: 60 }] });
    expect(job.pieces).toHaveLength(1);
  });

  const cases: readonly { readonly name: string; readonly edit: (j: ReturnType<typeof demo>) => unknown; readonly field: string; readonly code: string }[] = [
    { name: 'a missing units', edit: (j) => ({ ...j, units: undefined }), field: 'units', code: 'MISSING_INPUT' },
    { name: 'an unknown unit', edit: (j) => ({ ...j, units: 'ft' }), field: 'units', code: 'BAD_CHOICE' },
    { name: 'an unknown key on the job', edit: (j) => ({ ...j, colour: 'red' }), field: 'colour', code: 'BAD_JOB' },
    { name: 'an unknown key on a piece', edit: (j) => ({ ...j, pieces: j.pieces.map((p, i) => (i === 2 ? { ...p, colour: 'red' } : p)) }), field: 'pieces[2].colour', code: 'BAD_JOB' },
    { name: 'an unknown joint', edit: (j) => ({ ...j, pieces: j.pieces.map((p, i) => (i === 0 ? { ...p, joint: 'wye' } : p)) }), field: 'pieces[0].joint', code: 'BAD_CHOICE' },
    { name: 'a bend written as text', edit: (j) => ({ ...j, pieces: j.pieces.map((p, i) => (i === 3 ? { ...p, bend: '90' } : p)) }), field: 'pieces[3].bend', code: 'NOT_A_NUMBER' },
    { name: 'a missing piece label', edit: (j) => ({ ...j, pieces: j.pieces.map((p, i) => (i === 4 ? { ...p, piece: undefined } : p)) }), field: 'pieces[4].piece', code: 'MISSING_INPUT' },
    { name: 'a fit that is not set-on or set-in', edit: (j) => ({ ...j, pieces: j.pieces.map((p, i) => (i === 0 ? { ...p, fit: 'welded' } : p)) }), field: 'pieces[0].fit', code: 'BAD_CHOICE' },
    { name: 'no pieces', edit: (j) => ({ ...j, pieces: [] }), field: 'pieces', code: 'MISSING_INPUT' },
    { name: 'a piece that is not an object', edit: (j) => ({ ...j, pieces: ['tee'] }), field: 'pieces[0]', code: 'BAD_JOB' },
    { name: 'too few stations', edit: (j) => ({ ...j, stations: 3 }), field: 'stations', code: 'OUT_OF_RANGE' },
    { name: 'a fraction of 1/4 in', edit: (j) => ({ ...j, fraction: 4 }), field: 'fraction', code: 'BAD_CHOICE' },
    { name: 'an unknown output kind', edit: (j) => ({ ...j, outputs: ['svg', 'pdf'] }), field: 'outputs[1]', code: 'BAD_CHOICE' },
  ];

  for (const c of cases) {
    it(`names the field of ${c.name}: ${c.field}`, () => {
      const error = jobError(c.edit(demo()));
      expect(error.code).toBe(c.code);
      expect(error.field).toBe(c.field);
      expect(error.message.startsWith(`${c.field}: `), error.message).toBe(true);
    });
  }

  it('an unknown job key is answered with the keys a job takes', () => {
    const error = jobError({ ...demo(), unit: 'in' });
    expect(error.field).toBe('unit');
    expect(error.message).toMatch(/job, units, stations, .*pieces/);
  });

  it('a job that is not an object is named as the job', () => {
    for (const data of [null, [], 'job', 42]) {
      const error = jobError(data);
      expect(error.code).toBe('BAD_JOB');
      expect(error.field).toBe('job');
    }
  });
});

describe('fieldPath', () => {
  it('writes a path as it is read in the file', () => {
    expect(fieldPath(['pieces', 2, 'header'])).toBe('pieces[2].header');
    expect(fieldPath(['outputs', 0])).toBe('outputs[0]');
    expect(fieldPath(['units'])).toBe('units');
    expect(fieldPath([])).toBe('job');
  });
});
