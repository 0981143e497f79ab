/**
 * A template drawn as an SVG sheet at true physical size: the sheet planned by
 * `planSheet` of `@girth/sheet`, written by {@link planToSvg}.
 */
import { planSheet } from '@girth/sheet';
import type { Template } from '@girth/unroll';
import type { SvgOptions } from './types.js';
import { resolveSvgOptions } from './options.js';
import { planToSvg } from './plan-to-svg.js';

/**
 * Draws a template as an SVG sheet at true physical size.
 *
 * The sheet's `width` and `height` are in mm (or in, with `sheetUnits: 'in'`) and its
 * `viewBox` matches them, so one user unit is one mm (or one inch) and the sheet prints at
 * true size at 100 %. Template coordinates (mm, y-up) are flipped to SVG's y-down.
 * Groups with stable ids: `overlap`, `marks`, `stations`, `square-line`, `cut`, `labels`,
 * `title-block`, `calibration` (always present, empty when there is nothing to draw).
 * Every sheet carries the job and piece, the template's title and notes, how it goes on
 * the pipe, a calibration bar of 100 mm (4 in) and a caution. Wraps get a glue tab of
 * `overlapMm` past the stretch-out. All user text is escaped; numbers are rounded to
 * 0.001 mm (0.00001 in).
 *
 * @param template - the template to draw (mm, y-up), as made by `@girth/unroll`.
 * @param options - sheet units, margin (mm, 0–100, default 10), glue tab (mm, 0–200,
 *   default 25), job and piece labels (text, at most 200 characters).
 * @returns the SVG document as a string (UTF-8, with an XML declaration).
 * @throws GirthError for bad options (see `resolveSvgOptions`: `UNKNOWN_UNIT`, `OUT_OF_RANGE`,
 *   `NOT_A_NUMBER`, `NOT_FINITE`, `BAD_OPTION`) and for a template that cannot be drawn (see
 *   `checkTemplate`: a NaN or infinite coordinate gives `NOT_A_NUMBER` / `NOT_FINITE` with the
 *   field path, e.g. `template.cut[0].points[14][1]`).
 * @example
 * ```ts
 * const svg = templateToSvg(template, { job: 'J-2291', piece: 'Spool 14 / B', sheetUnits: 'mm' });
 * // '<?xml version="1.0" encoding="UTF-8"?>\n<svg ... width="608.658mm" ... viewBox="0 0 608.658 ...">'
 * ```
 */
export function templateToSvg(template: Template, options?: SvgOptions): string {
  return planToSvg(planSheet(template, resolveSvgOptions(options)));
}
