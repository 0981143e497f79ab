/**
 * Every joint of the command line and the job file, in the order help lists
 * them. Adding a joint: one file exporting its `JointDefinition`, and one line
 * here.
 */
import { branchJoint, type BranchInput } from './branch.js';
import { cutbackJoint, type CutbackInput } from './cutback.js';
import type { JointDefinition } from './definition.js';
import { miterJoint, type MiterInput } from './miter.js';
import { reducerJoint, type ReducerInput } from './reducer.js';
import { nozzleJoint, type NozzleInput } from './nozzle.js';
import { trunnionJoint, type TrunnionInput } from './trunnion.js';
import { padJoint, type PadInput } from './pad.js';
import { shellPlateJoint, type ShellPlateInput } from './shell-plate.js';

/** Any joint Girth lays out, as a fitter writes it. */
export type JointInput = BranchInput | MiterInput | CutbackInput | ReducerInput | NozzleInput | TrunnionInput | PadInput | ShellPlateInput;

/** The joints, in help order. */
export const JOINTS: readonly JointDefinition<JointInput>[] = [branchJoint, miterJoint, cutbackJoint, reducerJoint, nozzleJoint, trunnionJoint, padJoint, shellPlateJoint] as unknown as readonly JointDefinition<JointInput>[];

/**
 * The joint of that name, or `undefined`.
 * @example jointNamed('miter')?.summary
 */
export function jointNamed(name: string): JointDefinition<JointInput> | undefined {
  return JOINTS.find((j) => j.name === name);
}
