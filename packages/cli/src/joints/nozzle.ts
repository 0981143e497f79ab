/**
 * The nozzle joint: a nozzle set on or into a dished vessel head.
 */
import { HEAD_RATIO, NOZZLE_TILT_DEG, rangeText } from '@girth/pipes';
import type { NozzleLayout } from '@girth/unroll';
import { numberOption, optionalChoice, requireOption, stringOption } from '../option-values.js';
import { reportLength } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipe, renameField } from './read-inputs.js';
import type { WrittenLength } from './types.js';

/** A nozzle in a head, as a fitter writes it. */
export interface NozzleInput {
  readonly joint: 'nozzle';
  /** The head's OD and wall as a pipe name or `OD x wall`, e.g. `48 od x 1/2`. */
  readonly head: string;
  readonly headType?: (typeof HEAD_TYPES)[number];
  readonly ratio?: number;
  readonly crown?: WrittenLength;
  readonly knuckle?: WrittenLength;
  readonly flange?: WrittenLength;
  readonly nozzle: string;
  readonly offset?: WrittenLength;
  readonly direction?: (typeof DIRECTIONS)[number];
  readonly tilt?: number;
  readonly fit?: 'set-on' | 'set-in';
  readonly gap?: WrittenLength;
}

const HEAD_TYPES = ['ellipsoidal', 'hemispherical', 'flanged-and-dished', '80-10', 'torispherical'] as const;
const DIRECTIONS = ['hillside', 'radial', 'angle'] as const;
const FITS = ['set-on', 'set-in'] as const;

/** The head's library fields and the keys a user writes for them. */
const HEAD_FIELDS: Readonly<Record<string, string>> = {
  'head.type': 'headType',
  'head.ratio': 'ratio',
  'head.crownRadiusMm': 'crown',
  'head.knuckleRadiusMm': 'knuckle',
  'head.straightFlangeMm': 'flange',
};

