/**
 * Closed parts for a cutting table: every template as contours that each close
 * on themselves, so a plasma or CNC table's software can cut a part in one
 * pass and knows which side is the part.
 */
import { GirthError, requireFinite } from '@girth/pipes';
import { yOnPolyline } from '../internal/y-on-polyline.js';
import type { PathPart, Point2, StationLine, Template, WrapTemplate } from '../types.js';

/**
 * Default stub past the deepest cutback, mm: a single-cut wrap closed without a
 * stub length ends square this far beyond the deepest point of its cut (two
 * inches, enough to clamp and to square the end by eye).
 */
export const DEFAULT_STUB_MARGIN_MM = 50;

/** Ends of a wrap's cut line closer than this to a seam edge are on it, mm (float noise of the girth). */
const SEAM_EPS_MM = 1e-6;

/** Options of {@link closeTemplate}. */
export interface CloseTemplateOptions {
  /**
   * Length of a single-cut wrap's stub, mm: from the square line (through the
   * long point, y = 0) to the square end. Must be longer than the deepest
   * cutback; default the deepest cutback + {@link DEFAULT_STUB_MARGIN_MM}.
   * Ignored by templates that close on their own.
   */
  readonly stubMm?: number;
}

function openPolyline(part: PathPart | undefined): readonly Point2[] | undefined {
  return part !== undefined && part.kind === 'polyline' && !part.closed && part.points.length >= 2 ? part.points : undefined;
}

function meanY(points: readonly Point2[]): number {
  let sum = 0;
  for (const p of points) sum += p[1];
  return sum / points.length;
}

/**
 * The deepest cutback of a single-cut wrap, mm: the largest y of its cut line's points.
 * @example deepestCutbackMm([[0, 0], [10, 42.5], [20, 3]]) // 42.5
 */
export function deepestCutbackMm(points: readonly Point2[]): number {
  let max = -Infinity;
  for (const p of points) if (p[1] > max) max = p[1];
  return max;
}

function checkSpansGirth(points: readonly Point2[], t: WrapTemplate, field: string): void {
  const first = points[0] as Point2;
  const last = points[points.length - 1] as Point2;
  if (Math.abs(first[0]) > SEAM_EPS_MM * Math.max(1, t.stretchOutMm) || Math.abs(last[0] - t.stretchOutMm) > SEAM_EPS_MM * Math.max(1, t.stretchOutMm)) {
    throw new GirthError('BAD_OPTION', field, `${field}: a wrap's cut line must run the whole girth, from 0 to the stretch-out ${t.stretchOutMm} mm`, [first[0], last[0]]);
  }
}

/** Station lines moved onto the part: from the lower edge to the upper edge at each station's girth. */
function stationLinesOnPart(lines: readonly StationLine[], lower: (x: number) => number, upper: (x: number) => number): StationLine[] {
  return lines.map((s) => {
    const x = s.from[0];
    return { ...s, from: [x, lower(x)], to: [x, upper(x)] };
  });
}

/**
 * A single-cut wrap (branch cut, cut-back, miter end) as one closed part: the
 * cut line from station 1 round to the stretch-out, the seam edge at the
 * stretch-out, the square end at the stub length, and the seam edge at girth
 * 0 back to the start.
 */
function closeSingleCut(t: WrapTemplate, cut: readonly Point2[], options: CloseTemplateOptions): WrapTemplate {
  checkSpansGirth(cut, t, 'template.cut[0]');
  const deepest = deepestCutbackMm(cut);
  const stubMm = options.stubMm === undefined ? deepest + DEFAULT_STUB_MARGIN_MM : requireFinite(options.stubMm, 'options.stubMm');
  if (!(stubMm > deepest)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'options.stubMm',
      `options.stubMm: the stub must be longer than the deepest cutback, ${deepest.toFixed(2)} mm, got ${stubMm} mm`,
      stubMm,
    );
  }
  const contour: Point2[] = [...cut, [t.stretchOutMm, stubMm], [0, stubMm]];
  return {
    ...t,
    cut: [{ kind: 'polyline', points: contour, closed: true }],
    stationLines: stationLinesOnPart(t.stationLines, (x) => yOnPolyline(cut, x), () => stubMm),
    closedPart: { stubMm },
  };
}

