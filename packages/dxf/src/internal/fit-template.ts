/**
 * A template's sampled cut lines replaced by fitted arcs (see fit-arcs.ts),
 * before the sheet is planned: each polyline of the cut becomes arcs and
 * straight runs; the template's own arcs and segments, and its marks, stay.
 * Each polyline part is fitted on its own, so the corners where parts meet
 * (a cut line meeting a seam edge) stay corners.
 */
import type { PathPart, Point2, Template } from '@girth/unroll';
import { arcOfBulge } from './arc-math.js';
import { fitArcs } from './fit-arcs.js';
import type { SheetVertex } from './sheet.js';

/** A template with arc-fitted cut lines, and the largest distance of any cut sample from its fitted arc, mm. */
export interface FittedTemplate {
  readonly template: Template;
  readonly maxDeviationMm: number;
  /** Cut entities before (chords) and after fitting (arcs + straight segments). */
  readonly chordCount: number;
  readonly fittedCount: number;
}

function partsOf(vertices: readonly SheetVertex[]): PathPart[] {
  const out: PathPart[] = [];
  let straight: Point2[] = [];
  const flush = (): void => {
    if (straight.length >= 2) out.push({ kind: 'polyline', points: straight, closed: false });
    straight = [];
  };
  for (let i = 0; i + 1 < vertices.length; i++) {
    const [x, y, bulge] = vertices[i]!;
    const next = vertices[i + 1]!;
    if (bulge === 0) {
      if (straight.length === 0) straight.push([x, y]);
      straight.push([next[0], next[1]]);
      continue;
    }
    flush();
    const arc = arcOfBulge([x, y], [next[0], next[1]], bulge);
    out.push({ kind: 'arc', center: arc.center, radiusMm: arc.radius, startDeg: arc.startDeg, endDeg: arc.endDeg });
  }
  flush();
  return out;
}

const segmentsOf = (parts: readonly PathPart[]): number =>
  parts.reduce((n, p) => n + (p.kind === 'polyline' ? p.points.length - (p.closed ? 0 : 1) : 1), 0);

/**
 * The template with every cut polyline fitted with arcs within `toleranceMm` of its samples.
 *
 * @param toleranceMm largest distance of a cut sample from its arc, mm (> 0).
 * @example fitTemplateArcs(wrap, 0.025).maxDeviationMm
 */
export function fitTemplateArcs(template: Template, toleranceMm: number): FittedTemplate {
  let worst = 0;
  const cut = template.cut.flatMap((part): PathPart[] => {
    if (part.kind !== 'polyline' || part.points.length < 3) return [part];
    const pts = part.closed ? [...part.points, part.points[0]!] : part.points;
    const fit = fitArcs(pts, toleranceMm);
    worst = Math.max(worst, fit.maxDeviation);
    return partsOf(fit.vertices);
  });
  const chordCount = segmentsOf(template.cut);
  const fittedCount = segmentsOf(cut);
  return { template: { ...template, cut }, maxDeviationMm: worst, chordCount, fittedCount };
}
