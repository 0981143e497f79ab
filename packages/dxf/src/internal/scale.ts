/**
 * Converts sheet entities from millimetres to the output unit (a plain scale;
 * angles and bulges have no unit and stay).
 */
import type { SheetEntity } from './sheet.js';

const pt = (p: readonly [number, number], k: number): [number, number] => [p[0] * k, p[1] * k];

/** The entity with every length multiplied by `k` (1 for mm, 1 / 25.4 for inches). */
export function scaleEntity(e: SheetEntity, k: number): SheetEntity {
  if (k === 1) return e;
  switch (e.kind) {
    case 'polyline':
      return { ...e, vertices: e.vertices.map((v) => [v[0] * k, v[1] * k, v[2]] as const) };
    case 'line':
      return { ...e, from: pt(e.from, k), to: pt(e.to, k) };
    case 'arc':
      return { ...e, center: pt(e.center, k), radius: e.radius * k };
    case 'circle':
      return { ...e, center: pt(e.center, k), radius: e.radius * k };
    case 'text':
      return { ...e, at: pt(e.at, k), height: e.height * k };
  }
}
