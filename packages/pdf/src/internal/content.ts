/**
 * PDF content-stream operators written as text. pdf-lib's operator objects
 * format every operand eagerly through a general number formatter; for a
 * sheet of a few thousand points on fifty pages that was most of the time
 * (measured), so Girth writes the few operators it uses itself, lengths
 * rounded to 0.001 mm.
 */

/** A number as PDF writes it: at most 3 decimals, no exponent, no `-0`. */
export function num(x: number): string {
  const r = Math.round(x * 1000) / 1000;
  if (r === 0) return '0';
  const s = String(r);
  return s.includes('e') ? r.toFixed(3) : s;
}

/** `m` and `l` through the points. */
export function polyline(points: readonly (readonly [number, number])[]): string {
  let s = '';
  for (let i = 0; i < points.length; i++) {
    const p = points[i]!;
    s += `${num(p[0])} ${num(p[1])} ${i === 0 ? 'm' : 'l'}\n`;
  }
  return s;
}

/** `re`: a rectangle path. */
export function rect(x: number, y: number, w: number, h: number): string {
  return `${num(x)} ${num(y)} ${num(w)} ${num(h)} re\n`;
}

/** `cm`: concatenate a matrix. */
export function cm(a: number, b: number, c: number, d: number, e: number, f: number): string {
  return `${num(a)} ${num(b)} ${num(c)} ${num(d)} ${num(e)} ${num(f)} cm\n`;
}

/** Stroke settings: grey (0 black), width, cap (0 butt, 1 round), round joins, dash. */
export function strokeStyle(greyLevel: number, widthMm: number, cap: 0 | 1 = 1, dashMm?: readonly number[]): string {
  return `${num(greyLevel)} G ${num(widthMm)} w ${cap} J 1 j${dashMm ? ` [${dashMm.map(num).join(' ')}] 0 d` : ''}\n`;
}
