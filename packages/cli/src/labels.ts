/**
 * Job and piece labels: printed on every sheet, in file names and in the
 * summary, so they must be plain printable text.
 */
import { GirthError } from '@girth/pipes';

/** Longest label, characters: a title block line. */
export const MAX_LABEL_CHARS = 200;

/** Control characters (C0, DEL, C1): they would move the cursor or recolour the terminal when echoed. */
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/u;

/**
 * The label when it is printable text of at most {@link MAX_LABEL_CHARS}
 * characters; `undefined` passes through.
 * @throws GirthError `BAD_TEXT` naming the field, for control characters (a
 *   tab, a line break, an escape) or a label too long.
 * @example checkLabel('SP-03 tee', '--piece') // 'SP-03 tee'
 */
export function checkLabel<T extends string | undefined>(label: T, field: string): T {
  if (label === undefined) return label;
  const at = label.search(CONTROL);
  if (at >= 0) {
    const code = label.codePointAt(at)!.toString(16).toUpperCase().padStart(4, '0');
    throw new GirthError('BAD_TEXT', field, `${field}: character ${at + 1} is a control character (U+${code}); a label is one line of printable text`, printable(label));
  }
  const chars = [...(label as string)].length;
  if (chars > MAX_LABEL_CHARS) throw new GirthError('BAD_TEXT', field, `${field}: at most ${MAX_LABEL_CHARS} characters, got ${chars}`, label);
  if (label.trim() === '') throw new GirthError('EMPTY_INPUT', field, `${field}: blank; give the label as text, e.g. "SP-03 tee"`, label);
  return label;
}

/**
 * Text made safe to print on a terminal: every control character written as
 * `\u001B` instead of being sent raw.
 * @example printable('a\u001b[31m') // 'a\\u001B[31m'
 */
export function printable(text: string): string {
  return text.replace(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/gu, (c) => `\\u${c.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`);
}
