/**
 * The one path every template takes: a cut pipe is a bundle of generator lines,
 * and each generator is cut where it first meets the host surface.
 */
import { addScaled, type Vec3 } from './vec3.js';
import { intersectLine } from './surfaces/line-intersection.js';
import type { GeneratorBundle, HostSurface, Line3 } from './types.js';

/**
 * The generator line of `bundle` at station angle `phiRad` (0 at the heel,
 * increasing toward `sideDirection`). Its parameter `t` is the axial position
 * in mm, growing toward the host.
 * @example generatorLine(bundle, Math.PI) // the toe generator
 */
export function generatorLine(bundle: GeneratorBundle, phiRad: number): Line3 {
  const c = Math.cos(phiRad) * bundle.radius;
  const s = Math.sin(phiRad) * bundle.radius;
  const origin: Vec3 = addScaled(addScaled(bundle.axisPoint, bundle.heelDirection, c), bundle.sideDirection, s);
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
  /** True when the generator only grazes the host (a double root): a kink of the cut. */
  readonly grazing: boolean;
}

/**
 * The first point where the generator at `phiRad`, coming from the pipe's body,
 * meets `host`; `undefined` when it misses the host altogether.
 * @example hitGenerator(bundle, header, 0)?.axialMm
 */
export function hitGenerator(
  bundle: GeneratorBundle,
  host: HostSurface,
  phiRad: number,
  options: { readonly eps?: number } = {},
): GeneratorHit | undefined {
  const line = generatorLine(bundle, phiRad);
  const roots = intersectLine(host, line, options);
  const t = roots[0];
  if (t === undefined) return undefined;
  return {
    phiRad,
    axialMm: t,
    point: addScaled(line.origin, line.direction, t),
    grazing: roots.length === 2 && roots[0] === roots[1],
  };
}
