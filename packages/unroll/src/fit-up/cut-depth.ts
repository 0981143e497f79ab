/**
 * The full depth of a pipe-end cut: from its long point to its short point,
 * located exactly on the 3D cut (not on the sampled template).
 */
import { GirthError } from '@girth/pipes';
import { hitGenerator, type GeneratorBundle, type HostSurface } from '@girth/geometry';
import { maximizeOnInterval } from '../internal/golden-max.js';

const TWO_PI = 2 * Math.PI;

/** Generators tried round the pipe before the extremes are refined (one each half degree). */
const SCAN_STEPS = 720;

/**
 * Around a kink (a generator grazing the host) the intersection counts near
 * grazes as touching, which can put a spurious extreme within about 1e-6 rad
 * of it; an extreme found this close to a kink is the kink itself (the cut is
 * V-shaped there), radians.
 */
const KINK_BAND_RAD = 1e-5;

/** Width to which a long or short point is located, radians (~1e-10 mm of girth on a 100 mm pipe). */
const EXTREME_PHI_TOL_RAD = 1e-12;

/**
 * Where a cut reaches furthest and least far along its pipe, and how far
 * apart those are. Belongs to one station column of one template.
 */
export interface CutDepth {
  readonly kind: 'cut-depth';
  /** Id of the template whose column this is, e.g. `branch-cut`. */
  readonly templateId: string;
  /** The column of cutbacks this depth belongs to: `cutback`, or `cutbackFar` on a piece cut at both ends. */
  readonly columnKey: string;
  /** Long point to short point, along the pipe, mm (≥ 0): the largest cutback of the cut, wherever it falls between stations. */
  readonly fullDepthMm: number;
  /** Station angle of the long point (the zero of the cutback), degrees in [0, 360). */
  readonly longPointAngleDeg: number;
  /** Station angle of the short point (the zero of hand layout's ordinates), degrees in [0, 360). */
  readonly shortPointAngleDeg: number;
  /** Where the square line through the long point lies on the template, y in mm. */
  readonly longLineYMm: number;
  /** +1 when the cutback runs up the template (y grows), −1 when it runs down (the far end of a piece cut at both ends). */
  readonly cutbackDirection: 1 | -1;
}

/** Where the cut's column sits on its template; see {@link measureCutDepth}. */
export interface CutDepthPlacement {
  readonly templateId: string;
  /** Default `cutback`. */
  readonly columnKey?: string;
  /** Default 0 (the template's square line). */
  readonly longLineYMm?: number;
  /** Default +1. */
  readonly cutbackDirection?: 1 | -1;
  /** Station angles where the cut has a kink (a grazing generator), radians; see `BranchGeometry.cutKinkPhisRad`. */
  readonly kinkPhisRad?: readonly number[];
}

/**
 * Locates the long point (largest axial position) and the short point
 * (smallest) of the cut of `bundle` against `host`: a scan every half degree,
 * then a golden-section search around each local extreme of the scan (an
 * extreme next to a kink given in `placement.kinkPhisRad` is the kink). The
 * full depth is their difference, so it is exact wherever the short point
 * falls, between stations or on one.
 *
 * @throws GirthError `NO_INTERSECTION` (field `stations`) when no generator
 *   meets the host (a solved joint never has this).
 * @example
 * measureCutDepth(geometry.cutBundle, geometry.cutHost, { templateId: 'branch-cut' }).fullDepthMm
 */
export function measureCutDepth(bundle: GeneratorBundle, host: HostSurface, placement: CutDepthPlacement): CutDepth {
  const { long, short } = locateCutExtremes(bundle, host, placement.kinkPhisRad);
  return {
    kind: 'cut-depth',
    templateId: placement.templateId,
    columnKey: placement.columnKey ?? 'cutback',
    fullDepthMm: Math.max(0, long.value - short.value),
    longPointAngleDeg: toDeg(long.phi),
    shortPointAngleDeg: toDeg(short.phi),
    longLineYMm: placement.longLineYMm ?? 0,
    cutbackDirection: placement.cutbackDirection ?? 1,
  };
}

/**
 * The long point (largest axial position, mm along the bundle's axis toward
 * the host) and the short point (smallest) of a cut, with their station
 * angles in radians. See {@link measureCutDepth}.
 * @param kinkPhisRad station angles of the cut's kinks, radians (default none).
 * @example locateCutExtremes(geometry.cutBundle, geometry.cutHost).short.phi // the short point's station angle, radians
 * @throws GirthError `NO_INTERSECTION` (field `stations`) when no generator meets the host.
 */
export function locateCutExtremes(
  bundle: GeneratorBundle,
  host: HostSurface,
  kinkPhisRad: readonly number[] = [],
): { readonly long: { readonly phi: number; readonly value: number }; readonly short: { readonly phi: number; readonly value: number } } {
  const axial = (phi: number): number | undefined => hitGenerator(bundle, host, phi)?.axialMm;
  const atKink = (found: { phi: number; value: number } | undefined): { phi: number; value: number } | undefined => {
    if (found === undefined) return undefined;
    for (const kink of kinkPhisRad) {
      const apart = Math.abs(((found.phi - kink) % TWO_PI + 3 * Math.PI) % TWO_PI - Math.PI);
      const value = apart <= KINK_BAND_RAD ? axial(kink) : undefined;
      if (value !== undefined) return { phi: kink, value };
    }
    return found;
  };
  const long = atKink(extreme(axial, 1));
  const short = atKink(extreme(axial, -1));
  if (long === undefined || short === undefined) {
    throw new GirthError('NO_INTERSECTION', 'stations', 'stations: the pipe wall misses the surface it is cut to meet; check the sizes and the offset');
  }
  return { long, short };
}

/** The largest (`sign` +1) or smallest (−1) axial position round the pipe, with its angle. */
function extreme(axial: (phi: number) => number | undefined, sign: 1 | -1): { phi: number; value: number } | undefined {
  const f = (phi: number): number => {
    const v = axial(phi);
    return v === undefined ? -Infinity : sign * v;
  };
  const step = TWO_PI / SCAN_STEPS;
  const scan = Array.from({ length: SCAN_STEPS }, (_, i) => f(i * step));
  let best: { phi: number; fx: number } | undefined;
  for (let i = 0; i < SCAN_STEPS; i++) {
    const here = scan[i]!;
    if (here === -Infinity) continue;
    const prev = scan[(i + SCAN_STEPS - 1) % SCAN_STEPS]!;
    const next = scan[(i + 1) % SCAN_STEPS]!;
    if (!(here >= prev && here >= next)) continue;
    const found = maximizeOnInterval(f, (i - 1) * step, (i + 1) * step, EXTREME_PHI_TOL_RAD);
    const candidate = found.fx >= here ? { phi: found.x, fx: found.fx } : { phi: i * step, fx: here };
    if (best === undefined || candidate.fx > best.fx) best = candidate;
  }
  return best === undefined ? undefined : { phi: best.phi, value: sign * best.fx };
}

function toDeg(phiRad: number): number {
  const deg = ((phiRad % TWO_PI) + TWO_PI) % TWO_PI;
  const d = (deg * 180) / Math.PI;
  return d >= 360 ? 0 : d;
}
