/**
 * The fit-up options every joint with a wrap takes (branch, miter, cutback):
 * the square line the ordinates are measured from, both square lines drawn,
 * and the run and radius of the angle check. One place for the flags, the
 * job-file keys, their help and the call that applies them to a layout.
 */
import type { FormatLengthOptions } from '@girth/pipes';
import type { z as Zod } from 'zod';
import type { AngleCheckOptions, JointFitUp, LayoutResultBase, OrdinateReference } from '@girth/unroll';
import { optionalChoice, stringOption } from '../option-values.js';
import type { OptionSpec, ParsedArgs } from '../args.js';
import { optional, type LayoutLibrary, type SchemaKit } from './definition.js';
import { readLength } from './read-inputs.js';
import type { JointContext, WrittenLength } from './types.js';

/** The fit-up keys of a joint's input (flags and job file alike). */
export interface FitUpInput {
  readonly ordinatesFrom?: OrdinateReference;
  readonly referenceLines?: boolean;
  readonly checkRun?: WrittenLength;
  readonly checkRadius?: WrittenLength;
}

const REFERENCES = ['long-point', 'short-point'] as const;

/** The flags. */
export const FIT_UP_OPTIONS: OptionSpec = {
  'ordinates-from': { type: 'string' },
  'reference-lines': { type: 'boolean' },
  'check-run': { type: 'string' },
  'check-radius': { type: 'string' },
};

/** Help lines of the flags, for each joint's help. */
export const FIT_UP_HELP = `Fit-up:
  --ordinates-from long-point|short-point
                         square line the ordinates are measured from: through the long point
                         (the cutback, default) or through the short point (zero at the short point)
  --reference-lines      draw both square lines on the wrap, labelled
  --check-run LENGTH     run of the angle check (rise over run; default 12 in, or 300 mm)
  --check-radius LENGTH  radius of the chord check (default 12 in, or 300 mm)`;

/** Library field names of the angle check and the names the user wrote, for each joint's `fieldNames`. */
export const FIT_UP_FIELD_NAMES: Readonly<Record<string, string>> = {
  ordinatesFrom: 'ordinatesFrom',
  referenceLines: 'referenceLines',
  runMm: 'checkRun',
  chordRadiusMm: 'checkRadius',
};

/**
 * The fit-up flags as input keys.
 * @throws GirthError `BAD_CHOICE` (field `--ordinates-from`) for another word.
 */
export function fitUpFromOptions(args: ParsedArgs): FitUpInput {
  return {
    ...optional('ordinatesFrom', optionalChoice(args, 'ordinates-from', REFERENCES)),
    ...(args.values['reference-lines'] === true ? { referenceLines: true } : {}),
    ...optional('checkRun', stringOption(args, 'check-run')),
    ...optional('checkRadius', stringOption(args, 'check-radius')),
  };
}

/** The job-file keys. */
export function fitUpJobKeys(k: SchemaKit): Readonly<Record<string, Zod.ZodType>> {
  return {
    ordinatesFrom: k.choice(REFERENCES).optional(),
    referenceLines: k.z.boolean().optional(),
    checkRun: k.length().optional(),
    checkRadius: k.length().optional(),
  };
}

/** Default run and chord radius of the angle check, mm: a foot for inch jobs, 300 mm for mm jobs (round numbers on a tape). */
const DEFAULT_CHECK_MM = { in: 304.8, mm: 300 } as const;
/** One unit of arc per degree on a 57.3-unit radius: an inch for inch jobs, 10 mm for mm jobs (a 573 mm radius). */
const ARC_UNIT_MM = { in: 25.4, mm: 10 } as const;

/** How the job's lengths are worded on sheets and in the fit-up lines: mm, decimal inches or feet-inch-fractions. */
export function jobLengthFormat(ctx: JointContext): FormatLengthOptions {
  if (ctx.units === 'mm') return { format: 'mm' };
  return ctx.describe.lengthFormat === 'ft-in' ? { format: 'ft-in', fraction: ctx.describe.fraction ?? 16 } : { format: 'in' };
}

/**
 * The angle-check lengths of the input, mm.
 * @throws GirthError for a length that does not read or is negative (`NEGATIVE`, field `--check-run`); zero is refused by the library's `angleCheck` (`NEGATIVE`, renamed to the option through {@link FIT_UP_FIELD_NAMES}).
 */
export function angleCheckOptions(input: FitUpInput, ctx: JointContext): AngleCheckOptions {
  const run = readLength(input.checkRun, 'checkRun', ctx);
  const radius = readLength(input.checkRadius, 'checkRadius', ctx);
  return { runMm: run ?? DEFAULT_CHECK_MM[ctx.units], chordRadiusMm: radius ?? DEFAULT_CHECK_MM[ctx.units], arcUnitMm: ARC_UNIT_MM[ctx.units] };
}

/**
 * The layout with its fit-up applied as the input asks (`withFitUp`), worded in the job's unit.
 * @throws GirthError as `withFitUp`.
 */
export function applyFitUp<R extends LayoutResultBase>(lib: LayoutLibrary, layout: R, fitUp: JointFitUp, input: FitUpInput, ctx: JointContext): R {
  return lib.withFitUp(layout, fitUp, {
    ...optional('ordinatesFrom', input.ordinatesFrom),
    referenceLines: input.referenceLines ?? false,
    format: jobLengthFormat(ctx),
  });
}
