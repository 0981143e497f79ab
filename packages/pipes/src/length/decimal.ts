/**
 * Decimal rounding for people: half away from zero, ties honoured even when the
 * binary double sits a hair below the decimal tie.
 */

/**
 * `value` to `decimals` places, rounding half away from zero after a nudge of
 * one part in 10^12, so a decimal tie stored a hair below itself still rounds
 * up (12.75 in = 323.84999999999997 mm reads 323.9). A value that rounds to
 * zero has no minus sign.
 * @example toFixedHalfAway(323.84999999999997, 1) // "323.9"
 * @example toFixedHalfAway(-0.04, 1) // "0.0"
 */
export function toFixedHalfAway(value: number, decimals: number): string {
  const k = 10 ** decimals;
  const rounded = (Math.round(Math.abs(value) * k * (1 + 1e-12)) / k) * Math.sign(value);
  const text = rounded.toFixed(decimals);
  return /^-0(?:\.0*)?$/.test(text) ? text.slice(1) : text;
}
