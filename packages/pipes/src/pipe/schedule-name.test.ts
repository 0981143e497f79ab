import { describe, expect, it } from 'vitest';
import { looksLikeSchedule, readScheduleName, scheduleLabel } from './schedule-name.js';
import { readNpsAtStart } from './nps-text.js';
import { npsDesignationValue } from '../catalog/nps.js';

describe('readScheduleName', () => {
  // Spellings in use in the trade (common practice): "Sch 40", "STD WT", XH for
  // extra heavy (= XS), XXH (= XXS), an S suffix for the stainless schedules.
  const cases: ReadonlyArray<readonly [string, string | undefined]> = [
    ['sch 40', 'Sch 40'],
    ['Sch40', 'Sch 40'],
    ['SCH-80', 'Sch 80'],
    ['schedule 160', 'Sch 160'],
    ['sch. 10', 'Sch 10'],
    ['sch 040', 'Sch 40'],
    ['80s', 'Sch 80S'],
    ['80 S', 'Sch 80S'],
    ['sch 10s', 'Sch 10S'],
    ['std', 'STD'],
    ['std wt', 'STD'],
    ['Standard', 'STD'],
    ['xs', 'XS'],
    ['XH', 'XS'],
    ['extra strong', 'XS'],
    ['xxs', 'XXS'],
    ['xxh', 'XXS'],
    ['40', undefined],
    ['sch 45', undefined],
    ['20s', undefined],
    ['heavy', undefined],
    ['', undefined],
  ];
  for (const [text, label] of cases) {
    it(`reads ${JSON.stringify(text)} as ${label ?? 'no schedule'}`, () => {
      const name = readScheduleName(text);
      expect(name === undefined ? undefined : scheduleLabel(name)).toBe(label);
    });
  }

  it('tells schedule-shaped text from other words', () => {
    expect(looksLikeSchedule('sch 45')).toBe(true);
    expect(looksLikeSchedule('20s')).toBe(true);
    expect(looksLikeSchedule('heavy')).toBe(false);
    expect(looksLikeSchedule('40')).toBe(false);
  });
});

describe('nominal sizes', () => {
  it('reads NPS designations and what follows them', () => {
    expect(npsDesignationValue('1-1/2')).toBe(1.5);
    expect(npsDesignationValue('3/4')).toBe(0.75);
    expect(npsDesignationValue('16')).toBe(16);
    expect(npsDesignationValue('1 1/2')).toBeUndefined();
    expect(readNpsAtStart('1 1/2" xs')).toEqual({ npsIn: 1.5, rest: 'xs' });
    expect(readNpsAtStart('1-1/4 sch 40')).toEqual({ npsIn: 1.25, rest: 'sch 40' });
    expect(readNpsAtStart('16in sch40')).toEqual({ npsIn: 16, rest: 'sch40' });
    expect(readNpsAtStart('16 insch')).toEqual({ npsIn: 16, rest: 'insch' });
    expect(readNpsAtStart('.5 std')).toEqual({ npsIn: 0.5, rest: 'std' });
    expect(readNpsAtStart('1/0 std')).toBeUndefined();
    expect(readNpsAtStart('std')).toBeUndefined();
  });
});
