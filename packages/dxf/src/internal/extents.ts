/**
 * Extents of sheet geometry (not text): the smallest axis-aligned box holding
 * every line, polyline and arc, arcs counted at their true extremes.
 */
import { arcContainsAngle, arcOfBulge, pointOnCircle } from './arc-math.js';
import type { SheetEntity } from './sheet.js';

/** An axis-aligned box `[minX, minY, maxX, maxY]`. */
export type Box = readonly [minX: number, minY: number, maxX: number, maxY: number];

/** A growing box as a mutable local `[minX, minY, maxX, maxY]` (never escapes this file). */
type Acc = [number, number, number, number];

function addPoint(acc: Acc, x: number, y: number): void {
  acc[0] = Math.min(acc[0], x);
  acc[1] = Math.min(acc[1], y);
  acc[2] = Math.max(acc[2], x);
  acc[3] = Math.max(acc[3], y);
}

function addArc(acc: Acc, cx: number, cy: number, r: number, startDeg: number, endDeg: number): void {
  addPoint(acc, ...pointOnCircle(cx, cy, r, startDeg));
  addPoint(acc, ...pointOnCircle(cx, cy, r, endDeg));
  for (const q of [0, 90, 180, 270]) if (arcContainsAngle(startDeg, endDeg, q)) addPoint(acc, ...pointOnCircle(cx, cy, r, q));
}

/** Extents of the non-text entities, or `null` when there are none. */
export function sheetExtents(entities: readonly SheetEntity[]): Box | null {
  const box: Acc = [Infinity, Infinity, -Infinity, -Infinity];
  for (const e of entities) {
    switch (e.kind) {
      case 'line':
        addPoint(box, e.from[0], e.from[1]);
        addPoint(box, e.to[0], e.to[1]);
        break;
      case 'circle':
        addPoint(box, e.center[0] - e.radius, e.center[1] - e.radius);
        addPoint(box, e.center[0] + e.radius, e.center[1] + e.radius);
        break;
      case 'arc':
        addArc(box, e.center[0], e.center[1], e.radius, e.startDeg, e.endDeg);
        break;
      case 'polyline': {
        const n = e.vertices.length;
        e.vertices.forEach((v, i) => {
          addPoint(box, v[0], v[1]);
          const next = e.vertices[(i + 1) % n]!;
          if (v[2] !== 0 && (e.closed || i < n - 1)) {
            const arc = arcOfBulge([v[0], v[1]], [next[0], next[1]], v[2]);
            addArc(box, arc.center[0], arc.center[1], arc.radius, arc.startDeg, arc.endDeg);
          }
        });
        break;
      }
      case 'text':
        break;
    }
  }
  return Number.isFinite(box[0]) ? [box[0], box[1], box[2], box[3]] : null;
}
