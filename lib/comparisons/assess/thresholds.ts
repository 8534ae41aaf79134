/**
 * Every threshold a change of setup is judged by, each defined here once with its source. The
 * workspace, the shop counter and the install checklist read findings (assessChange.ts), never
 * these numbers, so a threshold moves in one place for all of them.
 *
 * Not here because they are defined once elsewhere: the rim-width band around the measuring rim
 * (RIM_WIDTH_TOLERANCE_IN, lib/fitment/dimensions.ts), the clearance margin (the vehicle's own
 * figure; its default DEFAULT_CLEARANCE_MARGIN_MM, lib/fitment/clearance.ts) and the centre-bore
 * match (BORE_MATCH_TOLERANCE_MM, lib/shop/quotes/hubFit.ts). Zero (a tire past the fender line
 * the user measured, any reach further inboard, any spacer) is a boundary, not a chosen figure.
 */

/** Actual speed off the indicated one by more than this: recalibrate, percent (common practice, no source). */
export const SPEEDO_WARN_PCT = 3;

/** Scrub radius growing by more than this: heavier steering and more kickback, mm = 1 in (common practice, no source). */
export const SCRUB_WARN_MM = 25.4;

/**
 * Gap between the axle ratio that restores today's engine speeds and the axle ratio, from which a
 * regear is advised (when a different common ratio is nearer), percent (common practice, no source).
 */
export const REGEAR_WARN_PCT = 5;

/** Tire reaching more than this further outboard than the current one: check fender clearance, mm (common practice, no source). */
export const OUTER_REACH_WARN_MM = 25;

/** Tire reaching more than this further inboard: a caution, not only a note, mm (common practice, no source). */
export const INNER_REACH_WARN_MM = 10;

/** Overall diameter changing by more than this: a lift or levelling is usually involved, mm ≈ 2 in (common practice, no source). */
export const DIAMETER_CHANGE_WARN_MM = 50;

/** Overall diameter changing by this much or more calls for a wheel alignment, mm = 1 in (common practice, no source). */
export const ALIGNMENT_DIAMETER_MM = 25.4;

/** The wheel plane moving this much or more per side calls for a wheel alignment, mm = 1/2 in (common practice, no source). */
export const ALIGNMENT_SHIFT_MM = 12.7;
