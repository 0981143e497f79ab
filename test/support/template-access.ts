/**
 * Reading a library result the way a fitter would read the printout: one
 * template by id, one station column, the cut contour's points. Every reader
 * fails loudly (naming what is missing) rather than returning NaN.
 */
import type { LayoutResult, Point2, Template } from '@girth/unroll';

/**
 * The template with contract id `id`.
 * @throws Error naming the ids present when it is missing.
 * @example templateById(result, 'branch-cut').stretchOutMm
 */
export function templateById(result: Pick<LayoutResult, 'templates'>, id: string): Template {
  const t = result.templates.find((x) => x.id === id);
  if (!t) throw new Error(`no template '${id}' (have: ${result.templates.map((x) => x.id).join(', ')})`);
  return t;
}

/**
 * Column `key` of a template's station table, in mm, one value per station.
 * @throws Error when a station lacks the key or holds a value that is not a finite number.
 * @example stationColumn(templateById(result, 'branch-cut'), 'cutback')
 */
export function stationColumn(template: Template, key: string): readonly number[] {
  return template.stations.map((row) => {
    const v = row.values[key];
    if (typeof v !== 'number' || !Number.isFinite(v)) throw new Error(`${template.id} station ${row.n}: '${key}' is ${String(v)}`);
    return v;
  });
}

/**
 * Every point of the template's polyline cut parts, in order.
 * @throws Error when the template has no polyline cut part.
 * @example cutPolylinePoints(templateById(result, 'header-hole')).length
 */
export function cutPolylinePoints(template: Template): readonly Point2[] {
  const parts = template.cut.filter((p): p is Extract<typeof p, { kind: 'polyline' }> => p.kind === 'polyline');
  if (parts.length === 0) throw new Error(`${template.id}: no polyline in its cut`);
  return parts.flatMap((p) => p.points);
}
