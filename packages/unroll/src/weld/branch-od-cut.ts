/**
 * A set-on branch cut on its OD line, with the ID line drawn too: the wall
 * preparation a fitter asks for when the branch is beveled from the outside.
 */
import { GirthError } from '@girth/pipes';
import { hitGenerator, solveBranch, type BranchSpec } from '@girth/geometry';
import { layoutBranch } from '../branch/layout-branch.js';
import type { BranchLayout, LayoutBranchOptions } from '../branch/types.js';
import { textLine } from '../facts.js';
import { appendedNotes } from './with-weld-prep.js';
import type { Point2, StationColumn, WrapTemplate } from '../types.js';
import { sampleCut } from '../wrap/sample-cut.js';

/** The station column of the ID line on an OD-cut wrap (contract key `idCutback`, a length). */
export const ID_LINE_COLUMN: StationColumn = { key: 'idCutback', heading: 'ID line cutback', quantity: 'length' };

/**
 * Lays out a set-on branch cut on the branch OD (the branch OD meets the
 * header OD: the solid cut line) with the ID line (where the branch ID meets
 * the header OD, the usual set-on line) drawn on the same wrap as a mark
 * (dashed on the sheet, on the mark layer of a DXF, never the cut layer), and
 * its cutback at each station in the column `idCutback` (mm, from the same
 * square line). The header hole is the OD-cut branch's. Everything else is
 * `layoutBranch`'s.
 *
 * @param spec a set-on branch (`fit` left out or `set-on`, no `contact`).
 * @param options as for `layoutBranch`.
 * @throws GirthError `BAD_OPTION` (field `fit`) for a set-in branch and
 *   (field `contact`) when `contact` is given; every error of `layoutBranch`.
 * @example layoutBranchCutOnOd({ header: NPS12, branch: NPS6 }).templates[0].marks.length // 1: the ID line
 */
export function layoutBranchCutOnOd(spec: BranchSpec, options: LayoutBranchOptions = {}): BranchLayout {
  if (spec !== null && typeof spec === 'object') {
    if (spec.fit !== undefined && spec.fit !== 'set-on') {
      throw new GirthError('BAD_OPTION', 'fit', `fit: the cut on the branch OD with the ID line is for a set-on branch, got ${String(spec.fit)}`, spec.fit);
    }
    if (spec.contact !== undefined) {
      throw new GirthError('BAD_OPTION', 'contact', 'contact: the cut on the branch OD sets which surfaces meet; leave the surfaces out', spec.contact);
    }
  }
  const odSpec: BranchSpec = { ...spec, fit: 'set-on', contact: { branch: 'outside', header: 'outside' } };
  const layout = layoutBranch(odSpec, options);
  const od = solveBranch(odSpec);
  const id = solveBranch({ ...spec, fit: 'set-on' });
  const [cut, hole] = layout.templates;
  if (cut.kind !== 'wrap') return layout;
  // The square line passes through the OD line's long point: axial there = heel axial + heel cutback.
  const heel = hitGenerator(od.cutBundle, od.cutHost, 0);
  const heelCutback = cut.stations[0]?.values.cutback;
  if (heel === undefined || heelCutback === undefined) throw new GirthError('NO_INTERSECTION', 'stations', 'stations: the heel generator misses the header');
  const longAxialMm = heel.axialMm + heelCutback;
  const r = od.spec.branch.odMm / 2;
  const line = sampleCut(id.cutBundle, id.cutHost, {
    stations: layout.stations,
    wrapOdMm: od.spec.branch.odMm,
    chordToleranceMm: options.chordToleranceMm,
    kinkPhisRad: id.cutKinkPhisRad,
  });
  const points: Point2[] = line.samples.map((h) => [r * h.phiRad, longAxialMm - h.axialMm]);
  const note = textLine(
    'Cut on the solid line: the branch OD on the header OD. The dashed line is the ID line, where the branch ID meets the header OD (the set-on fit-up line): bevel from the OD line down to it; ID line cutback is its distance from the same square line.',
  );
  const text = appendedNotes(cut, [note]);
  const withId: WrapTemplate = {
    ...cut,
    ...text,
    marks: [...cut.marks, { kind: 'polyline', points, closed: false }],
    stationColumns: [...cut.stationColumns, ID_LINE_COLUMN],
    stations: cut.stations.map((row, i) => {
      const s = line.stations[i];
      return s === undefined ? row : { ...row, values: { ...row.values, idCutback: longAxialMm - s.axialMm } };
    }),
  };
  return { ...layout, templates: [withId, hole] };
}
