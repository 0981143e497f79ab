/**
 * The trunnion joint: a trunnion or branch set on an elbow.
 */
import { BEND_DEG, rangeText } from '@girth/pipes';
import type { TrunnionLayout } from '@girth/unroll';
import { numberOption, optionalChoice, requireOption, stringOption } from '../option-values.js';
import { reportLength } from '../report-style.js';
import { defineJoint, optional } from './definition.js';
import { readLength, readPipe, renameField } from './read-inputs.js';
import type { WrittenLength } from './types.js';

/** A trunnion on an elbow, as a fitter writes it. */
export interface TrunnionInput {
  readonly joint: 'trunnion';
  /** The elbow's pipe, e.g. `NPS 12 STD`. */
  readonly elbow: string;
  /** `long` (default), `short`, or the centreline radius as a length. */
  readonly radius?: WrittenLength;
  readonly bend?: number;
  readonly trunnion: string;
  readonly along?: number;
  readonly around?: number;
  readonly direction?: (typeof DIRECTIONS)[number];
  readonly fit?: 'set-on' | 'set-in';
  readonly gap?: WrittenLength;
}

const DIRECTIONS = ['normal', 'inlet', 'outlet'] as const;
const FITS = ['set-on', 'set-in'] as const;
/** Angle around the elbow's cross-section, degrees. */
const AROUND_DEG = { min: -180, max: 180, unit: '°', what: 'the place around the elbow', reason: 'measured either way from the extrados to the intrados' } as const;
/** Angle along the bend, degrees (checked against the bend by the library). */
const ALONG_DEG = { min: 0, max: 180, unit: '°', what: 'the place along the bend', reason: 'from the inlet end, within the bend' } as const;

const ELBOW_FIELDS: Readonly<Record<string, string>> = {
  'elbow.radius': 'radius',
  'elbow.bendDeg': 'bend',
  alongDeg: 'along',
  aroundDeg: 'around',
};

/** `girth trunnion` and a job's `"joint": "trunnion"`. */
export const trunnionJoint = defineJoint<TrunnionInput>({
  name: 'trunnion',
  summary: 'trunnion or branch on an elbow: the trunnion cut, and the hole by square and by tape',
  options: {
    elbow: { type: 'string' },
    radius: { type: 'string' },
    bend: { type: 'string' },
    trunnion: { type: 'string' },
    along: { type: 'string' },
    around: { type: 'string' },
    direction: { type: 'string' },
    fit: { type: 'string' },
    gap: { type: 'string' },
  },
  help: `girth trunnion: a trunnion or branch on an elbow

  --elbow PIPE           the elbow's pipe, e.g. "NPS 12 STD"
  --radius R             long (1.5 x NPS, default), short (1.0 x NPS), or the
                         centreline radius as a length
  --bend DEG             bend angle, ${rangeText(BEND_DEG)} (default 90)
  --trunnion PIPE        trunnion (branch) pipe, no larger than the elbow
  --along DEG            where the axis meets the elbow: degrees along the bend from
                         the inlet end (default half the bend)
  --around DEG           degrees around the elbow from the extrados, -180 to 180
                         (180 = intrados; default 0)
  --direction WAY        normal (square to the elbow; default), inlet or outlet
                         (parallel to that end's pipe axis, as a support trunnion)
  --fit set-on|set-in    set-on: trunnion ID on the elbow's outside; set-in: trunnion OD
                         on the elbow's inside (default set-on)
  --gap LENGTH           root gap square to the elbow (default 0)

An elbow cannot be rolled out flat: the hole template gives the outline seen along
the trunnion axis with each station's drop from a square set on the axis, and tape
lengths over the elbow from the inlet end's extrados, with the method's error bound.

Examples:
  girth trunnion --elbow "NPS 12 STD" --trunnion "NPS 8 STD" --along 45
  girth trunnion --elbow "NPS 10 STD" --radius short --trunnion "NPS 6 STD" --along 30 --direction outlet --svg t2.svg
  girth trunnion --units mm --elbow "DN 300 x 9.5" --radius 600 --bend 60 --trunnion "DN 150 x 7.1" --around 30 --json`,
  fieldNames: { gapMm: 'gap', fit: 'fit', direction: 'direction', branch: 'trunnion', elbow: 'elbow' },
  fromOptions: (args) => ({
    joint: 'trunnion',
    elbow: requireOption(args, 'elbow', '"NPS 12 STD"'),
    ...optional('radius', stringOption(args, 'radius')),
    ...optional('bend', numberOption(args, 'bend')),
    trunnion: requireOption(args, 'trunnion', '"NPS 8 STD"'),
    ...optional('along', numberOption(args, 'along')),
    ...optional('around', numberOption(args, 'around')),
    ...optional('direction', optionalChoice(args, 'direction', DIRECTIONS)),
    ...optional('fit', optionalChoice(args, 'fit', FITS)),
    ...optional('gap', stringOption(args, 'gap')),
  }),
  jobKeys: (k) => ({
    elbow: k.text(),
    radius: k.length().optional(),
    bend: k.within(BEND_DEG).optional(),
    trunnion: k.text(),
    along: k.within(ALONG_DEG).optional(),
    around: k.within(AROUND_DEG).optional(),
    direction: k.choice(DIRECTIONS).optional(),
    fit: k.choice(FITS).optional(),
    gap: k.length().optional(),
  }),
  layout: (input, ctx, lib) => {
    const pipe = readPipe(input.elbow, 'elbow', ctx);
    const r = input.radius;
    const radius = r === undefined || r === 'long' || r === 'short' ? (r ?? 'long') : (readLength(r, 'radius', ctx) as number);
    try {
      return lib.layoutTrunnion(
        {
          elbow: { pipe, radius, ...(input.bend === undefined ? {} : { bendDeg: input.bend }) },
          branch: readPipe(input.trunnion, 'trunnion', ctx),
          ...(input.along === undefined ? {} : { alongDeg: input.along }),
          ...(input.around === undefined ? {} : { aroundDeg: input.around }),
          direction: input.direction ?? 'normal',
          fit: input.fit ?? 'set-on',
          gapMm: readLength(input.gap, 'gap', ctx) ?? 0,
        },
        { stations: ctx.stations },
      );
    } catch (error) {
      throw renameField(error, (field) => {
        const key = ELBOW_FIELDS[field];
        return key === undefined ? undefined : ctx.fieldName(key);
      });
    }
  },
  describe: (result, style) => {
    const r = result as TrunnionLayout;
    return `${r.alongDeg.toFixed(1)} deg along, ${r.aroundDeg.toFixed(1)} deg around, ${r.direction}, ${r.fit}, bend radius ${reportLength(r.bendRadiusMm, style)}, gap ${reportLength(r.gapMm, style)}`;
  },
});
