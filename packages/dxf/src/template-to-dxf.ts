/**
 * The DXF exporter's entry point: a template to the text of a DXF file.
 */
import type { Template } from '@girth/unroll';
import { buildSheet } from './internal/build-sheet.js';
import { resolveDxfOptions } from './internal/options.js';
import { writeAc1021 } from './internal/write-ac1021.js';
import { writeR12 } from './internal/write-r12.js';
import type { DxfOptions } from './types.js';

/**
 * A template as a DXF file for a cutting table or CAD, full size.
 *
 * Layers: `CUT` (lines to cut), `MARK` (square line, station lines, other
 * marks), `TEXT` (labels, station numbers, title, job and piece, a caution).
 * Cut pieces that meet end to start become one polyline; a contour that closes
 * (a header hole, a flat pattern) is ONE closed polyline, arcs as bulges; a
 * lone arc stays a true ARC. All text is one-line printable ASCII (see
 * {@link dxfSafeText}), so no label can add entities to the file.
 *
 * @param template a developed template, lengths in mm (from `@girth/unroll`).
 * @param options units (`'mm'` default, or `'in'`: coordinates divided by 25.4),
 *   version (`'AC1021'` default, or `'R12'`), job and piece text, text height
 *   (0, 100] mm, station numbers on/off, join tolerance (0, 1] mm.
 * @returns the whole DXF file as a string, ending in `EOF` and a line break.
 *   Nothing is written anywhere; the caller saves it.
 * @throws GirthError `NOT_A_NUMBER` / `NOT_FINITE` for a NaN or infinite
 *   coordinate, `OUT_OF_RANGE` for a coordinate beyond 1 km, a zero radius or
 *   a degenerate polyline, `EMPTY_INPUT` when there is nothing to cut,
 *   `BAD_OPTION` for unknown options values; the field names the culprit, e.g.
 *   `template.cut[0].points[17][1]`.
 * @example
 * ```ts
 * const dxf = templateToDxf(template, { units: 'in', version: 'R12', job: 'J-2291', piece: 'SP-14' });
 * ```
 */
export function templateToDxf(template: Template, options?: DxfOptions): string {
  const o = resolveDxfOptions(options);
  const sheet = buildSheet(template, o);
  return o.version === 'R12' ? writeR12(sheet) : writeAc1021(sheet);
}
