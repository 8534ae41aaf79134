/**
 * The comparison input: a current and a planned setup (tire, wheel, positioning, spacer) and the
 * vehicle figures the comparison needs. Shared by the workspace, the URL codec, saved
 * comparisons (validated JSONB) and their route handlers.
 *
 * Units follow the engine (lib/fitment/README.md): mm inside, inches where the trade designates
 * in inches (wheel diameter and width, backspacing, flange allowance), speeds in mph.
 *
 * Besides the per-field bounds, the schema asks the engine about what only the engine knows
 * (the tire size designation, the wheel diameter matching the tire's rim diameter, an offset or
 * backspacing that puts the mounting face inside the wheel), so an input that passes the schema
 * never makes `computeComparison` throw.
 */
import { z } from "zod";
import {
  DEFAULT_AXLE_RATIO,
  DEFAULT_FLANGE_IN,
  DEFAULT_TRANSMISSION_RATIO,
  FitmentInputError,
  checkOffsetMm,
  offsetFromBackspacing,
  parseTireSize,
} from "@/lib/fitment";

/** Bounds of every number of the input (the engine's accepted ranges, narrowed where sane). */
export const LIMITS = {
  wheelDiameterIn: { min: 8, max: 30 },
  wheelWidthIn: { min: 3, max: 20 },
  offsetMm: { min: -200, max: 200 },
  backspacingIn: { min: 0, max: 20 },
  flangeIn: { min: 0, max: 2 },
  spacerMm: { min: 0, max: 100 },
  kingpinInclinationDeg: { min: 0, max: 30 },
  axleRatio: { min: 1, max: 10 },
  transmissionRatio: { min: 0.3, max: 10 },
  cruiseMph: { min: 5, max: 150 },
  cruiseCount: { min: 1, max: 6 },
  fenderLineMm: { min: 0, max: 500 },
} as const;

const num = (label: string, { min, max }: { min: number; max: number }, unit: string, example: string) =>
  z
    .number({ error: `Enter ${label} as a number (e.g. ${example}).` })
    .refine(Number.isFinite, `Enter ${label} as a number (e.g. ${example}).`)
    .refine((v) => v >= min && v <= max, `${label[0]?.toUpperCase()}${label.slice(1)} must be between ${min} and ${max}${unit} (e.g. ${example}).`);

const inRange = (v: unknown, { min, max }: { min: number; max: number }): v is number =>
  typeof v === "number" && Number.isFinite(v) && v >= min && v <= max;

export const backspacingReferenceSchema = z.enum(["flange", "bead-seat"], {
  error: 'Say where the backspacing was measured to: "flange" (the flange edge) or "bead-seat".',
});

export const positionSchema = z.discriminatedUnion(
  "mode",
  [
    z.object({ mode: z.literal("offset"), offsetMm: num("the offset", LIMITS.offsetMm, " mm", "-12") }),
    z.object({
      mode: z.literal("backspacing"),
      backspacingIn: num("the backspacing", LIMITS.backspacingIn, " in", "4.5"),
      reference: backspacingReferenceSchema,
      flangeIn: num("the flange allowance", LIMITS.flangeIn, " in", "0.5"),
    }),
  ],
  { error: 'Give the wheel position as an offset (mode "offset") or a backspacing (mode "backspacing").' },
);

