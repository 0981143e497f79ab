/**
 * The miter joint: a segmented elbow, its pieces, cut list and wraps.
 */
import { BEND_DEG, MITER_WELDS, rangeText } from '@girth/pipes';
import type { MiterLayout } from '@girth/unroll';
import { numberOption, optionalChoice, requireNumberOption, requireOption, stringOption } from '../option-values.js';
import { reportAngle, reportLength, reportLengthAtLeast } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipe } from './read-inputs.js';
import type { WrittenLength } from './types.js';

/** A segmented (miter) elbow, as a fitter writes it. */
export interface MiterInput {
  readonly joint: 'miter';
  readonly pipe: string;
  readonly bend: number;
  readonly welds?: number;
  readonly pieces?: number;
  readonly radius?: WrittenLength;
  readonly radiusNps?: number;
  readonly tangent?: WrittenLength;
  readonly surface?: 'od' | 'id';
}

const FIT_SURFACES = ['od', 'id'] as const;

/** `girth miter` and a job's `"joint": "miter"`. */
export const miterJoint = defineJoint<MiterInput>({
  name: 'miter',
  summary: 'segmented elbow: pieces, cut list and wraps',
  options: {
    pipe: { type: 'string' },
    bend: { type: 'string' },
    welds: { type: 'string' },
    pieces: { type: 'string' },
    radius: { type: 'string' },
    'radius-nps': { type: 'string' },
    tangent: { type: 'string' },
    surface: { type: 'string' },
  },
  help: `girth miter: a miter (segmented) elbow

  --pipe PIPE            the pipe, e.g. "NPS 10 STD"
  --bend DEG             total change of direction, ${rangeText(BEND_DEG)}
  --welds N | --pieces N number of welds (${MITER_WELDS.min} to ${MITER_WELDS.max}), or of pieces (= welds + 1)
  --radius LENGTH        centreline radius, or
  --radius-nps X         centreline radius as X times the NPS (1.5 = long radius)
  --tangent LENGTH       straight length added to each end piece (default 0)
  --surface od|id        pipe surface laid on the weld planes (default od)

Examples:
  girth miter --pipe "NPS 10 STD" --bend 90 --welds 3 --radius-nps 1.5
  girth miter --pipe "NPS 24 STD" --bend 45 --pieces 3 --radius 36in --svg ell.svg --csv ell.csv`,
  fieldNames: {
    bendDeg: 'bend',
    welds: 'welds',
    pieces: 'pieces',
    radiusMm: 'radius',
    radiusNps: 'radiusNps',
    tangentMm: 'tangent',
    fitSurface: 'surface',
    pipe: 'pipe',
  },
  fromOptions: (args) => ({
    joint: 'miter',
    pipe: requireOption(args, 'pipe', '"NPS 10 STD"'),
    bend: requireNumberOption(args, 'bend', '90'),
    ...optional('welds', numberOption(args, 'welds')),
    ...optional('pieces', numberOption(args, 'pieces')),
    ...optional('radius', stringOption(args, 'radius')),
    ...optional('radiusNps', numberOption(args, 'radius-nps')),
    ...optional('tangent', stringOption(args, 'tangent')),
    ...optional('surface', optionalChoice(args, 'surface', FIT_SURFACES)),
  }),
  jobKeys: (k) => ({
    pipe: k.text(),
    bend: k.within(BEND_DEG),
    welds: k.within(MITER_WELDS).optional(),
    pieces: k.number().optional(),
    radius: k.length().optional(),
    radiusNps: k.number().optional(),
    tangent: k.length().optional(),
    surface: k.choice(FIT_SURFACES).optional(),
  }),
  layout: (input, ctx, lib) => {
    const radiusMm = readLength(input.radius, 'radius', ctx);
    const tangentMm = readLength(input.tangent, 'tangent', ctx);
    return lib.layoutMiter(
      {
        pipe: readPipe(input.pipe, 'pipe', ctx),
        bendDeg: input.bend,
        ...(input.welds !== undefined ? { welds: input.welds } : {}),
        ...(input.pieces !== undefined ? { pieces: input.pieces } : {}),
        ...(radiusMm !== undefined ? { radiusMm } : {}),
        ...(input.radiusNps !== undefined ? { radiusNps: input.radiusNps } : {}),
        ...(tangentMm !== undefined ? { tangentMm } : {}),
        ...(input.surface !== undefined ? { fitSurface: input.surface } : {}),
      },
      { stations: ctx.stations },
    );
  },
  reportLines: (layout, style) => {
    const result = layout as MiterLayout;
    const L = (mm: number): string => reportLength(mm, style);
    const lines = [
      '',
      `Miter: ${result.bendDeg} deg bend, ${result.welds} welds, ${result.pieceCount} pieces, cut angle ${result.cutAngleDeg.toFixed(3)} deg, centreline radius ${L(result.radiusMm)}`,
      '',
      'Piece            Count  Centre        Back          Throat',
    ];
    for (const p of result.pieces) {
      lines.push(`${p.label.padEnd(16)} ${String(p.count).padStart(5)}  ${L(p.center).padEnd(12)}  ${L(p.back).padEnd(12)}  ${L(p.throat)}`);
    }
    lines.push('', `Stock: at least ${reportLengthAtLeast(result.stockLengthMm, style)} of straight pipe, no allowance for kerf; cut in this order, turning the pipe 180 deg before each next cut:`);
    for (const c of result.stock.cuts) {
      lines.push(`  cut ${c.n}: centreline at ${L(c.centerAtMm)} from the stock end, long side at ${c.longSideDeg} deg`);
    }
    return lines;
  },
  describe: (layout, style) => {
    const r = layout as MiterLayout;
    return `${r.bendDeg} deg bend, ${r.pieceCount} pieces, cut ${reportAngle(r.cutAngleDeg)} deg, stock ${reportLength(r.stockLengthMm, style)}`;
  },
});
