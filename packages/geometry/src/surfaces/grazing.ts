/**
 * Where the generators of a cut pipe graze a host: the kinks of the cut.
 */
import { generatorLine } from '../generators.js';
import { minimizeOnInterval } from '../internal/golden-min.js';
import type { GeneratorBundle } from '../types.js';
import { addScaled, dot } from '../vec3.js';
import { lineRoots, type LineSurfaceOptions } from './line-intersection.js';
import { surfaceOpsFor, type HostSurface } from './table.js';
import type { HostShape } from './types.js';

const TWO_PI = 2 * Math.PI;

/** Generators looked at around the pipe before refining (every 3.75°): a graze is a V-shaped dip of |n · d|, found from its nearest sample. */
const GRAZE_SCAN_STEPS = 96;

/**
 * Largest |n · d| (the sine of the angle between a generator and the host's
 * tangent plane where it first meets it) that still counts as a graze: 1e-6,
 * a pipe side flush with the host within about 5e-13 of the host's size. The
 * smallest |n · d| that rounding lets the search see at a true graze is about
 * 1e-7 on metre-sized joints, so this keeps a margin above it.
 */
export const GRAZE_SINE_TOL = 1e-6;

/** Width to which a graze is located by the numeric search, radians (~1e-10 mm on a 1 m pipe). */
const GRAZE_PHI_TOL_RAD = 1e-13;

/** Grazes closer than this are one, radians. */
const SAME_GRAZE_RAD = 1e-9;

/**
 * Station angles (radians in [0, 2π), ascending, no repeats) at which a
 * generator of `bundle` grazes `host` where it first meets it: the kinks of
 * the cut (a branch side flush with the header side, an equal tee).
 *
 * Uses the host kind's closed form (`SurfaceOps.grazingPhisRad`) when it has
 * one. Otherwise a numeric search that needs only `intersectLine` and
 * `normal`, so it holds for surfaces of any degree (a torus is quartic):
 * along the cut, g(phi) = |n · d| (n the host normal at the first hit, d the
 * generator direction) is zero exactly where the generator touches the host;
 * g is taken with no tangency tolerance, sampled every 3.75°, each local dip
 * refined by golden-section search to 1e-13 rad, and kept when
 * g ≤ {@link GRAZE_SINE_TOL} there or the first root is flagged tangent
 * (within `options.eps`).
 *
 * @throws GirthError `BAD_OPTION` (field `host`) for a kind missing from the table.
 * @example findGrazingPhis(branchBundle(Math.PI / 2, 0, 100), header100) // [π/2, 3π/2]
 */
export function findGrazingPhis<S extends HostShape = HostSurface>(
  bundle: GeneratorBundle,
  host: S,
  options: LineSurfaceOptions<S> = {},
): readonly number[] {
  const ops = surfaceOpsFor(host, options.surfaces);
  if (ops.grazingPhisRad !== undefined) return ops.grazingPhisRad(host, bundle);

  const d = bundle.axisDirection;
  // |n · d| at the first hit with no tangency tolerance (so it keeps falling to the graze itself); +∞ on a miss.
  const exact = { ...options, eps: 0 };
  const g = (phiRad: number): number => {
    const line = generatorLine(bundle, phiRad);
    const first = lineRoots(host, line, exact)[0];
    if (first === undefined) return Number.POSITIVE_INFINITY;
    return Math.abs(dot(ops.normal(host, addScaled(line.origin, d, first.tMm)), d));
  };
  const tangentAt = (phiRad: number): boolean => lineRoots(host, generatorLine(bundle, phiRad), options)[0]?.tangent === true;

  const step = TWO_PI / GRAZE_SCAN_STEPS;
  const values = Array.from({ length: GRAZE_SCAN_STEPS }, (_, i) => g(i * step));
  const out: number[] = [];
  for (let i = 0; i < GRAZE_SCAN_STEPS; i++) {
    const here = values[i] as number;
    const prev = values[(i + GRAZE_SCAN_STEPS - 1) % GRAZE_SCAN_STEPS] as number;
    const next = values[(i + 1) % GRAZE_SCAN_STEPS] as number;
    if (!(here <= prev && here <= next && Number.isFinite(here))) continue;
    const refined = here === 0 ? { x: i * step, fx: 0 } : minimizeOnInterval(g, (i - 1) * step, (i + 1) * step, GRAZE_PHI_TOL_RAD);
    const best = refined.fx < here ? refined : { x: i * step, fx: here };
    if (!(best.fx <= GRAZE_SINE_TOL || tangentAt(best.x))) continue;
    const p = ((best.x % TWO_PI) + TWO_PI) % TWO_PI;
    const phi = TWO_PI - p < SAME_GRAZE_RAD ? 0 : p;
    if (!out.some((q) => Math.abs(q - phi) < SAME_GRAZE_RAD || TWO_PI - Math.abs(q - phi) < SAME_GRAZE_RAD)) out.push(phi);
  }
  return out.sort((a, b) => a - b);
}
