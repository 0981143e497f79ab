/**
 * Lengths and angles as the title block of a template states them: mm with
 * one decimal and inches with three, e.g. `387.4 mm (15.250 in)`. Station
 * tables are formatted by the exporters in the job's unit, not here.
 */

const MM_PER_IN = 25.4;

/** Rounds half away from zero at `decimals`, nudged past binary representation error (12.75 in = 323.84999… mm reads 323.9). */
function fixed(value: number, decimals: number): string {
  const k = 10 ** decimals;
  return ((Math.round(Math.abs(value) * k * (1 + 1e-12)) / k) * Math.sign(value)).toFixed(decimals);
}

/**
 * `mm` as `"387.4 mm (15.250 in)"`.
 * @example formatLengthMm(387.35) // "387.4 mm (15.250 in)"
 */
export function formatLengthMm(mm: number): string {
  return `${fixed(mm, 1)} mm (${fixed(mm / MM_PER_IN, 3)} in)`;
}

/**
 * Degrees with at most two decimals and no trailing zeros: `45°`, `22.5°`.
 * @example formatAngleDeg(22.5) // "22.5°"
 */
export function formatAngleDeg(deg: number): string {
  return `${Number(deg.toFixed(2))}°`;
}
