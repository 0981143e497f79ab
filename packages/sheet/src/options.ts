/**
 * Checking and defaulting the options of a sheet plan (shared by the SVG and DXF writers).
 */
import { GirthError, requireInRange } from '@girth/pipes';
import type { ResolvedSheetOptions, SheetOptions, SheetUnits } from './types.js';

/** Default blank paper around the drawing, mm. */
export const DEFAULT_MARGIN_MM = 10;
/** Default glue tab past the stretch-out of a wrap, mm. */
export const DEFAULT_OVERLAP_MM = 25;
/** Largest accepted margin, mm. */
export const MAX_MARGIN_MM = 100;
/** Largest accepted glue tab, mm. */
export const MAX_OVERLAP_MM = 200;
/** Longest accepted job or piece label, characters. */
export const MAX_LABEL_CHARS = 200;
/** Smallest and largest title block text scale. */
export const TEXT_SCALE_RANGE = { min: 0.01, max: 50 } as const;

const SHEET_UNITS: readonly SheetUnits[] = ['mm', 'in'];

function optionalLabel(value: unknown, field: 'job' | 'piece'): string | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== 'string') {
    throw new GirthError('BAD_OPTION', field, `${field}: expected text, got ${typeof value}`, value);
  }
  const chars = [...value].length;
  if (chars > MAX_LABEL_CHARS) {
    throw new GirthError(
      'BAD_OPTION',
      field,
      `${field}: at most ${MAX_LABEL_CHARS} characters, got ${chars}`,
      value,
    );
  }
  return value;
}

/**
 * Checks the options of {@link planSheet} and fills in the defaults.
 *
 * @param options - as given by the caller; `undefined` means all defaults.
 * @returns every option, checked: `sheetUnits` 'mm' | 'in' (default 'mm'),
 *   `marginMm` in [0, 100] (default 10), `overlapMm` in [0, 200] (default 25),
 *   `job` and `piece` text of at most 200 characters or `undefined`, `textScale`
 *   in [0.01, 50] (default 1), `stationNumbers` and `paper` true or false (default true).
 * @throws GirthError `UNKNOWN_UNIT` (field `sheetUnits`) for units other than 'mm' or 'in';
 *   `NOT_A_NUMBER`, `NOT_FINITE` or `OUT_OF_RANGE` (field `marginMm` / `overlapMm` / `textScale`)
 *   for a number that is not one or lies outside its range; `BAD_OPTION` (field `job` / `piece` /
 *   `stationNumbers` / `paper`) for a label that is not text or is longer than 200 characters, or a flag
 *   that is not true or false.
 * @example
 * ```ts
 * resolveSheetOptions({ sheetUnits: 'in' }).overlapMm; // 25
 * resolveSheetOptions({ overlapMm: 250 }); // throws GirthError OUT_OF_RANGE, field overlapMm
 * ```
 */
export function resolveSheetOptions(options: SheetOptions = {}): ResolvedSheetOptions {
  const units: unknown = options.sheetUnits ?? 'mm';
  if (!SHEET_UNITS.includes(units as SheetUnits)) {
    throw new GirthError(
      'UNKNOWN_UNIT',
      'sheetUnits',
      `sheetUnits: must be 'mm' or 'in', got ${JSON.stringify(units)}`,
      units,
    );
  }
  const marginMm = requireInRange(options.marginMm ?? DEFAULT_MARGIN_MM, 'marginMm', 0, MAX_MARGIN_MM, { unit: 'mm' });
  const overlapMm = requireInRange(options.overlapMm ?? DEFAULT_OVERLAP_MM, 'overlapMm', 0, MAX_OVERLAP_MM, {
    unit: 'mm',
  });
  const textScale = requireInRange(options.textScale ?? 1, 'textScale', TEXT_SCALE_RANGE.min, TEXT_SCALE_RANGE.max);
  const stationNumbers: unknown = options.stationNumbers ?? true;
  if (typeof stationNumbers !== 'boolean') {
    throw new GirthError('BAD_OPTION', 'stationNumbers', 'stationNumbers: expected true or false', stationNumbers);
  }
  const paper: unknown = options.paper ?? true;
  if (typeof paper !== 'boolean') {
    throw new GirthError('BAD_OPTION', 'paper', 'paper: expected true or false', paper);
  }
  return {
    sheetUnits: units as SheetUnits,
    marginMm,
    overlapMm,
    job: optionalLabel(options.job, 'job'),
    piece: optionalLabel(options.piece, 'piece'),
    textScale,
    stationNumbers,
    paper,
  };
}
