import { describe, expect, it } from 'vitest';
import { expectGirthError } from '@girth/pipes/test-support';
import { planTiles } from './tile-plan.js';
import { resolvePdfOptions } from './options.js';
import { planToPdf } from './write-pdf.js';
import { nps24LateralWrapPlan } from './test-support/lateral.js';

describe('bad printing options are typed errors naming the option', () => {
  it('an unknown paper is BAD_CHOICE on paper, listing the papers', () => {
    expectGirthError(() => resolvePdfOptions({ paper: 'A5' }), 'BAD_CHOICE', 'paper');
    expect(() => resolvePdfOptions({ paper: 'A5' })).toThrow(/letter, legal, tabloid, a4, a3, roll-24in/);
  });

  it('an unknown orientation is BAD_CHOICE on orientation', () => {
    expectGirthError(() => resolvePdfOptions({ orientation: 'sideways' as 'auto' }), 'BAD_CHOICE', 'orientation');
  });

  it('a margin over a quarter of the short side (Letter: 8.5 in / 4 = 53.975 mm) is OUT_OF_RANGE on marginMm', () => {
    expect(resolvePdfOptions({ marginMm: 53.9 }).marginMm).toBe(53.9);
    expectGirthError(() => resolvePdfOptions({ marginMm: 54 }), 'OUT_OF_RANGE', 'marginMm');
    expectGirthError(() => resolvePdfOptions({ marginMm: -1 }), 'NEGATIVE', 'marginMm');
    expectGirthError(() => resolvePdfOptions({ marginMm: Number.NaN }), 'NOT_A_NUMBER', 'marginMm');
    expectGirthError(() => resolvePdfOptions({ overlapMm: Number.POSITIVE_INFINITY }), 'NOT_FINITE', 'overlapMm');
  });

  it('an overlap of half the drawing window or more is OUT_OF_RANGE on overlapMm', () => {
    // Letter portrait: window 215.9 - 2 x 6.35 - 2 x 7 = 189.2 mm wide; landscape: 215.9 - 12.7 - 14 - 31 = 158.2 mm high.
    // An 80 mm overlap fits portrait only, so auto takes portrait.
    expect(planTiles(1000, 500, { paper: 'letter', overlapMm: 80 }).orientation).toBe('portrait');
    expectGirthError(() => planTiles(1000, 500, { paper: 'letter', orientation: 'landscape', overlapMm: 80 }), 'OUT_OF_RANGE', 'overlapMm');
    expectGirthError(() => planTiles(1000, 500, { paper: 'letter', overlapMm: 300 }), 'OUT_OF_RANGE', 'overlapMm');
    expectGirthError(() => planTiles(1000, 500, { paper: 'letter', orientation: 'portrait', overlapMm: 94.7 }), 'OUT_OF_RANGE', 'overlapMm');
  });

  it('a sheet needing more than 200 pages is OUT_OF_RANGE on pages, and nothing is made', async () => {
    // 4 m x 2 m on Letter: about 22 x 12 pages.
    expectGirthError(() => planTiles(4000, 2000, { paper: 'letter' }), 'OUT_OF_RANGE', 'pages');
    expect(planTiles(4000, 2000, { paper: 'roll-36in' }).pageCount).toBeLessThanOrEqual(4);
    await expect(planToPdf({ ...nps24LateralWrapPlan(), page: { left: 0, top: 0, widthMm: 4000, heightMm: 2000 } }, { paper: 'letter' })).rejects.toMatchObject({
      code: 'OUT_OF_RANGE',
      field: 'pages',
    });
  });
});
