/**
 * CSV as RFC 4180 writes it: fields separated by commas, records by CR LF, a
 * field quoted when it holds a comma, a double quote, CR or LF, with each
 * double quote doubled.
 */

/** Characters that start a formula in spreadsheet programs (OWASP, "CSV Injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;

/** One field, quoted when RFC 4180 requires it. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/**
 * A text field (a heading or label, not a number): prefixed with `'` when it
 * would start a spreadsheet formula, then quoted as RFC 4180 requires.
 */
export function csvTextField(value: string): string {
  return csvField(FORMULA_START.test(value) ? `'${value}` : value);
}

/** Records joined with CR LF, ending with CR LF (RFC 4180, section 2). */
export function csvRecords(records: ReadonlyArray<readonly string[]>): string {
  return records.map((r) => r.join(',')).join('\r\n') + '\r\n';
}
