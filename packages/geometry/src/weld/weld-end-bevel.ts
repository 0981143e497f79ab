/**
 * The ASME B16.25 weld-end preparation for a square end or a miter.
 */
import { requirePositive } from '@girth/pipes';
import {
  B16_25_BEVEL_DEG,
  B16_25_BEVEL_TOL_DEG,
  B16_25_COMPOUND_BREAK_MM,
  B16_25_COMPOUND_UPPER_DEG,
  B16_25_LAND_MM,
  B16_25_LAND_TOL_MM,
  B16_25_SINGLE_BEVEL_MAX_WALL_MM,
  B16_25_SQUARE_MAX_WALL_MM,
} from './limits.js';

/**
 * A weld end per ASME B16.25 (recalled; REFERENCES.md): angles in degrees
 * from the plane square to the pipe axis (for a miter: from the weld plane),
 * lengths in mm.
 * - `square`: wall up to 3 mm, cut square (a slight chamfer is allowed);
 * - `single`: wall over 3 up to 22 mm, 37.5° ± 2.5° with a 1/16 in ± 1/32 in land;
 * - `compound`: wall over 22 mm, 37.5° from the land up to 19 mm (3/4 in)
 *   above the inside surface, then 10° to the outside (recalled).
 */
export type WeldEndBevel =
  | { readonly kind: 'square'; readonly wallMm: number }
  | {
      readonly kind: 'single';
      readonly wallMm: number;
      readonly bevelDeg: number;
      readonly bevelTolDeg: number;
      readonly landMm: number;
      readonly landTolMm: number;
    }
  | {
      readonly kind: 'compound';
      readonly wallMm: number;
      readonly bevelDeg: number;
      readonly bevelTolDeg: number;
      readonly landMm: number;
      readonly landTolMm: number;
      /** Height above the inside surface where the bevel turns to `upperBevelDeg`, mm. */
      readonly breakMm: number;
      readonly upperBevelDeg: number;
    };

/**
 * The B16.25 weld end for a wall, as above.
 * @param wallMm wall thickness, mm, > 0.
 * @throws GirthError `NEGATIVE` / `NOT_A_NUMBER` / `NOT_FINITE` (field `wallMm`).
 * @example weldEndBevel(7.11) // { kind: 'single', bevelDeg: 37.5, landMm: 1.5875, ... }
 */
export function weldEndBevel(wallMm: number): WeldEndBevel {
  const t = requirePositive(wallMm, 'wallMm');
  if (t <= B16_25_SQUARE_MAX_WALL_MM) return { kind: 'square', wallMm: t };
  const single = {
    wallMm: t,
    bevelDeg: B16_25_BEVEL_DEG,
    bevelTolDeg: B16_25_BEVEL_TOL_DEG,
    landMm: B16_25_LAND_MM,
    landTolMm: B16_25_LAND_TOL_MM,
  };
  if (t <= B16_25_SINGLE_BEVEL_MAX_WALL_MM) return { kind: 'single', ...single };
  return { kind: 'compound', ...single, breakMm: B16_25_COMPOUND_BREAK_MM, upperBevelDeg: B16_25_COMPOUND_UPPER_DEG };
}
