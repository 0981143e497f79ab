/**
 * The reinforcing pad: a saddle plate under a branch on a header, from the
 * size the user gives (Girth does not size reinforcement).
 */
import { JOINT_ANGLE_DEG, rangeText } from '@girth/pipes';
import type { PadLayout } from '@girth/unroll';
import { numberOption, optionalChoice, requireOption, stringOption } from '../option-values.js';
import { reportLength } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipe } from './read-inputs.js';
import type { WrittenLength } from './types.js';

/** A pad under a branch, as a fitter writes it. */
export interface PadInput {
  readonly joint: 'pad';
  readonly header: string;
  readonly branch: string;
  readonly angle?: number;
  readonly offset?: WrittenLength;
  readonly fit?: 'set-on' | 'set-in';
  /** Pad plate thickness. */
  readonly thickness: WrittenLength;
  /** Ring width over the header surface from the hole edge (or `outside`). */
  readonly width?: WrittenLength;
  /** Outside diameter over the header surface (or `width`). */
  readonly outside?: WrittenLength;
}

const FITS = ['set-on', 'set-in'] as const;

/** `girth pad` and a job's `"joint": "pad"`. */
export const padJoint = defineJoint<PadInput>({
  name: 'pad',
  summary: 'reinforcing pad (saddle plate) under a branch, as a flat part to cut',
  options: {
    header: { type: 'string' },
    branch: { type: 'string' },
    angle: { type: 'string' },
    offset: { type: 'string' },
    fit: { type: 'string' },
    thickness: { type: 'string' },
    width: { type: 'string' },
    outside: { type: 'string' },
  },
  help: `girth pad: a reinforcing pad (saddle plate) under a branch on a header

  --header PIPE          run pipe, e.g. "NPS 12 STD"
  --branch PIPE          branch pipe the pad goes round
  --angle DEG            angle between branch and header axes, ${rangeText(JOINT_ANGLE_DEG)} (default 90)
  --offset LENGTH        sideways offset of the branch axis (default 0)
  --fit set-on|set-in    the branch joint's fit (default set-on)
  --thickness LENGTH     pad plate thickness
  --width LENGTH         ring width round the branch, over the header from the hole edge
  --outside LENGTH       or the pad's outside diameter over the header, round the branch axis

Girth does not size reinforcement: give the pad size your design calls for
(ASME B31.3 304.3, B31.1 104.3). The pad is developed on its mid-thickness
(girth on the header OD x (R + t/2) / R); the hole is where the branch OD meets
the header OD. A tell-tale hole is marked on the heel side.

Examples:
  girth pad --header "NPS 12 STD" --branch "NPS 6 STD" --thickness 3/8 --width "3 1/4" --svg pad.svg
  girth pad --header "NPS 16 STD" --branch "NPS 8 STD" --angle 45 --thickness 3/8 --outside 20 --dxf pad.dxf
  girth pad --units mm --header "DN 300 x 8" --branch "DN 150 x 7.1" --thickness 8 --width 80 --json`,
  fieldNames: { angleDeg: 'angle', offsetMm: 'offset', fit: 'fit', header: 'header', branch: 'branch', thicknessMm: 'thickness', widthMm: 'width', outsideMm: 'outside' },
  fromOptions: (args) => ({
    joint: 'pad',
    header: requireOption(args, 'header', '"NPS 12 STD"'),
    branch: requireOption(args, 'branch', '"NPS 6 STD"'),
    ...optional('angle', numberOption(args, 'angle')),
    ...optional('offset', stringOption(args, 'offset')),
    ...optional('fit', optionalChoice(args, 'fit', FITS)),
    thickness: requireOption(args, 'thickness', '3/8'),
    ...optional('width', stringOption(args, 'width')),
    ...optional('outside', stringOption(args, 'outside')),
  }),
  jobKeys: (k) => ({
    header: k.text(),
    branch: k.text(),
    angle: k.within(JOINT_ANGLE_DEG).optional(),
    offset: k.length().optional(),
    fit: k.choice(FITS).optional(),
    thickness: k.length(),
    width: k.length().optional(),
    outside: k.length().optional(),
  }),
  layout: (input, ctx, lib) =>
    lib.layoutPad(
      {
        branch: {
          header: readPipe(input.header, 'header', ctx),
          branch: readPipe(input.branch, 'branch', ctx),
          angleDeg: input.angle ?? 90,
          offsetMm: readLength(input.offset, 'offset', ctx, { allowNegative: true }) ?? 0,
          fit: input.fit ?? 'set-on',
        },
        thicknessMm: readLength(input.thickness, 'thickness', ctx) ?? 0,
        ...optional('widthMm', readLength(input.width, 'width', ctx)),
        ...optional('outsideMm', readLength(input.outside, 'outside', ctx)),
      },
      { stations: ctx.stations },
    ),
  describe: (result, style) => {
    const r = result as PadLayout;
    return `${r.angleDeg} deg, pad ${reportLength(r.thicknessMm, style)} thick, ring ${reportLength(r.widthMm, style)}`;
  },
});
