/**
 * Checking a template before its sheet is planned: every number finite and
 * within reach, arcs with a radius and a sweep, wraps with their stretch-out,
 * holes with the OD they lie on. Done once, in `planSheet`, for every writer.
 */
import { GirthError, requireFinite, requireInRange, requirePositive, TEMPLATE_REACH_MM } from '@girth/pipes';
import type { PathPart, Point2, Template } from '@girth/unroll';

/** Largest coordinate magnitude accepted, mm (1 km: beyond any sheet, and far from float trouble). */
export const MAX_COORD_MM = TEMPLATE_REACH_MM;
/** Largest label cap height accepted, mm. */
export const MAX_LABEL_HEIGHT_MM = 200;

function checkPoint(p: Point2, field: string): void {
  if (!Array.isArray(p) || p.length !== 2) {
    throw new GirthError('BAD_JOB', field, `${field}: expected a point [x, y]`, p);
  }
  requireInRange(p[0], `${field}[0]`, -MAX_COORD_MM, MAX_COORD_MM, { unit: 'mm' });
  requireInRange(p[1], `${field}[1]`, -MAX_COORD_MM, MAX_COORD_MM, { unit: 'mm' });
}

/**
 * Sweep of an arc from `startDeg` counter-clockwise to `endDeg`, degrees: 360 for a
 * full circle (`endDeg - startDeg >= 360`), 0 for an arc of no sweep, else in (0, 360).
 *
 * @example arcSweepDeg(350, 10) // 20
 */
export function arcSweepDeg(startDeg: number, endDeg: number): number {
  const raw = endDeg - startDeg;
  if (raw >= 360) return 360;
  return ((raw % 360) + 360) % 360;
}

function checkPart(part: PathPart, field: string): void {
  switch (part.kind) {
    case 'polyline': {
      if (!Array.isArray(part.points) || part.points.length < 2) {
        throw new GirthError('EMPTY_INPUT', `${field}.points`, `${field}.points: a polyline needs at least 2 points`, part.points);
      }
      part.points.forEach((p, i) => {
        // The usual case is checked without making the field path (made only for an error).
        if (Array.isArray(p) && p.length === 2 && Math.abs(p[0]) <= MAX_COORD_MM && Math.abs(p[1]) <= MAX_COORD_MM) return;
        checkPoint(p, `${field}.points[${i}]`);
      });
      return;
    }
    case 'segment':
      checkPoint(part.from, `${field}.from`);
      checkPoint(part.to, `${field}.to`);
      return;
    case 'arc': {
      checkPoint(part.center, `${field}.center`);
      requirePositive(part.radiusMm, `${field}.radiusMm`);
      requireInRange(part.radiusMm, `${field}.radiusMm`, 0, MAX_COORD_MM, { unit: 'mm', minOpen: true });
      const start = requireFinite(part.startDeg, `${field}.startDeg`);
      const end = requireFinite(part.endDeg, `${field}.endDeg`);
      if (arcSweepDeg(start, end) === 0) {
        throw new GirthError(
          'OUT_OF_RANGE',
          `${field}.endDeg`,
          `${field}: an arc must sweep more than 0°, got ${start}° to ${end}° (use 0° to 360° for a full circle)`,
          end,
        );
      }
      return;
    }
    default: {
      const kind = (part as { kind?: unknown }).kind;
      throw new GirthError('BAD_JOB', `${field}.kind`, `${field}.kind: expected polyline, arc or segment, got ${String(kind)}`, kind);
    }
  }
}

/**
 * Checks that a template can be drawn.
 *
 * @param template - the template to draw (mm, y-up).
 * @throws GirthError with the field path inside the template (e.g. `template.cut[0].points[14][1]`):
 *   `NOT_A_NUMBER` / `NOT_FINITE` for a coordinate that is NaN or infinite; `OUT_OF_RANGE` for a
 *   coordinate beyond ±1 000 000 mm, an arc sweeping 0° or a label taller than 200 mm; `NEGATIVE`
 *   for a radius or label height of 0 or less; `EMPTY_INPUT` for a template with nothing to cut,
 *   a wrap without `stretchOutMm` / `wrapOdMm` / `squareLine` / `startLine` or a hole without
 *   `wrapOdMm`; `BAD_JOB` for a malformed point or part.
 * @example
 * ```ts
 * checkTemplate(template); // returns nothing, or throws
 * ```
 */
export function checkTemplate(template: Template): void {
  const t = 'template';
  if (template === null || typeof template !== 'object') {
    throw new GirthError('BAD_JOB', t, `${t}: expected a template object, got ${String(template)}`, template);
  }
  if (template.kind !== 'wrap' && template.kind !== 'hole' && template.kind !== 'flat') {
    const kind: unknown = (template as { kind?: unknown }).kind;
    throw new GirthError('BAD_JOB', `${t}.kind`, `${t}.kind: expected wrap, hole or flat, got ${String(kind)}`, kind);
  }
  if (!Array.isArray(template.cut) || template.cut.length === 0) {
    throw new GirthError('EMPTY_INPUT', `${t}.cut`, `${t}.cut: a template needs at least one cut line`);
  }
  for (const key of ['marks', 'stationLines', 'labels', 'notes'] as const) {
    if (!Array.isArray(template[key])) throw new GirthError('BAD_JOB', `${t}.${key}`, `${t}.${key}: expected a list`, template[key]);
  }
  template.cut.forEach((p, i) => checkPart(p, `${t}.cut[${i}]`));
  template.marks.forEach((p, i) => checkPart(p, `${t}.marks[${i}]`));
  if (template.kind === 'wrap' && template.squareLine !== undefined) checkPart(template.squareLine, `${t}.squareLine`);
  template.stationLines.forEach((s, i) => {
    checkPoint(s.from, `${t}.stationLines[${i}].from`);
    checkPoint(s.to, `${t}.stationLines[${i}].to`);
    requireFinite(s.n, `${t}.stationLines[${i}].n`);
  });
  template.labels.forEach((l, i) => {
    checkPoint(l.at, `${t}.labels[${i}].at`);
    requirePositive(l.heightMm, `${t}.labels[${i}].heightMm`);
    requireInRange(l.heightMm, `${t}.labels[${i}].heightMm`, 0, MAX_LABEL_HEIGHT_MM, { unit: 'mm', minOpen: true });
  });
  // What each kind needs besides its lines (the types require them; data from JSON may lack them).
  const ods: readonly ('stretchOutMm' | 'wrapOdMm')[] =
    template.kind === 'wrap' ? ['stretchOutMm', 'wrapOdMm'] : template.kind === 'hole' ? ['wrapOdMm'] : [];
  for (const key of ods) {
    const value = (template as unknown as Record<string, number | undefined>)[key];
    if (value === undefined) {
      throw new GirthError('EMPTY_INPUT', `${t}.${key}`, `${t}.${key}: a ${template.kind} template needs its ${key}`);
    }
    requirePositive(value, `${t}.${key}`);
    requireInRange(value, `${t}.${key}`, 0, MAX_COORD_MM, { unit: 'mm', minOpen: true });
  }
  if (template.kind === 'wrap') {
    if (template.squareLine === undefined) {
      throw new GirthError('EMPTY_INPUT', `${t}.squareLine`, `${t}.squareLine: a wrap template needs its square line`);
    }
    if (typeof template.startLine !== 'string' || template.startLine.trim() === '') {
      throw new GirthError('EMPTY_INPUT', `${t}.startLine`, `${t}.startLine: a wrap template names the line station 1 goes on`);
    }
  }
}
