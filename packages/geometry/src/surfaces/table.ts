/**
 * The table of host surfaces, keyed by kind. Adding a host kind: one file
 * exporting its data type and its `SurfaceOps`, and one line here.
 */
import { GirthError } from '@girth/pipes';
import { coneOps, type ConeSurface } from './cone.js';
import { cylinderOps, type CylinderSurface } from './cylinder.js';
import { planeOps, type PlaneSurface } from './plane.js';
import { ellipsoidalHeadOps, type EllipsoidalHeadSurface } from './ellipsoidal-head.js';
import { hemisphericalHeadOps, type HemisphericalHeadSurface } from './hemispherical-head.js';
import { torisphericalHeadOps, type TorisphericalHeadSurface } from './torispherical-head.js';
import { torusOps, type TorusSurface } from './torus.js';
import type { HostShape, SurfaceOps, SurfaceTable } from './types.js';

/**
 * A surface that a pipe end can be cut to meet: one of the kinds in
 * {@link SURFACES}.
 */
export type HostSurface =
  | CylinderSurface
  | PlaneSurface
  | ConeSurface
  | HemisphericalHeadSurface
  | EllipsoidalHeadSurface
  | TorisphericalHeadSurface
  | TorusSurface;

/** The kinds of {@link HostSurface}: `'cylinder' | 'plane' | 'cone'` and the dished heads `'hemispherical-head' | 'ellipsoidal-head' | 'torispherical-head'` and the elbow body `'torus'`. */
export type HostKind = HostSurface['kind'];

/**
 * Girth's host surfaces, keyed by kind; nothing else in the library switches
 * on a host's `kind`. To cut against a kind of your own, pass
 * `{ ...SURFACES, [kind]: ops }` as the `surfaces` option.
 * @example SURFACES.cylinder.normal(header, [0, 0, 100]) // [0, 0, 1]
 */
export const SURFACES: SurfaceTable<HostSurface> = {
  cylinder: cylinderOps,
  plane: planeOps,
  cone: coneOps,
  'hemispherical-head': hemisphericalHeadOps,
  'ellipsoidal-head': ellipsoidalHeadOps,
  'torispherical-head': torisphericalHeadOps,
  torus: torusOps,
};

/** The `surfaces` option: a table of surface operations covering the kinds of `S`. */
export interface SurfaceTableOption<S extends HostShape> {
  /** The table to look hosts up in; {@link SURFACES} when left out. */
  readonly surfaces?: SurfaceTable<S>;
}

/**
 * The operations for `surface`, looked up by its kind in `surfaces`
 * ({@link SURFACES} by default).
 * @throws GirthError `BAD_OPTION` (field `host`) when the table has no entry for the kind.
 * @example surfaceOpsFor(header).normal(header, point)
 */
export function surfaceOpsFor<S extends HostShape>(surface: S, surfaces?: SurfaceTable<S>): SurfaceOps<S> {
  const table = (surfaces ?? SURFACES) as unknown as Readonly<Record<string, SurfaceOps<S> | undefined>>;
  const ops = Object.prototype.hasOwnProperty.call(table, surface.kind) ? table[surface.kind] : undefined;
  if (ops === undefined) {
    throw new GirthError('BAD_OPTION', 'host', `host: no surface of kind '${surface.kind}' is known; pass its operations in the surfaces table`, surface.kind);
  }
  return ops;
}
