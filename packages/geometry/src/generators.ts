/**
 * The one path every template takes: a cut pipe is a bundle of generator lines,
 * and each generator is cut where it first meets the host surface.
 */
import { addScaled, type Vec3 } from './vec3.js';
import { lineRoots, type LineSurfaceOptions } from './surfaces/line-intersection.js';
import type { HostSurface } from './surfaces/table.js';
import type { HostShape } from './surfaces/types.js';
import type { GeneratorBundle, Line3 } from './types.js';

/**
 * The generator line of `bundle` at station angle `phiRad` (0 at the heel,
 * increasing toward `sideDirection`). Its parameter `t` is the axial position
 * in mm, growing toward the host.
 * @example generatorLine(bundle, Math.PI) // the toe generator
 */
export function generatorLine(bundle: GeneratorBundle, phiRad: number): Line3 {
  const c = Math.cos(phiRad) * bundle.radius;
  const s = Math.sin(phiRad) * bundle.radius;
  // axisPoint + c · heel + s · side, added in that order (this runs for every generator sampled).
  const p = bundle.axisPoint;
  const h = bundle.heelDirection;
  const q = bundle.sideDirection;
  const origin: Vec3 = [p[0] + h[0] * c + q[0] * s, p[1] + h[1] * c + q[1] * s, p[2] + h[2] * c + q[2] * s];
  return { origin, direction: bundle.axisDirection };
}

/** Where one generator meets the host. */
export interface GeneratorHit {
  /** Station angle, radians. */
  readonly phiRad: number;
  /** Axial position of the hit along the generator, mm (grows toward the host). */
  readonly axialMm: number;
  /** The hit point in 3D, mm. */
  readonly point: Vec3;
  /** True when the generator only touches the host here (its first root is flagged tangent by the host's `intersectLine`): a kink of the cut. */
  readonly grazing: boolean;
}

/**
 * The first point where the generator at `phiRad`, coming from the pipe's body,
 * meets `host`; `undefined` when it misses the host altogether.
 *
 * The host's operations are looked up by its `kind` in `options.surfaces`
 * (`SURFACES` by default); pass a larger table to cut against a kind of your
 * own: `hitGenerator(bundle, myHost, phi, { surfaces: { ...SURFACES, mine: myOps } })`.
 *
 * @param options.eps relative tangency tolerance (`TANGENCY_REL_EPS` by default).
 * @throws GirthError `BAD_OPTION` (field `host`) for a kind missing from the table.
 * @example hitGenerator(bundle, header, 0)?.axialMm
 */
export function hitGenerator<S extends HostShape = HostSurface>(
  bundle: GeneratorBundle,
  host: S,
  phiRad: number,
  options: LineSurfaceOptions<S> = {},
): GeneratorHit | undefined {
  const line = generatorLine(bundle, phiRad);
  const first = lineRoots(host, line, options)[0];
  if (first === undefined) return undefined;
  return {
    phiRad,
    axialMm: first.tMm,
    point: addScaled(line.origin, line.direction, first.tMm),
    grazing: first.tangent,
  };
}
