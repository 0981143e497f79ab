/**
 * ASME B36.19M, stainless steel pipe: walls of schedules 5S, 10S, 40S and 80S,
 * inches, for NPS 1/8 to 30 as the standard lists them (40S and 80S to NPS 12
 * only; 5S from NPS 1/2). ODs are those of ASME B36.10M.
 *
 * Source: RECALLED from the standard. 5S/10S for NPS 1/2-30 and the 40S/80S
 * rule (equal to Sch 40/80 except 40S at NPS 12 and 80S at NPS 10-12) are
 * cross-checked against the project's REFERENCES.md in `asme-b36-19m.test.ts`;
 * 10S/40S/80S for NPS 1/8-3/8 are recalled without a second source. Cells we
 * were not sure of are left out (5S below NPS 1/2, 40S/80S above NPS 12).
 */
import { npsValueOf } from './nps.js';
import type { B3619mSchedule, B3619mSize } from './types.js';

function size(nps: string, dn: number, odIn: number, wallsIn: Partial<Record<B3619mSchedule, number>>): B3619mSize {
  return { kind: 'b36.19m-size', nps, npsIn: npsValueOf(nps), dn, odIn, wallsIn };
}

/** ASME B36.19M sizes in increasing NPS (recalled; see the file comment). */
export const ASME_B36_19M: readonly B3619mSize[] = [
  size('1/8', 6, 0.405, { '10S': 0.049, '40S': 0.068, '80S': 0.095 }),
  size('1/4', 8, 0.54, { '10S': 0.065, '40S': 0.088, '80S': 0.119 }),
  size('3/8', 10, 0.675, { '10S': 0.065, '40S': 0.091, '80S': 0.126 }),
  size('1/2', 15, 0.84, { '5S': 0.065, '10S': 0.083, '40S': 0.109, '80S': 0.147 }),
  size('3/4', 20, 1.05, { '5S': 0.065, '10S': 0.083, '40S': 0.113, '80S': 0.154 }),
  size('1', 25, 1.315, { '5S': 0.065, '10S': 0.109, '40S': 0.133, '80S': 0.179 }),
  size('1-1/4', 32, 1.66, { '5S': 0.065, '10S': 0.109, '40S': 0.14, '80S': 0.191 }),
  size('1-1/2', 40, 1.9, { '5S': 0.065, '10S': 0.109, '40S': 0.145, '80S': 0.2 }),
  size('2', 50, 2.375, { '5S': 0.065, '10S': 0.109, '40S': 0.154, '80S': 0.218 }),
  size('2-1/2', 65, 2.875, { '5S': 0.083, '10S': 0.12, '40S': 0.203, '80S': 0.276 }),
  size('3', 80, 3.5, { '5S': 0.083, '10S': 0.12, '40S': 0.216, '80S': 0.3 }),
  size('3-1/2', 90, 4.0, { '5S': 0.083, '10S': 0.12, '40S': 0.226, '80S': 0.318 }),
  size('4', 100, 4.5, { '5S': 0.083, '10S': 0.12, '40S': 0.237, '80S': 0.337 }),
  size('5', 125, 5.563, { '5S': 0.109, '10S': 0.134, '40S': 0.258, '80S': 0.375 }),
  size('6', 150, 6.625, { '5S': 0.109, '10S': 0.134, '40S': 0.28, '80S': 0.432 }),
  size('8', 200, 8.625, { '5S': 0.109, '10S': 0.148, '40S': 0.322, '80S': 0.5 }),
  size('10', 250, 10.75, { '5S': 0.134, '10S': 0.165, '40S': 0.365, '80S': 0.5 }),
  size('12', 300, 12.75, { '5S': 0.156, '10S': 0.18, '40S': 0.375, '80S': 0.5 }),
  size('14', 350, 14.0, { '5S': 0.156, '10S': 0.188 }),
  size('16', 400, 16.0, { '5S': 0.165, '10S': 0.188 }),
  size('18', 450, 18.0, { '5S': 0.165, '10S': 0.188 }),
  size('20', 500, 20.0, { '5S': 0.188, '10S': 0.218 }),
  size('22', 550, 22.0, { '5S': 0.188, '10S': 0.218 }),
  size('24', 600, 24.0, { '5S': 0.218, '10S': 0.25 }),
  size('30', 750, 30.0, { '5S': 0.25, '10S': 0.312 }),
];
