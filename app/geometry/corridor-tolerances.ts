/**
 * Tolerances of the corridor and take overlay, kept together so that changing one is a reviewed
 * decision. They live beside the corridor code rather than in `tolerances.ts` because this part of
 * the engine was written as one unit; the two files are the engine's complete list. Lengths are in
 * the alignment's working unit (in feet they are therefore a little stricter than in metres).
 */

/** Largest distance allowed between a tapered slice's fitted circle and the true spiral edge: 0.5 mm. */
export const SPIRAL_FIT_TOLERANCE = 0.0005;

/** Sagitta of the arcs of the local corridor polygon used to count remainder pieces: 0.5 mm. */
export const REMAINDER_CHORD_TOLERANCE = 0.0005;

/**
 * Sagitta of the chorded pieces on which ground the right-of-way covers twice (a leg crossing or
 * closing in on an earlier one) is measured, to be taken once: 0.5 mm. Each chord's segment is
 * put back, so this bounds only the error of chords cut short where lines cross an arc.
 */
export const OVERLAP_CHORD_TOLERANCE = 0.0005;

/** Default sagitta of display outlines and take polygons: 1 cm (common practice, as `DEFAULT_CHORD_TOLERANCE_M`). */
export const DISPLAY_CHORD_TOLERANCE = 0.01;

/** An intersection smaller than this (square units) is a touch, not a take. */
export const TAKE_MIN_AREA = 1e-6;

/** A remainder piece smaller than this (square units) is a sliver of round-off or digitising and is dropped. */
export const SLIVER_AREA = 0.01;

/** A building is hit when its footprint overlaps the right-of-way by more than this (square units). */
export const BUILDING_HIT_AREA = 0.01;

/** Σ takes may exceed the corridor area by this much (square units) before parcels are said to overlap. */
export const OVERLAP_WARNING_AREA = 0.01;

/** Two elements meeting at an angle larger than this (radians) next to a curve cannot be cut radially. */
export const JOINT_ANGLE_RAD = 1e-8;

/** Default length of corridor pieces, in corridor widths (wL + wR): short pieces keep bounding-box candidates few. */
export const PIECE_LENGTH_IN_WIDTHS = 2;

/** …but never shorter than this (units), so a narrow corridor is not cut into hundreds of pieces. */
export const MIN_PIECE_LENGTH = 50;

/** Largest central angle of one annular slice: 90°, so a triangle from the centre can contain it. */
export const MAX_SLICE_RAD = Math.PI / 2;
