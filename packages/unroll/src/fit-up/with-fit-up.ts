/**
 * A layout with its fit-up applied: the station tables measured from the
 * chosen square line, each station's ordinate worded for the job, the square
 * lines to draw, and the fit-up dimensions on the result and every template.
 */
import { formatLength, GirthError, type FormatLengthOptions } from '@girth/pipes';
import type { LayoutResultBase, Template } from '../types.js';
import type { BranchFitUp } from './branch-fit-up.js';
import type { CutDepth } from './cut-depth.js';
import { branchFitUpLines, miterFitUpLines, ordinateReferenceLine, planeCutFitUpLines } from './fit-up-text.js';
import type { MiterFitUp } from './miter-fit-up.js';
import { DEFAULT_ORDINATE_REFERENCE, requireOrdinateReference, type OrdinateReference } from './ordinate-reference.js';
import { ordinatesFrom } from './ordinates-from.js';
import type { PlaneCutFitUp } from './plane-cut-fit-up.js';
import { referenceLines } from './reference-lines.js';
import type { StationOrdinate, TemplateOrdinates } from './template-ordinates.js';

/** The fit-up of any joint that has one: a branch, a miter elbow or a plane cut. */
export type JointFitUp = BranchFitUp | MiterFitUp | PlaneCutFitUp;

/** Options of {@link withFitUp}. */
export interface WithFitUpOptions {
  /** The square line the ordinates are measured from; default `long-point` (the cutback). */
  readonly ordinatesFrom?: OrdinateReference;
  /** Draw both square lines of each cut, labelled, on the wrap; default false. */
  readonly referenceLines?: boolean;
  /** How lengths are worded (the job's unit): default `{ format: 'mm' }`. */
  readonly format?: FormatLengthOptions;
}

/**
 * The fit-up lines of any joint's fit-up, in the job's unit.
 * @example jointFitUpLines(branchFitUp(spec), { format: 'ft-in' })[0] // 'Mark the header along its top line ...'
 */
export function jointFitUpLines(fitUp: JointFitUp, format: FormatLengthOptions): string[] {
  switch (fitUp.kind) {
    case 'branch-fit-up':
      return branchFitUpLines(fitUp, format);
    case 'miter-fit-up':
      return miterFitUpLines(fitUp, format);
    case 'plane-cut-fit-up':
      return planeCutFitUpLines(fitUp, format);
  }
}

/**
 * The layout with its fit-up applied, for every output to carry:
 * - each template with a cut measured from a square line (branch cut, miter
 *   end and middle pieces, plane cut) gets its station columns measured from
 *   the chosen line (see `ordinatesFrom`: from the short point each value is
 *   the full depth less the cutback, headed by its reference) and an
 *   `ordinates` record: the reference in words, each column's full depth and
 *   stock past the short point, each station's ordinate worded in the job's
 *   unit with the stretch of station line it is measured along (from the
 *   square line to the cut), and the square lines to draw (both when asked,
 *   the short-point line alone when measuring from it); from the short point
 *   the layout's note that the cutback runs from the long point is left out;
 * - every template gets the joint's `fitUpLines`, worded in the job's unit;
 * - the result gets `fitUp` (the dimensions, mm) and `ordinatesFrom`.
 * Templates without such a cut (a header hole) keep their stations. Pure.
 *
 * @param result a layout of the joint `fitUp` was measured on.
 * @param fitUp `branchFitUp`, `miterFitUp` or `planeCutFitUp` of the same spec.
 * @throws GirthError `BAD_OPTION` (field `ordinatesFrom`) for an unknown
 *   reference, (field `referenceLines`) for a flag that is not true or false;
 *   the errors of `formatLength` for a bad `format`; `BAD_OPTION` (field
 *   `depths`) when the fit-up does not belong to the layout.
 * @example
 * const r = withFitUp(layoutBranch(spec), branchFitUp(spec), { ordinatesFrom: 'short-point', format: { format: 'ft-in' } });
 * r.templates[0].stations[0]?.values.ordinate // full depth at the heel of a 90° tee, mm
 */
export function withFitUp<R extends LayoutResultBase>(result: R, fitUp: JointFitUp, options: WithFitUpOptions = {}): R {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { ordinatesFrom, referenceLines, format }', options);
  }
  const reference = requireOrdinateReference(options.ordinatesFrom ?? DEFAULT_ORDINATE_REFERENCE, 'ordinatesFrom');
  const both: unknown = options.referenceLines ?? false;
  if (typeof both !== 'boolean') throw new GirthError('BAD_OPTION', 'referenceLines', 'referenceLines: expected true or false', both);
  const format = options.format ?? { format: 'mm' };
  formatLength(0, format); // checks the format once, before anything is built
  const fitUpLines = jointFitUpLines(fitUp, format);
  const templates = result.templates.map((t) => templateWithFitUp(t, fitUp.cutDepths, reference, both, format, fitUpLines));
  return { ...result, templates: templates as unknown as R['templates'], fitUp, ordinatesFrom: reference };
}

function templateWithFitUp(
  t: Template,
  depths: readonly CutDepth[],
  reference: OrdinateReference,
  both: boolean,
  format: FormatLengthOptions,
  fitUpLines: readonly string[],
): Template {
  const done = ordinatesFrom(t, reference, depths);
  if (done.columns.length === 0) return { ...t, fitUpLines };
  const girthOf = new Map(t.stationLines.map((s) => [s.n, s.from[0]]));
  const stations: StationOrdinate[] = [];
  for (const c of done.columns) {
    const depth = depths.find((d) => d.templateId === t.id && d.columnKey === c.cutbackKey)!;
    t.stations.forEach((row, i) => {
      const cutback = row.values[c.cutbackKey]!;
      const valueMm = done.stations[i]!.values[c.key]!;
      const x = girthOf.get(row.n) ?? row.values.girth ?? 0;
      const yRef = depth.longLineYMm + (reference === 'long-point' ? 0 : depth.cutbackDirection * depth.fullDepthMm);
      const yCut = depth.longLineYMm + depth.cutbackDirection * cutback;
      const towardCut = reference === 'long-point' ? depth.cutbackDirection : depth.cutbackDirection === 1 ? -1 : 1;
      stations.push({ n: row.n, columnKey: c.key, valueMm, text: formatLength(valueMm, format), from: [x, yRef], to: [x, yCut], towardCut });
    });
  }
  const ordinates: TemplateOrdinates = {
    kind: 'template-ordinates',
    reference,
    referenceWords: done.referenceWords,
    columns: done.columns,
    stations,
    referenceLines: both || reference === 'short-point' ? referenceLines(t, depths) : [],
    bothLines: both,
    lines: done.columns.map((c) => ordinateReferenceLine(c, format)),
  };
  return { ...withoutLongPointNote(t, reference), stationColumns: done.stationColumns, stations: done.stations, ordinates, fitUpLines };
}

/** Opening of the layouts' note that says the cutback runs from the long point. */
const LONG_POINT_NOTE = 'Cutback is measured';

/**
 * From the short point, the template's note saying the cutback is measured
 * from the long point would contradict its table: it is left out (the
 * ordinates' own line names the reference). From the long point nothing changes.
 */
function withoutLongPointNote(t: Template, reference: OrdinateReference): Template {
  if (reference === 'long-point') return t;
  const keep = (text: string): boolean => !text.startsWith(LONG_POINT_NOTE);
  const facts = t.facts === undefined ? {} : { facts: { ...t.facts, notes: t.facts.notes.filter((line) => keep(line[0]?.kind === 'text' ? line[0].text : '')) } };
  return { ...t, notes: t.notes.filter(keep), ...facts };
}