/** `girth nozzle` and a job's `"joint": "nozzle"`. */
export const nozzleJoint = defineJoint<NozzleInput>({
  name: 'nozzle',
  summary: 'nozzle in a dished head: the nozzle cut, and the hole by square and by tape',
  options: {
    head: { type: 'string' },
    'head-type': { type: 'string' },
    ratio: { type: 'string' },
    crown: { type: 'string' },
    knuckle: { type: 'string' },
    flange: { type: 'string' },
    nozzle: { type: 'string' },
    offset: { type: 'string' },
    direction: { type: 'string' },
    tilt: { type: 'string' },
    fit: { type: 'string' },
    gap: { type: 'string' },
  },
  help: `girth nozzle: a nozzle in a dished vessel head

  --head PIPE            the head's OD and wall, e.g. "48 od x 1/2", "DN 600 x 10"
  --head-type TYPE       ellipsoidal (default; 2:1 unless --ratio), hemispherical,
                         flanged-and-dished (crown = OD, knuckle = 6 % of OD),
                         80-10 (crown 80 %, knuckle 10 % of OD), or torispherical
                         with --crown and --knuckle (inside radii)
  --ratio N              ellipsoidal: inside diameter to twice the depth, ${rangeText(HEAD_RATIO)} (default 2)
  --crown LENGTH, --knuckle LENGTH
                         torispherical: inside crown and knuckle radii
  --flange LENGTH        straight flange below the tangent line (reported; default 0)
  --nozzle PIPE          nozzle pipe
  --offset LENGTH        distance from the head's centre line (default 0): of the
                         axis for a hillside nozzle, else of where the axis meets the head
  --direction WAY        hillside (parallel to the vessel axis; default), radial
                         (square to the head), or angle (with --tilt)
  --tilt DEG             angle: tilt from the vessel axis, ${rangeText(NOZZLE_TILT_DEG)}, positive leaning outboard
  --fit set-on|set-in    set-on: nozzle ID on the head's outside; set-in: nozzle OD
                         on the head's inside (default set-on)
  --gap LENGTH           root gap square to the head (default 0)

The hole in a head cannot be rolled out flat: its template gives the outline seen
along the nozzle axis with each station's drop from a square set on the axis, and
tape lengths over the head from the crown centre, with the method's error bound.

Examples:
  girth nozzle --head "48 od x 1/2" --nozzle "NPS 6 STD" --offset 12
  girth nozzle --head "48 od x 1/2" --head-type flanged-and-dished --nozzle "NPS 4 STD" --offset 8 --direction radial --svg n2.svg
  girth nozzle --head "60 od x 5/8" --head-type hemispherical --nozzle "NPS 3 XS" --offset 15 --direction angle --tilt 20 --fit set-in --dxf n3.dxf
  girth nozzle --units mm --head "1524 od x 16" --nozzle "DN 200 x 8.2" --offset 400 --json`,
  fieldNames: { offsetMm: 'offset', gapMm: 'gap', fit: 'fit', direction: 'direction', tiltDeg: 'tilt', nozzle: 'nozzle', head: 'head' },
  fromOptions: (args) => ({
    joint: 'nozzle',
    head: requireOption(args, 'head', '"48 od x 1/2"'),
    ...optional('headType', optionalChoice(args, 'head-type', HEAD_TYPES)),
    ...optional('ratio', numberOption(args, 'ratio')),
    ...optional('crown', stringOption(args, 'crown')),
    ...optional('knuckle', stringOption(args, 'knuckle')),
    ...optional('flange', stringOption(args, 'flange')),
    nozzle: requireOption(args, 'nozzle', '"NPS 6 STD"'),
    ...optional('offset', stringOption(args, 'offset')),
    ...optional('direction', optionalChoice(args, 'direction', DIRECTIONS)),
    ...optional('tilt', numberOption(args, 'tilt')),
    ...optional('fit', optionalChoice(args, 'fit', FITS)),
    ...optional('gap', stringOption(args, 'gap')),
  }),
  jobKeys: (k) => ({
    head: k.text(),
    headType: k.choice(HEAD_TYPES).optional(),
    ratio: k.within(HEAD_RATIO).optional(),
    crown: k.length().optional(),
    knuckle: k.length().optional(),
    flange: k.length().optional(),
    nozzle: k.text(),
    offset: k.length().optional(),
    direction: k.choice(DIRECTIONS).optional(),
    tilt: k.within(NOZZLE_TILT_DEG).optional(),
    fit: k.choice(FITS).optional(),
    gap: k.length().optional(),
  }),
  layout: (input, ctx, lib) => {
    const shell = readPipe(input.head, 'head', ctx);
    const crown = readLength(input.crown, 'crown', ctx);
    const knuckle = readLength(input.knuckle, 'knuckle', ctx);
    const flange = readLength(input.flange, 'flange', ctx);
    try {
      return lib.layoutNozzle(
        {
          head: {
            type: input.headType ?? 'ellipsoidal',
            odMm: shell.odMm,
            wallMm: shell.wallMm,
            ...(input.ratio === undefined ? {} : { ratio: input.ratio }),
            ...(crown === undefined ? {} : { crownRadiusMm: crown }),
            ...(knuckle === undefined ? {} : { knuckleRadiusMm: knuckle }),
            ...(flange === undefined ? {} : { straightFlangeMm: flange }),
          },
          nozzle: readPipe(input.nozzle, 'nozzle', ctx),
          offsetMm: readLength(input.offset, 'offset', ctx) ?? 0,
          direction: input.direction ?? 'hillside',
          ...(input.tilt === undefined ? {} : { tiltDeg: input.tilt }),
          fit: input.fit ?? 'set-on',
          gapMm: readLength(input.gap, 'gap', ctx) ?? 0,
        },
        { stations: ctx.stations },
      );
    } catch (error) {
      throw renameField(error, (field) => {
        const key = HEAD_FIELDS[field];
        return key === undefined ? undefined : ctx.fieldName(key);
      });
    }
  },
  describe: (result, style) => {
    const r = result as NozzleLayout;
    const way = r.direction === 'angle' ? `tilted ${r.tiltDeg.toFixed(1)} deg` : r.direction;
    return `${way}, ${r.fit}, offset ${reportLength(r.offsetMm, style)}, gap ${reportLength(r.gapMm, style)}`;
  },
});
