/**
 * Pipes from the ASME catalog tables: an NPS and a schedule, and every pipe
 * listed for an NPS.
 */
import { findB3610mSize, findB3619mSize, B36_10M_SCHEDULE_ORDER, B36_19M_SCHEDULE_ORDER } from '../catalog/lookup.js';
import type { B3610mSize } from '../catalog/types.js';
import { inchesToMm } from '../length/units.js';
import { makePipe } from './make-pipe.js';
import { scheduleLabel, type ScheduleName } from './schedule-name.js';
import type { Pipe } from './types.js';

/**
 * The wall of a schedule for an ASME size, inches, or `undefined` when the
 * standard lists no such wall for that size.
 */
export function asmeWallIn(size: B3610mSize, schedule: ScheduleName): number | undefined {
  if (schedule.kind === 'b36.10m-schedule') return size.wallsIn[schedule.key];
  return findB3619mSize(size.npsIn)?.wallsIn[schedule.key];
}

/**
 * The ASME pipe of a size and schedule (walls and OD times 25.4 exactly), or
 * `undefined` when the standard lists no such wall.
 */
export function asmeCatalogPipe(size: B3610mSize, schedule: ScheduleName, field: string): Pipe | undefined {
  const wallIn = asmeWallIn(size, schedule);
  if (wallIn === undefined) return undefined;
  const sch = scheduleLabel(schedule);
  return makePipe(
    {
      odMm: inchesToMm(size.odIn),
      wallMm: inchesToMm(wallIn),
      label: `NPS ${size.nps} ${sch}`,
      standard: schedule.kind === 'b36.10m-schedule' ? 'ASME B36.10M' : 'ASME B36.19M',
      nps: size.nps,
      npsIn: size.npsIn,
      dn: size.dn,
      schedule: sch,
    },
    field,
  );
}

/** Every schedule listed for an ASME size, B36.10M first, in the standards' order. */
export function asmeSchedulesOf(size: B3610mSize): readonly ScheduleName[] {
  const names: ScheduleName[] = [];
  for (const key of B36_10M_SCHEDULE_ORDER) {
    if (size.wallsIn[key] !== undefined) names.push({ kind: 'b36.10m-schedule', key });
  }
  const stainless = findB3619mSize(size.npsIn);
  if (stainless !== undefined) {
    for (const key of B36_19M_SCHEDULE_ORDER) {
      if (stainless.wallsIn[key] !== undefined) names.push({ kind: 'b36.19m-schedule', key });
    }
  }
  return names;
}

/** Every ASME pipe of a nominal size in inches (empty when the size is not listed). */
export function asmePipesOfNps(npsIn: number, field = 'pipe'): readonly Pipe[] {
  const size = findB3610mSize(npsIn);
  if (size === undefined) return [];
  return asmeSchedulesOf(size)
    .map((s) => asmeCatalogPipe(size, s, field))
    .filter((p): p is Pipe => p !== undefined);
}
