/**
 * How far a template reaches, and the layouts' refusal of a joint whose
 * template would reach past the 1 km every exporter draws (before the joint is
 * handed to an exporter, which would otherwise refuse it late, naming a point
 * of the template instead of the input at fault).
 */
import { GirthError, TEMPLATE_REACH_MM } from '@girth/pipes';
import type { PathPart, Point2, Template } from '../types.js';

function pointReach(p: Point2): number {
  return Math.max(Math.abs(p[0]), Math.abs(p[1]));
}

function partReach(part: PathPart): number {
  switch (part.kind) {
    case 'polyline': {
      let most = 0;
      for (const p of part.points) {
        const a = Math.abs(p[0]);
        const b = Math.abs(p[1]);
        if (a > most) most = a;
        if (b > most) most = b;
      }
      return most;
    }
    case 'segment':
      return Math.max(pointReach(part.from), pointReach(part.to));
    case 'arc':
      return Math.max(pointReach(part.center), part.radiusMm);
  }
}

/**
 * The largest coordinate magnitude or length of a template, mm: every point
 * of its cut lines, marks, square line, station lines and labels, every arc's
 * radius, and its stretch-out and OD. What the exporters hold to
 * {@link TEMPLATE_REACH_MM}. A NaN is passed over (the exporters' checks name it).
 * @example templateReachMm(layoutPlaneCut(spec).templates[0]) // ≈ the stretch-out
 */
export function templateReachMm(t: Template): number {
  let most = 0;
  const take = (v: number): void => {
    if (v > most) most = v;
  };
  for (const part of t.cut) take(partReach(part));
  for (const part of t.marks) take(partReach(part));
  for (const s of t.stationLines) take(Math.max(pointReach(s.from), pointReach(s.to)));
  for (const l of t.labels) take(pointReach(l.at));
  if (t.kind === 'wrap') {
    take(partReach(t.squareLine));
    take(t.stretchOutMm);
  }
  if (t.kind !== 'flat') take(t.wrapOdMm);
  return most;
}

/**
 * Refuses templates that reach past {@link TEMPLATE_REACH_MM}, naming the
 * input `field` that made them so large.
 * @param why - what to change, in the trade's words (ends the message).
 * @throws GirthError `OUT_OF_RANGE` on `field`, saying how far the template
 *   would reach, the limit and `why`.
 * @example requireWithinReach(templates, 'radiusMm', spec.radiusMm, 'give a smaller radius or more welds')
 */
export function requireWithinReach(templates: readonly Template[], field: string, value: unknown, why: string): void {
  for (const t of templates) {
    const reach = templateReachMm(t);
    if (!(reach > TEMPLATE_REACH_MM)) continue;
    throw new GirthError(
      'OUT_OF_RANGE',
      field,
      `${field}: the template would reach ${(reach / 1e6).toPrecision(3)} km, beyond the ${TEMPLATE_REACH_MM / 1e6} km Girth lays out; ${why}`,
      value,
    );
  }
}
