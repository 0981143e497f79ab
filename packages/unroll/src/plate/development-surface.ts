/**
 * The surface a template is developed on: the OD (a paper or sheet-metal wrap
 * laid on the pipe) or the mid-thickness (neutral) surface of a plate rolled
 * into the pipe, for a part cut flat and then rolled.
 */
import { GirthError, requireFinite } from '@girth/pipes';
import { describeLine, factLine, lengthFact, type FactLine } from '../facts.js';
import type { Development, DevelopmentSurfaceKind, PathPart, Point2, Template } from '../types.js';

/** Options of {@link onDevelopmentSurface}. */
export interface DevelopmentSurfaceOptions {
  /** `'od'` (default, the template as laid out) or `'mid'`, the plate's mid-thickness surface. */
  readonly surface?: DevelopmentSurfaceKind;
  /** Thickness of the plate rolled into the pipe, mm, above 0 and below half the OD; required for `'mid'`. */
  readonly plateThicknessMm?: number;
}

/**
 * The rule a `mid` development follows, worded for the sheet's notes and the
 * JSON (common practice: a rolled plate keeps its length at mid-thickness).
 * @example describeLine(developmentNote({ surface: 'mid', diameterMm: 161.2, odMm: 168.3, plateThicknessMm: 7.1 }))
 */
export function developmentNote(d: Development): FactLine {
  if (d.surface === 'od') return factLine`Girth measured on the OD ${lengthFact(d.odMm)} (wrap laid on the pipe).`;
  if (d.diameterMm > d.odMm) {
    // A plate rolled onto the pipe's outside (a reinforcing pad): its mid surface lies outside the OD.
    return factLine`Cut flat from ${lengthFact(d.plateThicknessMm ?? 0)} plate and rolled onto the pipe: girth measured on the mid-thickness diameter ${lengthFact(d.diameterMm)} (OD plus the plate thickness); the outline keeps its place on the OD.`;
  }
  return factLine`Cut flat from ${lengthFact(d.plateThicknessMm ?? 0)} plate and rolled: girth measured on the mid-thickness diameter ${lengthFact(d.diameterMm)} (OD less the plate thickness); the cut keeps its place on the pipe.`;
}

const scaleX = (p: Point2, k: number): Point2 => [p[0] * k, p[1]];

function scalePart(part: PathPart, k: number): PathPart {
  switch (part.kind) {
    case 'polyline':
      return { ...part, points: part.points.map((p) => scaleX(p, k)) };
    case 'segment':
      return { ...part, from: scaleX(part.from, k), to: scaleX(part.to, k) };
    case 'arc':
      // A wrap or hole template draws no arcs; an arc is scaled only by a uniform factor, never by x alone.
      throw new GirthError('BAD_OPTION', 'template.cut', 'template.cut: a template with arcs cannot be developed on another surface', part.kind);
  }
}

/**
 * A wrap or hole template developed on a chosen surface of the pipe. The cut
 * line keeps its true place on the pipe (axial positions, y, unchanged); only
 * the girth (x) is measured on another diameter: every x, the station table's
 * `girth` column and the stretch-out are multiplied by (OD - t) / OD for the
 * mid-thickness surface of a plate of thickness t (common practice: the
 * neutral surface of a rolled plate is at mid-thickness, so a part cut to this
 * development and rolled closes on the pipe at its OD). A note giving the old
 * stretch-out gives the new one. Chords shrink with x,
 * so the chord tolerance still holds. A note stating the rule is added, and
 * `development` set for the JSON. `'od'` returns the template with
 * `development` set and no other change. Flat patterns (cones) carry their own
 * plate rule and come back unchanged.
 *
 * @param template a wrap (girth on its `wrapOdMm`) or a hole template (girth on the header OD).
 * @param options surface `'od'` or `'mid'`, plate thickness in mm for `'mid'`.
 * @throws GirthError `MISSING_INPUT` (`options.plateThicknessMm`) for `'mid'` without a thickness,
 *   `NEGATIVE` for a thickness at or below 0, `WALL_TOO_THICK` for one of half the OD or more,
 *   `BAD_CHOICE` (`options.surface`) for another surface.
 * @example
 * const rolled = onDevelopmentSurface(layoutBranch(spec).templates[0], { surface: 'mid', plateThicknessMm: 9.53 });
 * rolled.kind === 'wrap' && rolled.stretchOutMm // π × (OD − 9.53)
 */
