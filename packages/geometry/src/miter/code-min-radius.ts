/**
 * The smallest centreline radius ASME B31.3 allows a multiple miter, as recalled.
 */
import { requireInRange, requirePositive } from '@girth/pipes';

/**
 * The constant A of ASME B31.3 eq. (5) for a wall T, mm (recalled, not checked
 * against the printed code): 25 mm for T ≤ 13 mm, 2T for 13 < T < 22 mm,
 * 2T/3 + 30 mm for T ≥ 22 mm.
 *
 * @param wallMm wall thickness T, mm, > 0.
 * @throws GirthError `NEGATIVE`, `NOT_A_NUMBER`, `NOT_FINITE` for a bad wall.
 * @example miterRadiusConstantAMm(10) // 25
 */
export function miterRadiusConstantAMm(wallMm: number): number {
  const t = requirePositive(wallMm, 'wallMm');
  if (t <= 13) return 25;
  if (t < 22) return 2 * t;
  return (2 * t) / 3 + 30;
}

/**
 * The smallest effective radius of a multiple miter bend by ASME B31.3
 * para. 304.2.3 eq. (5), as recalled: R1 = A / tan(θ) + D/2, with θ the cut
 * angle, D the OD and A from {@link miterRadiusConstantAMm}. The effective
 * radius is the distance from the bend centre to the pipe centreline at the
 * middle of a piece, so it only exists for two or more welds.
 *
 * @param odMm pipe OD, mm, > 0.
 * @param wallMm wall, mm, > 0.
 * @param cutAngleDeg cut angle θ, degrees, in (0, 90).
 * @returns mm.
 * @throws GirthError `NEGATIVE`/`OUT_OF_RANGE` for input outside those ranges.
 * @example codeMinMiterRadiusMm(323.9, 9.53, 15) // 25 / tan 15° + 161.95 ≈ 255.25
 */
export function codeMinMiterRadiusMm(odMm: number, wallMm: number, cutAngleDeg: number): number {
  const d = requirePositive(odMm, 'odMm');
  const a = miterRadiusConstantAMm(wallMm);
  const theta = requireInRange(cutAngleDeg, 'cutAngleDeg', 0, 90, { minOpen: true, maxOpen: true, unit: 'degrees' });
  return a / Math.tan((theta * Math.PI) / 180) + d / 2;
}
