/**
 * Normalises what a fitter types (or pastes from a spreadsheet or a phone) into
 * plain ASCII the parsers read: typographic primes and quotes become `'` and
 * `"`, Unicode minus signs and dashes become `-`, vulgar fractions such as `½`
 * become ` 1/2`, `×` becomes `x`, runs of whitespace become one space, and
 * everything is lower case. Internal to the package.
 */

const VULGAR_FRACTIONS: Readonly<Record<string, string>> = {
  '¼': '1/4',
  '½': '1/2',
  '¾': '3/4',
  '⅛': '1/8',
  '⅜': '3/8',
  '⅝': '5/8',
  '⅞': '7/8',
};

/**
 * The text trimmed, lower-cased and reduced to the ASCII marks the parsers know.
 * @example normalizeInputText(' 2′–1½″ ') // "2'-1 1/2\""
 */
export function normalizeInputText(text: string): string {
  return text
    .replace(/[\u2032\u2018\u2019\u00b4\u0060]/g, "'")
    .replace(/[\u2033\u201c\u201d]/g, '"')
    .replace(/[\u2212\u2010\u2011\u2012\u2013\u2014]/g, '-')
    .replace(/\u2044/g, '/')
    .replace(/\u00d7/g, 'x')
    .replace(/[\u00bc-\u00be\u2150-\u215e]/g, (c) => {
      const f = VULGAR_FRACTIONS[c];
      return f === undefined ? c : ` ${f}`;
    })
    .replace(/\s+/g, ' ')
    .trim()
    .toLowerCase();
}
