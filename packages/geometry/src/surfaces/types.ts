/**
 * The operations every host surface provides, and the table that gathers them
 * by kind. A host kind is one file (`cylinder.ts`, `plane.ts`, `cone.ts`)
 * exporting its data type and its {@link SurfaceOps}; `table.ts` gathers them.
 */
import type { GeneratorBundle, Line3 } from '../types.js';
import type { Vec3 } from '../vec3.js';

/** What every host surface's data has: a `kind` tag naming its entry in a {@link SurfaceTable}. */
export interface HostShape {
  readonly kind: string;
}

/** One place where a line meets a surface. */
export interface LineRoot {
  /** The line parameter, mm along the line's unit direction from its origin. */
  readonly tMm: number;
  /**
   * True when the line only touches the surface here (a root of even
   * multiplicity, within the tangency tolerance): a generator that grazes the
   * host, which is a kink of the cut.
   */
  readonly tangent: boolean;
}

/** A point on the flat, mm: `[u, v]`, as a surface's `develop` lays it out. */
export type FlatPoint = readonly [number, number];

/**
 * The operations of one host kind `S`. Pure functions of plain data; each
 * surface file exports one of these, and {@link SURFACES} gathers them.
 *
 * The "outside" of a host is the side the cut pipe comes from; normals point
 * to it and a positive offset moves the surface toward it.
 *
 * @example
 * const roots = cylinderOps.intersectLine(header, line, TANGENCY_REL_EPS); // all roots, ascending
 */
export interface SurfaceOps<S extends HostShape> {
  /**
   * Every parameter at which `line` meets `surface`, ascending. A root where
   * the line only touches the surface is listed once with `tangent: true`; a
   * line that misses gives an empty array. Works for any degree of surface
   * (a torus has up to four roots).
   *
   * @param eps relative tangency tolerance; each surface states what it is
   *   relative to (see `TANGENCY_REL_EPS`).
   */
  readonly intersectLine: (surface: S, line: Line3, eps: number) => readonly LineRoot[];
  /**
   * The surface moved by `distanceMm` along its outward normal (negative moves
   * it inward): OD to ID, or the surface a root gap away.
   * @throws GirthError `OUT_OF_RANGE` (field `gap`) when no surface is left.
   */
  readonly offset: (surface: S, distanceMm: number) => S;
  /** The outward unit normal at `point`, a point on the surface (mm). */
  readonly normal: (surface: S, point: Vec3) => Vec3;
  /**
   * For a developable surface: where `point` (on the surface, mm) lands when
   * the surface is rolled out flat, keeping lengths along the surface. Each
   * surface states its flat frame. Absent for surfaces that do not develop.
   */
  readonly develop?: (surface: S, point: Vec3) => FlatPoint;
  /** The inverse of `develop`: the point on the surface (mm) that lands at `flat`. */
  readonly undevelop?: (surface: S, flat: FlatPoint) => Vec3;
  /**
   * Optional closed form of `findGrazingPhis` for this kind: the station
   * angles (radians in [0, 2π), ascending) at which a generator of `bundle`
   * touches `surface`. When absent, grazes are found by a numeric search on
   * the other operations.
   */
  readonly grazingPhisRad?: (surface: S, bundle: GeneratorBundle) => readonly number[];
}

/**
 * A table of surface operations keyed by kind: one entry for each kind of
 * `S`. {@link SURFACES} is the table of Girth's own kinds; a caller may pass a
 * larger one (`{ ...SURFACES, myKind: myOps }`) through the `surfaces` option
 * of `hitGenerator`, `sampleCut` and the functions in `surfaces/`.
 */
export type SurfaceTable<S extends HostShape> = {
  readonly [K in S['kind']]: SurfaceOps<Extract<S, { readonly kind: K }>>;
};
