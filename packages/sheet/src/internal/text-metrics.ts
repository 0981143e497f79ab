/**
 * A safe over-estimate of how wide a line of text prints, so the sheet can be
 * made large enough without a font at hand. Widths are those of DejaVu Sans
 * (the widest of the fonts named) rounded up, in em.
 */

const NARROW = new Set([...' !\'(),-./:;I[\\]`fijlrt{|}']);
const WIDE = new Set([...'MW@%mw—']);

function charEm(ch: string): number {
  if (NARROW.has(ch)) return 0.45;
  if (WIDE.has(ch)) return 1.05;
  if (/[0-9"_]/.test(ch)) return 0.7;
  if (/[A-Z#$&+<=>?^~]/.test(ch)) return 0.9;
  if (/[a-z]/.test(ch)) return 0.65;
  const cp = ch.codePointAt(0) ?? 0;
  // CJK, emoji and other wide scripts: a full em and a little more.
  if (cp >= 0x1100) return 1.1;
  return 0.8;
}

/** `charEm` of every ASCII character, looked up instead of tested. */
const ASCII_EM: readonly number[] = Array.from({ length: 128 }, (_, cp) => charEm(String.fromCharCode(cp)));

/** Bold type prints wider than regular (DejaVu Sans Bold up to 13 % wider): allowance on the estimate. */
export const BOLD_FACTOR = 1.15;

/**
 * Estimated printed width of one line of text, mm (never less than the real width in
 * DejaVu Sans, Verdana or Arial).
 *
 * @param text - one line, already cleaned of controls.
 * @param fontMm - font size, mm.
 * @param bold - true for bold type.
 * @example textWidthMm('HEEL', 5) // 16
 */
export function textWidthMm(text: string, fontMm: number, bold = false): number {
  let em = 0;
  for (let i = 0; i < text.length; i++) {
    const cp = text.charCodeAt(i);
    if (cp < 128) em += ASCII_EM[cp] as number;
    else if (cp >= 0xdc00 && cp <= 0xdfff && i > 0 && text.charCodeAt(i - 1) >= 0xd800 && text.charCodeAt(i - 1) <= 0xdbff) continue;
    else em += charEm(String.fromCodePoint(text.codePointAt(i) as number));
  }
  return em * fontMm * (bold ? BOLD_FACTOR : 1);
}
