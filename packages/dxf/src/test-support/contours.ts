/**
 * Polylines of a parsed DXF (LWPOLYLINE or R12 POLYLINE alike) as plain data.
 */
import type { IDxf, IEntity } from 'dxf-parser';

/** A polyline read back: layer, closed flag, vertices `[x, y, bulge]`. */
export interface ReadPolyline {
  readonly layer: string;
  readonly closed: boolean;
  readonly vertices: ReadonlyArray<readonly [number, number, number]>;
}

type AnyVertex = { x: number; y: number; bulge?: number };
type AnyPolyline = IEntity & { vertices: AnyVertex[]; shape?: boolean };

/** Every LWPOLYLINE and POLYLINE of the file. */
export function polylinesOf(dxf: IDxf): ReadPolyline[] {
  return dxf.entities
    .filter((e) => e.type === 'LWPOLYLINE' || e.type === 'POLYLINE')
    .map((e) => {
      const p = e as AnyPolyline;
      return { layer: p.layer, closed: p.shape === true, vertices: p.vertices.map((v) => [v.x, v.y, v.bulge ?? 0] as const) };
    });
}

/** Entity type counts per layer, e.g. `{ 'CUT:LWPOLYLINE': 1 }`. */
export function countByLayer(dxf: IDxf): Record<string, number> {
  const out: Record<string, number> = {};
  for (const e of dxf.entities) out[`${e.layer}:${e.type}`] = (out[`${e.layer}:${e.type}`] ?? 0) + 1;
  return out;
}

/** Radius of the arc a bulged segment draws: chord (1 + b²) / (4 |b|) (the bulge is tan(sweep / 4)). */
export function bulgeRadius(a: readonly [number, number, number], b: readonly [number, number, number]): number {
  const chord = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const bulge = Math.abs(a[2]);
  return (chord * (1 + bulge * bulge)) / (4 * bulge);
}
