/**
 * Text made safe for a DXF TEXT entity: one line, printable ASCII, with the
 * DXF special-character codes for the diameter, degree and plus-minus signs.
 */
import { flattenControls } from './internal/flatten-controls.js';
import { MAX_TEXT_CHARS } from './tolerances.js';

/** Characters written as DXF control codes (understood by CAD readers since R12). */
const CONTROL_CODES: Readonly<Record<string, string>> = {
  '\u00D8': '%%c', // Ø
  '\u00F8': '%%c', // ø
  '\u2300': '%%c', // ⌀ diameter sign
  '\u2205': '%%c', // ∅ (often typed for a diameter)
  '\u00B0': '%%d', // °
  '\u00B1': '%%p', // ±
};

/** Letters and signs with a plain ASCII spelling that Unicode decomposition does not give. */
const TRANSLITERATIONS: Readonly<Record<string, string>> = {
  '\u00DF': 'ss', '\u00E6': 'ae', '\u00C6': 'AE', '\u0153': 'oe', '\u0152': 'OE',
  '\u0142': 'l', '\u0141': 'L', '\u0111': 'd', '\u0110': 'D', '\u00F0': 'd', '\u00D0': 'D',
  '\u00FE': 'th', '\u00DE': 'Th', '\u00D7': 'x', '\u00F7': '/', '\u2044': '/',
  '\u2010': '-', '\u2011': '-', '\u2012': '-', '\u2013': '-', '\u2014': '-', '\u2212': '-',
  '\u2018': "'", '\u2019': "'", '\u201A': "'", '\u2032': "'",
  '\u201C': '"', '\u201D': '"', '\u201E': '"', '\u2033': '"',
  '\u2026': '...', '\u2022': '*', '\u00B7': '-', '\u00B5': 'u', '\u03BC': 'u', '\u2122': 'TM',
};

type Token = { readonly kind: 'char'; readonly text: string } | { readonly kind: 'code'; readonly text: string };

/** Splits one input character (a code point) into output tokens. */
function tokensOf(ch: string): Token[] {
  const code = CONTROL_CODES[ch];
  if (code !== undefined) return [{ kind: 'code', text: code }];
  const translit = TRANSLITERATIONS[ch];
  if (translit !== undefined) return [...translit].map((c) => ({ kind: 'char', text: c }));
  if (/^[\x20-\x7E]$/.test(ch)) return [{ kind: 'char', text: ch }];
  // Decompose (é -> e + accent, ½ -> 1⁄2, ² -> 2), drop the accents, map again.
  const decomposed = ch.normalize('NFKD').replace(/[\u0300-\u036F]/g, '');
  if (decomposed !== ch && decomposed.length > 0) return [...decomposed].flatMap(tokensOf);
  if (decomposed.length === 0) return [];
  return [{ kind: 'char', text: '?' }];
}

/** Writes one literal character; `next` is the token after it (for `%` escaping). */
function emitChar(text: string, next: Token | undefined): string {
  if (text === '^') return '^ '; // a caret followed by a letter is a control character to CAD readers
  if (text === '%' && next !== undefined && next.text.startsWith('%')) return '%%%'; // literal percent before another %
  return text;
}

/**
 * Makes any text safe for one DXF TEXT entity.
 *
 * - Each run of line breaks, tabs and other control characters becomes one
 *   space, so a label can never start a new group code or entity.
 * - Ø ø ⌀ ∅ become `%%c`, ° becomes `%%d`, ± becomes `%%p` (DXF control codes).
 * - Accented letters lose their accents, common signs get an ASCII spelling
 *   (½ -> 1/2, × -> x, – -> -), anything else non-ASCII becomes `?`.
 * - A caret is written `^ ` and a percent sign before another `%` as `%%%`, so
 *   neither is read as a control code.
 * - The result is trimmed and cut to {@link MAX_TEXT_CHARS} characters.
 *
 * @param text any string (no limit on content).
 * @returns printable ASCII (0x20-0x7E) without CR or LF; may be empty.
 * @example dxfSafeText('Ø168.3 @ 45°\n0\nLINE') // '%%c168.3 @ 45%%d 0 LINE'
 */
export function dxfSafeText(text: string): string {
  // Plain printable ASCII with no caret or percent sign is already safe: only trimmed and cut.
  if (/^[\x20-\x24\x26-\x5D\x5F-\x7E]*$/.test(text)) {
    const t = text.trim();
    return t.length <= MAX_TEXT_CHARS ? t : t.slice(0, MAX_TEXT_CHARS).trim();
  }
  // Plain ASCII with signs written as control codes (a title's "45°"): each sign becomes its code.
  if (/^[\x20-\x24\x26-\x5D\x5F-\x7E\u00B0\u00B1\u00D8\u00F8\u2205\u2300]*$/.test(text)) {
    const t = text.trim();
    const coded = t.replace(/[\u00B0\u00B1\u00D8\u00F8\u2205\u2300]/g, (ch) => CONTROL_CODES[ch]!);
    if (coded.length <= MAX_TEXT_CHARS) return coded;
  }
  const flat = flattenControls(text).trim();
  const tokens = [...flat].flatMap(tokensOf);
  let out = '';
  for (let i = 0; i < tokens.length; i++) {
    const token = tokens[i]!;
    const piece = token.kind === 'code' ? token.text : emitChar(token.text, tokens[i + 1]);
    if (out.length + piece.length > MAX_TEXT_CHARS) break;
    out += piece;
  }
  return out.trim();
}
