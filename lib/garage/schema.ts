/**
 * The garage: vehicles, measured clearances, checklists. Shared by the forms and the handlers.
 */
import { z } from "zod";
import { VEHICLE_LIMITS } from "@/lib/comparisons/model";
import {
  CLEARANCE_DISTANCE_LIMITS_MM,
  CLEARANCE_MARGIN_LIMITS_MM,
  DEFAULT_CLEARANCE_MARGIN_MM,
  MM_PER_IN,
  parseBoltPattern,
  parseLength,
} from "@/lib/fitment";
import { FRONT_SUSPENSIONS } from "@/lib/platform/db/types";
import { CLEARANCE_DIRECTION_LABEL, SUSPENSION_STATE_LABEL } from "@/lib/garage/labels";
import { boundText } from "@/lib/setup/messages";
import { numberField, optionalLengthField, optionalNumberField, setupSchema } from "@/lib/setup/schema";

const text = (label: string, max: number) =>
  z
    .string({ error: `Enter ${label}.` })
    .trim()
    .max(max, `Use at most ${max} characters for ${label}.`);
const optionalText = (label: string, max: number) =>
  z
    .union([z.null(), text(label, max)])
    .optional()
    .transform((v) => (v ? v : null));

export const FRONT_SUSPENSION_LABEL: Record<(typeof FRONT_SUSPENSIONS)[number], string> = {
  independent: "Independent front suspension",
  "solid-axle": "Solid front axle",
};

/** Bolt pattern text, checked by the engine; the output is the engine's normalized text. */
export const boltPatternField = z
  .string({ error: "Enter the bolt pattern (e.g. 6x5.5 or 6x139.7)." })
  .trim()
  .min(1, "Enter the bolt pattern (e.g. 6x5.5 or 6x139.7).")
  .max(30, "That bolt pattern is too long (e.g. 6x5.5).")
  .transform((v, ctx) => {
    try {
      return parseBoltPattern(v).text;
    } catch (e) {
      ctx.addIssue({ code: "custom", message: e instanceof Error ? e.message : "Not a bolt pattern (e.g. 6x5.5)." });
      return z.NEVER;
    }
  });

const BARE_DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

/**
 * A clearance margin, in a field whose label states no unit: text with its unit ("1/2 in",
 * "12 mm"), a fraction (an inch notation: "3/4" is 3/4 in), 0, or a number of mm from an API
 * caller. A bare decimal such as "12" is refused with a message rather than guessed.
 */
export function marginField(label: string) {
  const example = "1/2 in or 12 mm";
  return z
    .union([z.number(), z.string()])
    .transform((v, ctx) => {
      if (typeof v === "number") return v;
      const t = v.trim().replace(/\u2212/g, "-");
      if (BARE_DECIMAL.test(t) && Number(t) !== 0) {
        ctx.addIssue({ code: "custom", message: `${label}: say which unit ${t} is in, e.g. ${example}.` });
        return z.NEVER;
      }
      try {
        return parseLength(t, "in");
      } catch {
        ctx.addIssue({ code: "custom", message: `${label}: not a length, e.g. ${example}.` });
        return z.NEVER;
      }
    })
    .pipe(
      z
        .number()
        .min(CLEARANCE_MARGIN_LIMITS_MM.min, `${label}: cannot be negative, e.g. ${example}.`)
        .max(
          CLEARANCE_MARGIN_LIMITS_MM.max,
          `${label}: keep it at most ${CLEARANCE_MARGIN_LIMITS_MM.max} mm (${boundText(CLEARANCE_MARGIN_LIMITS_MM.max / MM_PER_IN, "max", 2)} in), e.g. ${example}.`,
        ),
    );
}

/** The vehicle's margin ("Clearance margin" on the vehicle form): left empty, the common-practice default 1/2 in. */
export const vehicleMarginSchema = z
  .union([z.number(), z.string(), z.null()])
  .optional()
  // Blank first, then one schema: a union of "" and the margin would report a bad margin as
  // "Invalid input" instead of saying what a margin looks like.
  .transform((v) => (v === null || v === undefined || (typeof v === "string" && v.trim() === "") ? DEFAULT_CLEARANCE_MARGIN_MM : v))
  .pipe(marginField("Clearance margin"));

/** A garage vehicle as its form and the vehicles API take it (the shop counter's is lib/shop/customers/schema.ts). */
export const garageVehicleSchema = z.object({
  name: text("a name", 80).min(1, "Give the vehicle a name (e.g. Gravel hauler)."),
  year: optionalNumberField("Year", { min: 1900, max: 2100 }, "2009", { integer: true }),
  make: optionalText("the make", 60),
  model: optionalText("the model", 60),
  trim: optionalText("the trim", 60),
  frontSuspension: z.enum(FRONT_SUSPENSIONS, { error: "Choose independent front suspension or a solid front axle." }),
  boltPattern: boltPatternField,
  hubBoreMm: optionalLengthField("Hub bore (mm)", "mm", { min: 30, max: 250 }, "106.1"),
  stockSetup: setupSchema,
  currentSetup: setupSchema,
  // Typed in inches (the form's label says so), stored in mm; the bound is stated in inches.
  liftHeightMm: optionalLengthField("Lift height (in)", "in", { min: 0, max: 500 }, "2-1/2 or 2.5", "mm"),
  kingpinInclinationDeg: optionalNumberField("Kingpin inclination (°)", VEHICLE_LIMITS.kingpinInclinationDeg, "8", { unit: "°" }),
  axleRatio: optionalNumberField("Axle ratio", VEHICLE_LIMITS.axleRatio, "3.73"),
  transmissionRatio: optionalNumberField("Top-gear ratio", VEHICLE_LIMITS.transmissionRatio, "0.72"),
  clearanceMarginMm: vehicleMarginSchema,
  notes: z
    .union([z.null(), text("the notes", 4000)])
    .optional()
    .transform((v) => v ?? ""),
});
export type GarageVehicleForm = z.input<typeof garageVehicleSchema>;
export type GarageVehicleValues = z.output<typeof garageVehicleSchema>;

