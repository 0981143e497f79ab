/**
 * The miter joint: a segmented elbow, its pieces, cut list and wraps.
 */
import { BEND_DEG, MITER_WELDS, rangeText } from '@girth/pipes';
import type { MiterLayout } from '@girth/unroll';
import { numberOption, optionalChoice, requireNumberOption, requireOption, stringOption } from '../option-values.js';
import { reportAngle, reportLength, reportLengthAtLeast } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipe } from './read-inputs.js';
import { angleCheckOptions, applyFitUp, FIT_UP_FIELD_NAMES, FIT_UP_HELP, FIT_UP_OPTIONS, fitUpFromOptions, fitUpJobKeys, type FitUpInput } from './fit-up-options.js';
import type { WrittenLength } from './types.js';
import { readGroove, WELD_PREP_FIELD_NAMES, WELD_PREP_OPTIONS, weldPrepFromOptions, weldPrepHelp, weldPrepJobKeys, type WeldPrepInput } from './weld-prep-options.js';

/** A segmented (miter) elbow, as a fitter writes it. */
export interface MiterInput extends WeldPrepInput, FitUpInput {
  readonly joint: 'miter';
  readonly pipe: string;
  readonly bend: number;
  readonly welds?: number;
  readonly pieces?: number;
  readonly radius?: WrittenLength;
  readonly radiusNps?: number;
  readonly tangent?: WrittenLength;
  readonly surface?: 'od' | 'id';
  readonly gap?: WrittenLength;
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
    gap: { type: 'string' },
    ...WELD_PREP_OPTIONS,
    ...FIT_UP_OPTIONS,
  },
  help: `girth miter: a miter (segmented) elbow

  --pipe PIPE            the pipe, e.g. "NPS 10 STD"
  --bend DEG             total change of direction, ${rangeText(BEND_DEG)}
  --welds N | --pieces N number of welds (${MITER_WELDS.min} to ${MITER_WELDS.max}), or of pieces (= welds + 1)
  --radius LENGTH        centreline radius, or
  --radius-nps X         centreline radius as X times the NPS (1.5 = long radius)
  --tangent LENGTH       straight length added to each end piece (default 0)
  --surface od|id        pipe surface laid on the weld planes (default od)
  --gap LENGTH           root gap at each weld, square to the weld plane (default 0);
                         each piece end is set back half of it, the stock is shorter
${weldPrepHelp('', true)}
${FIT_UP_HELP}

Examples:
  girth miter --pipe "NPS 10 STD" --bend 90 --welds 3 --radius-nps 1.5
  girth miter --pipe "NPS 24 STD" --bend 45 --pieces 3 --radius 36in --svg ell.svg --csv ell.csv
  girth miter --pipe "NPS 12 STD" --bend 90 --welds 3 --radius-nps 1.5 --groove-angle 75 --land 1/16`,
  fieldNames: {
    bendDeg: 'bend',
    welds: 'welds',
    pieces: 'pieces',
    radiusMm: 'radius',
    radiusNps: 'radiusNps',
    tangentMm: 'tangent',
    fitSurface: 'surface',
    pipe: 'pipe',
    gapMm: 'gap',
    ...WELD_PREP_FIELD_NAMES,
    ...FIT_UP_FIELD_NAMES,
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
    ...optional('gap', stringOption(args, 'gap')),
    ...weldPrepFromOptions(args),
    ...fitUpFromOptions(args),
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
    gap: k.length().optional(),
    ...weldPrepJobKeys(k),
    ...fitUpJobKeys(k),
  }),
  layout: (input, ctx, lib) => {
    const radiusMm = readLength(input.radius, 'radius', ctx);
    const tangentMm = readLength(input.tangent, 'tangent', ctx);
    const gapMm = readLength(input.gap, 'gap', ctx);
    const spec = {
      pipe: readPipe(input.pipe, 'pipe', ctx),
      bendDeg: input.bend,
      ...(input.welds !== undefined ? { welds: input.welds } : {}),
      ...(input.pieces !== undefined ? { pieces: input.pieces } : {}),
      ...(radiusMm !== undefined ? { radiusMm } : {}),
      ...(input.radiusNps !== undefined ? { radiusNps: input.radiusNps } : {}),
      ...(tangentMm !== undefined ? { tangentMm } : {}),
      ...(input.surface !== undefined ? { fitSurface: input.surface } : {}),
      ...(gapMm !== undefined ? { gapMm } : {}),
    };
    const groove = readGroove(input, ctx);
    const layout = lib.layoutMiter(spec, { stations: ctx.stations });
    const prepared = groove === undefined ? layout : lib.withMiterWeldPrep(layout, lib.weldPrepForMiter(spec, groove, { stations: ctx.stations }));
    return applyFitUp(lib, prepared, lib.miterFitUp(spec, angleCheckOptions(input, ctx)), input, ctx);
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