/** A piece cut at both ends (a miter middle) as one closed part: near cut, seam edge, far cut backwards, seam edge. */
function closeTwoCut(t: WrapTemplate, a: readonly Point2[], b: readonly Point2[]): WrapTemplate {
  const [near, far] = meanY(a) <= meanY(b) ? [a, b] : [b, a];
  checkSpansGirth(near, t, 'template.cut[0]');
  checkSpansGirth(far, t, 'template.cut[1]');
  const contour: Point2[] = [...near, ...[...far].reverse()];
  return {
    ...t,
    cut: [{ kind: 'polyline', points: contour, closed: true }],
    stationLines: stationLinesOnPart(t.stationLines, (x) => yOnPolyline(near, x), (x) => yOnPolyline(far, x)),
    closedPart: {},
  };
}

/**
 * A template as closed parts to cut from plate or sheet. A single-cut wrap
 * (branch cut, cut-back, miter end) becomes ONE closed contour: its cut line,
 * both seam edges (girth 0 and the stretch-out) and a square end at the stub
 * length. A piece cut at both ends (miter middle) becomes one closed contour
 * of both cuts and the seam edges. Header holes and flat patterns (cones)
 * already close and come back unchanged apart from `closedPart`. Station lines
 * of a wrap are moved onto the part (from the cut to the square end, or from
 * cut to cut), so the table marks them on the piece it keeps; station 1's line
 * then runs along the seam edge, and a DXF writer leaves such a coincident
 * stretch to the cut layer. The station table, square line (the reference the
 * cutbacks are measured from), labels and notes are kept.
 *
 * Coordinates as the template's (mm, y-up); the part is the region inside the
 * contour, the scrap outside. Pure: the template is not changed.
 *
 * @param template a template from a layout (`layoutBranch`, `layoutMiter`, ...).
 * @param options `stubMm`: stub length of a single-cut wrap, mm, from the square line to the square end.
 * @returns the template with its cut as closed contour(s) and `closedPart` set.
 * @throws GirthError `OUT_OF_RANGE` (`options.stubMm`) when the stub is not longer
 *   than the deepest cutback; `NOT_A_NUMBER` / `NOT_FINITE` for a stub that is not a
 *   finite number; `BAD_OPTION` (`template.cut`) for a wrap whose cut is not one or
 *   two open lines running the whole girth, or a hole / flat pattern whose cut is not closed.
 * @example
 * const part = closeTemplate(layoutBranch(spec).templates[0], { stubMm: 300 });
 * part.cut.length // 1, closed
 */
export function closeTemplate(template: Template, options: CloseTemplateOptions = {}): Template {
  if (template.kind !== 'wrap') {
    template.cut.forEach((part, i) => {
      const closed = part.kind === 'polyline' ? part.closed : part.kind === 'arc' ? Math.abs(part.endDeg - part.startDeg) % 360 === 0 : false;
      if (!closed && template.cut.length === 1) {
        throw new GirthError('BAD_OPTION', `template.cut[${i}]`, `template.cut[${i}]: a ${template.kind} template's cut must already be closed`, part.kind);
      }
    });
    return { ...template, closedPart: {} };
  }
  const lines = template.cut.map(openPolyline);
  if (lines.length === 1 && lines[0] !== undefined) return closeSingleCut(template, lines[0], options);
  if (lines.length === 2 && lines[0] !== undefined && lines[1] !== undefined) return closeTwoCut(template, lines[0], lines[1]);
  throw new GirthError(
    'BAD_OPTION',
    'template.cut',
    `template.cut: a wrap closes from one or two open cut lines, got ${template.cut.length} part(s)`,
    template.cut.length,
  );
}
