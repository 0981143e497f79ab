/**
 * The drawing's extents for `$EXTMIN` / `$EXTMAX`, so a reader can zoom to
 * the part and a nesting program knows its size before reading the entities.
 */
import { arcContainsAngle } from './arc-math.js';
import type { SheetEntity } from './sheet.js';

/** Lower-left and upper-right corners, in the sheet's unit. */
export interface Extents {
  readonly min: readonly [number, number];
  readonly max: readonly [number, number];
}

/**
 * The box around every entity: polyline vertices and the top of each bulged
 * side, arcs with the quadrant points they pass, circles, and each text's
 * baseline point with its height above (its width is not known to the DXF).
 * An empty sheet has the box (0, 0)-(0, 0).
 *
 * @example sheetExtents(sheet.entities).max
 */
export function sheetExtents(entities: readonly SheetEntity[]): Extents {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  const add = (x: number, y: number): void => {
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  };
  for (const e of entities) {
    switch (e.kind) {
      case 'polyline': {
        const n = e.vertices.length;
        e.vertices.forEach(([x, y, bulge], i) => {
          add(x, y);
          if (bulge === 0 || (!e.closed && i === n - 1)) return;
          // The arc's middle lies the sagitta off the chord's middle: s = b · chord / 2, to the right of the chord for b > 0.
          const [x1, y1] = e.vertices[(i + 1) % n]!;
          add((x + x1) / 2 + (bulge * (y1 - y)) / 2, (y + y1) / 2 - (bulge * (x1 - x)) / 2);
        });
        break;
      }
      case 'line':
        add(e.from[0], e.from[1]);
        add(e.to[0], e.to[1]);
        break;
      case 'arc':
        for (const deg of [e.startDeg, e.endDeg, 0, 90, 180, 270]) {
          if (deg !== e.startDeg && deg !== e.endDeg && !arcContainsAngle(e.startDeg, e.endDeg, deg)) continue;
          const rad = (deg * Math.PI) / 180;
          add(e.center[0] + e.radius * Math.cos(rad), e.center[1] + e.radius * Math.sin(rad));
        }
        break;
      case 'circle':
        add(e.center[0] - e.radius, e.center[1] - e.radius);
        add(e.center[0] + e.radius, e.center[1] + e.radius);
        break;
      case 'text':
        add(e.at[0], e.at[1]);
        add(e.at[0], e.at[1] + e.height);
        break;
    }
  }
  if (minX > maxX) return { min: [0, 0], max: [0, 0] };
  return { min: [minX, minY], max: [maxX, maxY] };
}
