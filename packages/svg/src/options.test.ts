import { describe, expect, test } from 'vitest';
import { girthErrorOf } from '@girth/pipes/test-support';
import { resolveSvgOptions } from './options.js';
import { templateToSvg } from './template-to-svg.js';
import { planeCutWrap } from './test-support/fixtures.js';
import type { SvgOptions } from './types.js';

describe('resolveSvgOptions', () => {
  test('defaults: mm sheet, 10 mm margin, 25 mm overlap, no job or piece', () => {
    expect(resolveSvgOptions()).toEqual({ sheetUnits: 'mm', marginMm: 10, overlapMm: 25, job: undefined, piece: undefined });
  });

  test('accepts the ends of each range', () => {
    expect(resolveSvgOptions({ overlapMm: 0, marginMm: 0 })).toMatchObject({ overlapMm: 0, marginMm: 0 });
    expect(resolveSvgOptions({ overlapMm: 200, marginMm: 100 })).toMatchObject({ overlapMm: 200, marginMm: 100 });
  });

  const bad: [string, SvgOptions, string, string][] = [
    ['negative overlap', { overlapMm: -1 }, 'overlapMm', 'OUT_OF_RANGE'],
    ['overlap over 200 mm', { overlapMm: 200.5 }, 'overlapMm', 'OUT_OF_RANGE'],
    ['NaN overlap', { overlapMm: NaN }, 'overlapMm', 'NOT_A_NUMBER'],
    ['infinite margin', { marginMm: Infinity }, 'marginMm', 'NOT_FINITE'],
    ['negative margin', { marginMm: -0.1 }, 'marginMm', 'OUT_OF_RANGE'],
    ['margin over 100 mm', { marginMm: 101 }, 'marginMm', 'OUT_OF_RANGE'],
    ['unknown units', { sheetUnits: 'cm' as 'mm' }, 'sheetUnits', 'UNKNOWN_UNIT'],
    ['job not text', { job: 42 as unknown as string }, 'job', 'BAD_OPTION'],
    ['piece too long', { piece: 'x'.repeat(201) }, 'piece', 'BAD_OPTION'],
  ];
  for (const [name, options, field, code] of bad) {
    test(`${name}: GirthError ${code} on ${field}`, () => {
      const e = girthErrorOf(() => resolveSvgOptions(options));
      expect(e.code).toBe(code);
      expect(e.field).toBe(field);
      expect(e.message).toContain(field);
    });
  }

  test('the message names the limit', () => {
    expect(girthErrorOf(() => resolveSvgOptions({ overlapMm: 250 })).message).toMatch(/\[0, 200\] mm/);
    expect(girthErrorOf(() => resolveSvgOptions({ piece: 'x'.repeat(300) })).message).toMatch(/200 characters/);
  });

  test('templateToSvg checks its options the same way, before drawing anything', () => {
    const e = girthErrorOf(() => templateToSvg(planeCutWrap(100, 30), { overlapMm: -5 }));
    expect(e.code).toBe('OUT_OF_RANGE');
    expect(e.field).toBe('overlapMm');
  });
});
