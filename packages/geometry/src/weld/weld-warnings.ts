/**
 * What a welder should know about a joint's weld preparation that does not
 * stop the layout.
 */
import type { GirthWarning } from '@girth/pipes';
import { AWS_D1_1_PREQUALIFIED_MIN_DIHEDRAL_DEG, TANGENT_JOINT_WARN_DIHEDRAL_DEG } from './limits.js';
import type { BevelStatus } from './types.js';

/** Stable codes of the warnings {@link weldPrepWarnings} gives. */
export type WeldPrepWarningCode = 'DIHEDRAL_BELOW_PREQUALIFIED' | 'TANGENT_JOINT' | 'GROOVE_CLOSED';

/** One station as the warnings need it. */
export interface WeldPrepWarningStation {
  readonly n: number;
  readonly dihedralDeg: number;
  readonly status: BevelStatus;
}

/** What kind of joint the stations belong to: only a tubular connection (branch, cut-back) is held to the tubular details. */
export interface WeldPrepWarningOptions {
  /** True for T-, Y-, K-type tubular connections (branch, cut-back to a surface); false for butt joints (miters). */
  readonly tubular: boolean;
  /** True when the tangent-joint check applies (a set-on branch). */
  readonly checkTangent: boolean;
}

const list = (ns: readonly number[]): string => (ns.length === 1 ? `station ${ns[0]}` : `stations ${ns.join(', ')}`);
const deg = (v: number): string => `${v.toFixed(1)}°`;

/**
 * Warnings for a joint's stations:
 * - `DIHEDRAL_BELOW_PREQUALIFIED` (tubular joints): a local dihedral angle
 *   below 30°, where AWS D1.1's prequalified tubular groove details stop
 *   without added conditions (recalled);
 * - `TANGENT_JOINT` (set-on branch): a local dihedral angle of 165° or more,
 *   where the branch wall runs nearly along the header (the sides of a
 *   near-equal tee) and the groove becomes a flare;
 * - `GROOVE_CLOSED`: stations where the members meet tighter than the groove,
 *   so beveling the cut pipe cannot open it.
 * @example weldPrepWarnings([{ n: 9, dihedralDeg: 20, status: 'closed' }], { tubular: true, checkTangent: false }).map((w) => w.code) // ['DIHEDRAL_BELOW_PREQUALIFIED', 'GROOVE_CLOSED']
 */
export function weldPrepWarnings(stations: readonly WeldPrepWarningStation[], options: WeldPrepWarningOptions): readonly GirthWarning[] {
  const out: GirthWarning[] = [];
  if (options.tubular) {
    const low = stations.filter((s) => s.dihedralDeg < AWS_D1_1_PREQUALIFIED_MIN_DIHEDRAL_DEG);
    if (low.length > 0) {
      const least = Math.min(...low.map((s) => s.dihedralDeg));
      out.push({
        code: 'DIHEDRAL_BELOW_PREQUALIFIED',
        field: 'angleDeg',
        message:
          `The local dihedral angle falls to ${deg(least)} at ${list(low.map((s) => s.n))}, below the ${AWS_D1_1_PREQUALIFIED_MIN_DIHEDRAL_DEG}° ` +
          `that AWS D1.1's prequalified tubular groove details cover without added conditions (as recalled; check the edition in force); qualify the procedure for it.`,
      });
    }
  }
  if (options.checkTangent) {
    const flat = stations.filter((s) => s.dihedralDeg >= TANGENT_JOINT_WARN_DIHEDRAL_DEG);
    if (flat.length > 0) {
      const most = Math.max(...flat.map((s) => s.dihedralDeg));
      out.push({
        code: 'TANGENT_JOINT',
        field: 'branch',
        message:
          `At ${list(flat.map((s) => s.n))} the branch wall lies nearly along the header (dihedral angle up to ${deg(most)}): ` +
          `the joint becomes a tangent (flare) joint there and a torch angle alone does not make a groove; consider a set-in branch or a weld detail for it.`,
      });
    }
  }
  const closed = stations.filter((s) => s.status === 'closed');
  if (closed.length > 0) {
    out.push({
      code: 'GROOVE_CLOSED',
      field: 'grooveAngleDeg',
      message:
        `At ${list(closed.map((s) => s.n))} the members meet at less than the groove angle, so beveling the cut pipe cannot open the groove; ` +
        `prepare the other member too or choose another weld detail there.`,
    });
  }
  return out;
}
