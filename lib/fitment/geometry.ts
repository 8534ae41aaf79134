/**
 * Geometry of a tire on a wheel, measured from the hub mounting face (mm, + = inboard for the
 * swing and bead-seat distances as named).
 *
 * - effective offset = offset − spacer thickness (a spacer of t mm moves the wheel t mm outboard);
 * - inner swing = effective offset + section/2 (how far the tire reaches inboard of the face);
 * - outer swing = section/2 − effective offset (how far it reaches outboard);
 *   so inner + outer = section and inner − outer = 2 × effective offset;
 * - bead seat inboard = W/2 + effective offset, bead seat outboard = W/2 − effective offset.
 * The section width is taken on the actual rim (UN R30 §6.1.1.1, K = 0.4; see dimensions.ts).
 */
import { FitmentInputError, requireNumber } from "./errors";
import { RIM_WIDTH_TOLERANCE_IN, SECTION_WIDTH_K, measuringRimWidthIn } from "./dimensions";
import { checkOffsetMm, checkWheelWidthIn } from "./offset";
import { type TireSize, toTireSize } from "./tireSize";
import { MM_PER_IN, MM_PER_MILE } from "./units";

/** A wheel: nominal diameter and width (inches), offset (mm). */
export interface Wheel {
  diameterIn: number;
  widthIn: number;
  offsetMm: number;
}

/** A tire on a wheel, optionally with a hub spacer. */
export interface SetupInput {
  tire: string | TireSize;
  wheel: Wheel;
  /** Hub spacer thickness, mm (0–100). */
  spacerMm?: number;
}

/** Result of {@link setupGeometry}; distances in mm from the hub mounting face. */
export interface SetupGeometry {
  tire: TireSize;
  wheel: Wheel;
  spacerMm: number;
  /** Section width on this rim (K = 0.4 rule). */
  sectionWidthMm: number;
  overallDiameterMm: number;
  overallRadiusMm: number;
  sidewallMm: number;
  circumferenceMm: number;
  revsPerMile: number;
  rimWidthMm: number;
  effectiveOffsetMm: number;
  /** Tire reach inboard of the mounting face. */
  innerSwingMm: number;
  /** Tire reach outboard of the mounting face. */
  outerSwingMm: number;
  /** Inboard bead seat, inboard of the mounting face (= backspacing to the bead seat). */
  beadSeatInboardMm: number;
  /** Outboard bead seat, outboard of the mounting face. */
  beadSeatOutboardMm: number;
  /** Backspacing measured to the bead seat, inches (spacer included). */
  backspacingIn: number;
  /** Wheel/tire centreline outboard of the mounting face (= −effective offset). */
  centrelineOutboardMm: number;
  measuringRimWidthIn: number;
  rimWidthMinIn: number;
  rimWidthMaxIn: number;
  /** Rim width within the range suited to the section width. */
  rimWidthSuitable: boolean;
}

/** Accepted wheel diameters, inches. */
export const WHEEL_DIAMETER_LIMITS_IN = { min: 8, max: 30 } as const;
/** Accepted spacer thickness, mm. */
export const SPACER_LIMITS_MM = { min: 0, max: 100 } as const;

/**
 * Geometry of a tire on a wheel (all distances from the hub mounting face).
 *
 * @example
 * const g = setupGeometry({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } });
 * g.innerSwingMm; // 157.5
 * g.outerSwingMm; // 107.5
 */
export function setupGeometry(input: SetupInput): SetupGeometry {
  if (input === null || typeof input !== "object") {
    throw new FitmentInputError(
      "setup",
      'setup must be an object like { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } }',
      input,
    );
  }
  const tire = toTireSize(input.tire);
  const wheel = input.wheel;
  if (wheel === null || typeof wheel !== "object") {
    throw new FitmentInputError("wheel", "wheel must be an object like { diameterIn: 17, widthIn: 8, offsetMm: 25 }", wheel);
  }
  const diameterIn = requireNumber(
    "wheel.diameterIn",
    wheel.diameterIn,
    WHEEL_DIAMETER_LIMITS_IN.min,
    WHEEL_DIAMETER_LIMITS_IN.max,
    "17",
    "in",
  );
  const widthIn = checkWheelWidthIn(wheel.widthIn, "wheel.widthIn");
  const offsetMm = checkOffsetMm(wheel.offsetMm, widthIn, "wheel.offsetMm");
  const spacerMm =
    input.spacerMm === undefined ? 0 : requireNumber("spacerMm", input.spacerMm, SPACER_LIMITS_MM.min, SPACER_LIMITS_MM.max, "25", "mm");
  if (diameterIn !== tire.rimDiameterIn) {
    throw new FitmentInputError(
      "wheel.diameterIn",
      `wheel.diameterIn ${diameterIn} in does not match the rim diameter ${tire.rimDiameterIn} in of ${tire.text} (e.g. a ${tire.rimDiameterIn} in wheel)`,
      diameterIn,
    );
  }
  const measuring = measuringRimWidthIn(tire);
  const section = tire.sectionWidthMm + SECTION_WIDTH_K * (widthIn - measuring) * MM_PER_IN;
  const rimWidthMm = widthIn * MM_PER_IN;
  const eff = offsetMm - spacerMm;
  const half = section / 2;
  const circumference = Math.PI * tire.overallDiameterMm;
  const minRim = measuring - RIM_WIDTH_TOLERANCE_IN;
  const maxRim = measuring + RIM_WIDTH_TOLERANCE_IN;
  return {
    tire,
    wheel,
    spacerMm,
    sectionWidthMm: section,
    overallDiameterMm: tire.overallDiameterMm,
    overallRadiusMm: tire.overallDiameterMm / 2,
    sidewallMm: tire.sidewallMm,
    circumferenceMm: circumference,
    revsPerMile: MM_PER_MILE / circumference,
    rimWidthMm,
    effectiveOffsetMm: eff,
    innerSwingMm: eff + half,
    outerSwingMm: half - eff,
    beadSeatInboardMm: rimWidthMm / 2 + eff,
    beadSeatOutboardMm: rimWidthMm / 2 - eff,
    backspacingIn: (rimWidthMm / 2 + eff) / MM_PER_IN,
    centrelineOutboardMm: eff === 0 ? 0 : -eff,
    measuringRimWidthIn: measuring,
    rimWidthMinIn: minRim,
    rimWidthMaxIn: maxRim,
    rimWidthSuitable: widthIn >= minRim && widthIn <= maxRim,
  };
}
