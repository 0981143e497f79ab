import { GirthError } from '@girth/pipes';
import { describe, expect, it } from 'vitest';
import { initialState } from './page-state.js';
import { problemOf, readForm } from './read-form.js';

describe('readForm', () => {
  it('keeps pipes and lengths as text and numbers as numbers, leaving blanks out (the job file\'s keys)', () => {
    const state = { ...initialState('branch'), fields: { header: ' 16 std ', branch: '8 std', angle: '60', offset: '1 1/2', gap: '', fit: 'set-in', branchSurface: '', headerSurface: '' } };
    const reading = readForm(state);
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    expect(reading.input).toEqual({ joint: 'branch', header: '16 std', branch: '8 std', angle: 60, offset: '1 1/2', fit: 'set-in' });
    expect(reading.ctx.stations).toBe(16);
    expect(reading.tableFormat).toBe('ft-in');
  });

  it('refuses a number field that is not a plain number, and stations out of 4 to 360, naming each field', () => {
    const state = { ...initialState('cutback'), stations: '2', fields: { pipe: '6 std', angle: '0x10', gap: '', surface: '' } };
    const reading = readForm(state);
    expect(reading.ok).toBe(false);
    if (reading.ok) return;
    expect(reading.problems.map((p) => p.key)).toEqual(['angle', 'stations']);
    expect(reading.problems[0]!.message).toBe('expected a number, got "0x10"');
  });

  it('decimal inches and mm pick the table format', () => {
    const inch = readForm({ ...initialState('miter'), inchStyle: 'decimal' });
    const mm = readForm({ ...initialState('miter'), units: 'mm' });
    expect(inch.ok && inch.tableFormat).toBe('in');
    expect(mm.ok && mm.tableFormat).toBe('mm');
  });
});

describe('problemOf', () => {
  it('puts a layout error beside its field and words other fields by their labels', () => {
    const p = problemOf(new GirthError('BAD_OPTION', '@seam', '@seam: only an eccentric cone has a seam to place; add @eccentric or leave the seam out'), 'reducer');
    expect(p).toEqual({ key: 'seam', code: 'BAD_OPTION', message: 'only an eccentric cone has a seam to place; add "Eccentric (one side flat)" or leave the seam out' });
  });

  it('an error of no field of the form goes above the result (key "")', () => {
    expect(problemOf(new GirthError('BAD_OPTION', 'template', 'template: too large'), 'branch').key).toBe('');
  });
});
