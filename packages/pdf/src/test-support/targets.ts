/**
 * Finding the registration targets (a ring with a cross) on a rendered page,
 * knowing only their radius and the shaded strips they sit in.
 */
import type { Grey } from './raster.js';

/** Darkness (0 white .. 255 black) at a point, bilinear. */
export function darkAt(img: Grey, x: number, y: number): number {
  const x0 = Math.floor(x);
  const y0 = Math.floor(y);
  if (x0 < 0 || y0 < 0 || x0 + 1 >= img.width || y0 + 1 >= img.height) return 0;
  const fx = x - x0;
  const fy = y - y0;
  const p = (i: number, j: number) => 255 - img.data[j * img.width + i]!;
  return (1 - fy) * ((1 - fx) * p(x0, y0) + fx * p(x0 + 1, y0)) + fy * ((1 - fx) * p(x0, y0 + 1) + fx * p(x0 + 1, y0 + 1));
}

const ANGLES = Array.from({ length: 40 }, (_, i) => ((i + 0.5) * 2 * Math.PI) / 40 + 0.1);

/** How ring-like the darkness is about (x, y) at radius r: ring minus just inside and just outside. */
function ringScore(img: Grey, x: number, y: number, r: number): number {
  let s = 0;
  for (const a of ANGLES) {
    const c = Math.cos(a);
    const d = Math.sin(a);
    s += darkAt(img, x + r * c, y + r * d) - 0.5 * (darkAt(img, x + (r - 2) * c, y + (r - 2) * d) + darkAt(img, x + (r + 2) * c, y + (r + 2) * d));
  }
  return s / ANGLES.length;
}

/**
 * Centres of the rings of radius `rPx` inside the box, sub-pixel, found by
 * scanning every pixel and refining each peak on a 0.05 px grid.
 */
export function findTargets(img: Grey, box: { x0: number; y0: number; x1: number; y1: number }, rPx: number): { x: number; y: number }[] {
  const found: { x: number; y: number; s: number }[] = [];
  for (let y = Math.ceil(box.y0); y <= box.y1; y++) {
    for (let x = Math.ceil(box.x0); x <= box.x1; x++) {
      const s = ringScore(img, x, y, rPx);
      if (s < 40) continue;
      const near = found.find((f) => Math.hypot(f.x - x, f.y - y) < 2 * rPx);
      if (near === undefined) found.push({ x, y, s });
      else if (s > near.s) Object.assign(near, { x, y, s });
    }
  }
  return found.map((f) => {
    let best = f;
    for (let dy = -1; dy <= 1; dy += 0.05) {
      for (let dx = -1; dx <= 1; dx += 0.05) {
        const s = ringScore(img, f.x + dx, f.y + dy, rPx);
        if (s > best.s) best = { x: f.x + dx, y: f.y + dy, s };
      }
    }
    return { x: best.x, y: best.y };
  });
}
