/**
 * The fit-up dimensions in the words a fitter reads, in the job's unit, for
 * any output (title block notes, table footers, text reports).
 */
import { formatAngleDeg, formatLength, type FormatLengthOptions } from '@girth/pipes';
import type { AngleCheck } from './angle-check.js';
import type { BranchFitUp } from './branch-fit-up.js';
import type { MiterFitUp } from './miter-fit-up.js';
import type { OrdinateColumn } from './ordinates-from.js';
import type { PlaneCutFitUp } from './plane-cut-fit-up.js';

type Format = FormatLengthOptions;

/**
 * One line naming the square line a cut's ordinates are measured from, with
 * the full depth and, from the short point, the stock to leave past it.
 * @param format the job's length format (see `formatLength`).
 * @example ordinateReferenceLine(column, { format: 'ft-in' })
 * // 'Ordinates measured from the square line through the short point; full depth of the cut 1 3/16" (long point to short point): leave at least that much pipe past the short-point line.'
 */
export function ordinateReferenceLine(column: OrdinateColumn, format: Format): string {
  const depth = formatLength(column.fullDepthMm, format);
  const what = column.cutbackKey === 'cutbackFar' ? 'Far-end ordinates' : 'Ordinates';
  return column.reference === 'short-point'
    ? `${what} ${column.referenceWords}; full depth of the cut ${depth} (long point to short point): leave at least ${formatLength(column.stockPastShortPointMm, format)} of pipe past the short-point line.`
    : `${what} ${column.referenceWords}; full depth of the cut ${depth} (long point to short point).`;
}

/**
 * The tape-and-square check of one angle in a sentence.
 * @param between what the two lines are, e.g. `branch centreline and header`.
 * @param runAlong where the run is measured, e.g. `along the header`.
 * @example angleCheckLine(check, 'branch centreline and header', 'along the header', { format: 'in' })
 */
export function angleCheckLine(check: AngleCheck, between: string, runAlong: string, format: Format): string {
  const f = (mm: number): string => formatLength(mm, format);
  const rise =
    check.riseMm === undefined
      ? 'the lines stand square: check with a square'
      : `over a run of ${f(check.runMm)} ${runAlong} the other line rises ${f(check.riseMm)}`;
  return (
    `Angle check, ${formatAngleDeg(check.angleDeg)} between ${between}: ${rise}; ` +
    `marks ${f(check.chordRadiusMm)} from the vertex on each line are ${f(check.chordMm)} apart; ` +
    `on a radius of ${f(check.arcRadiusMm)} the arc between the lines is ${f(check.arcLengthMm)} (${f(check.arcUnitMm)} per degree).`
  );
}

/**
 * The lines of a branch's fit-up: header marks of the hole and the weld, the
 * offset, and the angle check.
 * @example branchFitUpLines(branchFitUp(spec), { format: 'in' })[0]
 */
export function branchFitUpLines(fit: BranchFitUp, format: Format): string[] {
  const f = (mm: number): string => formatLength(mm, format);
  const line = fit.markLine === 'top-line' ? 'top line' : 'offset line';
  const lines = [
    `Mark the header along its ${line} from where the branch centreline crosses the header OD: ` +
      `hole heel ${f(fit.hole.heel.fromCentreMm)} toward the heel end, hole toe ${f(fit.hole.toe.fromCentreMm)} toward the toe end; ` +
      `weld heel ${f(fit.weld.heel.fromCentreMm)}, weld toe ${f(fit.weld.toe.fromCentreMm)} (branch OD on the header OD).`,
  ];
  if (fit.offset !== undefined) {
    const side = fit.offset.offsetMm > 0 ? 'to the positive-offset side' : 'to the negative-offset side';
    lines.push(
      `Offset line: ${f(Math.abs(fit.offset.girthFromTopLineMm))} round the header OD from the top line ${side} ` +
        `(${f(Math.abs(fit.offset.chordFromTopLineMm))} straight across); the branch centreline meets the header there.`,
    );
  }
  lines.push(angleCheckLine(fit.angleCheck, 'branch centreline and header', 'along the header from the crossing', format));
  return lines;
}

/**
 * The lines of a miter elbow's fit-up: weld lines on the stock, centre to face,
 * and the check of each joint (one line; every joint turns the same).
 * @example miterFitUpLines(miterFitUp(spec), { format: 'ft-in' })
 */
export function miterFitUpLines(fit: MiterFitUp, format: Format): string[] {
  const f = (mm: number): string => formatLength(mm, format);
  const welds = fit.weldLines.map((w) => `weld ${w.weld} at ${f(w.fromStartMm)}`).join(', ');
  const lines = [`Weld lines on the stock (${f(fit.stockLengthMm)} long), on the centreline from its start: ${welds}.`];
  lines.push(
    fit.centreToFaceMm !== undefined
      ? `Elbow: ${formatAngleDeg(fit.bendDeg)} bend on a ${f(fit.radiusMm)} radius, centre to face ${f(fit.centreToFaceMm)}.`
      : `Elbow: ${formatAngleDeg(fit.bendDeg)} bend on a ${f(fit.radiusMm)} radius; the ends' axes are ${f(fit.endAxesApartMm ?? 2 * fit.radiusMm)} apart.`,
  );
  const joint = fit.joints[0];
  if (joint !== undefined) lines.push(angleCheckLine(joint.angleCheck, 'the axes of the pieces at each weld', 'along one piece', format));
  return lines;
}

/**
 * The lines of a plane cut's fit-up: where the centreline meets the cut from
 * each square line, and the angle check.
 * @example planeCutFitUpLines(planeCutFitUp(spec), { format: 'mm' })
 */
export function planeCutFitUpLines(fit: PlaneCutFitUp, format: Format): string[] {
  const f = (mm: number): string => formatLength(mm, format);
  return [
    `The centreline meets the cut ${f(fit.centreFromLongPointMm)} from the square line through the long point, ${f(fit.centreFromShortPointMm)} from the one through the short point.`,
    angleCheckLine(fit.angleCheck, 'pipe axis and the plane', 'along the plane', format),
  ];
}
