/**
 * Options and units of the SVG exporter.
 */

import type { SheetUnits } from '@girth/sheet';

/** Units of the sheet: the SVG's `width`/`height` and its user unit (1 user unit = 1 mm or 1 in). */
export type { SheetUnits };

/**
 * Options of {@link templateToSvg}. Every field is optional; lengths are in mm
 * whatever the sheet units.
 */
export interface SvgOptions {
  /** Units of the sheet: `'mm'` (default) or `'in'`. The drawing is at true size either way. */
  readonly sheetUnits?: SheetUnits;
  /** Blank paper around everything drawn, mm, 0 to 100. Default 10 (most printers cannot print the outer 5 mm). */
  readonly marginMm?: number;
  /**
   * Wraps only: how far the paper runs past the stretch-out as a glue tab, mm,
   * 0 to 200. Default 25. 0 draws no tab. Hole templates and flat patterns have none.
   */
  readonly overlapMm?: number;
  /** The job, as the user wrote it (e.g. `J-2291 Cooling water tie-in`). At most 200 characters. */
  readonly job?: string;
  /** The piece or spool, as the user wrote it (e.g. `Spool 14, branch B`). At most 200 characters. */
  readonly piece?: string;
}

/** {@link SvgOptions} with every default filled in and every value checked. */
export interface ResolvedSvgOptions {
  readonly sheetUnits: SheetUnits;
  readonly marginMm: number;
  readonly overlapMm: number;
  /** The job, or `undefined` when not given (the sheet then leaves a blank to write on). */
  readonly job: string | undefined;
  readonly piece: string | undefined;
}
