/**
 * The cutback joint: a pipe end cut to meet a flat surface at an angle.
 */
import { JOINT_ANGLE_DEG, rangeText } from '@girth/pipes';
import type { PlaneCutLayout } from '@girth/unroll';
import { optionalChoice, requireNumberOption, requireOption, stringOption } from '../option-values.js';
import { reportLength } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipe } from './read-inputs.js';
import { angleCheckOptions, applyFitUp, FIT_UP_FIELD_NAMES, FIT_UP_HELP, FIT_UP_OPTIONS, fitUpFromOptions, fitUpJobKeys, type FitUpInput } from './fit-up-options.js';
import type { WrittenLength } from './types.js';
import { readGroove, WELD_PREP_FIELD_NAMES, WELD_PREP_OPTIONS, weldPrepFromOptions, weldPrepHelp, weldPrepJobKeys, type WeldPrepInput } from './weld-prep-options.js';

/** A pipe end cut to meet a plane, as a fitter writes it. */
export interface CutbackInput extends WeldPrepInput, FitUpInput {
  readonly joint: 'cutback';
  readonly pipe: string;
  readonly angle: number;
  readonly gap?: WrittenLength;
  readonly surface?: 'od' | 'id';
}

const FIT_SURFACES = ['od', 'id'] as const;

/** `girth cutback` and a job's `"joint": "cutback"`. */
export const cutbackJoint = defineJoint<CutbackInput>({
  name: 'cutback',
  summary: 'pipe end cut to meet a plane at an angle',
  options: {
    pipe: { type: 'string' },
    angle: { type: 'string' },
    gap: { type: 'string' },
    surface: { type: 'string' },
    ...WELD_PREP_OPTIONS,
    ...FIT_UP_OPTIONS,
  },
  help: `girth cutback: a pipe end cut to meet a flat surface at an angle

  --pipe PIPE            the pipe, e.g. "NPS 6 STD"
  --angle DEG            angle between the pipe axis and the plane, ${rangeText(JOINT_ANGLE_DEG)}; 90 is square
  --gap LENGTH           root gap square to the plane (default 0)
  --surface od|id        pipe surface laid on the plane (default od)
${weldPrepHelp('the plane')}
${FIT_UP_HELP}

Examples:
  girth cutback --pipe "NPS 6 STD" --angle 60
  girth cutback --pipe "NPS 4 Sch 80" --angle 30 --gap 3mm --svg vent.svg
  girth cutback --pipe "NPS 6 STD" --angle 60 --groove-angle 45 --land 1/16 --csv vent.csv
  girth cutback --pipe "NPS 6 STD" --angle 45 --ordinates-from short-point --check-run 24`,
  fieldNames: { angleDeg: 'angle', gapMm: 'gap', fitSurface: 'surface', pipe: 'pipe', ...WELD_PREP_FIELD_NAMES, ...FIT_UP_FIELD_NAMES },
  fromOptions: (args) => ({
    joint: 'cutback',
    pipe: requireOption(args, 'pipe', '"NPS 6 STD"'),
    angle: requireNumberOption(args, 'angle', '60'),
    ...optional('gap', stringOption(args, 'gap')),
    ...optional('surface', optionalChoice(args, 'surface', FIT_SURFACES)),
    ...weldPrepFromOptions(args),
    ...fitUpFromOptions(args),
  }),
  jobKeys: (k) => ({
    pipe: k.text(),
    angle: k.within(JOINT_ANGLE_DEG),
    gap: k.length().optional(),
    surface: k.choice(FIT_SURFACES).optional(),
    ...weldPrepJobKeys(k),
    ...fitUpJobKeys(k),
  }),
  layout: (input, ctx, lib) => {
    const spec = {
      pipe: readPipe(input.pipe, 'pipe', ctx),
      angleDeg: input.angle,
      gapMm: readLength(input.gap, 'gap', ctx) ?? 0,
      ...(input.surface !== undefined ? { fitSurface: input.surface } : {}),
    };
    const groove = readGroove(input, ctx);
    const layout = lib.layoutPlaneCut(spec, { stations: ctx.stations });
    const prepared = groove === undefined ? layout : lib.withPlaneCutWeldPrep(layout, lib.weldPrepForPlaneCut(spec, groove, { stations: ctx.stations }));
    return applyFitUp(lib, prepared, lib.planeCutFitUp(spec, angleCheckOptions(input, ctx)), input, ctx);
  },
  describe: (result, style) => {
    const r = result as PlaneCutLayout;
    return `${r.angleDeg} deg to the plane, gap ${reportLength(r.gapMm, style)}`;
  },
});
