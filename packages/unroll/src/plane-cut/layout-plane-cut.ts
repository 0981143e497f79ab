/**
 * A pipe end cut to meet a plane, laid out as a wrap-around template.
 */
import { hitGenerator, planeCutGeometry, type PlaneCutSpec } from '@girth/geometry';
import { GirthError } from '@girth/pipes';
import type { PipeUsed } from '../types.js';
import { developWrap } from '../wrap/develop-wrap.js';
import { resolveCutStations, type CutLayoutOptions } from './layout-options.js';
import { planeCutText } from './plane-cut-text.js';
import type { PlaneCutLayout } from './types.js';

/**
 * Lays out a pipe end cut to meet a plane at `angleDeg` (90 is a square cut):
 * the generators of the fit surface (the OD by default) are intersected with
 * the plane, moved toward the pipe by the root gap, and developed onto a wrap
 * template for the OD (`id: 'plane-cut'`). Its station table holds the
 * ordinates: `girth` around the OD from station 1 (the heel, the short side)
 * and `cutback` back from the square line through the long point; for the OD
 * these are (D/2) tan(c) (1 + cos phi), c = 90° − angle.
 *
 * @param spec pipe, `angleDeg` in [1, 90], optional `gapMm` ≥ 0 and `fitSurface`.
 * @param options `stations` (4 to 360, default 16), `chordToleranceMm` (default 0.05).
 * @throws GirthError `OUT_OF_RANGE` for an angle outside [1, 90] (MIN_JOINT_ANGLE_DEG) or a bad station
 *   count; `NEGATIVE`, `NOT_A_NUMBER`, `NOT_FINITE`, `WALL_TOO_THICK`, `BAD_OPTION`
 *   for bad sizes, gap, fit surface or chord tolerance.
 * @example
 * const cut = layoutPlaneCut({ pipe: { odMm: 168.3, wallMm: 7.11, label: 'NPS 6 STD' }, angleDeg: 60 });
 * cut.templates[0].stations[0]?.values.cutback // the heel: OD × tan 30°
 */
export function layoutPlaneCut(spec: PlaneCutSpec, options: CutLayoutOptions = {}): PlaneCutLayout {
  const g = planeCutGeometry(spec);
  const stations = resolveCutStations(options);
  const wrapOdMm = g.pipe.odMm;
  const draft = developWrap({
    bundle: g.bundle,
    host: g.host,
    wrapOdMm,
    stations,
    ...(options.chordToleranceMm === undefined ? {} : { chordToleranceMm: options.chordToleranceMm }),
    id: 'plane-cut',
    title: '',
    notes: [],
  });
  // The template's square line is at the long point: axial + cutback, the same at every station.
  const heel = hitGenerator(g.bundle, g.host, 0);
  const heelCutback = draft.stations[0]?.values.cutback;
  const axisHit = hitGenerator({ ...g.bundle, radius: 0 }, g.host, 0);
  if (heel === undefined || axisHit === undefined || heelCutback === undefined) {
    throw new GirthError('NO_INTERSECTION', 'angleDeg', 'angleDeg: the pipe does not meet the plane');
  }
  const longAxialMm = heel.axialMm + heelCutback;
  const centerCutbackMm = longAxialMm - axisHit.axialMm;
  const text = planeCutText(g, Math.PI * wrapOdMm, centerCutbackMm);
  const pipe: PipeUsed = { role: 'pipe', label: g.pipe.label, odMm: g.pipe.odMm, wallMm: g.pipe.wallMm, idMm: g.pipe.idMm };
  return {
    kind: 'plane-cut',
    templates: [{ ...draft, title: text.title, notes: text.notes, facts: text.facts }],
    pipes: [pipe],
    warnings: g.warnings,
    angleDeg: g.angleDeg,
    cutAngleDeg: g.cutAngleDeg,
    gapMm: g.gapMm,
    fitSurface: g.fitSurface,
    stations,
    centerCutbackMm,
    gapSetbackMm: g.gapSetbackMm,
  };
}