export const setupSchema = z
  .object({
    tire: z.string({ error: "Enter a tire size (e.g. 265/70R17)." }).trim().min(1, "Enter a tire size (e.g. 265/70R17).").max(80, "That tire size is too long (e.g. 265/70R17)."),
    wheelDiameterIn: num("the wheel diameter", LIMITS.wheelDiameterIn, " in", "17"),
    wheelWidthIn: num("the wheel width", LIMITS.wheelWidthIn, " in", "9"),
    position: positionSchema,
    spacerMm: num("the spacer thickness", LIMITS.spacerMm, " mm", "25"),
  })
  .superRefine((s, ctx) => {
    // Cross-checks only on fields that passed their own bounds (no second message for one mistake).
    if (s.tire.trim() === "") return;
    let rim: number;
    try {
      rim = parseTireSize(s.tire).rimDiameterIn;
    } catch (e) {
      ctx.addIssue({ code: "custom", path: ["tire"], message: e instanceof Error ? e.message : "Not a tire size (e.g. 265/70R17)." });
      return;
    }
    if (inRange(s.wheelDiameterIn, LIMITS.wheelDiameterIn) && s.wheelDiameterIn !== rim) {
      ctx.addIssue({
        code: "custom",
        path: ["wheelDiameterIn"],
        message: `A ${rim} in tire needs a ${rim} in wheel; this wheel is ${s.wheelDiameterIn} in.`,
      });
    }
    const p = s.position;
    const positionInRange =
      p.mode === "offset"
        ? inRange(p.offsetMm, LIMITS.offsetMm)
        : inRange(p.backspacingIn, LIMITS.backspacingIn) && inRange(p.flangeIn, LIMITS.flangeIn) && (p.reference === "flange" || p.reference === "bead-seat");
    if (!inRange(s.wheelWidthIn, LIMITS.wheelWidthIn) || !positionInRange) return;
    try {
      positionOffsetMm(s.position, s.wheelWidthIn);
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      ctx.addIssue({
        code: "custom",
        path: ["position", s.position.mode === "offset" ? "offsetMm" : "backspacingIn"],
        message: s.position.mode === "offset"
          ? `An offset of ${s.position.offsetMm} mm puts the mounting face outside a ${s.wheelWidthIn} in wide wheel (e.g. -12).`
          : `A backspacing of ${s.position.backspacingIn} in puts the mounting face outside a ${s.wheelWidthIn} in wide wheel (e.g. 4.5).`,
      });
    }
  });

export const vehicleSchema = z.object({
  /** null = not set: the engine then assumes 0° and the drawing shows no steering axis. */
  kingpinInclinationDeg: num("the kingpin inclination", LIMITS.kingpinInclinationDeg, "°", "8").nullable(),
  axleRatio: num("the axle ratio", LIMITS.axleRatio, "", "3.73"),
  transmissionRatio: num("the top-gear ratio", LIMITS.transmissionRatio, "", "1.00"),
  cruiseSpeedsMph: z
    .array(num("a cruise speed", LIMITS.cruiseMph, " mph", "65"), { error: "Enter one to six cruise speeds (e.g. 60, 70)." })
    .min(LIMITS.cruiseCount.min, "Enter at least one cruise speed (e.g. 65).")
    .max(LIMITS.cruiseCount.max, "Enter at most six cruise speeds."),
  /** Fender line, measured outboard from the hub mounting face; null = not entered. */
  fenderLineMm: num("the fender line distance", LIMITS.fenderLineMm, " mm", "140").nullable(),
});

export const comparisonInputSchema = z.object({
  current: setupSchema,
  planned: setupSchema,
  vehicle: vehicleSchema,
});

export type Position = z.infer<typeof positionSchema>;
export type SetupInputValues = z.infer<typeof setupSchema>;
export type VehicleValues = z.infer<typeof vehicleSchema>;
export type ComparisonInput = z.infer<typeof comparisonInputSchema>;
export type BackspacingReferenceValue = z.infer<typeof backspacingReferenceSchema>;

/**
 * The offset (mm) a position stands for, through the engine (backspacing → offset with its
 * reference and flange allowance); throws FitmentInputError when the mounting face would sit
 * outside the wheel.
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

/** Vehicle figures used when none are given (each labelled as a default in the workspace). */
export const DEFAULT_VEHICLE: VehicleValues = {
  kingpinInclinationDeg: null,
  axleRatio: DEFAULT_AXLE_RATIO,
  transmissionRatio: DEFAULT_TRANSMISSION_RATIO,
  cruiseSpeedsMph: [60, 70],
  fenderLineMm: null,
};

/** The demo comparison the workspace opens with (invented, realistic sizes). */
export const DEFAULT_INPUT: ComparisonInput = {
  current: {
    tire: "265/70R17 113T",
    wheelDiameterIn: 17,
    wheelWidthIn: 8,
    position: { mode: "offset", offsetMm: 25 },
    spacerMm: 0,
  },
  planned: {
    tire: "37x12.50R17LT 124Q LRD",
    wheelDiameterIn: 17,
    wheelWidthIn: 9,
    position: { mode: "offset", offsetMm: -12 },
    spacerMm: 0,
  },
  vehicle: DEFAULT_VEHICLE,
};

/** A new backspacing position with the usual reference and the engine's flange allowance. */
export const DEFAULT_FLANGE_ALLOWANCE_IN = DEFAULT_FLANGE_IN;
