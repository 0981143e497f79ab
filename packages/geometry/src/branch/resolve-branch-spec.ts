/**
 * Checks a branch joint as given and fills in its defaults.
 */
import { GirthError, JOINT_ANGLE_DEG, requireFinite, requireNonNegative, requireWithin } from '@girth/pipes';
import { resolvePipeSection } from '../pipe-section.js';
import type { BranchContact, BranchFit, BranchPipeSection, BranchSpec, PipeFace, ResolvedBranchSpec } from './types.js';

/** Default angle between branch and header axes: a tee, degrees. */
export const DEFAULT_BRANCH_ANGLE_DEG = 90;

/** The surfaces that meet for each fit (REFERENCES.md, common practice: set-on = branch ID on header OD; set-in = branch OD on header ID). */
export const FIT_CONTACT: Readonly<Record<BranchFit, BranchContact>> = {
  'set-on': { branch: 'inside', header: 'outside' },
  'set-in': { branch: 'outside', header: 'inside' },
};

/**
 * The spec checked field by field, with defaults: angle 90°, offset 0,
 * fit `set-on`, contact from the fit, gap 0. Does not check that the pipes
 * fit each other (see `solveBranch`).
 *
 * @throws GirthError `EMPTY_INPUT` (no spec, header or branch);
 *   `NOT_A_NUMBER` / `NOT_FINITE` naming the field; `NEGATIVE` for an OD,
 *   wall or nominal size ≤ 0 or a negative `gapMm`; `WALL_TOO_THICK` when a
 *   wall is half the OD or more (the pipe checks of `resolvePipeSection`, with
 *   fields `header.*` and `branch.*`); `OUT_OF_RANGE` for `angleDeg` outside [1, 90] (JOINT_ANGLE_DEG in `@girth/pipes` limits); `BAD_CHOICE` for
 *   an unknown `fit` or contact surface; `BAD_OPTION` for a `contact` that is not an object or a label that is not text.
 * @example resolveBranchSpec({ header: { odMm: 323.85, wallMm: 9.525 }, branch: { odMm: 168.275, wallMm: 7.112 } }).fit // 'set-on'
 */
export function resolveBranchSpec(spec: BranchSpec): ResolvedBranchSpec {
  if (spec === null || typeof spec !== 'object') {
    throw new GirthError('EMPTY_INPUT', 'spec', 'spec: give the header, the branch and the joint', spec);
  }
  const header: BranchPipeSection = { ...resolvePipeSection(spec.header, 'header'), role: 'header' };
  const branch: BranchPipeSection = { ...resolvePipeSection(spec.branch, 'branch'), role: 'branch' };
  const angleDeg = resolveAngle(spec.angleDeg);
  const offsetMm = spec.offsetMm === undefined ? 0 : requireFinite(spec.offsetMm, 'offsetMm');
  const fit = resolveFit(spec.fit);
  const contact = spec.contact === undefined ? FIT_CONTACT[fit] : resolveContact(spec.contact);
  const gapMm = spec.gapMm === undefined ? 0 : requireNonNegative(spec.gapMm, 'gapMm');
  return { kind: 'branch-spec', header, branch, angleDeg, offsetMm, fit, contact, gapMm };
}

function resolveAngle(value: unknown): number {
  if (value === undefined) return DEFAULT_BRANCH_ANGLE_DEG;
  return requireWithin(value, 'angleDeg', JOINT_ANGLE_DEG);
}

function resolveFit(value: unknown): BranchFit {
  if (value === undefined) return 'set-on';
  if (value === 'set-on' || value === 'set-in') return value;
  throw new GirthError('BAD_CHOICE', 'fit', `fit: must be 'set-on' or 'set-in', got ${JSON.stringify(value)}`, value);
}

function resolveContact(value: unknown): BranchContact {
  if (value === null || typeof value !== 'object') {
    throw new GirthError('BAD_OPTION', 'contact', `contact: expected { branch, header }, each 'inside' or 'outside'`, value);
  }
  const c = value as { branch?: unknown; header?: unknown };
  return { branch: resolveFace(c.branch, 'contact.branch'), header: resolveFace(c.header, 'contact.header') };
}

function resolveFace(value: unknown, field: string): PipeFace {
  if (value === 'inside' || value === 'outside') return value;
  throw new GirthError('BAD_CHOICE', field, `${field}: must be 'inside' or 'outside', got ${JSON.stringify(value)}`, value);
}
