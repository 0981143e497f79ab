/**
 * The branch joint: a tee or lateral on a header, centred or offset.
 */
import { GirthError, JOINT_ANGLE_DEG, rangeText } from '@girth/pipes';
import type { BranchLayout } from '@girth/unroll';
import { numberOption, optionalChoice, requireOption, stringOption } from '../args.js';
import { reportLength } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipe } from './read-inputs.js';
import { angleCheckOptions, applyFitUp, FIT_UP_FIELD_NAMES, FIT_UP_HELP, FIT_UP_OPTIONS, fitUpFromOptions, fitUpJobKeys, type FitUpInput } from './fit-up-options.js';
import type { WrittenLength } from './types.js';
import { readGroove, WELD_PREP_FIELD_NAMES, WELD_PREP_OPTIONS, weldPrepFromOptions, weldPrepHelp, weldPrepJobKeys, type WeldPrepInput } from './weld-prep-options.js';

/** A branch on a header, as a fitter writes it. */
export interface BranchInput extends WeldPrepInput, FitUpInput {
  readonly joint: 'branch';
  readonly header: string;
  readonly branch: string;
  readonly angle?: number;
  readonly offset?: WrittenLength;
  readonly fit?: 'set-on' | 'set-in';
  readonly gap?: WrittenLength;
  /** Override which branch surface meets which header surface. */
  readonly branchSurface?: 'inside' | 'outside';
  readonly headerSurface?: 'inside' | 'outside';
  /** Set-on only: `od` cuts on the branch OD line and draws the ID line dashed; `id` (default) cuts on the ID line. */
  readonly cutOn?: 'od' | 'id';
}

const FITS = ['set-on', 'set-in'] as const;
const SURFACES = ['inside', 'outside'] as const;
const CUT_ON = ['od', 'id'] as const;

