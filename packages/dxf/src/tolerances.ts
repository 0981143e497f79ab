/**
 * Named tolerances and limits of the DXF exporter, each with its physical
 * meaning. Functions that compare points take an `eps` option defaulting to
 * one of these; nothing here is mutable.
 */

/**
 * Two path ends closer than this (mm) are the same point: consecutive cut
 * pieces that meet are joined into one polyline, and a chain whose end meets
 * its start is written closed. 1e-4 mm (0.1 µm) is far below any kerf or
 * shop measurement and far above float noise of trigonometry on pipe sizes.
 */
export const JOIN_EPS_MM = 1e-4;

/**
 * Decimal places written for coordinates, radii and text heights, in the
 * output unit. Six places are 1 nm in mm or 25 nm in inches; rounding there
 * only removes float noise and keeps numbers out of exponent notation, which
 * some older cutting-table readers do not accept.
 */
export const COORD_DECIMALS = 6;

/** Decimal places for arc angles in degrees (1e-9° is 2e-7 mm on a 10 m radius). */
export const ANGLE_DECIMALS = 9;

/**
 * Decimal places for polyline bulges (tan of a quarter of the arc sweep, no
 * unit). 1e-10 keeps the arc's sagitta exact to well under 1e-6 mm for any
 * radius a template can have.
 */
export const BULGE_DECIMALS = 10;

/**
 * Largest coordinate magnitude accepted, mm. One kilometre: no pipe template
 * comes near it, and past it a number is a units mistake, not a layout.
 */
export const MAX_COORD_MM = 1_000_000;

/** Longest text written in one TEXT entity (characters); R12 readers stop at 255. */
export const MAX_TEXT_CHARS = 250;

/**
 * Default largest distance of a fitted arc from the exact cut, mm: the
 * templates' own chord tolerance (0.05 mm), so fitting arcs loses nothing the
 * chords kept.
 */
export const ARC_TOLERANCE_MM = 0.05;

/**
 * Share of the arc tolerance a fitted arc may use against the samples and the
 * curve points estimated between them; the rest covers the estimate's own
 * error. 0.8: checked against the independent oracle (test/acceptance/arc-fit-oracle).
 */
export const ARC_SAMPLE_SHARE = 0.8;
