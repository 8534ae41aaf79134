/**
 * A customer's vehicle as the shop counter takes it: a description, the bolt pattern, the hub
 * bore, the setup it runs now — the same setup the workspace and the garage describe
 * (lib/setup), stored as it is (customer_vehicles.current_setup, quotes.current_setup) — and
 * the axle ratio. Shared by the counter's form and its route handlers. (A garage vehicle is
 * lib/garage/schema.ts's garageVehicleSchema.)
 */
import { z } from "zod";
import { DEFAULT_FLANGE_IN, FitmentInputError, parseBoltPattern, parseTireSize, setupGeometry } from "@/lib/fitment";
import { isObject } from "@/lib/setup/check";
import { SETUP_FIELD_LABEL } from "@/lib/setup/fields";
import { type Setup, type SetupForm, toEngineSetup } from "@/lib/setup/model";
import { optionalLengthField, setupSchema } from "@/lib/setup/schema";
import { requiredText } from "@/lib/platform/validation/requiredText";
import { type CounterBodyPoints, bodyPointsSchema } from "./counterBodyPoints";
import { type CounterPlacard, placardSchema } from "./counterPlacard";

const engineMessage = (e: unknown, fallback: string) => (e instanceof FitmentInputError ? e.message : fallback);

const counterVehicleFields = z.object({
  description: requiredText("Describe the vehicle, e.g. 2016 half-ton pickup.").max(120, "Use at most 120 characters."),
  boltPattern: requiredText("Enter the bolt pattern, e.g. 6x5.5.").superRefine((v, ctx) => {
    try {
      parseBoltPattern(v);
    } catch (e) {
      ctx.addIssue({ code: "custom", message: engineMessage(e, "Enter a bolt pattern like 6x5.5.") });
    }
  }),
  // The hub's pilot diameter: the counter checks each wheel's centre bore against it.
  hubBoreMm: optionalLengthField("Hub bore (mm)", "mm", { min: 30, max: 250 }, "108"),
  // The quote's fitment summary compares wheels on the hub face; it reads no spacer yet, so a
  // spacer is refused here rather than left out of the figures without a word.
  currentSetup: setupSchema.refine((s) => s.spacerMm === 0, {
    path: ["spacerMm"],
    message: `${SETUP_FIELD_LABEL.spacerMm}: the counter compares wheels without a spacer; leave it empty and enter the wheel as it is.`,
  }),
  axleRatio: z
    .union([z.literal("").transform(() => undefined), z.coerce.number().min(1).max(10)], {
      error: "Enter the axle ratio as a number from 1 to 10, e.g. 3.73, or leave it empty.",
    })
    .optional(),
});

/** The form's values: text as typed, the setup as lib/setup's form shape; the placard and body points already read into SI (counterPlacard.ts, counterBodyPoints.ts). */
export type CounterVehicleForm = Omit<z.input<typeof counterVehicleFields>, "currentSetup"> & {
  currentSetup: SetupForm;
  placard?: unknown;
  bodyPoints?: unknown;
};
export type CounterVehicle = z.output<typeof counterVehicleFields> & {
  placard?: CounterPlacard | null;
  bodyPoints?: CounterBodyPoints | null;
};

/**
 * The flat vehicle the counter took before its setup was lib/setup's (`tireSize`, `offsetMode`,
 * `offsetMm`, `backspacingIn`, `backspacingFrom`): a request in that shape still reads, and its
 * problems are reported under the names it used. Where each old field lives now:
 */
const FLAT_FIELD = {
  tireSize: "currentSetup.tire",
  wheelDiameterIn: "currentSetup.wheelDiameterIn",
  wheelWidthIn: "currentSetup.wheelWidthIn",
  offsetMode: "currentSetup.position",
  offsetMm: "currentSetup.position.offsetMm",
  backspacingIn: "currentSetup.position.backspacingIn",
  backspacingFrom: "currentSetup.position.reference",
} as const;

const isFlat = (v: unknown): v is Record<string, unknown> =>
  isObject(v) && !("currentSetup" in v) && Object.keys(FLAT_FIELD).some((k) => k in v);

