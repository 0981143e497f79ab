/**
 * Making user text safe to place in SVG: characters XML cannot hold are
 * dropped, line breaks split lines, and text is cut into pieces svgson can
 * wrap in CDATA without being broken out of.
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

/**
 * User text as one line for an attribute: controls dropped, line breaks and
 * tabs as single spaces (svgson escapes `& < > " '` in attributes itself).
 *
 * @example attrText('a\nb') // 'a b'
 */
export function attrText(text: string): string {
  return textLines(text).join(' ');
}

/**
 * One line of text cut so that no piece contains `]]>`.
 *
 * svgson 5.3.1 writes a text node that holds `&`, `<` or `>` as CDATA and
 * splits only the first `]]>` in it, so a second `]]>` would end the CDATA
 * early and let the rest be read as markup. Cutting the text between `]]` and
 * `>` into separate text nodes keeps every piece free of `]]>`; adjacent text
 * nodes read back as the same characters.
 *
 * @example cdataSafePieces('a]]>b') // ['a]]', '>b']
 */
export function cdataSafePieces(line: string): string[] {
  return line.split(']]>').flatMap((piece, i, all) => {
    const head = i > 0 ? '>' + piece : piece;
    const out = i < all.length - 1 ? head + ']]' : head;
    return out === '' ? [] : [out];
  });
}
