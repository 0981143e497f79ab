/**
 * Reading an SVG back for tests, with svgson. svgson 5.3.1 does not decode XML
 * entities (`&amp;` stays `&amp;`) and gives CDATA content as plain text nodes,
 * so the two cannot be told apart after parsing. Here CDATA sections are first
 * rewritten as escaped text (a CDATA section ends at its first `]]>`, as XML
 * says), then every text and attribute value is decoded.
 */
import { parseSync, type INode } from 'svgson';

const NAMED: Readonly<Record<string, string>> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

/** XML entities (the five named ones and numeric references) decoded. */
export function decodeEntities(s: string): string {
  return s.replace(/&(#x[0-9a-fA-F]+|#[0-9]+|[a-z]+);/g, (all, ref: string) => {
    if (ref.startsWith('#x')) return String.fromCodePoint(parseInt(ref.slice(2), 16));
    if (ref.startsWith('#')) return String.fromCodePoint(parseInt(ref.slice(1), 10));
    return NAMED[ref] ?? all;
  });
}

function decodeTree(node: INode): INode {
  const attributes: Record<string, string> = {};
  for (const [k, v] of Object.entries(node.attributes)) attributes[k] = decodeEntities(v);
  return {
    name: node.name,
    type: node.type,
    value: decodeEntities(node.value),
    attributes,
    children: node.children.map(decodeTree),
  };
}

const escapeText = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

/** The SVG parsed with svgson, text and attribute values decoded. */
export function parseSvg(svg: string): INode {
  const body = svg
    .replace(/^<\?xml[^>]*\?>\s*/, '')
    .replace(/<!\[CDATA\[([\s\S]*?)\]\]>/g, (_all, content: string) => escapeText(content));
  return decodeTree(parseSync(body));
}

/** Every element below (and including) `node`, depth first. */
export function elements(node: INode, name?: string): INode[] {
  const out: INode[] = [];
  const visit = (n: INode): void => {
    if (n.type === 'element' && (name === undefined || n.name === name)) out.push(n);
    n.children.forEach(visit);
  };
  visit(node);
  return out;
}

/** The element with this id. */
export function byId(root: INode, id: string): INode {
  const found = elements(root).find((n) => n.attributes.id === id);
  if (!found) throw new Error(`no element with id ${id}`);
  return found;
}

/** All the text below `node`, in order (lines of `<tspan>`s joined with '\n'). */
export function textOf(node: INode): string {
  if (node.type === 'text') return node.value;
  const parts = node.children.map(textOf);
  return node.name === 'text' && node.children.some((c) => c.name === 'tspan') ? parts.join('\n') : parts.join('');
}

/** Width, height (as numbers and their unit) and viewBox of the root. */
export function sheetSize(root: INode): { width: number; height: number; unit: string; viewBox: number[] } {
  const w = /^([0-9.]+)(mm|in)$/.exec(root.attributes.width ?? '');
  const h = /^([0-9.]+)(mm|in)$/.exec(root.attributes.height ?? '');
  if (!w || !h || w[2] !== h[2]) throw new Error(`bad sheet size ${root.attributes.width} x ${root.attributes.height}`);
  return {
    width: Number(w[1]),
    height: Number(h[1]),
    unit: w[2] as string,
    viewBox: (root.attributes.viewBox ?? '').trim().split(/[\s,]+/).map(Number),
  };
}
