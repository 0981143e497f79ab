/**
 * Listing the catalog: the schedules and pipes of an NPS, and every NPS and DN
 * Girth knows, for error messages and help text.
 */
import { ASME_B36_10M } from '../catalog/asme-b36-10m.js';
import { EN_10220 } from '../catalog/en-10220.js';
import { findB3610mSize, nearbyNps } from '../catalog/lookup.js';
import { GirthError } from '../errors.js';
import { normalizeInputText } from '../internal/normalize-text.js';
import { asmePipesOfNps, asmeSchedulesOf } from './catalog-pipe.js';
import { readNpsAtStart } from './nps-text.js';
import { scheduleLabel } from './schedule-name.js';
import type { Pipe } from './types.js';

function npsInOf(nps: string, field: string): number {
  const s = normalizeInputText(String(nps)).replace(/^nps */, '');
  const read = readNpsAtStart(s);
  if (read === undefined || read.rest !== '') {
    throw new GirthError('BAD_PIPE_NAME', field, `${field}: "${nps}" is not a nominal pipe size; write it like 6, 1-1/2, 1 1/2" or NPS 16`, nps);
  }
  if (findB3610mSize(read.npsIn) === undefined) {
    throw new GirthError(
      'UNKNOWN_SIZE',
      field,
      `${field}: NPS ${nps} is not a size of ASME B36.10M; nearby sizes: ${nearbyNps(read.npsIn).map((n) => `NPS ${n}`).join(', ')}`,
      nps,
    );
  }
  return read.npsIn;
}

/**
 * The schedules and weight classes listed for a nominal pipe size, as written in
 * labels and accepted by `resolvePipe`: ASME B36.10M schedule numbers, then STD,
 * XS, XXS, then ASME B36.19M 5S/10S/40S/80S, each only where the size has it.
 *
 * @param nps the nominal size: `'6'`, `'1-1/2'`, `'1 1/2"'`, `'1.5'`, `'NPS 16'`.
 * @throws GirthError `BAD_PIPE_NAME` when `nps` is not a size, `UNKNOWN_SIZE`
 *   (listing nearby sizes) when the standard has no such size; field `'nps'`.
 * @example schedulesFor('3-1/2') // ['Sch 10', 'Sch 30', 'Sch 40', 'Sch 80', 'STD', 'XS', 'Sch 5S', 'Sch 10S', 'Sch 40S', 'Sch 80S']
 */
export function schedulesFor(nps: string): readonly string[] {
  const size = findB3610mSize(npsInOf(nps, 'nps'));
  return size === undefined ? [] : asmeSchedulesOf(size).map(scheduleLabel);
}

/**
 * Every catalog pipe of a nominal size, one per schedule listed (see
 * {@link schedulesFor}), dimensions in mm.
 * @throws GirthError as {@link schedulesFor}.
 * @example pipesForNps('16').map((p) => p.label) // ['NPS 16 Sch 10', 'NPS 16 Sch 20', ...]
 */
export function pipesForNps(nps: string): readonly Pipe[] {
  return asmePipesOfNps(npsInOf(nps, 'nps'));
}

/**
 * The nominal pipe sizes of ASME B36.10M in increasing order, as written (`'1/8'` ... `'48'`).
 * @example npsSizes()[0] // '1/8'
 */
export function npsSizes(): readonly string[] {
  return ASME_B36_10M.map((r) => r.nps);
}

/**
 * The DNs of EN 10220 series 1 that `DN <n> x <wall>` accepts, increasing.
 * @example dnSizes()[0] // 15
 */
export function dnSizes(): readonly number[] {
  return EN_10220.map((r) => r.dn);
}
