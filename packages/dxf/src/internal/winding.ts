/**
 * CAM winding: a cutting table's software tells the part from the scrap by
 * the direction of each closed contour. Outer contours (the part's outside)
 * run counter-clockwise, inner contours (holes: scrap) clockwise, y-up.
 */
import type { SheetEntity, SheetVertex } from './sheet.js';

type Polyline = Extract<SheetEntity, { kind: 'polyline' }>;

/**
 * Signed area enclosed by a closed polyline with bulges, in the square of its
 * unit: positive counter-clockwise (y-up). Each bulged segment adds the
 * circular segment between its chord and its arc.
 *
 * @example signedArea([[0, 0, 0], [1, 0, 0], [1, 1, 0], [0, 1, 0]]) // 1
 */
export function signedArea(vertices: readonly SheetVertex[]): number {
  let area = 0;
  const n = vertices.length;
  for (let i = 0; i < n; i++) {
    const [x0, y0, bulge] = vertices[i]!;
    const [x1, y1] = vertices[(i + 1) % n]!;
    area += (x0 * y1 - x1 * y0) / 2;
    if (bulge !== 0) {
      // Sweep θ = 4 atan(b); radius from the chord; segment area r²(θ − sin θ)/2, signed with the bulge.
      const theta = 4 * Math.atan(bulge);
      const chord = Math.hypot(x1 - x0, y1 - y0);
      const r = chord / (2 * Math.sin(Math.abs(theta) / 2));
      area += Math.sign(theta) * ((r * r) / 2) * (Math.abs(theta) - Math.sin(Math.abs(theta)));
    }
  }
  return area;
}

/**
 * A closed polyline walked the other way: vertices reversed, each segment's
 * bulge negated and stored at its new start.
 *
 * @example reverseClosed([[0, 0, 0.5], [1, 0, 0], [0, 1, 0]])
 */
export function reverseClosed(vertices: readonly SheetVertex[]): SheetVertex[] {
  const n = vertices.length;
  const out: SheetVertex[] = [];
  for (let i = 0; i < n; i++) {
    const p = vertices[n - 1 - i]!;
    // The segment from p to the next vertex of the reversed list was the segment into p, from the vertex before p.
    const before = vertices[(2 * n - 2 - i) % n]!;
    out.push([p[0], p[1], before[2] === 0 ? 0 : -before[2]]);
  }
  return out;
}

/** Point in polygon (even-odd) on the chords of a closed polyline. */
function inside(x: number, y: number, vertices: readonly SheetVertex[]): boolean {
  let odd = false;
  const n = vertices.length;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const [xi, yi] = vertices[i]!;
    const [xj, yj] = vertices[j]!;
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) odd = !odd;
  }
  return odd;
}

/**
 * Closed cut contours wound the CAM way: each contour's depth is how many
 * other closed contours hold it (tested at a point between its first two
 * vertices), plus `baseDepth`; even depths (outer contours) run
 * counter-clockwise, odd depths (inner contours, scrap) clockwise. Other
 * entities pass unchanged. `baseDepth` 1 makes every top-level contour a hole
 * (a header hole template is a hole in the header, its inside is scrap).
 *
 * @example orientContours(entities, 0)
 */
export function orientContours(entities: readonly SheetEntity[], baseDepth: 0 | 1): SheetEntity[] {
  const closed = entities.filter((e): e is Polyline => e.kind === 'polyline' && e.closed && e.layer === 'cut');
  return entities.map((e) => {
    if (e.kind !== 'polyline' || !e.closed || e.layer !== 'cut') return e;
    const [a, b] = e.vertices as [SheetVertex, SheetVertex];
    const mx = (a[0] + b[0]) / 2;
    const my = (a[1] + b[1]) / 2;
    let depth = baseDepth;
    for (const other of closed) if (other !== e && inside(mx, my, other.vertices)) depth++;
    const wantCcw = depth % 2 === 0;
    const ccw = signedArea(e.vertices) > 0;
    return ccw === wantCcw ? e : { ...e, vertices: reverseClosed(e.vertices) };
  });
}
