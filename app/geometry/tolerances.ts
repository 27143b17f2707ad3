/**
 * Every numerical tolerance of the engine, in one place so that changing one is a reviewed decision.
 * Relative tolerances are fractions of the value compared; angular ones are radians.
 */

/** Forward check of a solved curve against a given length: |computed − given| ≤ this · |given|. */
export const VERIFY_LENGTH_REL = 1e-9;

/** Forward check of a solved curve against a given angle, radians. */
export const VERIFY_ANGLE_RAD = 1e-10;

/** Newton/Levenberg–Marquardt stops when every scaled residual is below this. */
export const SOLVER_RESIDUAL_TOL = 1e-14;

/** Two solver roots closer than this (relative in radii, radians in angles) are the same root. */
export const ROOT_DEDUP_REL = 1e-7;

/** A deflection smaller than this (radians) at a PI counts as zero: no curve can be fitted. */
export const ZERO_DEFLECTION_RAD = 1e-9;

/** Relative slack when checking that tangent lengths fit on a leg (round-off, not design slack). */
export const TANGENT_FIT_REL = 1e-9;

/** Points closer than this fraction of the alignment's size are the same point. */
export const SAME_POINT_REL = 1e-9;

/** Default sagitta (chord-to-arc distance) when densifying, metres: 1 cm, common practice. */
export const DEFAULT_CHORD_TOLERANCE_M = 0.01;

/** Slack when comparing a design value with its limit, so that exactly-at-limit passes. */
export const CHECK_LIMIT_REL = 1e-9;

/** Relative singular-value threshold used when counting independent knowns. */
export const RANK_REL_TOL = 1e-7;
