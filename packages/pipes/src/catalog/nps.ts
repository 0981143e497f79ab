/**
 * Nominal pipe size designations: `'1/8'`, `'1-1/2'`, `'16'` and their values
 * in inches.
 */

/**
 * The value of an NPS designation as written in the tables (`'1-1/2'` is 1.5,
 * `'3/4'` is 0.75, `'16'` is 16), or `undefined` if it is not of that form.
 * @example npsDesignationValue('2-1/2') // 2.5
 */
export function npsDesignationValue(designation: string): number | undefined {
  const m = /^(?:(\d+)-(\d+)\/(\d+)|(\d+)\/(\d+)|(\d+))$/.exec(designation);
  if (m === null) return undefined;
  if (m[6] !== undefined) return Number(m[6]);
  if (m[4] !== undefined) return Number(m[4]) / Number(m[5]);
  return Number(m[1]) + Number(m[2]) / Number(m[3]);
}

/** `npsDesignationValue` for table literals: throws on a malformed designation. */
export function npsValueOf(designation: string): number {
  const v = npsDesignationValue(designation);
  if (v === undefined) throw new Error(`pipe catalog: malformed NPS designation "${designation}"`);
  return v;
}
