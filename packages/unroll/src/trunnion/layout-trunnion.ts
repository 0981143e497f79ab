/**
 * A trunnion on an elbow from spec to templates: the trunnion cut (a wrap on
 * its OD) and the hole (marked on the elbow by square and by tape).
 */
import { DEFAULT_STATIONS, GirthError, requireWithin, STATIONS } from '@girth/pipes';
import { solveTrunnion, type TrunnionSpec } from '@girth/geometry';
import { developWrap } from '../wrap/develop-wrap.js';
import { developElbowHole } from './elbow-hole.js';
import { elbowHoleText, trunnionCutText } from './trunnion-text.js';
import type { LayoutTrunnionOptions, TrunnionLayout } from './types.js';

/**
 * Lays out a trunnion (or branch) on an elbow: `trunnion-cut`, a wrap on the
 * trunnion OD (columns `girth`, `cutback`, mm; exact, developed on the
 * trunnion cylinder), and `elbow-hole` (columns `drop`, `around`, `along`,
 * mm; see `developElbowHole`), stations at the same angles. See
 * `solveTrunnion` for the frame and the checks.
 *
 * @throws GirthError every error of `solveTrunnion`; `OUT_OF_RANGE` on
 *   `stations`; the option errors of `sampleCut`; `BAD_OPTION` when
 *   `options` is not an object.
 * @example
 * const layout = layoutTrunnion({ elbow: { pipe: { odMm: 323.85, wallMm: 9.525, npsIn: 12 } },
 *   branch: { odMm: 219.075, wallMm: 8.179, label: 'NPS 8 STD' }, alongDeg: 45 });
 * layout.templates[1].stations[0]?.values.along // tape from the inlet end to station 1, mm
 */
export function layoutTrunnion(spec: TrunnionSpec, options: LayoutTrunnionOptions = {}): TrunnionLayout {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { stations, chordToleranceMm }', options);
  }
  const g = solveTrunnion(spec);
  const stations = options.stations === undefined ? DEFAULT_STATIONS : requireWithin(options.stations, 'stations', STATIONS);
  const s = g.spec;
  const cut = developWrap({
    bundle: g.cutBundle,
    host: g.cutHost,
    wrapOdMm: s.branch.odMm,
    stations,
    chordToleranceMm: options.chordToleranceMm,
    id: 'trunnion-cut',
    ...trunnionCutText(g, Math.PI * s.branch.odMm),
  });
  const hole = developElbowHole({ geometry: g, stations, chordToleranceMm: options.chordToleranceMm, text: (bound) => elbowHoleText(g, bound) });
  return {
    kind: 'trunnion',
    templates: [cut, hole.template],
    pipes: [
      { role: 'elbow', label: s.elbow.pipe.label, odMm: s.elbow.pipe.odMm, wallMm: s.elbow.pipe.wallMm, idMm: s.elbow.pipe.idMm },
      { role: 'trunnion', label: s.branch.label, odMm: s.branch.odMm, wallMm: s.branch.wallMm, idMm: s.branch.idMm },
    ],
    warnings: g.warnings,
    bendRadiusMm: s.elbow.bendRadiusMm,
    bendDeg: s.elbow.bendDeg,
    alongDeg: s.alongDeg,
    aroundDeg: s.aroundDeg,
    direction: s.direction,
    tiltFromNormalDeg: g.tiltFromNormalDeg,
    fit: s.fit,
    gapMm: s.gapMm,
    stations,
    alongTapeBoundMm: hole.alongBoundMm,
  };
}
