/**
 * Text for the standard PDF fonts, which cover WinAnsi only: characters they
 * lack are written the way a fitter would type them.
 */
import type { PDFFont } from 'pdf-lib';

/** Stand-ins for characters outside WinAnsi (checked against pdf-lib 1.17.1's Helvetica). */
const STAND_INS: Readonly<Record<string, string>> = {
  '\u2300': '\u00d8', // diameter sign -> O with stroke
  '\u2032': "'",
  '\u2033': '"',
  '\u2248': '~',
  '\u2192': '->',
  '\u2190': '<-',
  '\u2191': '^',
  '\u2193': 'v',
  '\u2264': '<=',
  '\u2265': '>=',
  '\u2212': '-',
  '\u2044': '/',
  '\u2009': ' ',
  '\u202f': ' ',
  '\u00a0': ' ',
};

const cache = new WeakMap<PDFFont, ReadonlySet<number>>();

/**
 * `text` with every character the font cannot show replaced: a known
 * stand-in, else `?`.
 * @example printable(helvetica, '45\u00b0 \u2300 10') // '45° Ø 10'
 */
export function printable(font: PDFFont, text: string): string {
  let set = cache.get(font);
  if (set === undefined) {
    set = new Set(font.getCharacterSet());
    cache.set(font, set);
  }
  let out = '';
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    if (set.has(cp)) out += ch;
    else out += STAND_INS[ch] ?? (ch.normalize('NFKD').split('').every((c) => set.has(c.codePointAt(0)!)) ? ch.normalize('NFKD') : '?');
  }
  return out;
}
