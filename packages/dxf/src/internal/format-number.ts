/**
 * Numbers as DXF writes them: fixed decimals, trailing zeros dropped, never
 * exponent notation, never `-0`, never NaN.
 */
import { GirthError } from '@girth/pipes';

/** Powers of ten 10^0 … 10^6, exact doubles. */
const SCALES: readonly number[] = [1, 10, 100, 1000, 10000, 100000, 1000000];
const ZEROS = '000000';
/** Below this many units of the last place, every decimal of up to 15 digits maps to its own double. */
const EXACT_UNITS = 1e15;

/**
 * The plain decimal text of the integer `n` times 10^-decimals, trailing zeros
 * dropped (`n` a whole number, 0 < |n| < 1e15, decimals 0–6). With at most 15
 * significant digits this is exactly the shortest text `String(n / 10^decimals)`
 * writes, built from two small integers instead of a shortest-digits search.
 */
function scaledIntegerText(n: number, decimals: number, scale: number): string {
  const neg = n < 0;
  const m = neg ? -n : n;
  let whole = Math.floor(m / scale);
  let frac = m - whole * scale;
  if (frac < 0) {
    whole -= 1;
    frac += scale;
  } else if (frac >= scale) {
    whole += 1;
    frac -= scale;
  }
  let s = String(whole);
  if (frac !== 0) {
    let digits = decimals;
    while (frac % 10 === 0) {
      frac /= 10;
      digits -= 1;
    }
    const f = String(frac);
    s += '.' + ZEROS.slice(0, digits - f.length) + f;
  }
  return neg ? '-' + s : s;
}

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
    const n = Math.round(value * scale);
    if (n === 0) return '0';
    // Faster still, same text: whole decimals 0–6 and at most 15 significant digits.
    if (scale === SCALES[decimals] && n < EXACT_UNITS && n > -EXACT_UNITS) return scaledIntegerText(n, decimals, scale);
    const r = n / scale;
    if (Math.abs(r) < 1e21) return r === 0 ? '0' : String(r);
  }
  let s = value.toFixed(decimals);
  if (s.includes('.')) s = s.replace(/\.?0+$/, '');
  return s === '-0' ? '0' : s;
}
