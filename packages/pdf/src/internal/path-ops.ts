/**
 * Path parts of a template (mm, y-up) as PDF path operators, in the same
 * units: polylines as lines, arcs as cubic Bezier pieces of at most 90°.
 */
import { arcSweepDeg } from '@girth/sheet';
import type { PathPart } from '@girth/unroll';
import { num, polyline } from './content.js';

/** Largest sweep of one Bezier piece, degrees (the cubic's radial error at 90° is 0.027 % of the radius). */
const MAX_PIECE_DEG = 90;

function arcOps(part: Extract<PathPart, { kind: 'arc' }>): string {
  const sweepDeg = arcSweepDeg(part.startDeg, part.endDeg);
  const pieces = Math.max(1, Math.ceil(sweepDeg / MAX_PIECE_DEG - 1e-9));
  const stepRad = (sweepDeg * Math.PI) / 180 / pieces;
  const k = (4 / 3) * Math.tan(stepRad / 4) * part.radiusMm;
  const [cx, cy] = part.center;
  const r = part.radiusMm;
  let a = (part.startDeg * Math.PI) / 180;
  let s = `${num(cx + r * Math.cos(a))} ${num(cy + r * Math.sin(a))} m\n`;
  for (let i = 0; i < pieces; i++) {
    const b = a + stepRad;
    const [x0, y0] = [cx + r * Math.cos(a), cy + r * Math.sin(a)];
    const [x3, y3] = [cx + r * Math.cos(b), cy + r * Math.sin(b)];
    s += `${num(x0 - k * Math.sin(a))} ${num(y0 + k * Math.cos(a))} ${num(x3 + k * Math.sin(b))} ${num(y3 - k * Math.cos(b))} ${num(x3)} ${num(y3)} c\n`;
    a = b;
  }
  return sweepDeg >= 360 ? `${s}h\n` : s;
}

/**
 * The path operators of one part (no painting operator).
 * @example partOps({ kind: 'segment', from: [0, 0], to: [10, 0] }) // '0 0 m\n10 0 l\n'
 */
export function partOps(part: PathPart): string {
  switch (part.kind) {
    case 'polyline':
      return polyline(part.points) + (part.closed ? 'h\n' : '');
    case 'segment':
      return polyline([part.from, part.to]);
    case 'arc':
      return arcOps(part);
  }
}
