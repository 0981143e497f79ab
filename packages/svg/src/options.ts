/**
 * Checking and defaulting the options of the SVG exporter (the sheet plan's
 * options, checked by `resolveSheetOptions` of `@girth/sheet`).
 */
import { resolveSheetOptions } from '@girth/sheet';
import type { ResolvedSvgOptions, SvgOptions } from './types.js';

export { DEFAULT_MARGIN_MM, DEFAULT_OVERLAP_MM, MAX_LABEL_CHARS, MAX_MARGIN_MM, MAX_OVERLAP_MM } from '@girth/sheet';

/**
 * Checks the options of {@link templateToSvg} and fills in the defaults.
 *
 * @param options - as given by the caller; `undefined` means all defaults.
 * @returns every option, checked: `sheetUnits` 'mm' | 'in' (default 'mm'),
 *   `marginMm` in [0, 100] (default 10), `overlapMm` in [0, 200] (default 25),
 *   `job` and `piece` text of at most 200 characters or `undefined`.
 * @throws GirthError `UNKNOWN_UNIT` (field `sheetUnits`) for units other than 'mm' or 'in';
 *   `NOT_A_NUMBER`, `NOT_FINITE` or `OUT_OF_RANGE` (field `marginMm` / `overlapMm`) for a length
 *   that is not a number or lies outside its range; `BAD_OPTION` (field `job` / `piece`) for a
 *   label that is not text or is longer than 200 characters.
 * @example
 * ```ts
 * resolveSvgOptions({ sheetUnits: 'in' }).overlapMm; // 25
 * resolveSvgOptions({ overlapMm: 250 }); // throws GirthError OUT_OF_RANGE, field overlapMm
 * ```
 */
export function resolveSvgOptions(options: SvgOptions = {}): ResolvedSvgOptions {
  const o = resolveSheetOptions({
    ...(options.sheetUnits === undefined ? {} : { sheetUnits: options.sheetUnits }),
    ...(options.marginMm === undefined ? {} : { marginMm: options.marginMm }),
    ...(options.overlapMm === undefined ? {} : { overlapMm: options.overlapMm }),
    ...(options.job === undefined ? {} : { job: options.job }),
    ...(options.piece === undefined ? {} : { piece: options.piece }),
  });
  return { sheetUnits: o.sheetUnits, marginMm: o.marginMm, overlapMm: o.overlapMm, job: o.job, piece: o.piece };
}
