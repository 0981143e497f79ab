/**
 * Cleaning user text into lines any writer can hold.
 */

/**
 * Characters removed from user text: C0/C1 controls (tab, CR and LF are handled
 * apart), lone surrogates, the non-characters U+FFFE/U+FFFF (none of which XML 1.0
 * can carry) and the bidirectional embedding, override and isolate controls
 * (which could make a label read differently from what was typed).
 */
const DROPPED = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/**
 * User text as lines XML can hold: controls dropped, tabs as spaces, split at
 * CR LF, CR or LF. Always at least one line (possibly empty).
 *
 * @example textLines('Spool 7\r\nB\u0007') // ['Spool 7', 'B']
 */
export function textLines(text: string): string[] {
  return text
    .replace(DROPPED, '')
    .replace(/\t/g, ' ')
    .split(/\r\n|\r|\n/);
}

