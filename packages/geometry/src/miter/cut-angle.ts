/**
 * The cut angle of a miter joint.
 */
import { requireInRange, requireInteger } from '@girth/pipes';
import { MAX_MITER_WELDS } from './limits.js';

/**
 * The cut angle of each joint of a miter elbow: the bend divided by twice the
 * number of welds. ASME B31.3 para. 304.2.3: the cut angle is the change of
 * direction at a joint divided by two; a bend of B over W equal joints changes
 * direction by B / W at each.
 *
 * @param bendDeg total bend, degrees, in (0, 180].
 * @param welds number of welds, a whole number from 1 to {@link MAX_MITER_WELDS}.
 * @returns degrees, in (0, 90].
 * @throws GirthError `OUT_OF_RANGE` for a bend outside (0, 180] or a weld count outside its range.
 * @example miterCutAngleDeg(90, 3) // 15
 */
export function miterCutAngleDeg(bendDeg: number, welds: number): number {
  const b = requireInRange(bendDeg, 'bendDeg', 0, 180, { minOpen: true, unit: 'degrees' });
  const w = requireInteger(welds, 'welds', 1, MAX_MITER_WELDS);
  return b / (2 * w);
}
