/**
 * The DXF exporter's entry points: a template, or a sheet plan, to the text of a DXF file.
 */
import { planSheet, type SheetPlan } from '@girth/sheet';
import { closeTemplate, onDevelopmentSurface, type Template } from '@girth/unroll';
import { planToSheet } from './internal/build-sheet.js';
import { fitTemplateArcs } from './internal/fit-template.js';
import { DEFAULT_TEXT_HEIGHT_MM, resolveDxfOptions } from './internal/options.js';
import { MM_PER_INCH } from '@girth/pipes';
import { ARC_SAMPLE_SHARE } from './tolerances.js';
import { writeAc1021 } from './internal/write-ac1021.js';
import { writeR12 } from './internal/write-r12.js';
import type { DxfOptions, DxfWriteOptions } from './types.js';

/**
 * Writes a sheet plan as a DXF file, full size.
 *
 * Layers: `CUT` (the plan's `cut` layer), `MARK` (`mark`: square line, station
 * lines, other marks), `TEXT` (`text`: labels, station numbers, title block,
 * caution). The plan's `paper` items (glue tab, calibration bar) are left out.
 * Cut pieces that meet end to start become one polyline; a contour that closes
 * (a header hole, a flat pattern) is ONE closed polyline, arcs as bulges; a
 * lone arc stays a true ARC. Text sits where the plan put it: centred texts are
 * centred on their baseline point, the rest start there; its height is the
 * plan's cap height. All text is one-line printable ASCII (see {@link dxfSafeText}).
 *
 * @param plan a plan from `planSheet` of `@girth/sheet` (already checked).
 * @param options units (`'mm'` default, or `'in'`: coordinates divided by 25.4),
 *   version (`'AC1021'` default, or `'R12'`), join tolerance (0, 1] mm.
 * @returns the whole DXF file as a string, ending in `EOF` and a line break.
 * @throws GirthError `BAD_OPTION` / `OUT_OF_RANGE` for bad options.
 * @example
 * ```ts
 * const dxf = planToDxf(planSheet(template, { job: 'J-2291' }), { units: 'in', version: 'R12' });
 * ```
 */
export function planToDxf(plan: SheetPlan, options?: DxfWriteOptions): string {
  const o = resolveDxfOptions(options);
  const sheet = planToSheet(plan, { units: o.units, joinEpsMm: o.joinEpsMm, text: o.text });
  return o.version === 'R12' ? writeR12(sheet) : writeAc1021(sheet);
}

/** A length for the notes, the output unit first. */
function noteLength(mm: number, units: 'mm' | 'in'): string {
  return units === 'in' ? `${(mm / MM_PER_INCH).toFixed(4)} in (${mm.toFixed(3)} mm)` : `${mm.toFixed(3)} mm`;
}

/** The template with arc-fitted cut lines and a note saying so and how close they are. */
function withArcs(template: Template, toleranceMm: number, units: 'mm' | 'in'): Template {
  const fit = fitTemplateArcs(template, toleranceMm * ARC_SAMPLE_SHARE);
  if (fit.fittedCount === fit.chordCount) return fit.template;
  const note =
    `Cut lines fitted with arcs: ${fit.fittedCount} arcs and lines for ${fit.chordCount} chords; ` +
    `largest distance from the sampled cut ${noteLength(fit.maxDeviationMm, units)}, limit ${noteLength(toleranceMm, units)} from the true cut.`;
  return { ...fit.template, notes: [...fit.template.notes, note] };
}

/**
 * A template as a DXF file for a cutting table or CAD, full size: its sheet
 * planned by `planSheet` (the same plan the SVG writes), written by {@link planToDxf}.
 *
 * @param template a developed template, lengths in mm (from `@girth/unroll`).
 * @param options units (`'mm'` default, or `'in'`: coordinates divided by 25.4),
 *   version (`'AC1021'` default, or `'R12'`), job and piece text, title text cap
 *   height (0, 100] mm (default that of the sheet, 2.92 mm; the rest of the title
 *   block scales with it), station numbers on/off, join tolerance (0, 1] mm;
 *   for a cutting table: `closedParts` (every part one closed contour, `stubMm`
 *   the stub of a single-cut wrap), `surface: 'mid'` with `plateThicknessMm`
 *   (developed on the mid-thickness of a rolled plate; the sheet's notes say
 *   so), `text` (`'text'`, `'none'`, or `'stroke'` single-stroke lines on MARK),
 *   `curves: 'arcs'` (cut lines fitted with arcs within `arcToleranceMm`, default
 *   0.05 mm, of the true cut; the notes give the count and the largest deviation).
 * @returns the whole DXF file as a string, ending in `EOF` and a line break.
 *   Nothing is written anywhere; the caller saves it.
 * @throws GirthError `NOT_A_NUMBER` / `NOT_FINITE` for a NaN or infinite
 *   coordinate, `OUT_OF_RANGE` for a coordinate beyond 1 km, a zero radius or
 *   a degenerate polyline, `EMPTY_INPUT` when there is nothing to cut,
 *   `BAD_OPTION` for unknown options values; the field names the culprit, e.g.
 *   `template.cut[0].points[17][1]`; `OUT_OF_RANGE` (`options.stubMm`) for a stub
 *   not longer than the cut; `MISSING_INPUT` / `NEGATIVE` / `WALL_TOO_THICK`
 *   (`options.plateThicknessMm`) for a missing or impossible plate.
 * @example
 * ```ts
 * const dxf = templateToDxf(template, { units: 'in', version: 'R12', job: 'J-2291', piece: 'SP-14' });
 * ```
 */
export function templateToDxf(template: Template, options?: DxfOptions): string {
  const o = resolveDxfOptions(options);
  const developed =
    options?.surface === undefined ? template : onDevelopmentSurface(template, { surface: options.surface, ...(options.plateThicknessMm === undefined ? {} : { plateThicknessMm: options.plateThicknessMm }) });
  const closed = options?.closedParts === true ? closeTemplate(developed, options.stubMm === undefined ? {} : { stubMm: options.stubMm }) : developed;
  const part = o.curves === 'arcs' ? withArcs(closed, o.arcToleranceMm, o.units) : closed;
  const plan = planSheet(part, {
    sheetUnits: o.units,
    ...(o.job === '' ? {} : { job: o.job }),
    ...(o.piece === '' ? {} : { piece: o.piece }),
    textScale: o.textHeightMm / DEFAULT_TEXT_HEIGHT_MM,
    stationNumbers: o.stationNumbers,
    // The DXF leaves the paper layer out: not planning it saves the work, and moves nothing else.
    paper: false,
  });
  return planToDxf(plan, { units: o.units, version: o.version, joinEpsMm: o.joinEpsMm, text: o.text });
}
