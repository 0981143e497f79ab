/**
 * Making user text safe to place in SVG: characters XML cannot hold are
 * dropped (by `textLines` of `@girth/sheet`) and line breaks split lines;
 * `internal/xml.ts` escapes what is left.
 */

import { textLines } from '@girth/sheet';

export { textLines };

/**
 * User text as one line for an attribute: controls dropped, line breaks and
 * tabs as single spaces (escaped when written).
 *
 * @example attrText('a\nb') // 'a b'
 */
export function attrText(text: string): string {
  return textLines(text).join(' ');
}
