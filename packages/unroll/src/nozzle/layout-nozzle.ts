/**
 * A nozzle in a dished head from spec to templates: the nozzle cut (a wrap
 * on the nozzle OD) and the hole (marked on the head by square and by tape).
 */
import { DEFAULT_STATIONS, GirthError, requireWithin, STATIONS } from '@girth/pipes';
import { solveNozzle, type NozzleSpec } from '@girth/geometry';
import { developWrap } from '../wrap/develop-wrap.js';
import { developHeadHole } from './head-hole.js';
import { headHoleText, nozzleCutText } from './nozzle-text.js';
import type { LayoutNozzleOptions, NozzleLayout } from './types.js';

/**
 * Lays out a nozzle in a dished head: `nozzle-cut`, a wrap on the nozzle OD
 * (columns `girth`, `cutback`, mm; exact, developed on the nozzle cylinder),
 * and `head-hole` (columns `drop`, `meridian`, `around`, mm; see
 * `developHeadHole`), stations at the same angles, station 1 on the nozzle's
 * outboard side. See `solveNozzle` for the frame and the checks.
 *
 * @throws GirthError every error of `solveNozzle`; `OUT_OF_RANGE` on
 *   `stations`; the option errors of `sampleCut`; `BAD_OPTION` when
 *   `options` is not an object.
 * @example
 * const layout = layoutNozzle({ head: { type: 'ellipsoidal', odMm: 1219.2, wallMm: 12.7 },
 *   nozzle: { odMm: 168.275, wallMm: 7.112, label: 'NPS 6 STD' }, offsetMm: 300 });
 * layout.templates[1].stations[0]?.values.meridian // tape from the crown centre to station 1, mm
 */
export function layoutNozzle(spec: NozzleSpec, options: LayoutNozzleOptions = {}): NozzleLayout {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { stations, chordToleranceMm }', options);
  }
  const g = solveNozzle(spec);
  const stations = options.stations === undefined ? DEFAULT_STATIONS : requireWithin(options.stations, 'stations', STATIONS);
  const s = g.spec;
  const nozzleCut = developWrap({
    bundle: g.cutBundle,
    host: g.cutHost,
    wrapOdMm: s.nozzle.odMm,
    stations,
    chordToleranceMm: options.chordToleranceMm,
    id: 'nozzle-cut',
    ...nozzleCutText(g, Math.PI * s.nozzle.odMm),
  });
  const hole = developHeadHole({
    geometry: g,
    stations,
    chordToleranceMm: options.chordToleranceMm,
    text: (bound) => headHoleText(g, bound),
  });
  return {
    kind: 'nozzle',
    templates: [nozzleCut, hole.template],
    pipes: [
      { role: 'head', label: s.head.label, odMm: s.head.odMm, wallMm: s.head.wallMm, idMm: s.head.idMm },
      { role: 'nozzle', label: s.nozzle.label, odMm: s.nozzle.odMm, wallMm: s.nozzle.wallMm, idMm: s.nozzle.idMm },
    ],
    warnings: g.warnings,
    offsetMm: s.offsetMm,
    direction: s.direction,
    tiltDeg: s.tiltDeg,
    fit: s.fit,
    gapMm: s.gapMm,
    stations,
    aroundTapeBoundMm: hole.aroundBoundMm,
  };
}
