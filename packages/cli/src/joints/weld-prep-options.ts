/**
 * The weld-preparation options every cut joint shares (branch, cutback,
 * miter): the groove angle and the land (root face). One place for their
 * flags, help lines, job-file keys and the groove they make, so each joint's
 * definition adds them with a line or two.
 */
import { GirthError } from '@girth/pipes';
import type { GrooveSpec } from '@girth/geometry';
import { numberOption, stringOption } from '../option-values.js';
import type { OptionSpec, ParsedArgs } from '../args.js';
import type { z as Zod } from 'zod';
import type { SchemaKit } from './definition.js';
import { readLength } from './read-inputs.js';
import type { JointContext, WrittenLength } from './types.js';

/** The weld-preparation part of a joint's input, as written. */
export interface WeldPrepInput {
  /** Groove angle, degrees, in (0, 90). */
  readonly grooveAngle?: number;
  /** Land (root face), a written length. */
  readonly land?: WrittenLength;
}

/** The flags. */
export const WELD_PREP_OPTIONS: OptionSpec = {
  'groove-angle': { type: 'string' },
  land: { type: 'string' },
};

/**
 * Help lines, for a joint whose groove is `against` (e.g. `the header`).
 * @example weldPrepHelp('the header')
 */
export function weldPrepHelp(against: string, included = false): string {
  const what = included ? 'included angle between two pieces, half on each' : `groove angle against ${against}`;
  return `  --groove-angle DEG     weld prep: the ${what},
                         more than 0 and less than 90; adds the dihedral and torch
                         angle at each station to the table, the JSON and a bevel
                         band on the wrap
  --land LENGTH          weld prep: land (root face), less than the wall (default 0)`;
}

/** Library field names of the groove and the key the user wrote for them. */
export const WELD_PREP_FIELD_NAMES: Readonly<Record<string, string>> = { grooveAngleDeg: 'grooveAngle', landMm: 'land', groove: 'grooveAngle' };

/**
 * The weld-prep input from the flags (`{}` when neither is given).
 * @throws GirthError `NOT_A_NUMBER` naming `--groove-angle`.
 */
export function weldPrepFromOptions(args: ParsedArgs): WeldPrepInput {
  const grooveAngle = numberOption(args, 'groove-angle');
  const land = stringOption(args, 'land');
  return { ...(grooveAngle === undefined ? {} : { grooveAngle }), ...(land === undefined ? {} : { land }) };
}

/** The job-file keys (`grooveAngle`, `land`); the library checks the range. */
export function weldPrepJobKeys(k: SchemaKit): Readonly<Record<string, Zod.ZodType>> {
  return { grooveAngle: k.number().optional(), land: k.length().optional() };
}

/**
 * The groove asked for, or `undefined` when no weld prep is asked for.
 * @throws GirthError `MISSING_INPUT` naming the groove angle when only a land
 *   is given; errors of the written land naming it.
 */
export function readGroove(input: WeldPrepInput, ctx: JointContext): GrooveSpec | undefined {
  if (input.grooveAngle === undefined) {
    if (input.land !== undefined) {
      const name = ctx.fieldName('grooveAngle');
      throw new GirthError('MISSING_INPUT', name, `${name}: a land (root face) needs a groove angle too, e.g. 37.5`);
    }
    return undefined;
  }
  const landMm = readLength(input.land, 'land', ctx);
  return { grooveAngleDeg: input.grooveAngle, ...(landMm === undefined ? {} : { landMm }) };
}