export function onDevelopmentSurface(template: Template, options: DevelopmentSurfaceOptions = {}): Template {
  const surface = options.surface ?? 'od';
  if (surface !== 'od' && surface !== 'mid') {
    throw new GirthError('BAD_CHOICE', 'options.surface', `options.surface: must be 'od' or 'mid', got '${String(surface)}'`, surface);
  }
  if (template.kind === 'flat') return template;
  const odMm = template.development?.odMm ?? template.wrapOdMm;
  if (surface === 'od') return { ...template, development: { surface, diameterMm: odMm, odMm } };
  if (options.plateThicknessMm === undefined) {
    throw new GirthError('MISSING_INPUT', 'options.plateThicknessMm', 'options.plateThicknessMm: the mid-thickness surface needs the plate thickness');
  }
  const t = requireFinite(options.plateThicknessMm, 'options.plateThicknessMm');
  if (!(t > 0)) throw new GirthError('NEGATIVE', 'options.plateThicknessMm', `options.plateThicknessMm: must be above 0 mm, got ${t} mm`, t);
  if (!(t < odMm / 2)) {
    throw new GirthError('WALL_TOO_THICK', 'options.plateThicknessMm', `options.plateThicknessMm: a ${t} mm plate leaves no bore in a ${odMm} mm OD (limit: below half the OD)`, t);
  }
  const diameterMm = odMm - t;
  // From the surface the template is on now (OD, or an earlier development) to the new one.
  const k = diameterMm / (template.development?.diameterMm ?? odMm);
  const development: Development = { surface, diameterMm, odMm, plateThicknessMm: t };
  const note = developmentNote(development);
  // A note that states the old stretch-out (the layout's "stretch-out ..." line) states the new one.
  const oldStretchMm = template.kind === 'wrap' ? template.stretchOutMm : undefined;
  const restate = (line: FactLine): FactLine =>
    line.map((f) => (f.kind === 'length' && oldStretchMm !== undefined && Math.abs(f.mm - oldStretchMm) <= 1e-9 * oldStretchMm ? lengthFact(f.mm * k) : f));
  const factNotes = template.facts?.notes.map(restate);
  const girthKeys = new Set(template.stationColumns.filter((c) => c.key === 'girth').map((c) => c.key));
  const base = {
    cut: template.cut.map((p) => scalePart(p, k)),
    marks: template.marks.map((p) => scalePart(p, k)),
    stationLines: template.stationLines.map((s) => ({ ...s, from: scaleX(s.from, k), to: scaleX(s.to, k) })),
    labels: template.labels.map((l) => ({ ...l, at: scaleX(l.at, k) })),
    stations: template.stations.map((s) => ({
      ...s,
      values: Object.fromEntries(Object.entries(s.values).map(([key, v]) => [key, girthKeys.has(key) ? v * k : v])),
    })),
    notes: [...(factNotes === undefined ? template.notes : factNotes.map((l) => describeLine(l))), describeLine(note)],
    ...(template.facts === undefined || factNotes === undefined ? {} : { facts: { ...template.facts, notes: [...factNotes, note] } }),
    development,
  };
  if (template.kind === 'wrap') {
    return { ...template, ...base, stretchOutMm: template.stretchOutMm * k, squareLine: scalePart(template.squareLine, k) as typeof template.squareLine };
  }
  return { ...template, ...base };
}
