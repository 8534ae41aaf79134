/**
 * A setup: the tire, the wheel, where the wheel sits on the hub (an offset, or a backspacing with
 * the point it was measured to and the flange allowance) and a spacer. The workspace, the garage
 * and the shop counter all describe a vehicle's wheels this way, store it this way and hand it to
 * the engine through `toEngineSetup`.
 *
 * Plain TypeScript with the engine as its only dependency, so the browser can use it without zod.
 * Units follow the engine (lib/fitment/README.md): mm inside, inches where the trade designates
 * in inches (wheel diameter and width, backspacing, flange allowance).
 */
import { type BackspacingReference, FLANGE_ALLOWANCE_LIMITS_IN, checkOffsetMm, offsetFromBackspacing } from "@/lib/fitment/offset";
import { RIM_WIDTH_LIMITS_IN } from "@/lib/fitment/dimensions";
import { SPACER_LIMITS_MM, type SetupInput, WHEEL_DIAMETER_LIMITS_IN } from "@/lib/fitment/geometry";

export type { BackspacingReference };

/** The points a backspacing is measured to, in the engine's spelling (also the stored one). */
export const BACKSPACING_REFERENCES = ["flange", "bead-seat"] as const satisfies readonly BackspacingReference[];

/** Where the wheel sits: its offset, or its backspacing with what it was measured to. */
export type Position =
  { mode: "offset"; offsetMm: number } | { mode: "backspacing"; backspacingIn: number; reference: BackspacingReference; flangeIn: number };

export interface Setup {
  /** The size as written on the sidewall, e.g. "265/70R17 113T". */
  tire: string;
  wheelDiameterIn: number;
  wheelWidthIn: number;
  position: Position;
  /** 0 when no spacer is fitted. */
  spacerMm: number;
}

/**
 * A setup as a form holds it: text in every length (or numbers from an API caller). The
 * position carries the fields of both modes so switching mode keeps what was typed; only those
 * of the chosen mode are read.
 */
export interface SetupForm {
  tire: string;
  wheelDiameterIn: string | number;
  wheelWidthIn: string | number;
  position: {
    mode: "offset" | "backspacing";
    offsetMm?: string | number;
    backspacingIn?: string | number;
    reference?: BackspacingReference;
    flangeIn?: string | number;
  };
  /** Empty: no spacer. */
  spacerMm?: string | number | null;
}

/**
 * Bounds of every number of a setup. Diameter, width, flange allowance and spacer are the
 * engine's; offset and backspacing are narrowed here from what the engine computes with to
 * what a wheel sold for a truck can have (common practice, no source): the engine bounds an
 * offset by the wheel's width and accepts −10 to 30 in of backspacing.
 */
export const SETUP_LIMITS = {
  wheelDiameterIn: WHEEL_DIAMETER_LIMITS_IN,
  wheelWidthIn: RIM_WIDTH_LIMITS_IN,
  offsetMm: { min: -200, max: 200 },
  backspacingIn: { min: 0, max: 20 },
  flangeIn: FLANGE_ALLOWANCE_LIMITS_IN,
  spacerMm: SPACER_LIMITS_MM,
} as const;

/** Longest tire size text kept (a designation with load index, speed symbol and load range fits easily). */
export const TIRE_TEXT_MAX = 80;

/**
 * The offset (mm) a position stands for, through the engine (backspacing → offset with its
 * reference and flange allowance); throws FitmentInputError when the mounting face would sit
 * outside the wheel.
 *
 * @example
 * positionOffsetMm({ mode: "backspacing", backspacingIn: 3.5, reference: "bead-seat", flangeIn: 0.5 }, 9.5); // -31.75
 */
export function positionOffsetMm(position: Position, wheelWidthIn: number): number {
  if (position.mode === "offset") return checkOffsetMm(position.offsetMm, wheelWidthIn, "offsetMm");
  return offsetFromBackspacing({
    widthIn: wheelWidthIn,
    backspacingIn: position.backspacingIn,
    measuredFrom: position.reference,
    flangeIn: position.flangeIn,
  });
}

/**
 * The engine's input for a valid setup (the position turned into an offset).
 *
 * @example
 * toEngineSetup({ tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 });
 * // { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 }, spacerMm: 0 }
 */
export function toEngineSetup(s: Setup): SetupInput {
  return {
    tire: s.tire,
    wheel: { diameterIn: s.wheelDiameterIn, widthIn: s.wheelWidthIn, offsetMm: positionOffsetMm(s.position, s.wheelWidthIn) },
    spacerMm: s.spacerMm,
  };
}
