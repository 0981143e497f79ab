/**
 * Plain data of a pipe end cut to meet a plane. Lengths in mm, angles in
 * degrees where a name says `Deg`.
 */
import type { GirthWarning } from '@girth/pipes';
import type { Vec3 } from '../vec3.js';
import type { GeneratorBundle, PlaneSurface } from '../types.js';
import type { CutFitSurface } from './fit-surface.js';
import type { PipeSection, ResolvedPipeSection } from '../pipe-section.js';

/** A pipe end cut to meet a plane (a cut-back to a flat surface). */
export interface PlaneCutSpec {
  readonly pipe: PipeSection;
  /** Angle between the pipe axis and the plane, degrees, from 1 (MIN_JOINT_ANGLE_DEG) to 90; 90 is a square cut. */
  readonly angleDeg: number;
  /** Root gap left between the pipe end and the plane, measured square to the plane, mm, ≥ 0 (default 0). */
  readonly gapMm?: number;
  /** Which pipe surface meets the plane (default `od`), see {@link CutFitSurface}. */
  readonly fitSurface?: CutFitSurface;
}

/**
 * The 3D set-up of a plane cut. The pipe axis runs along +x toward the plane,
 * which it crosses at the origin; the heel (phi = 0, the shortest generator)
 * is toward +z and phi grows toward +y.
 */
export interface PlaneCutGeometry {
  readonly kind: 'plane-cut-geometry';
  readonly pipe: ResolvedPipeSection;
  readonly angleDeg: number;
  /** How far the cut leans from square: 90 − angleDeg, degrees. */
  readonly cutAngleDeg: number;
  readonly gapMm: number;
  readonly fitSurface: CutFitSurface;
  /** Radius of the generators that meet the plane, mm. */
  readonly fitRadiusMm: number;
  /** The cut pipe's generator lines. */
  readonly bundle: GeneratorBundle;
  /** The plane itself (through the origin); its normal points back toward the pipe. */
  readonly plane: PlaneSurface;
  /** The surface the generators are cut to: the plane moved toward the pipe by the gap. */
  readonly host: PlaneSurface;
  /** Where the pipe axis meets the plane, mm. */
  readonly axisOnPlane: Vec3;
  /** How far the gap moves the cut back along the axis: gap / sin(angle), mm. */
  readonly gapSetbackMm: number;
  readonly warnings: readonly GirthWarning[];
}
