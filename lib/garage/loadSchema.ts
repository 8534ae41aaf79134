/**
 * The body of a load profile save (PUT /api/vehicles/[id]/load): every figure in SI (kPa, kg,
 * mm) or null, and the unit system the screen showed, so the messages name the fields as it
 * labelled them. The shape is checked here; bounds, groups and the placard and body-point checks
 * are lib/garage/loadProfile.ts (they need the vehicle's current tire).
 */
import { z } from "zod";
import { MEASURE_KEYS, type MeasureKey } from "@/lib/garage/loadProfile";

const siUnit = (k: MeasureKey) => (k.endsWith("Kpa") ? "kPa" : k.endsWith("Kg") ? "kg" : "mm");
const figure = (k: MeasureKey) =>
  z
    .number({ error: `${k}: a number in ${siUnit(k)} or null.` })
    .refine(Number.isFinite, `${k}: a finite number.`)
    .nullable()
    .default(null);

export const loadProfileSchema = z.object({
  units: z.enum(["imperial", "metric"], { error: 'units must be "imperial" or "metric".' }).default("metric"),
  vehicleKind: z
    .enum(["light-truck", "passenger-car"], { error: "Choose the vehicle: truck, SUV or van, or a car." })
    .default("light-truck"),
  placardTire: z
    .string({ error: "Tire size on the placard: text, e.g. P265/70R17 113S." })
    .trim()
    .nullable()
    .default(null)
    .transform((v) => (v ? v : null)),
  ...(Object.fromEntries(MEASURE_KEYS.map((k) => [k, figure(k)])) as Record<MeasureKey, ReturnType<typeof figure>>),
});
