/**
 * A branch joint from spec to templates: the branch cut (a wrap on the branch
 * OD) and the hole (marked on the header OD).
 */
import { DEFAULT_STATIONS, GirthError, requireWithin, STATIONS } from '@girth/pipes';
import { solveBranch, type BranchPipeSection, type BranchSpec } from '@girth/geometry';
import type { PipeUsed } from '../types.js';
import { developWrap } from '../wrap/develop-wrap.js';
import { branchCutText, headerHoleText } from './branch-text.js';
import { developHeaderHole } from './header-hole.js';
import type { BranchLayout, LayoutBranchOptions } from './types.js';

/** Stations around a branch when none are asked for: 16 of 22.5° (common practice). */
export const DEFAULT_BRANCH_STATIONS = DEFAULT_STATIONS;
/** Fewest stations a branch layout accepts. */
export const MIN_BRANCH_STATIONS = STATIONS.min;
/** Most stations a branch layout accepts (one a degree). */
export const MAX_BRANCH_STATIONS = STATIONS.max;

/**
 * Lays out a branch joint: `branch-cut`, a wrap template on the branch OD
 * (stretch-out π × branch OD; columns `girth`, `cutback`, mm), and
 * `header-hole`, the hole on the header OD (columns `girth`, `axial`, mm),
 * with stations at the same angles, the pipes used and the warnings. See
 * `solveBranch` for the conventions and `developWrap` / `developHeaderHole`
 * for the templates.
 *
 * @param options.stations 4 to 360, default 16.
 * @param options.chordToleranceMm chord tolerance of the drawn curves, mm, default 0.05.
 * @throws GirthError every error of `solveBranch` (bad sizes, angle, offset,
 *   fit, gap); `OUT_OF_RANGE` on `stations` or `chordToleranceMm`;
 *   `BAD_OPTION` when `options` is not an object.
 * @example
 * const layout = layoutBranch({ header: { odMm: 323.85, wallMm: 9.525, label: 'NPS 12 STD' },
 *   branch: { odMm: 168.275, wallMm: 7.112, label: 'NPS 6 STD' }, angleDeg: 45 });
 * layout.templates[0].stations[0]?.values.cutback // heel cutback, mm
 */
export function layoutBranch(spec: BranchSpec, options: LayoutBranchOptions = {}): BranchLayout {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { stations, chordToleranceMm }', options);
  }
  const geometry = solveBranch(spec);
  const stations =
    options.stations === undefined
      ? DEFAULT_BRANCH_STATIONS
      : requireWithin(options.stations, 'stations', STATIONS);
  const s = geometry.spec;

  const cutText = branchCutText(geometry, Math.PI * s.branch.odMm);
  const branchCut = developWrap({
    bundle: geometry.cutBundle,
    host: geometry.cutHost,
    wrapOdMm: s.branch.odMm,
    stations,
    chordToleranceMm: options.chordToleranceMm,
    kinkPhisRad: geometry.cutKinkPhisRad,
    id: 'branch-cut',
    ...cutText,
  });
  const headerHole = developHeaderHole({
    geometry,
    stations,
    chordToleranceMm: options.chordToleranceMm,
    ...headerHoleText(geometry),
  });

  return {
    kind: 'branch',
    templates: [branchCut, headerHole],
    pipes: [pipeUsed(s.header), pipeUsed(s.branch)],
    warnings: geometry.warnings,
    angleDeg: s.angleDeg,
    offsetMm: s.offsetMm,
    fit: s.fit,
    contact: s.contact,
    gapMm: s.gapMm,
    stations,
  };
}

function pipeUsed(p: BranchPipeSection): PipeUsed {
  return { role: p.role, label: p.label, odMm: p.odMm, wallMm: p.wallMm, idMm: p.idMm };
}
