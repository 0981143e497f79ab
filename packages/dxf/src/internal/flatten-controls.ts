/**
 * Control characters out of text: each run of them (line breaks, tabs, NUL,
 * C1 controls, Unicode line and paragraph separators) becomes one space.
 */
export function flattenControls(text: string): string {
  return text.replace(/[\u0000-\u001F\u007F-\u009F\u2028\u2029]+/g, ' ');
}
