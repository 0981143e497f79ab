/**
 * Writing SVG markup straight into a string: elements, attributes and text,
 * every piece of user text escaped. No tree is built on the way.
 */
import { attrText, textLines } from './safe-text.js';

const PRINTABLE_ASCII = /^[\x20-\x7E]*$/;

/** Attribute values; `undefined` leaves the attribute out. */
export type Attrs = Readonly<Record<string, string | undefined>>;

/**
 * An attribute value or text escaped for XML: `&`, `<`, `>`, `"` and `'` become
 * entities (so neither markup nor a closing quote can come from user text).
 *
 * @example escapeXml('a"<b>') // 'a&quot;&lt;b&gt;'
 */
export function escapeXml(s: string): string {
  return /[&<>"']/.test(s)
    ? s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&apos;')
    : s;
}

/**
 * An element as markup; `<name …/>` when it has no children. Attribute values
 * are cleaned of characters XML cannot hold and escaped.
 *
 * @example el('g', { id: 'cut' }) // '<g id="cut"/>'
 */
export function el(name: string, attributes: Attrs, children: readonly string[] = []): string {
  let s = '<' + name;
  for (const k in attributes) {
    const v = attributes[k];
    // Printable ASCII needs no cleaning; skipping it keeps long path data fast.
    if (v !== undefined) s += ` ${k}="${escapeXml(PRINTABLE_ASCII.test(v) ? v : attrText(v))}"`;
  }
  return children.length === 0 ? s + '/>' : s + '>' + children.join('') + '</' + name + '>';
}

/**
 * One line of (already cleaned) text as escaped character data.
 *
 * @example textData('a]]>b') // 'a]]&gt;b'
 */
export function textData(line: string): string {
  return escapeXml(line);
}

/**
 * A `<text>` element of user text: one line as plain text, several lines as
 * `<tspan>`s one below the other (each `lineDy` apart).
 *
 * @param attributes - `x` and `y` (first baseline) as written, and the rest.
 * @param lineDy - distance between baselines, as written (sheet units).
 * @example textElement('HEEL', { x: '10', y: '20', 'font-size': '5' }, '6.75')
 */
export function textElement(text: string, attributes: Attrs & { readonly x: string; readonly y: string }, lineDy: string): string {
  const lines = textLines(text);
  if (lines.length === 1) return el('text', attributes, [textData(lines[0] as string)]);
  return el(
    'text',
    attributes,
    lines.map((line, i) => el('tspan', { x: attributes.x, dy: i === 0 ? undefined : lineDy }, [textData(line)])),
  );
}