export { CLEARANCE_DIRECTION_LABEL, SUSPENSION_STATE_LABEL };

/** A distance text that names its own unit ("38 mm", "1-1/2 in", '1.5"'). */
export const UNIT_AT_END = /(mm|cm|in|inch|inches|"|''|”)\s*$/i;

/**
 * The distance text for another unit choice ("Unit (when the distance has none)"): a bare
 * figure is converted (1 in = 25.4 mm, NIST SP 811), so switching the unit never relabels it; a
 * text that names its own unit, or does not read, is left as it is.
 *
 * @example
 * distanceForUnit("1.5", "in", "mm"); // "38.1"
 * distanceForUnit("1-1/2", "in", "mm"); // "38.1"
 * distanceForUnit("38 mm", "mm", "in"); // "38 mm"
 */
export function distanceForUnit(text: string, from: "in" | "mm", to: "in" | "mm"): string {
  const t = text.trim().replace(/\u2212/g, "-");
  if (from === to || t === "" || UNIT_AT_END.test(t)) return text;
  let mm: number;
  try {
    mm = parseLength(t, from);
  } catch {
    return text;
  }
  // mm to the hundredth, inches to the ten-thousandth: both well inside what a tape reads.
  const r = to === "mm" ? Math.round(mm * 100) / 100 : Math.round((mm / MM_PER_IN) * 10_000) / 10_000;
  return String(r === 0 ? 0 : r);
}

/**
 * A measured gap: text with its unit ("1-1/2 in", "38 mm"), or a bare number with `unit`.
 * A bare number without a unit is refused — a gap in the wrong unit is worse than none.
 */
export const clearanceSchema = z
  .object({
    label: text("a label", 120).min(1, 'Name the point (e.g. "frame rail, full left lock").'),
    direction: z.enum(["inboard", "outboard", "upward", "fore-aft"], {
      error: "Choose a direction: inboard, outboard, upward or fore/aft at full lock.",
    }),
    distance: z
      .union([z.string(), z.number()], { error: "Enter the distance with its unit (e.g. 1-1/2 in or 38 mm)." })
      .transform((v) => String(v).trim()),
    unit: z.enum(["in", "mm"], { error: 'The unit must be "in" or "mm".' }).optional(),
    suspensionState: z.enum(["ride-height", "full-stuff", "full-lock"], {
      error: "Choose the suspension state: ride height, full stuff or full lock.",
    }),
    /** The setup fitted when measured; the vehicle's current setup when left out. */
    measuredSetup: setupSchema.optional(),
  })
  .transform((c, ctx) => {
    if (!c.distance) {
      ctx.addIssue({ code: "custom", path: ["distance"], message: "Enter the distance with its unit (e.g. 1-1/2 in or 38 mm)." });
      return z.NEVER;
    }
    const hasUnit = UNIT_AT_END.test(c.distance);
    if (!hasUnit && c.unit === undefined) {
      ctx.addIssue({
        code: "custom",
        path: ["distance"],
        message: `Say which unit ${c.distance} is in: write "${c.distance} in" or "${c.distance} mm".`,
      });
      return z.NEVER;
    }
    let mm: number;
    try {
      mm = parseLength(c.distance, c.unit ?? "mm");
    } catch {
      ctx.addIssue({ code: "custom", path: ["distance"], message: "The distance should look like 1-1/2 in, 1.5 in or 38 mm." });
      return z.NEVER;
    }
    if (mm < CLEARANCE_DISTANCE_LIMITS_MM.min || mm > CLEARANCE_DISTANCE_LIMITS_MM.max) {
      ctx.addIssue({
        code: "custom",
        path: ["distance"],
        message: "The distance must be between 0 and 1000 mm (0 when it already touches).",
      });
      return z.NEVER;
    }
    const shown = hasUnit ? c.distance : `${c.distance} ${c.unit}`;
    return {
      label: c.label,
      direction: c.direction,
      suspensionState: c.suspensionState,
      distanceMm: mm,
      distanceText: shown,
      measuredSetup: c.measuredSetup,
    };
  });
export type ClearanceFormValues = z.input<typeof clearanceSchema>;
export type ClearanceValues = z.output<typeof clearanceSchema>;

const itemId = z.string().regex(/^[a-z0-9:-]{1,80}$/, "Not a checklist item.");
/** A margin in mm as the checklist link carries it (`m=`); anything else is ignored. */
export const marginMmParam = z.coerce
  .number()
  .min(CLEARANCE_MARGIN_LIMITS_MM.min)
  .max(CLEARANCE_MARGIN_LIMITS_MM.max)
  .optional()
  .catch(undefined);

export const checklistUpdateSchema = z
  .object({
    planned: setupSchema.optional(),
    comparisonId: z.uuid({ error: "That is not a comparison id." }).optional(),
    marginMm: z
      .number({ error: "Give the margin in mm (e.g. 12.7)." })
      .min(CLEARANCE_MARGIN_LIMITS_MM.min)
      .max(CLEARANCE_MARGIN_LIMITS_MM.max)
      .optional(),
    ticked: z.array(itemId).max(200, "Too many items."),
  })
  .refine((v) => v.planned !== undefined || v.comparisonId !== undefined, {
    message: "Send the planned setup or the saved comparison the checklist is for.",
    path: ["planned"],
  });

export { numberField };
