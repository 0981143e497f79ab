/**
 * How the report prints lengths: the unit, feet-inch-fractions or decimals,
 * and least sizes rounded up. Light on purpose (no layout code), so a joint's
 * definition can use it without slowing `girth --help`.
 */
import { formatLength, MM_PER_INCH, type LengthUnit } from '@girth/pipes';
import type { TableLengthFormat } from '@girth/table';

/** How lengths are printed. */
export interface ReportStyle {
  readonly units: LengthUnit;
  readonly tableFormat: TableLengthFormat;
  readonly fraction: 8 | 16 | 32;
}

/**
 * A length as the report prints it.
 * @example reportLength(25.4, { units: 'in', tableFormat: 'ft-in', fraction: 16 }) // '1"'
 */
export function reportLength(mm: number, style: ReportStyle): string {
  return formatLength(mm, { format: style.tableFormat, fraction: style.fraction });
}

/** The step the report rounds to, mm: 1/fraction in, 0.001 in, or 0.1 mm. */
function reportStepMm(style: ReportStyle): number {
  if (style.tableFormat === 'ft-in') return MM_PER_INCH / style.fraction;
  return style.tableFormat === 'in' ? MM_PER_INCH / 1000 : 0.1;
}

/**
 * A least size (stock to cut, plate to buy) as the report prints it: rounded
 * up to the report's step, never down, so what is bought or cut is not short.
 * @example reportLengthAtLeast(100.01, { units: 'mm', tableFormat: 'mm', fraction: 16 }) // "100.1 mm"
 */
export function reportLengthAtLeast(mm: number, style: ReportStyle): string {
  const step = reportStepMm(style);
  return reportLength(Math.ceil(mm / step - 1e-9) * step, style);
}

/**
 * An angle for the report with enough decimals that a small non-zero angle
 * never reads as 0 (a near-cylinder cone's sweep of 0.004°): two decimals,
 * more when needed, at most six.
 * @example reportAngle(126.404) // '126.40'
 */
export function reportAngle(deg: number): string {
  let d = 2;
  while (d < 6 && deg !== 0 && Number(deg.toFixed(d)) === 0) d += 1;
  return deg.toFixed(d);
}