/** `girth branch` and a job's `"joint": "branch"`. */
export const branchJoint = defineJoint<BranchInput>({
  name: 'branch',
  summary: 'tee or lateral: the branch cut and the hole in the header',
  options: {
    header: { type: 'string' },
    branch: { type: 'string' },
    angle: { type: 'string' },
    offset: { type: 'string' },
    fit: { type: 'string' },
    gap: { type: 'string' },
    'branch-surface': { type: 'string' },
    'header-surface': { type: 'string' },
    'cut-on': { type: 'string' },
    ...WELD_PREP_OPTIONS,
    ...FIT_UP_OPTIONS,
  },
  help: `girth branch: a branch on a header (tee, lateral, centred or offset)

  --header PIPE          run pipe, e.g. "NPS 12 STD", "DN 300 x 8", "12.75 od x .375"
  --branch PIPE          branch pipe
  --angle DEG            angle between branch and header axes, ${rangeText(JOINT_ANGLE_DEG)} (default 90)
  --offset LENGTH        sideways offset of the branch axis (default 0); positive is to
                         your right looking down on the header from the heel end, toe away
  --fit set-on|set-in    set-on: branch ID on header OD; set-in: branch OD on header ID
                         (default set-on)
  --gap LENGTH           root gap normal to the header (default 0)
  --branch-surface inside|outside, --header-surface inside|outside
                         override which surfaces meet (give both)
  --cut-on od|id         set-on: cut on the branch OD line and draw the ID line
                         dashed (od), or cut on the ID line (id, default)
${weldPrepHelp('the header')}
${FIT_UP_HELP}

Examples:
  girth branch --header "NPS 12 STD" --branch "NPS 6 STD"
  girth branch --header "NPS 12 STD" --branch "NPS 8 STD" --angle 45 --gap 1/16 --svg lat.svg
  girth branch --header "NPS 8 STD" --branch "NPS 2 XS" --offset "2 1/2" --fit set-in --dxf drain.dxf
  girth branch --units mm --header "DN 300 x 8" --branch "DN 150 x 7.1" --json
  girth branch --header "NPS 10 XS" --branch "NPS 8 XS" --cut-on od --svg tee.svg
  girth branch --header "NPS 12 STD" --branch "NPS 6 STD" --angle 45 --groove-angle 45 --land 1/16 --gap 1/8
  girth branch --header "NPS 12 STD" --branch "NPS 6 STD" --ordinates-from short-point --reference-lines --svg tee-short.svg`,
  fieldNames: { angleDeg: 'angle', offsetMm: 'offset', gapMm: 'gap', fit: 'fit', header: 'header', branch: 'branch', contact: 'branchSurface', cutOn: 'cutOn', ...WELD_PREP_FIELD_NAMES, ...FIT_UP_FIELD_NAMES },
  fromOptions: (args) => ({
    joint: 'branch',
    header: requireOption(args, 'header', '"NPS 12 STD"'),
    branch: requireOption(args, 'branch', '"NPS 6 STD"'),
    ...optional('angle', numberOption(args, 'angle')),
    ...optional('offset', stringOption(args, 'offset')),
    ...optional('fit', optionalChoice(args, 'fit', FITS)),
    ...optional('gap', stringOption(args, 'gap')),
    ...optional('branchSurface', optionalChoice(args, 'branch-surface', SURFACES)),
    ...optional('headerSurface', optionalChoice(args, 'header-surface', SURFACES)),
    ...optional('cutOn', optionalChoice(args, 'cut-on', CUT_ON)),
    ...weldPrepFromOptions(args),
    ...fitUpFromOptions(args),
  }),
  jobKeys: (k) => ({
    header: k.text(),
    branch: k.text(),
    angle: k.within(JOINT_ANGLE_DEG).optional(),
    offset: k.length().optional(),
    fit: k.choice(FITS).optional(),
    gap: k.length().optional(),
    branchSurface: k.choice(SURFACES).optional(),
    headerSurface: k.choice(SURFACES).optional(),
    cutOn: k.choice(CUT_ON).optional(),
    ...weldPrepJobKeys(k),
    ...fitUpJobKeys(k),
  }),
  layout: (input, ctx, lib) => {
    if ((input.branchSurface === undefined) !== (input.headerSurface === undefined)) {
      const missing = input.branchSurface === undefined ? 'branchSurface' : 'headerSurface';
      throw new GirthError('MISSING_INPUT', ctx.fieldName(missing), `${ctx.fieldName(missing)}: give both branch and header surfaces to override the fit`);
    }
    const spec = {
      header: readPipe(input.header, 'header', ctx),
      branch: readPipe(input.branch, 'branch', ctx),
      angleDeg: input.angle ?? 90,
      offsetMm: readLength(input.offset, 'offset', ctx, { allowNegative: true }) ?? 0,
      fit: input.fit ?? 'set-on',
      gapMm: readLength(input.gap, 'gap', ctx) ?? 0,
      ...(input.branchSurface !== undefined && input.headerSurface !== undefined
        ? { contact: { branch: input.branchSurface, header: input.headerSurface } }
        : {}),
    };
    const groove = readGroove(input, ctx);
    const onOd = input.cutOn === 'od';
    if (onOd && (input.fit === 'set-in' || input.branchSurface !== undefined)) {
      const name = ctx.fieldName('cutOn');
      throw new GirthError('BAD_OPTION', name, `${name}: cutting on the branch OD with the ID line is for a set-on branch with the usual surfaces; leave out the set-in fit and the surface overrides`, input.cutOn);
    }
    const layout = onOd ? lib.layoutBranchCutOnOd(spec, { stations: ctx.stations }) : lib.layoutBranch(spec, { stations: ctx.stations });
    const prepared = groove === undefined ? layout : lib.withBranchWeldPrep(layout, lib.weldPrepForBranch(onOd ? { ...spec, contact: { branch: 'outside', header: 'outside' } } : spec, groove, { stations: ctx.stations }));
    return applyFitUp(lib, prepared, lib.branchFitUp(spec, angleCheckOptions(input, ctx)), input, ctx);
  },
  describe: (result, style) => {
    const r = result as BranchLayout;
    return `${r.angleDeg} deg, ${r.fit}, offset ${reportLength(r.offsetMm, style)}, gap ${reportLength(r.gapMm, style)}`;
  },
});