function fromFlat(v: Record<string, unknown>): Record<string, unknown> {
  const { tireSize, wheelDiameterIn, wheelWidthIn, offsetMode, offsetMm, backspacingIn, backspacingFrom, ...rest } = v;
  return {
    ...rest,
    currentSetup: {
      tire: tireSize,
      wheelDiameterIn,
      wheelWidthIn,
      position: { mode: offsetMode, offsetMm, backspacingIn, reference: backspacingFrom, flangeIn: DEFAULT_FLANGE_IN },
      spacerMm: 0,
    },
  };
}

const flatPath = (path: PropertyKey[]): PropertyKey[] => {
  const key = path.join(".");
  const old = (Object.keys(FLAT_FIELD) as (keyof typeof FLAT_FIELD)[]).find((k) => FLAT_FIELD[k] === key);
  return old ? [old] : path;
};

/**
 * The counter's vehicle from a form or a request. The flat shape of older clients is read too
 * (its problems keyed by its own field names).
 */
export const counterVehicleSchema = z.unknown().transform((v, ctx) => {
  const flat = isFlat(v);
  const r = counterVehicleFields.safeParse(flat ? fromFlat(v) : v);
  if (r.success) {
    // The placard's and the body points' checks need the current tire (the garage's checks take one); the setup read above.
    const s = r.data.currentSetup;
    const current = () => ({ text: s.tire, diameterMm: setupGeometry(toEngineSetup(s)).overallDiameterMm });
    const out: CounterVehicle = { ...r.data };
    let refused = false;
    for (const [key, schema] of [
      ["placard", placardSchema(current)],
      ["bodyPoints", bodyPointsSchema(current)],
    ] as const) {
      const raw = isObject(v) ? v[key] : undefined;
      if (raw === undefined || raw === null) continue;
      const p = schema.safeParse(raw);
      if (p.success) Object.assign(out, { [key]: p.data });
      else for (const i of p.error.issues) ctx.addIssue({ code: "custom", path: [key, ...i.path], message: i.message });
      refused ||= !p.success;
    }
    return refused ? z.NEVER : out;
  }
  for (const i of r.error.issues) ctx.addIssue({ code: "custom", path: flat ? flatPath(i.path) : i.path, message: i.message });
  return z.NEVER;
}) as unknown as z.ZodType<CounterVehicle, CounterVehicleForm>;

/** What the counter's comparison reads of a vehicle: its setup as the engine takes it. */
export interface CounterVehicleForEngine {
  description: string;
  /** The engine's text of the pattern (6x5.5 and 6 on 5.5 are one). */
  boltPattern: string;
  hubBoreMm: number | null;
  axleRatio: number | null;
  currentSetup: Setup;
  /** The engine's text of the tire size. */
  tireSize: string;
  /** The wheel on the hub: the position as an offset. */
  wheel: { diameterIn: number; widthIn: number; offsetMm: number };
  /** The door placard (and axle loads) when the counter took them. */
  placard: CounterPlacard | null;
  /** The body points when the counter measured them. */
  bodyPoints: CounterBodyPoints | null;
}

/**
 * A counter vehicle, from the form or as stored, for the engine: the offset computed from a
 * backspacing when that was given.
 *
 * @example
 * counterVehicleForEngine({ description: "Pickup", boltPattern: "6 on 5.5", hubBoreMm: null, axleRatio: null,
 *   currentSetup: { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "backspacing", backspacingIn: 5.5, reference: "bead-seat", flangeIn: 0.5 }, spacerMm: 0 } }).wheel;
 * // { diameterIn: 17, widthIn: 8, offsetMm: 38.1 }   (5.5 − 8 / 2 = 1.5 in = 38.1 mm)
 */
export function counterVehicleForEngine(v: {
  description: string;
  boltPattern: string;
  hubBoreMm?: number | null;
  axleRatio?: number | null;
  currentSetup: Setup;
  placard?: CounterPlacard | null;
  bodyPoints?: CounterBodyPoints | null;
}): CounterVehicleForEngine {
  return {
    description: v.description,
    boltPattern: parseBoltPattern(v.boltPattern).text,
    hubBoreMm: v.hubBoreMm ?? null,
    axleRatio: v.axleRatio ?? null,
    currentSetup: v.currentSetup,
    tireSize: parseTireSize(v.currentSetup.tire).text,
    wheel: toEngineSetup(v.currentSetup).wheel,
    placard: v.placard ?? null,
    bodyPoints: v.bodyPoints ?? null,
  };
}
