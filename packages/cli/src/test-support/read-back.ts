/**
 * Reading written templates back with independent parsers: svgson for SVG and
 * dxf-parser for DXF.
 */
import { parseSync, type INode } from 'svgson';
import DxfParser from 'dxf-parser';
import type { IDxf } from 'dxf-parser';

/** The physical size of an SVG sheet and its viewBox. */
export interface SvgSheet {
  readonly root: INode;
  readonly width: number;
  readonly height: number;
  readonly unit: string;
  readonly viewBox: readonly number[];
}

/**
 * Parses an SVG with svgson (after dropping the XML declaration, which svgson
 * does not take) and reads the root's width, height and viewBox.
 * @throws Error when the width or height has no physical unit.
 */
export function readSvgSheet(text: string): SvgSheet {
  const root = parseSync(text.replace(/^<\?xml[^>]*\?>\s*/, ''));
  const w = /^([0-9.]+)(mm|in|cm|pt)$/.exec(root.attributes.width ?? '');
  const h = /^([0-9.]+)(mm|in|cm|pt)$/.exec(root.attributes.height ?? '');
  if (w === null || h === null || w[2] !== h[2]) {
    throw new Error(`SVG size is not in one physical unit: ${root.attributes.width} x ${root.attributes.height}`);
  }
  return {
    root,
    width: Number(w[1]),
    height: Number(h[1]),
    unit: w[2]!,
    viewBox: (root.attributes.viewBox ?? '').trim().split(/[\s,]+/).map(Number),
  };
}

/** Every element below (and including) `node` with this name. */
export function svgElements(node: INode, name: string): INode[] {
  const out: INode[] = [];
  const visit = (n: INode): void => {
    if (n.type === 'element' && n.name === name) out.push(n);
    n.children.forEach(visit);
  };
  visit(node);
  return out;
}

/** All text content below `node`, joined. */
export function svgText(node: INode): string {
  return node.type === 'text' ? node.value : node.children.map(svgText).join(' ');
}

/** The DXF parsed by dxf-parser. @throws Error when it cannot be parsed. */
export function readDxf(text: string): IDxf {
  const parsed = new DxfParser().parseSync(text);
  if (parsed === null) throw new Error('dxf-parser returned nothing');
  return parsed;
}

/** A closed LWPOLYLINE or POLYLINE: its layer and vertices. */
export interface ClosedPolyline {
  readonly layer: string;
  readonly vertices: readonly { readonly x: number; readonly y: number }[];
}

/** The closed polylines of a parsed DXF. */
export function closedPolylines(dxf: IDxf): ClosedPolyline[] {
  const out: ClosedPolyline[] = [];
  for (const e of dxf.entities) {
    const entity = e as unknown as { type: string; layer: string; shape?: boolean; vertices?: { x: number; y: number }[] };
    if ((entity.type === 'LWPOLYLINE' || entity.type === 'POLYLINE') && entity.shape === true && entity.vertices !== undefined) {
      out.push({ layer: entity.layer, vertices: entity.vertices });
    }
  }
  return out;
}

/** Width and height of the box around some points. */
export function extents(points: readonly { readonly x: number; readonly y: number }[]): { readonly dx: number; readonly dy: number } {
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  return { dx: Math.max(...xs) - Math.min(...xs), dy: Math.max(...ys) - Math.min(...ys) };
}
