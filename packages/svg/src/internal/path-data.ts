/**
 * SVG path data for the parts of a template, placed on the paper.
 *
 * Written directly rather than through makerjs's SVG exporter, for two
 * reasons measured on makerjs 0.19.2: its chain finding takes about 6 ms for a
 * 1000-point cut line (and reverses the run), against 0.15 ms written here; and
 * it writes each arc as one SVG arc command, whose endpoint form is
 * ill-conditioned near 180°: after rounding to 0.001 mm the centre of a
 * 300-700 mm radius arc sweeping 179.5-180.5° moved by up to 0.8 mm. Arcs are
 * written here as pieces of at most 90°, where rounding moves them by about
 * a thousandth of a millimetre.
 */
import type { PathPart, Point2 } from '@girth/unroll';
import { arcSweepDeg } from '@girth/sheet';
import type { Frame } from './frame.js';
import type { NumberWriter } from './numbers.js';

/** Largest sweep of one SVG arc command, degrees. */
export const MAX_ARC_PIECE_DEG = 90;

function pointsData(points: readonly Point2[], closed: boolean, frame: Frame, w: NumberWriter): string {
  let d = '';
  for (let i = 0; i < points.length; i++) {
    const p = points[i] as Point2;
    d += (i === 0 ? 'M' : i === 1 ? ' L' : ' ') + w.len(frame.x(p[0])) + ' ' + w.len(frame.y(p[1]));
  }
  return closed ? d + ' Z' : d;
}

function arcData(part: Extract<PathPart, { kind: 'arc' }>, frame: Frame, w: NumberWriter): string {
  const sweepDeg = arcSweepDeg(part.startDeg, part.endDeg);
  const full = sweepDeg === 360;
  const pieces = Math.ceil(sweepDeg / MAX_ARC_PIECE_DEG);
  const r = w.len(part.radiusMm);
  const at = (deg: number): string => {
    const a = (deg * Math.PI) / 180;
    const x = part.center[0] + part.radiusMm * Math.cos(a);
    const y = part.center[1] + part.radiusMm * Math.sin(a);
    return `${w.len(frame.x(x))} ${w.len(frame.y(y))}`;
  };
  const first = at(part.startDeg);
  let d = `M${first}`;
  for (let i = 1; i <= pieces; i++) {
    // Counter-clockwise in the template's y-up frame is the negative-angle direction once y
    // is flipped, so the sweep flag is 0; no piece exceeds 90°, so the large-arc flag is 0.
    const end = full && i === pieces ? first : at(part.startDeg + (sweepDeg * i) / pieces);
    d += ` A${r} ${r} 0 0 0 ${end}`;
  }
  return full ? d + ' Z' : d;
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
