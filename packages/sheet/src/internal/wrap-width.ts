/**
 * Breaks a line of text into lines that print no wider than a given width, by
 * the same width estimate the sheet is sized with.
 */
import { textWidthMm } from './text-metrics.js';

/**
 * `text` as lines each printing at most `widthMm` wide at `fontMm` (by
 * `textWidthMm`), broken at spaces; a word wider than the width on its own is
 * split between characters. Blank text gives no lines.
 *
 * @example wrapToWidth('Wrap on the OD of the pipe', 30, 3) // ['Wrap on the OD of', 'the pipe']
 */
export function wrapToWidth(text: string, widthMm: number, fontMm: number, bold = false): string[] {
  const fits = (s: string): boolean => textWidthMm(s, fontMm, bold) <= widthMm;
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(/\s+/).filter((w) => w.length > 0)) {
    const joined = current ? `${current} ${word}` : word;
    if (fits(joined)) {
      current = joined;
      continue;
    }
    if (current) lines.push(current);
    current = '';
    let rest = word;
    // A word too wide on its own: split it between characters (at least one per line).
    while (!fits(rest)) {
      const chars = [...rest];
      let n = 1;
      while (n < chars.length && fits(chars.slice(0, n + 1).join(''))) n++;
      lines.push(chars.slice(0, n).join(''));
      rest = chars.slice(n).join('');
    }
    current = rest;
  }
  if (current) lines.push(current);
  return lines;
}
