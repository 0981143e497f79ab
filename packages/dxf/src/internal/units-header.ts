/**
 * How a Girth DXF says its unit, in each version.
 */
import type { DxfUnits } from '../types.js';

/** `$INSUNITS` values (drawing units, AC1021 only: R12 does not define the variable): 1 inches, 4 millimetres. */
export const INSUNITS_CODE = { in: 1, mm: 4 } as const;

/** `$MEASUREMENT` values (0 English, 1 metric; AC1021 only, R12 does not define it): what Inkscape's DXF import reads. */
export const MEASUREMENT_CODE = { in: 0, mm: 1 } as const;

/**
 * The comment line a file starts with, naming the unit in words for a reader
 * (or a person) that knows no header variable for it.
 *
 * @example unitComment('in') // 'Girth flat pattern, units: inches'
 */
export function unitComment(units: DxfUnits): string {
  return `Girth flat pattern, units: ${units === 'in' ? 'inches' : 'millimetres'}`;
}
