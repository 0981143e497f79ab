/**
 * Numbers as written into the SVG.
 */
import { GirthError } from '@girth/pipes';
import type { SheetUnits } from '../types.js';

/** Millimetres in one inch (exact by definition). */
export const MM_PER_IN = 25.4;

/**
 * Decimal places written per sheet unit: 0.001 mm, and 0.00001 in (0.000254 mm),
 * so both keep at least a thousandth of a millimetre.
 */
const DECIMALS: Readonly<Record<SheetUnits, number>> = { mm: 3, in: 5 };

/** Writes lengths given in mm as numbers in sheet units. */
export interface NumberWriter {
  readonly units: SheetUnits;
  /** A length in mm, in sheet units, rounded; `-0` becomes `0`, never exponent notation. */
  readonly len: (mm: number) => string;
  /** A plain number (e.g. a scale-free count), rounded the same way. */
  readonly num: (value: number) => string;
}

/**
 * A writer of numbers for the given sheet units.
 *
 * @throws GirthError `NOT_FINITE` (field `svg`) if asked to write a non-finite number; inputs
 *   are checked before drawing, so this only guards against a fault in the exporter itself.
 * @example numberWriter('in').len(25.4) // '1'
 */
export function numberWriter(units: SheetUnits): NumberWriter {
  const scale = 10 ** DECIMALS[units];
  const perMm = units === 'in' ? 1 / MM_PER_IN : 1;
  const num = (value: number): string => {
    if (!Number.isFinite(value)) {
      throw new GirthError('NOT_FINITE', 'svg', `svg: refusing to write the non-finite number ${value}`, value);
    }
    const r = Math.round(value * scale) / scale;
    return r === 0 ? '0' : String(r);
  };
  return { units, num, len: (mm: number) => num(mm * perMm) };
}
