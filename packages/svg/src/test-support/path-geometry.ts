/**
 * Reading SVG path data back into geometry for tests: the subset the exporter
 * writes (M, L, A, Z and their relative forms, implicit repeats). Arcs are
 * converted from endpoint to centre form as the SVG 1.1 specification,
 * appendix F.6.5, says, independently of makerjs.
 */

/** An arc read back: centre, radius, start angle and signed sweep in SVG's y-down frame (degrees). */
export interface ReadArc {
  readonly cx: number;
  readonly cy: number;
  readonly r: number;
  readonly startDeg: number;
  readonly sweepDeg: number;
  readonly from: readonly [number, number];
  readonly to: readonly [number, number];
}

/** What a path draws: its vertices (subpath starts and line ends) and its arcs. */
export interface ReadPath {
  readonly points: [number, number][];
  readonly arcs: ReadArc[];
  readonly closedSubpaths: number;
}

const ARITY: Readonly<Record<string, number>> = { m: 2, l: 2, a: 7, z: 0 };

function angleDeg(ux: number, uy: number, vx: number, vy: number): number {
  const dot = ux * vx + uy * vy;
  const det = ux * vy - uy * vx;
  return (Math.atan2(det, dot) * 180) / Math.PI;
}

/** SVG 1.1 F.6.5: centre parameters of a circular arc (rx = ry = r, no rotation). */
export function arcCentre(
  x1: number,
  y1: number,
  rIn: number,
  largeArc: boolean,
  sweep: boolean,
  x2: number,
  y2: number,
): ReadArc {
  const xp = (x1 - x2) / 2;
  const yp = (y1 - y2) / 2;
  let r = Math.abs(rIn);
  const lambda = (xp * xp + yp * yp) / (r * r);
  if (lambda > 1) r *= Math.sqrt(lambda);
  const num = r * r * r * r - r * r * yp * yp - r * r * xp * xp;
  const den = r * r * yp * yp + r * r * xp * xp;
  const coef = (largeArc !== sweep ? 1 : -1) * Math.sqrt(Math.max(0, num / den));
  const cxp = coef * yp;
  const cyp = -coef * xp;
  const cx = cxp + (x1 + x2) / 2;
  const cy = cyp + (y1 + y2) / 2;
  const startDeg = angleDeg(1, 0, (xp - cxp) / r, (yp - cyp) / r);
  let sweepDeg = angleDeg((xp - cxp) / r, (yp - cyp) / r, (-xp - cxp) / r, (-yp - cyp) / r) % 360;
  if (!sweep && sweepDeg > 0) sweepDeg -= 360;
  if (sweep && sweepDeg < 0) sweepDeg += 360;
  return { cx, cy, r, startDeg, sweepDeg, from: [x1, y1], to: [x2, y2] };
}

/**
 * Reads path data.
 * @throws Error for commands outside the subset or a malformed number list.
 */
export function readPath(d: string): ReadPath {
  const tokens = d.match(/[A-Za-z]|-?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/g) ?? [];
  const points: [number, number][] = [];
  const arcs: ReadArc[] = [];
  let closedSubpaths = 0;
  let x = 0;
  let y = 0;
  let startX = 0;
  let startY = 0;
  let i = 0;
  let cmd = '';
  while (i < tokens.length) {
    const t = tokens[i] as string;
    if (/[A-Za-z]/.test(t)) {
      cmd = t;
      i++;
      if (!(cmd.toLowerCase() in ARITY)) throw new Error(`unexpected path command ${cmd}`);
      if (cmd.toLowerCase() === 'z') {
        closedSubpaths++;
        x = startX;
        y = startY;
        continue;
      }
    }
    const lower = cmd.toLowerCase();
    const n = ARITY[lower] as number;
    const args = tokens.slice(i, i + n).map(Number);
    if (args.length !== n || args.some((v) => !Number.isFinite(v))) throw new Error(`bad arguments for ${cmd} at token ${i}`);
    i += n;
    const rel = cmd === lower;
    if (lower === 'm') {
      x = (rel ? x : 0) + (args[0] as number);
      y = (rel ? y : 0) + (args[1] as number);
      startX = x;
      startY = y;
      points.push([x, y]);
      cmd = rel ? 'l' : 'L'; // following pairs are line-tos
    } else if (lower === 'l') {
      x = (rel ? x : 0) + (args[0] as number);
      y = (rel ? y : 0) + (args[1] as number);
      points.push([x, y]);
    } else {
      const [r, , , la, sw, ex, ey] = args as [number, number, number, number, number, number, number];
      const tx = (rel ? x : 0) + ex;
      const ty = (rel ? y : 0) + ey;
      arcs.push(arcCentre(x, y, r, la === 1, sw === 1, tx, ty));
      x = tx;
      y = ty;
      points.push([x, y]);
    }
  }
  return { points, arcs, closedSubpaths };
}

/** Bounds of everything a path draws: vertices, and arcs sampled every 0.05°. */
export function pathBounds(path: ReadPath): { minX: number; minY: number; maxX: number; maxY: number } {
  const xs: number[] = [];
  const ys: number[] = [];
  for (const [px, py] of path.points) {
    xs.push(px);
    ys.push(py);
  }
  for (const a of path.arcs) {
    const steps = Math.max(2, Math.ceil(Math.abs(a.sweepDeg) / 0.05));
    for (let k = 0; k <= steps; k++) {
      const t = ((a.startDeg + (a.sweepDeg * k) / steps) * Math.PI) / 180;
      xs.push(a.cx + a.r * Math.cos(t));
      ys.push(a.cy + a.r * Math.sin(t));
    }
  }
  return { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
}
