/**
 * A setup's fields as every screen labels them (the workspace, the garage forms, the shop
 * counter), the unit each is typed in and an example each accepts. Messages name a field by
 * this label, so what a person reads matches what they see.
 */

/** Setup fields by their path in a setup. */
export const SETUP_FIELD_LABEL = {
  tire: "Tire size",
  wheelDiameterIn: "Wheel diameter (in)",
  wheelWidthIn: "Wheel width (in)",
  "position.offsetMm": "Offset (mm)",
  "position.backspacingIn": "Backspacing (in)",
  "position.reference": "Measured to",
  "position.flangeIn": "Flange allowance (in)",
  spacerMm: "Spacer (mm, optional)",
} as const;
export type SetupFieldPath = keyof typeof SETUP_FIELD_LABEL;

/**
 * The form names of a setup's fields nested under `name`, for placing a server's field errors.
 *
 * @example
 * setupFieldNames("currentSetup")[0]; // "currentSetup.tire"
 */
export const setupFieldNames = (name: string): string[] => Object.keys(SETUP_FIELD_LABEL).map((path) => `${name}.${path}`);

/** Examples each setup field accepts (used in its messages and hints). */
export const SETUP_FIELD_EXAMPLE = {
  tire: "265/70R17",
  wheelDiameterIn: "17",
  wheelWidthIn: "9 or 8-1/2",
  "position.offsetMm": "-12 or 25 (minus for a wheel that sits further out)",
  "position.backspacingIn": "4-3/4, 4¾ or 4.75",
  "position.flangeIn": "1/2 or 0.5",
  spacerMm: "25 (leave empty for none)",
} as const;

/** The two ways a wheel's position is given, as the setup forms offer them. */
export const POSITION_MODE_LABEL = { offset: "Offset", backspacing: "Backspacing" } as const;

/** The words for each backspacing reference, as the screens and messages say them (inside a sentence). */
export const BACKSPACING_REFERENCE_LABEL = { flange: "flange edge", "bead-seat": "bead seat" } as const;
