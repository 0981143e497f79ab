/**
 * Limits and constants of weld preparation, each with its meaning and source.
 */

/**
 * AWS D1.1, tubular T-, Y- and K-connections (recalled; check the edition in
 * force): the prequalified complete-joint-penetration groove details cover
 * local dihedral angles down to 30° without added limits; a smaller angle
 * (the toe of a shallow lateral) needs the detail's extra conditions or a
 * qualified procedure. Degrees.
 */
export const AWS_D1_1_PREQUALIFIED_MIN_DIHEDRAL_DEG = 30;

/**
 * AWS D1.1 (recalled): the prequalified tubular groove details reach up to a
 * local dihedral angle of 180°, where the surfaces are flush. Degrees.
 */
export const AWS_D1_1_PREQUALIFIED_MAX_DIHEDRAL_DEG = 180;

/**
 * A branch whose local dihedral angle reaches this many degrees somewhere
 * (the sides of a near-equal tee) is, there, close to a tangent joint: the
 * branch wall runs along the header surface and the groove turns into a flare
 * whose root cannot be reached by a torch angle alone. Girth's own threshold
 * (common practice calls such a joint a flare or tangent joint), degrees.
 */
export const TANGENT_JOINT_WARN_DIHEDRAL_DEG = 165;

/**
 * ASME B16.25 weld-end bevel for walls over 3 mm up to 22 mm (REFERENCES.md,
 * recalled): a single bevel of 37.5° from the plane square to the pipe axis.
 */
export const B16_25_BEVEL_DEG = 37.5;
/** ASME B16.25 tolerance on the bevel angle, ± degrees (REFERENCES.md, recalled). */
export const B16_25_BEVEL_TOL_DEG = 2.5;
/** ASME B16.25 root face (land), 1/16 in, mm (REFERENCES.md, recalled). */
export const B16_25_LAND_MM = 25.4 / 16;
/** ASME B16.25 tolerance on the root face, ± 1/32 in, mm (REFERENCES.md, recalled). */
export const B16_25_LAND_TOL_MM = 25.4 / 32;
/** ASME B16.25: walls up to this thickness are cut square (or slightly chamfered) instead of beveled, mm (REFERENCES.md, recalled). */
export const B16_25_SQUARE_MAX_WALL_MM = 3;
/** ASME B16.25: the single 37.5° bevel serves walls up to this thickness; thicker walls get a compound bevel, mm (REFERENCES.md, recalled). */
export const B16_25_SINGLE_BEVEL_MAX_WALL_MM = 22;
/** ASME B16.25 compound bevel for walls over 22 mm (recalled): the 37.5° bevel runs this far up from the inside surface, mm (3/4 in). */
export const B16_25_COMPOUND_BREAK_MM = 19;
/** ASME B16.25 compound bevel for walls over 22 mm (recalled): above the break the bevel is this steep, degrees from the plane square to the axis. */
export const B16_25_COMPOUND_UPPER_DEG = 10;
