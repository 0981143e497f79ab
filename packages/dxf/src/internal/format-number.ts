/**
 * Numbers as DXF writes them: fixed decimals, trailing zeros dropped, never
 * exponent notation, never `-0`, never NaN.
 */
import { GirthError } from '@girth/pipes';

/**
 * `value` rounded to `decimals` places as plain decimal text.
 * @throws GirthError `NOT_FINITE` if a non-finite number slipped through (a bug, reported not written).
 */
export function formatDxfNumber(value: number, decimals: number): string {
  if (!Number.isFinite(value)) {
    throw new GirthError('NOT_FINITE', 'dxf', `dxf: refusing to write the non-finite number ${String(value)}`, value);
  }
  if (decimals <= 6) {
    // Fast path: a multiple of 10^-decimals is either 0 or at least 1e-6 in size,
    // and String() writes such numbers (below 1e21) in plain decimals, shortest form.
    const scale = 10 ** decimals;
    const r = Math.round(value * scale) / scale;
    if (Math.abs(r) < 1e21) return r === 0 ? '0' : String(r);
  }
  let s = value.toFixed(decimals);
  if (s.includes('.')) s = s.replace(/\.?0+$/, '');
  return s === '-0' ? '0' : s;
}
