/**
 * The reducer joint: a concentric or eccentric cone rolled from plate.
 */
import { CONE_APEX_ANGLE_DEG, GirthError, rangeText } from '@girth/pipes';
import type { ConeLayout } from '@girth/unroll';
import { numberOption, optionalChoice, requireOption, stringOption } from '../option-values.js';
import { reportAngle, reportLength, reportLengthAtLeast } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipeOrDiameter } from './read-inputs.js';
import type { WrittenLength } from './types.js';

/** A cone reducer rolled from plate, as a fitter writes it. */
export interface ReducerInput {
  readonly joint: 'reducer';
  readonly large: string;
  readonly small: string;
  readonly length?: WrittenLength;
  readonly includedAngle?: number;
  readonly plate: WrittenLength;
  readonly eccentric?: boolean;
  readonly seam?: 'flat-side' | 'opposite';
  readonly diameters?: 'outside' | 'inside' | 'mean';
  readonly segments?: number;
}

const SEAMS = ['flat-side', 'opposite'] as const;
const DIAMETERS = ['outside', 'inside', 'mean'] as const;

/** `girth reducer` and a job's `"joint": "reducer"`. */
export const reducerJoint = defineJoint<ReducerInput>({
  name: 'reducer',
  summary: 'concentric or eccentric cone rolled from plate',
  options: {
    large: { type: 'string' },
    small: { type: 'string' },
    length: { type: 'string' },
    'included-angle': { type: 'string' },
    plate: { type: 'string' },
    eccentric: { type: 'boolean' },
    seam: { type: 'string' },
    diameters: { type: 'string' },
    segments: { type: 'string' },
  },
  help: `girth reducer: a cone reducer's flat pattern

  --large PIPE|LENGTH    large end: a pipe (its OD) or a diameter
  --small PIPE|LENGTH    small end, at least 1 mm (0.04 in) smaller
  --length LENGTH        length along the axis, or
  --included-angle DEG   the cone's included (apex) angle, ${rangeText(CONE_APEX_ANGLE_DEG)}
  --plate LENGTH         plate thickness (pattern developed on the mean surface)
  --diameters outside|inside|mean  which surface the end diameters are on (default outside)
  --eccentric            one side flat (pattern by triangulation)
  --seam flat-side|opposite        seam of an eccentric cone (default flat-side)
  --segments K           split into K equal pieces (K divides the stations)

Examples:
  girth reducer --large "NPS 12 STD" --small "NPS 8 STD" --length 7 --plate 3/8
  girth reducer --large 8in --small 5in --length 4in --plate 0 --dxf cone.dxf
  girth reducer --large 72in --small 48in --length 30in --plate 1/2 --eccentric --segments 2 --svg ecc.svg`,
  fieldNames: {
    largeDiameterMm: 'large',
    smallDiameterMm: 'small',
    lengthMm: 'length',
    apexAngleDeg: 'includedAngle',
    thicknessMm: 'plate',
    diametersAt: 'diameters',
    seam: 'seam',
    segments: 'segments',
    large: 'large',
    small: 'small',
  },
  fromOptions: (args) => ({
    joint: 'reducer',
    large: requireOption(args, 'large', '"NPS 12 STD"'),
    small: requireOption(args, 'small', '"NPS 8 STD"'),
    ...optional('length', stringOption(args, 'length')),
    ...optional('includedAngle', numberOption(args, 'included-angle')),
    plate: requireOption(args, 'plate', '3/8'),
    eccentric: args.values.eccentric === true,
    ...optional('seam', optionalChoice(args, 'seam', SEAMS)),
    ...optional('diameters', optionalChoice(args, 'diameters', DIAMETERS)),
    ...optional('segments', numberOption(args, 'segments')),
  }),
  jobKeys: (k) => ({
    large: k.text(),
    small: k.text(),
    length: k.length().optional(),
    includedAngle: k.within(CONE_APEX_ANGLE_DEG).optional(),
    plate: k.length(),
    eccentric: k.z.boolean().optional(),
    seam: k.choice(SEAMS).optional(),
    diameters: k.choice(DIAMETERS).optional(),
    segments: k.number().optional(),
  }),
  layout: (input, ctx, lib) => {
    if (input.seam !== undefined && input.eccentric !== true) {
      const eccentric = ctx.fieldPrefix === '--' ? '--eccentric' : ctx.fieldName('eccentric');
      throw new GirthError('BAD_OPTION', ctx.fieldName('seam'), `${ctx.fieldName('seam')}: only an eccentric cone has a seam to place; add ${eccentric} or leave the seam out`, input.seam);
    }
    const large = readPipeOrDiameter(input.large, 'large', ctx);
    const small = readPipeOrDiameter(input.small, 'small', ctx);
    const lengthMm = readLength(input.length, 'length', ctx);
    const spec = {
      largeDiameterMm: large.diameterMm,
      smallDiameterMm: small.diameterMm,
      largeLabel: large.label,
      smallLabel: small.label,
      thicknessMm: readLength(input.plate, 'plate', ctx) ?? 0,
      ...(lengthMm !== undefined ? { lengthMm } : {}),
      ...(input.includedAngle !== undefined ? { apexAngleDeg: input.includedAngle } : {}),
      ...(input.diameters !== undefined ? { diametersAt: input.diameters } : {}),
    };
    const options = { stations: ctx.stations, ...(input.segments !== undefined ? { segments: input.segments } : {}) };
    return input.eccentric === true
      ? lib.layoutEccentricCone(spec, { ...options, ...(input.seam !== undefined ? { seam: input.seam } : {}) })
      : lib.layoutConcentricCone(spec, options);
  },
  reportLines: (layout, style) => {
    const result = layout as ConeLayout;
    const L = (mm: number): string => reportLength(mm, style);
    const lines: string[] = [];
    if (result.form === 'concentric') {
      const p = result.pattern;
      lines.push(
        '',
        `Pattern: outer radius ${L(p.outerRadius)}, inner radius ${L(p.innerRadius)}, sweep ${reportAngle(p.sweepDeg)} deg, slant height ${L(p.slantHeight)}`,
      );
    }
    for (const piece of result.pieces) {
      lines.push(`Plate for ${piece.templateId}: at least ${reportLengthAtLeast(piece.widthMm, style)} x ${reportLengthAtLeast(piece.heightMm, style)} (the pattern's bounding rectangle)`);
    }
    return lines;
  },
  describe: (layout, style) => {
    const r = layout as ConeLayout;
    return `${r.form}, length ${reportLength(r.lengthMm, style)}, plate ${reportLength(r.thicknessMm, style)}`;
  },
});
