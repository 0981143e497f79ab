/**
 * Finding sizes in the catalog tables, and the sizes next to one that is not
 * there (for error messages).
 */
import { ASME_B36_10M } from './asme-b36-10m.js';
import { ASME_B36_19M } from './asme-b36-19m.js';
import { EN_10220 } from './en-10220.js';
import type { B3610mSchedule, B3610mSize, B3619mSchedule, B3619mSize, En10220Size } from './types.js';

/** Two nominal sizes closer than this (inches) are the same size. */
const NPS_EPS_IN = 1e-9;

/** B36.10M schedules in the order the standard's columns run, numbers before weight classes. */
export const B36_10M_SCHEDULE_ORDER: readonly B3610mSchedule[] = [
  '10', '20', '30', '40', '60', '80', '100', '120', '140', '160', 'STD', 'XS', 'XXS',
];

/** B36.19M schedules in increasing wall. */
export const B36_19M_SCHEDULE_ORDER: readonly B3619mSchedule[] = ['5S', '10S', '40S', '80S'];

/**
 * The ASME B36.10M size with this nominal size in inches, or `undefined`.
 * @example findB3610mSize(1.5)?.odIn // 1.9
 */
export function findB3610mSize(npsIn: number): B3610mSize | undefined {
  return ASME_B36_10M.find((r) => Math.abs(r.npsIn - npsIn) < NPS_EPS_IN);
}

/**
 * The ASME B36.10M size with this DN (DN 150 is NPS 6), or `undefined`.
 * @example findB3610mSizeByDn(150)?.nps // '6'
 */
export function findB3610mSizeByDn(dn: number): B3610mSize | undefined {
  return ASME_B36_10M.find((r) => r.dn === dn);
}

/**
 * The ASME B36.19M size with this nominal size in inches, or `undefined`.
 * @example findB3619mSize(4)?.wallsIn['10S'] // 0.12
 */
export function findB3619mSize(npsIn: number): B3619mSize | undefined {
  return ASME_B36_19M.find((r) => Math.abs(r.npsIn - npsIn) < NPS_EPS_IN);
}

/**
 * The EN 10220 size with this DN, or `undefined`.
 * @example findEn10220Size(150)?.odMm // 168.3
 */
export function findEn10220Size(dn: number): En10220Size | undefined {
  return EN_10220.find((r) => r.dn === dn);
}

/** The entries of a sorted list next to `value`: the largest below and the smallest above. */
function neighbours<T>(rows: readonly T[], key: (row: T) => number, value: number): readonly T[] {
  let below: T | undefined;
  let above: T | undefined;
  for (const r of rows) {
    const k = key(r);
    if (k < value) below = r;
    else if (k > value && above === undefined) above = r;
  }
  return [below, above].filter((r): r is T => r !== undefined);
}

/**
 * The ASME NPS designations next to a size that is not listed, e.g. `['6', '8']`
 * for 7.
 * @example nearbyNps(7) // ['6', '8']
 */
export function nearbyNps(npsIn: number): readonly string[] {
  return neighbours(ASME_B36_10M, (r) => r.npsIn, npsIn).map((r) => r.nps);
}

/**
 * The DNs of a table next to a DN that is not listed in it.
 * @param table `'EN 10220'` (tube ODs) or `'ASME'` (DN beside NPS in B36.10M).
 * @example nearbyDn(175, 'EN 10220') // [150, 200]
 */
export function nearbyDn(dn: number, table: 'EN 10220' | 'ASME'): readonly number[] {
  const rows: readonly { readonly dn: number }[] = table === 'EN 10220' ? EN_10220 : ASME_B36_10M;
  return neighbours(rows, (r) => r.dn, dn).map((r) => r.dn);
}
