/**
 * Limits of miter elbows, each with its meaning.
 */
import { MITER_WELDS } from '@girth/pipes';

/** Most welds a miter elbow may have; past this the pieces get shorter than anyone cuts. */
export const MAX_MITER_WELDS = MITER_WELDS.max;

/**
 * ASME B31.3 para. 304.2.3: for multiple miters the cut angle (the change of
 * direction at a joint divided by two) is at most 22.5°. Degrees.
 */
export const B31_3_MULTIPLE_MITER_MAX_CUT_DEG = 22.5;

/** Slack when comparing a cut angle with a code limit, degrees: far below any protractor. */
export const CUT_ANGLE_EPS_DEG = 1e-9;

/**
 * Largest centreline radius of a miter elbow, mm (1 km). Real segmented bends
 * stay within tens of metres; the bound turns an absurd or overflowing radius
 * into a typed error instead of numbers no shop can use.
 */
export const MAX_MITER_RADIUS_MM = 1e6;
