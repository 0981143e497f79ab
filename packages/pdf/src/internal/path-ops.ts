/**
 * Path parts of a template (mm, y-up) as PDF path operators, in the same
 * units: polylines as lines, arcs as cubic Bezier pieces of at most 90°.
 */
import { appendBezierCurve, closePath, lineTo, moveTo, type PDFOperator } from 'pdf-lib';
import { arcSweepDeg } from '@girth/sheet';
import type { PathPart, Point2 } from '@girth/unroll';

/** Largest sweep of one Bezier piece, degrees (the cubic's radial error at 90° is 0.027 % of the radius). */
const MAX_PIECE_DEG = 90;

function pointsOps(points: readonly Point2[], closed: boolean, out: PDFOperator[]): void {
  points.forEach((p, i) => out.push(i === 0 ? moveTo(p[0], p[1]) : lineTo(p[0], p[1])));
  if (closed) out.push(closePath());
}

function arcOps(part: Extract<PathPart, { kind: 'arc' }>, out: PDFOperator[]): void {
  const sweepDeg = arcSweepDeg(part.startDeg, part.endDeg);
  const pieces = Math.max(1, Math.ceil(sweepDeg / MAX_PIECE_DEG - 1e-9));
  const stepRad = (sweepDeg * Math.PI) / 180 / pieces;
  const k = (4 / 3) * Math.tan(stepRad / 4) * part.radiusMm;
  const [cx, cy] = part.center;
  let a = (part.startDeg * Math.PI) / 180;
  out.push(moveTo(cx + part.radiusMm * Math.cos(a), cy + part.radiusMm * Math.sin(a)));
  for (let i = 0; i < pieces; i++) {
    const b = a + stepRad;
    const [x0, y0] = [cx + part.radiusMm * Math.cos(a), cy + part.radiusMm * Math.sin(a)];
    const [x3, y3] = [cx + part.radiusMm * Math.cos(b), cy + part.radiusMm * Math.sin(b)];
    out.push(appendBezierCurve(x0 - k * Math.sin(a), y0 + k * Math.cos(a), x3 + k * Math.sin(b), y3 - k * Math.cos(b), x3, y3));
    a = b;
  }
  if (sweepDeg >= 360) out.push(closePath());
}

/**
 * Appends the path operators of one part to `out` (no painting operator).
 * @example const ops: PDFOperator[] = []; partOps({ kind: 'segment', from: [0, 0], to: [10, 0] }, ops);
 */
export function partOps(part: PathPart, out: PDFOperator[]): void {
  switch (part.kind) {
    case 'polyline':
      pointsOps(part.points, part.closed, out);
      return;
    case 'segment':
      pointsOps([part.from, part.to], false, out);
      return;
    case 'arc':
      arcOps(part, out);
      return;
  }
}
