/**
 * From a joint as written to its layout: the joint's definition resolves pipe
 * names and lengths and calls the library. The command line and the job file
 * both come through here.
 */
import { requireWithin, STATIONS } from '@girth/pipes';
import * as unroll from '@girth/unroll';
import type { LayoutResult } from '@girth/unroll';
import { renameField } from './read-inputs.js';
import { jointNamed, type JointInput } from './registry.js';
import type { JointContext } from './types.js';

/**
 * Lays out any joint, its templates worded in the job's unit (`ctx.describe`).
 * @throws GirthError for bad input, its field named as the user wrote it
 *   (`--offset` or `pieces[1].offset`), never the library's name (`offsetMm`).
 * @example layoutJoint({ joint: 'branch', header: 'NPS 12 STD', branch: 'NPS 6 STD' }, ctx)
 */
export function layoutJoint(input: JointInput, ctx: JointContext): LayoutResult {
  requireWithin(ctx.stations, ctx.fieldName('stations'), STATIONS);
  const joint = jointNamed(input.joint);
  if (joint === undefined) throw new Error(`no definition for the joint "${input.joint}"`);
  try {
    return unroll.describeResult(joint.layout(input, ctx, unroll), ctx.describe);
  } catch (error) {
    throw renameField(error, (field) => {
      // Already named as the user wrote it (`--header`, `pieces[1].header`).
      if (field.startsWith(ctx.fieldPrefix)) return undefined;
      const root = field.split(/[.[]/)[0] ?? field;
      if (root === 'stations') return ctx.fieldName('stations');
      const name = joint.fieldNames[root];
      return name === undefined ? undefined : ctx.fieldName(name);
    });
  }
}
