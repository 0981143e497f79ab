/**
 * Limits of plane cuts, each with its physical meaning.
 */

/**
 * Plane cuts at fewer degrees than this between the pipe axis and the plane get
 * a warning: the cut runs out into a feather edge more than 3.7 diameters long
 * (cot 15° = 3.73), which is hard to cut, fit and weld.
 */
export const SHALLOW_PLANE_CUT_WARN_DEG = 15;
