/**
 * Pipe names as fitters type them, resolved to dimensions: `NPS 16 STD`,
 * `16" sch 40`, `1 1/2" xs`, `6" 80S`, `DN 150 x 7.1`, `406.4x9.53mm`,
 * `24" OD x 3/8"`.
 */
import { GirthError } from '../errors.js';
import { findB3610mSize, findB3610mSizeByDn, findEn10220Size, nearbyDn, nearbyNps } from '../catalog/lookup.js';
import type { B3610mSize } from '../catalog/types.js';
import { normalizeInputText } from '../internal/normalize-text.js';
import { readLength, type ReadLength } from '../internal/read-length.js';
import { inchesToMm, mmToInches, type LengthUnit } from '../length/units.js';
import { asmeCatalogPipe, asmeSchedulesOf } from './catalog-pipe.js';
import { makePipe, trimmedNumber } from './make-pipe.js';
import { readNpsAtStart } from './nps-text.js';
import { looksLikeSchedule, readScheduleName, scheduleLabel } from './schedule-name.js';
import type { Pipe } from './types.js';

/** Options of {@link resolvePipe}. */
export interface ResolvePipeOptions {
  /** The job's unit, for a bare OD x wall (`406.4 x 9.53`) and a bare wall after an NPS. Default `'mm'`. */
  readonly unit?: LengthUnit;
  /** The input field named in errors, e.g. `header` or `jobs[1].branch`. Default `'pipe'`. */
  readonly field?: string;
}

/** Examples of accepted forms, quoted in error messages. */
export const PIPE_NAME_EXAMPLES = `NPS 16 STD, 6" sch 80, NPS 1-1/2 XS, NPS 4 Sch 10S, DN 150 x 7.1, 406.4 x 9.53 mm or 24" OD x 3/8"`;

/** The `x` between OD and wall: the first `x` followed by a number, or standing alone before more text. */
const TIMES = /x(?= *[\d.+-]| +\S)/;

interface Context {
  readonly text: string;
  readonly field: string;
  readonly unit: LengthUnit;
}

function badName(ctx: Context, why: string): GirthError {
  return new GirthError('BAD_PIPE_NAME', ctx.field, `${ctx.field}: cannot read "${ctx.text}" as a pipe (${why}); write it like ${PIPE_NAME_EXAMPLES}`, ctx.text);
}

function npsText(npsIn: number): string {
  return trimmedNumber(npsIn, 4);
}

function unknownNps(ctx: Context, npsIn: number): GirthError {
  const near = nearbyNps(npsIn).map((n) => `NPS ${n}`);
  return new GirthError(
    'UNKNOWN_SIZE',
    ctx.field,
    `${ctx.field}: NPS ${npsText(npsIn)} is not a size of ASME B36.10M; nearby sizes: ${near.join(', ')}; for another pipe give OD x wall, e.g. 406.4 x 9.53 mm`,
    ctx.text,
  );
}

function scheduleList(size: B3610mSize): string {
  return asmeSchedulesOf(size).map(scheduleLabel).join(', ');
}

/** Re-throws a length error under the pipe's field; text that is no length becomes BAD_PIPE_NAME. */
function readPart(ctx: Context, part: string, unit: LengthUnit, what: string): ReadLength {
  try {
    return readLength(part, { unit, field: ctx.field });
  } catch (e) {
    if (e instanceof GirthError && (e.code === 'BAD_LENGTH' || e.code === 'EMPTY_INPUT')) {
      throw badName(ctx, `the ${what} "${part}" is not a length`);
    }
    if (e instanceof GirthError) {
      const detail = e.message.startsWith(`${ctx.field}: `) ? e.message.slice(ctx.field.length + 2) : e.message;
      throw new GirthError(e.code, ctx.field, `${ctx.field}: the ${what} in "${ctx.text}": ${detail}`, ctx.text);
    }
    throw e;
  }
}

/** Reads the wall after an `x`, dropping a trailing `wall`, `wt` or `thk`. */
function wallText(text: string): string {
  return text.replace(/ *(?:wall|w\.?t\.?|thk\.?|thick(?:ness)?)$/, '').trim();
}

function withSchedule(ctx: Context, size: B3610mSize, scheduleText: string): Pipe {
  const label = `NPS ${size.nps}`;
  if (scheduleText === '') {
    throw new GirthError(
      'MISSING_SCHEDULE',
      ctx.field,
      `${ctx.field}: "${ctx.text}" gives no schedule or wall; ${label} comes in ${scheduleList(size)}, or give a wall like ${label} x 0.375in`,
      ctx.text,
    );
  }
  const schedule = readScheduleName(scheduleText);
  if (schedule === undefined && !looksLikeSchedule(scheduleText)) {
    throw badName(ctx, `"${scheduleText}" is not a schedule; ${label} comes in ${scheduleList(size)}`);
  }
  const pipe = schedule === undefined ? undefined : asmeCatalogPipe(size, schedule, ctx.field);
  if (pipe === undefined) {
    throw new GirthError(
      'UNKNOWN_SCHEDULE',
      ctx.field,
      `${ctx.field}: ${label} has no ${schedule ? scheduleLabel(schedule) : `"${scheduleText}"`} in ASME B36.10M or B36.19M; it comes in ${scheduleList(size)}`,
      ctx.text,
    );
  }
  return pipe;
}

