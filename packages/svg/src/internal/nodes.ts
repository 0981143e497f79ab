/**
 * Building the SVG as a svgson tree (`INode`), which svgson then writes out
 * with its attribute values escaped.
 */
import type { INode } from 'svgson';
import { attrText, cdataSafePieces, textLines } from './safe-text.js';

const PRINTABLE_ASCII = /^[\x20-\x7E]*$/;

/** Attribute values; `undefined` leaves the attribute out. */
export type Attrs = Readonly<Record<string, string | undefined>>;

/**
 * An element node. Attribute values are user-safe: controls are dropped here and
 * svgson escapes `& < > " '` when writing.
 *
 * @example el('g', { id: 'cut', class: 'cut' })
 */
export function el(name: string, attributes: Attrs, children: readonly INode[] = []): INode {
  const attrs: Record<string, string> = {};
  for (const [k, v] of Object.entries(attributes)) {
    // Printable ASCII needs no cleaning (svgson escapes it); skipping the clean-up keeps long path data fast.
    if (v !== undefined) attrs[k] = PRINTABLE_ASCII.test(v) ? v : attrText(v);
  }
  return { name, type: 'element', value: '', attributes: attrs, children: [...children] };
}

/**
 * Text nodes holding one line of (already cleaned) text, cut so svgson's CDATA cannot be broken out of.
 *
 * @example textNodes('a]]>b').map((n) => n.value) // ['a]]', '>b']
 */
export function textNodes(line: string): INode[] {
  return cdataSafePieces(line).map((value) => ({ name: '', type: 'text', value, attributes: {}, children: [] }));
}

/**
 * A `<text>` element of user text: one line as plain text, several lines as
 * `<tspan>`s one below the other (each `lineEm` apart).
 *
 * @param x - paper x of every line, as written (sheet units).
 * @param y - paper y of the first baseline, as written (sheet units).
 * @param lineDy - distance between baselines, as written (sheet units).
 * @example textElement('HEEL', { x: '10', y: '20', 'font-size': '5' }, '6.75')
 */
export function textElement(
  text: string,
  attributes: Attrs & { readonly x: string; readonly y: string },
  lineDy: string,
): INode {
  const lines = textLines(text);
  if (lines.length === 1) return el('text', attributes, textNodes(lines[0] as string));
  return el(
    'text',
    attributes,
    lines.map((line, i) => el('tspan', { x: attributes.x, dy: i === 0 ? undefined : lineDy }, textNodes(line))),
  );
}
