/**
 * SVG path data for the parts of a template, placed on the paper.
 *
 * Polylines and segments are written directly: a template's cut line has
 * hundreds to thousands of points, and makerjs's chain finding takes about
 * 6 ms for 1000 points (and reverses the run), against 0.15 ms written
 * directly. Arcs go through makerjs, which handles the y flip, the large-arc
 * and sweep flags and full circles.
 */
import makerjs from 'makerjs';
import type { PathPart, Point2 } from '@girth/unroll';
import { arcSweepDeg } from '../check-template.js';
import type { Frame } from './frame.js';
import { MM_PER_IN, type NumberWriter } from './numbers.js';

function pointsData(points: readonly Point2[], closed: boolean, frame: Frame, w: NumberWriter): string {
  let d = '';
  for (let i = 0; i < points.length; i++) {
    const p = points[i] as Point2;
    d += (i === 0 ? 'M' : i === 1 ? ' L' : ' ') + w.len(frame.x(p[0])) + ' ' + w.len(frame.y(p[1]));
  }
  return closed ? d + ' Z' : d;
}

function arcData(
  part: Extract<PathPart, { kind: 'arc' }>,
  frame: Frame,
  w: NumberWriter,
): string {
  const k = w.units === 'in' ? 1 / MM_PER_IN : 1;
  const full = arcSweepDeg(part.startDeg, part.endDeg) === 360;
  // makerjs draws y-up and writes y negated when the origin is [0, 0]; giving it the
  // centre at minus its paper y puts the arc where the frame puts it.
  const arc = new makerjs.paths.Arc(
    [frame.x(part.center[0]) * k, -frame.y(part.center[1]) * k],
    part.radiusMm * k,
    full ? 0 : part.startDeg,
    full ? 360 : part.endDeg,
  );
  const accuracy = w.units === 'in' ? 0.00001 : 0.001;
  return makerjs.exporter.toSVGPathData({ paths: { arc } }, { origin: [0, 0], accuracy }) as string;
}

/**
 * Path data of one part on the paper, in sheet units.
 *
 * @example partData({ kind: 'segment', from: [0, 0], to: [10, 0] }, frame, numberWriter('mm'))
 */
export function partData(part: PathPart, frame: Frame, w: NumberWriter): string {
  switch (part.kind) {
    case 'polyline':
      return pointsData(part.points, part.closed, frame, w);
    case 'segment':
      return pointsData([part.from, part.to], false, frame, w);
    case 'arc':
      return arcData(part, frame, w);
  }
}

/**
 * Path data of straight lines given on the paper (mm, y-down), in sheet units.
 */
export function paperLinesData(lines: readonly (readonly [Point2, Point2])[], w: NumberWriter): string {
  return lines
    .map(([a, b]) => `M${w.len(a[0])} ${w.len(a[1])} L${w.len(b[0])} ${w.len(b[1])}`)
    .join(' ');
}
