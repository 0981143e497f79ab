/**
 * Schedule numbers and weight classes as fitters write them: `sch 40`, `Sch40`,
 * `schedule 80`, `80S`, `sch 10s`, `STD`, `std wt`, `XS`, `XH`, `XXS`.
 */
import type { B3610mSchedule, B3619mSchedule } from '../catalog/types.js';

/** A schedule read from text: which table it belongs to and its key there. */
export type ScheduleName =
  | { readonly kind: 'b36.10m-schedule'; readonly key: B3610mSchedule }
  | { readonly kind: 'b36.19m-schedule'; readonly key: B3619mSchedule };

const NUMBERED_B36_10M = new Set<string>(['10', '20', '30', '40', '60', '80', '100', '120', '140', '160']);
const NUMBERED_B36_19M = new Set<string>(['5S', '10S', '40S', '80S']);

/**
 * True when the (lower-case) text has the shape of a schedule even if no table
 * lists it (`sch 45`, `20s`), so errors can say "no such schedule" rather than
 * "not a pipe name".
 * @example looksLikeSchedule('sch 45') // true
 */
export function looksLikeSchedule(text: string): boolean {
  return /^(?:sch(?:ed(?:ule)?)?\.?[ -]*\d+ *s?|\d+ *s)$/.test(text);
}

/**
 * The schedule written in `text` (lower case, trimmed), or `undefined` when it
 * is not one of the schedules of ASME B36.10M or B36.19M. A bare number is not
 * a schedule (`40` could be anything); `sch 40` and `40S` are.
 * @example readScheduleName('sch 10s') // { kind: 'b36.19m-schedule', key: '10S' }
 */
export function readScheduleName(text: string): ScheduleName | undefined {
  const t = text.trim().toLowerCase();
  if (/^(?:std|std\.? ?w(?:eigh)?t\.?|std\.? wall|standard(?: weight| wall)?)$/.test(t)) return { kind: 'b36.10m-schedule', key: 'STD' };
  if (/^(?:xs|xh|x-?strong|extra[ -]?strong|extra[ -]?heavy)$/.test(t)) return { kind: 'b36.10m-schedule', key: 'XS' };
  if (/^(?:xxs|xxh|xx-?strong|double[ -]?extra[ -]?strong|double[ -]?extra[ -]?heavy)$/.test(t)) return { kind: 'b36.10m-schedule', key: 'XXS' };
  const numbered = /^(?:sch(?:ed(?:ule)?)?\.?[ -]*(\d+) *(s?)|(\d+) *s)$/.exec(t);
  if (numbered === null) return undefined;
  const n = String(Number(numbered[1] ?? numbered[3]));
  const stainless = numbered[3] !== undefined || numbered[2] === 's';
  if (stainless) {
    const key = `${n}S`;
    return NUMBERED_B36_19M.has(key) ? { kind: 'b36.19m-schedule', key: key as B3619mSchedule } : undefined;
  }
  return NUMBERED_B36_10M.has(n) ? { kind: 'b36.10m-schedule', key: n as B3610mSchedule } : undefined;
}

/**
 * The schedule as written in labels: `Sch 40`, `STD`, `XS`, `XXS`, `Sch 10S`.
 * @example scheduleLabel({ kind: 'b36.10m-schedule', key: '80' }) // 'Sch 80'
 */
export function scheduleLabel(name: ScheduleName): string {
  if (name.key === 'STD' || name.key === 'XS' || name.key === 'XXS') return name.key;
  return `Sch ${name.key}`;
}
