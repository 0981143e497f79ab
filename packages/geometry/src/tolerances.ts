/**
 * Named tolerances, each with its physical meaning. Functions that compare
 * floats take an `eps` option defaulting to one of these; nothing is global or
 * mutable.
 */
import { JOINT_ANGLE_DEG } from '@girth/pipes';


/**
 * Relative tolerance for deciding that a quadratic's discriminant is zero,
 * i.e. that a generator line just grazes a surface (tangent). Relative to the
 * square of the surface's size. 1e-12 of R² is a graze within about 1e-6 R.
 */
export const TANGENCY_REL_EPS = 1e-12;

/** Default chord tolerance for sampled contours, mm: the largest distance between the true curve and a straight segment of the drawing. */
export const DEFAULT_CHORD_TOLERANCE_MM = 0.05;

/** Angles below this many degrees between a branch and its header get a warning: the crotch becomes a long feather edge that is hard to fit and weld. */
export const SHALLOW_LATERAL_WARN_DEG = 15;

/**
 * The shallowest angle, degrees, between a cut pipe's axis and what it meets
 * (a lateral's header, a cut-back's plane) that Girth lays out. At 1° the cut
 * already runs out about 57 diameters along the pipe (cot 1°); below it the
 * numbers stop meaning anything a shop can cut, and toward 0 they overflow.
 * The bound itself lives in `@girth/pipes` (`JOINT_ANGLE_DEG`), shared with the command line.
 */
export const MIN_JOINT_ANGLE_DEG = JOINT_ANGLE_DEG.min;

/** Geometry closer than this (mm) is treated as touching; 1 nm, far below any shop measurement. */
export const LENGTH_EPS_MM = 1e-6;
