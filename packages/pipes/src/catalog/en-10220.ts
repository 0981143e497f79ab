/**
 * EN 10220 / ISO 4200 series 1: outside diameters of steel tubes, mm, for DN 15
 * to DN 1200. The wall is chosen by the user (`DN 150 x 7.1`), as these
 * standards list many walls per OD.
 *
 * Source: RECALLED from the standards. DN 15-600 are cross-checked against
 * the project's REFERENCES.md in `en-10220.test.ts` (to 0.1 mm: published copies
 * differ by 0.1 mm at DN 250/300); DN 700-1200 are recalled without a second
 * source. DN 1100 is left out (we could not recall a series-1 OD for it).
 */
import type { En10220Size } from './types.js';

function size(dn: number, odMm: number): En10220Size {
  return { kind: 'en-10220-size', dn, odMm };
}

/** EN 10220 series-1 sizes in increasing DN (recalled; see the file comment). */
export const EN_10220: readonly En10220Size[] = [
  size(15, 21.3),
  size(20, 26.9),
  size(25, 33.7),
  size(32, 42.4),
  size(40, 48.3),
  size(50, 60.3),
  size(65, 76.1),
  size(80, 88.9),
  size(100, 114.3),
  size(125, 139.7),
  size(150, 168.3),
  size(200, 219.1),
  size(250, 273.0),
  size(300, 323.9),
  size(350, 355.6),
  size(400, 406.4),
  size(450, 457.0),
  size(500, 508.0),
  size(600, 610.0),
  size(700, 711.0),
  size(800, 813.0),
  size(900, 914.0),
  size(1000, 1016.0),
  size(1200, 1219.0),
];
