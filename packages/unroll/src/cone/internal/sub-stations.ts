/**
 * How finely an eccentric cone's outline is drawn between stations.
 *
 * The outline runs straight between sub-stations. For an end circle of radius
 * R cut into M equal runs, a run stands at most R (1 − cos(π/M)) off the circle
 * (its rise), and the runs together fall short of the girth 2πR by about
 * π³ R / (3 M²). Both must stay within the tolerance; the girth shortfall is
 * the stricter (about twice the rise).
 */
import { maxEndShiftFactor } from '@girth/geometry';
import { GirthError } from '@girth/pipes';
import type { ResolvedCone } from './resolve-cone.js';

/** Most straight runs an outline may have around the whole cone. */
export const CONE_MAX_OUTLINE_RUNS = 200_000;

/** Safety margin on the radius used to size the runs: the mean end of an eccentric cone is close to, not exactly, a circle. */
const RADIUS_MARGIN = 1.25;

/**
 * Sub-stations per station interval (an even number ≥ 2) so that runs stay
 * within `chordToleranceMm` of the large end (the larger, so the worse, edge).
 *
 * @throws GirthError `OUT_OF_RANGE` (field `chordToleranceMm`) when the
 *   tolerance would need more than {@link CONE_MAX_OUTLINE_RUNS} runs.
 * @example subStationsPerStation(cone, 0.05) // e.g. 12
 */
export function subStationsPerStation(cone: ResolvedCone, chordToleranceMm: number): number {
  const shift = Math.abs(cone.sheet.normalShiftMm) * maxEndShiftFactor(cone.given);
  const radius = RADIUS_MARGIN * (cone.given.largeRadiusMm + shift);
  const tol = chordToleranceMm;
  const forGirth = Math.sqrt((Math.PI ** 3 * radius) / (3 * tol));
  const forRise = Math.PI / Math.acos(Math.max(-1, 1 - tol / radius));
  const runs = Math.max(cone.stations, forGirth, forRise);
  let m = Math.ceil(runs / cone.stations);
  if (m % 2 === 1) m += 1;
  if (m * cone.stations > CONE_MAX_OUTLINE_RUNS) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'chordToleranceMm',
      `chordToleranceMm: ${tol} mm on a ${(2 * cone.given.largeRadiusMm).toFixed(1)} mm end needs more than ${CONE_MAX_OUTLINE_RUNS} runs; allow a larger tolerance`,
      chordToleranceMm,
    );
  }
  return m;
}