/** `DN 150 x 7.1` (EN 10220 OD, wall in mm unless marked) or `DN 150 Sch 40` (the ASME pipe listed as DN 150). */
function resolveDn(ctx: Context, dn: number, rest: string): Pipe {
  const times = /^x */.exec(rest);
  if (times !== null) {
    const size = findEn10220Size(dn);
    if (size === undefined) {
      throw new GirthError(
        'UNKNOWN_SIZE',
        ctx.field,
        `${ctx.field}: DN ${dn} is not a size of EN 10220 series 1; nearby sizes: ${nearbyDn(dn, 'EN 10220').map((d) => `DN ${d}`).join(', ')}`,
        ctx.text,
      );
    }
    // EN 10220 walls are millimetres: a bare wall after a DN is read in mm whatever the job's unit.
    const wall = readPart(ctx, wallText(rest.slice(times[0].length)), 'mm', 'wall');
    return makePipe(
      { odMm: size.odMm, wallMm: wall.mm, label: `DN ${dn} x ${trimmedNumber(wall.mm)}`, standard: 'EN 10220', dn },
      ctx.field,
    );
  }
  const size = findB3610mSizeByDn(dn);
  if (size === undefined) {
    if (rest === '') throw missingDnWall(ctx, dn);
    throw new GirthError(
      'UNKNOWN_SIZE',
      ctx.field,
      `${ctx.field}: DN ${dn} is not listed beside an NPS in ASME B36.10M; nearby sizes: ${nearbyDn(dn, 'ASME').map((d) => `DN ${d}`).join(', ')}`,
      ctx.text,
    );
  }
  if (rest === '') throw missingDnWall(ctx, dn, size);
  return withSchedule(ctx, size, rest);
}

function missingDnWall(ctx: Context, dn: number, size?: B3610mSize): GirthError {
  const asme = size ? `, or an ASME schedule (DN ${dn} is NPS ${size.nps}: ${scheduleList(size)})` : '';
  return new GirthError('MISSING_SCHEDULE', ctx.field, `${ctx.field}: "${ctx.text}" gives no wall; write it like DN ${dn} x 7.1 (wall in mm)${asme}`, ctx.text);
}

/** `NPS 6 x 0.5in`: the ASME OD of a size with a wall of the user's. */
function resolveNpsWithWall(ctx: Context, sizeText: string, wallPart: string): Pipe {
  const nps = readNpsAtStart(sizeText);
  if (nps === undefined || nps.rest !== '') throw badName(ctx, `"${sizeText}" is not a nominal size`);
  const size = findB3610mSize(nps.npsIn);
  if (size === undefined) throw unknownNps(ctx, nps.npsIn);
  const wall = readPart(ctx, wallText(wallPart), ctx.unit, 'wall');
  const inches = wall.writtenUnit === 'in' || wall.writtenUnit === 'ft' || (wall.writtenUnit === undefined && ctx.unit === 'in');
  const wallLabel = inches ? `${mmToInches(wall.mm).toFixed(3)} in` : `${trimmedNumber(wall.mm)} mm`;
  return makePipe(
    {
      odMm: inchesToMm(size.odIn),
      wallMm: wall.mm,
      label: `NPS ${size.nps} x ${wallLabel}`,
      standard: 'ASME B36.10M',
      nps: size.nps,
      npsIn: size.npsIn,
      dn: size.dn,
    },
    ctx.field,
  );
}

/** `406.4 x 9.53 mm`, `24" OD x 3/8"`: any OD and wall. A bare side borrows the other side's unit mark. */
function resolveOdByWall(ctx: Context, odPart: string, wallPart: string): Pipe {
  const odText = odPart.replace(/^o\.?d\.? */, '').replace(/ *o\.?d\.?$/, '').trim();
  const wText = wallText(wallPart);
  let od = readPart(ctx, odText, ctx.unit, 'OD');
  let wall = readPart(ctx, wText, ctx.unit, 'wall');
  if (od.writtenUnit === undefined && wall.writtenUnit !== undefined) od = readPart(ctx, `${odText} ${wall.writtenUnit}`, ctx.unit, 'OD');
  if (wall.writtenUnit === undefined && od.writtenUnit !== undefined) wall = readPart(ctx, `${wText} ${od.writtenUnit}`, ctx.unit, 'wall');
  const unit = od.writtenUnit ?? ctx.unit;
  const inches = unit === 'in' || unit === 'ft';
  const label = inches
    ? `${mmToInches(od.mm).toFixed(3)} OD x ${mmToInches(wall.mm).toFixed(3)} in`
    : `${trimmedNumber(od.mm)} x ${trimmedNumber(wall.mm)} mm`;
  return makePipe({ odMm: od.mm, wallMm: wall.mm, label, standard: 'custom' }, ctx.field);
}

/**
 * Resolves a pipe name as a fitter types it to a {@link Pipe} in millimetres.
 *
 * Accepted (case and spacing do not matter):
 * - ASME sizes with a schedule or weight class: `NPS 16 STD`, `16" sch 40`,
 *   `16 sch40`, `NPS 1-1/2 XS`, `1 1/2" xs`, `1.5 XXS`, `NPS 6 sch 80`,
 *   `6" 80S`, `NPS 4 Sch 10S` (B36.10M schedules and STD/XS/XXS, B36.19M 5S,
 *   10S, 40S, 80S; XH/XXH and `std wt` are read as XS/XXS/STD);
 * - an ASME size with a wall of your own: `NPS 6 x 0.5in` (a bare wall is in
 *   `options.unit`);
 * - EN 10220 tubes by DN and wall: `DN 150 x 7.1`, `DN150x7.1` (a bare wall is
 *   in mm whatever the job's unit);
 * - ASME pipes by DN and schedule: `DN 150 Sch 40` (labelled `NPS 6 Sch 40`,
 *   with `dn` 150);
 * - any OD x wall: `406.4x9.53mm`, `406.4 x 9.53`, `24 od x .375`,
 *   `24" OD x 3/8"`, `16in x 0.5in`. Bare numbers take `options.unit`
 *   (default mm) unless the other side carries a unit mark.
 *
 * @returns the pipe with a canonical label (`NPS 16 STD`, `NPS 6 Sch 80`,
 *   `DN 150 x 7.1`, `406.4 x 9.53 mm`, `24.000 OD x 0.375 in`).
 * @throws GirthError (field = `options.field ?? 'pipe'`): `EMPTY_INPUT` for
 *   blank text; `BAD_PIPE_NAME` for text that is not a pipe name (with
 *   examples); `UNKNOWN_SIZE` for a size not in the standard, listing nearby
 *   sizes; `UNKNOWN_SCHEDULE` for a schedule the size does not have, listing
 *   those it has; `MISSING_SCHEDULE` for a size with neither schedule nor
 *   wall; `WALL_TOO_THICK` for a wall of half the OD or more; `NEGATIVE` for
 *   values at or below zero; `UNKNOWN_UNIT`, `DIVIDE_BY_ZERO`, `NOT_FINITE`
 *   from the lengths.
 * @example resolvePipe('NPS 16 STD').odMm // 406.4
 * @example resolvePipe('1 1/2" xs').label // 'NPS 1-1/2 XS'
 * @example resolvePipe('24 od x .375', { unit: 'in' }).label // '24.000 OD x 0.375 in'
 */
export function resolvePipe(text: string, options: ResolvePipeOptions = {}): Pipe {
  const field = options.field ?? 'pipe';
  if (typeof text !== 'string') {
    throw new GirthError('BAD_PIPE_NAME', field, `${field}: expected a pipe name as text, got ${typeof text}; write it like ${PIPE_NAME_EXAMPLES}`, text);
  }
  const ctx: Context = { text, field, unit: options.unit ?? 'mm' };
  const s = normalizeInputText(text);
  if (s === '') throw new GirthError('EMPTY_INPUT', field, `${field}: no pipe given; write it like ${PIPE_NAME_EXAMPLES}`, text);

  const dn = /^dn *(\d+) *(.*)$/.exec(s);
  if (dn !== null) return resolveDn(ctx, Number(dn[1]), (dn[2] ?? '').trim());

  const npsPrefix = /^nps *(.*)$/.exec(s);
  const body = npsPrefix !== null ? (npsPrefix[1] ?? '').trim() : s;
  const times = TIMES.exec(body);
  if (times !== null) {
    const left = body.slice(0, times.index).trim();
    const right = body.slice(times.index + 1).trim();
    return npsPrefix !== null ? resolveNpsWithWall(ctx, left, right) : resolveOdByWall(ctx, left, right);
  }

  const nps = readNpsAtStart(body);
  if (nps === undefined) throw badName(ctx, npsPrefix !== null ? 'no size after NPS' : 'it starts with no size');
  const size = findB3610mSize(nps.npsIn);
  if (size === undefined) throw unknownNps(ctx, nps.npsIn);
  return withSchedule(ctx, size, nps.rest);
}
