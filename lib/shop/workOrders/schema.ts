/**
 * What the work order's sign-offs accept, shared by the sheet's forms and the route handlers.
 * Fields arrive as typed (text); the output carries numbers in SI-ish units the sheet stores:
 * torque in N·m, pressure in kPa, weights in grams. Messages name the field as the sheet labels it.
 */
import { z } from "zod";
import {
  FitmentInputError,
  TORQUE_UNIT_SYMBOL,
  parseTorqueEntry,
  psiToKpa,
  requireTorqueNm,
  torqueToNm,
  type TorqueUnit,
} from "@/lib/fitment";
import { WHEEL_POSITIONS, WORK_ORDER_STATUSES } from "@/lib/platform/db/types";
import { readDotDateCode } from "./dotCode";
import { FIELD_LABEL, MATCH_MOUNT_METHODS, PRESSURE_UNITS, RECHECK_DAYS_LIMITS, type PressureEntryUnit } from "./vocabulary";

/** The torque field's label in a unit, e.g. "Maker's torque (ft·lb)". */
export const torqueFieldLabel = (unit: TorqueUnit) => `${FIELD_LABEL.torque} (${TORQUE_UNIT_SYMBOL[unit]})`;
export const pressureFieldLabel = (unit: PressureEntryUnit) => `${FIELD_LABEL.pressure} (${unit})`;

/** Accepted cold pressures: from a spare's low figure to a load range E tire's maximum, with room (kPa). */
export const PRESSURE_LIMITS_KPA = { min: psiToKpa(10), max: psiToKpa(120) } as const;

/**
 * One plain decimal number typed in a field: no comma (decimal mark or thousands?), no range, in
 * [min, max]. Returns the number, or a message that starts with the label.
 *
 * @example
 * readDecimal("-0.25", "Camber left (°)", -10, 10); // -0.25
 * readDecimal("1,5", "Camber left (°)", -10, 10); // "Camber left (°): "1,5" is ambiguous …"
 */
export function readDecimal(text: string, label: string, min: number, max: number): number | string {
  const t = String(text ?? "")
    .trim()
    .replace(/\u2212/g, "-");
  if (t === "") return `${label}: enter a number.`;
  if (t.includes(",")) return `${label}: "${t}" is ambiguous — write decimals with a point and no thousands separator.`;
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t)) return `${label}: "${t}" is not one number.`;
  const n = Number(t);
  if (n < min || n > max) return `${label}: use ${min} to ${max}, got ${t}.`;
  return n;
}

const decimal = (label: string, min: number, max: number) =>
  z.string({ error: `${label}: enter a number.` }).transform((s, ctx) => {
    const r = readDecimal(s, label, min, max);
    if (typeof r === "string") {
      ctx.addIssue({ code: "custom", message: r });
      return z.NEVER;
    }
    return r;
  });

const position = z.enum(WHEEL_POSITIONS, { error: "Position: pick LF, RF, LR, RR or spare." });
const torqueUnit = z.enum(["ftlb", "nm"], { error: `${FIELD_LABEL.unit}: pick ft·lb or N·m.` });
const confirmed = (label: string) => z.literal(true, { error: `${label}: tick it once it is done.` });

/** The maker's torque, read in its unit and range-checked in N·m; the issue sits on `torque`. */
function torqueNmOf(v: { torque: string; unit: TorqueUnit }, ctx: z.RefinementCtx): number {
  const label = torqueFieldLabel(v.unit);
  try {
    return requireTorqueNm(torqueToNm(parseTorqueEntry(v.torque, v.unit, label), v.unit), v.unit, label);
  } catch (e) {
    ctx.addIssue({ code: "custom", path: ["torque"], message: e instanceof FitmentInputError ? e.message : `${label}: enter one figure.` });
    return z.NEVER;
  }
}

const fitted = z
  .object({
    step: z.literal("fitted"),
    position,
    dotCode: z.string({ error: `${FIELD_LABEL.dotCode}: enter the four digits.` }),
    tire: z.string().trim().min(1, `${FIELD_LABEL.tire}: say which tire went on.`).max(120, `${FIELD_LABEL.tire}: at most 120 characters.`),
    wheel: z
      .string()
      .trim()
      .min(1, `${FIELD_LABEL.wheel}: say which wheel it went on.`)
      .max(120, `${FIELD_LABEL.wheel}: at most 120 characters.`),
  })
  .transform((v, ctx) => {
    const r = readDotDateCode(v.dotCode);
    if (!r.ok) {
      ctx.addIssue({ code: "custom", path: ["dotCode"], message: r.message });
      return z.NEVER;
    }
    return {
      step: v.step,
      position: v.position,
      data: { dotCode: r.value.code, dotWeek: r.value.week, dotYear: r.value.year, tire: v.tire, wheel: v.wheel },
    };
  });

const matchMount = z
  .object({
    step: z.literal("match_mount"),
    position,
    method: z.enum(MATCH_MOUNT_METHODS, { error: `${FIELD_LABEL.method}: say which marks were lined up.` }),
  })
  .transform((v) => ({ step: v.step, position: v.position, data: { method: v.method } }));

const beadlock = z
  .object({
    step: z.literal("beadlock"),
    position,
    ringBolts: z.coerce
      .number({ error: `${FIELD_LABEL.ringBolts}: enter a whole number (e.g. 24).` })
      .int(`${FIELD_LABEL.ringBolts}: enter a whole number (e.g. 24).`)
      .min(3, `${FIELD_LABEL.ringBolts}: use 3 to 64.`)
      .max(64, `${FIELD_LABEL.ringBolts}: use 3 to 64.`),
    torque: z.string({ error: `${FIELD_LABEL.torque}: enter the ring maker's figure.` }),
    unit: torqueUnit,
    passesDone: confirmed(FIELD_LABEL.passesDone),
  })
  .transform((v, ctx) => {
    const torqueNm = torqueNmOf(v, ctx);
    return { step: v.step, position: v.position, data: { ringBolts: v.ringBolts, torqueNm, unit: v.unit } };
  });

const beadSeat = z
  .object({ step: z.literal("bead_seat"), position, acknowledged: confirmed(FIELD_LABEL.acknowledged) })
  .transform((v) => ({ step: v.step, position: v.position, data: { acknowledged: true } }));

const pressure = z
  .object({
    step: z.literal("pressure"),
    position,
    pressure: z.string({ error: `${FIELD_LABEL.pressure}: enter the figure.` }),
    pressureUnit: z.enum(PRESSURE_UNITS, { error: `${FIELD_LABEL.pressureUnit}: pick psi or kPa.` }),
  })
  .transform((v, ctx) => {
    const label = pressureFieldLabel(v.pressureUnit);
    const toUnit = (kpa: number) => (v.pressureUnit === "kPa" ? Math.round(kpa) : Math.round(kpa / psiToKpa(1)));
    const r = readDecimal(v.pressure, label, toUnit(PRESSURE_LIMITS_KPA.min), toUnit(PRESSURE_LIMITS_KPA.max));
    if (typeof r === "string") {
      ctx.addIssue({ code: "custom", path: ["pressure"], message: r });
      return z.NEVER;
    }
    const kpa = v.pressureUnit === "kPa" ? r : psiToKpa(r);
    return { step: v.step, position: v.position, data: { pressureKpa: kpa, unit: v.pressureUnit } };
  });

const balance = z
  .object({
    step: z.literal("balance"),
    position,
    innerGrams: decimal(FIELD_LABEL.innerGrams, 0, 500),
    outerGrams: decimal(FIELD_LABEL.outerGrams, 0, 500),
  })
  .transform((v) => ({ step: v.step, position: v.position, data: { innerGrams: v.innerGrams, outerGrams: v.outerGrams } }));

const lugTorque = z
  .object({
    step: z.literal("lug_torque"),
    position,
    torque: z.string({ error: `${FIELD_LABEL.torque}: enter the vehicle maker's figure.` }),
    unit: torqueUnit,
    passesDone: confirmed(FIELD_LABEL.passesDone),
  })
  .transform((v, ctx) => {
    const torqueNm = torqueNmOf(v, ctx);
    return { step: v.step, position: v.position, data: { torqueNm, unit: v.unit } };
  });

/** Readings in degrees; the ranges hold any truck's readings with room, and refuse a slipped decimal point. */
const readings = z.object({
  camberLeft: decimal(FIELD_LABEL.camberLeft, -10, 10),
  camberRight: decimal(FIELD_LABEL.camberRight, -10, 10),
  casterLeft: decimal(FIELD_LABEL.casterLeft, -5, 15),
  casterRight: decimal(FIELD_LABEL.casterRight, -5, 15),
  toeTotal: decimal(FIELD_LABEL.toeTotal, -5, 5),
});

const alignment = z
  .object({ step: z.literal("alignment"), position: z.literal("vehicle"), before: readings, after: readings })
  .transform((v) => ({ step: v.step, position: v.position, data: { before: v.before, after: v.after } }));

const trimming = z
  .object({
    step: z.literal("trimming"),
    position: z.literal("vehicle"),
    trimmed: confirmed(FIELD_LABEL.trimmed),
    note: z.string().trim().max(300, `${FIELD_LABEL.note}: at most 300 characters.`).default(""),
  })
  .transform((v) => ({ step: v.step, position: v.position, data: { trimmed: true, note: v.note } }));

/** One step signed off: which step of which position, and what was recorded. */
export const signStepSchema = z.discriminatedUnion(
  "step",
  [fitted, matchMount, beadlock, beadSeat, pressure, balance, lugTorque, alignment, trimming],
  { error: "Step: reload the sheet; that step is not known." },
);
export type SignedStep = z.output<typeof signStepSchema>;

/** Making the work order for a booked quote. */
export const createWorkOrderSchema = z.object({ quoteId: z.uuid({ error: "Quote: reload the page; that quote is not known." }) });

/** A status move: booked → in the bay → done. */
export const statusMoveSchema = z.object({
  to: z.enum(WORK_ORDER_STATUSES, { error: "Status: pick in the bay or done." }),
});

/** The owner's re-check setting. */
export const recheckSettingSchema = z.object({
  days: z.coerce
    .number({ error: `Re-check after (days): enter a whole number of days.` })
    .int("Re-check after (days): enter a whole number of days.")
    .min(RECHECK_DAYS_LIMITS.min, `Re-check after (days): use ${RECHECK_DAYS_LIMITS.min} to ${RECHECK_DAYS_LIMITS.max}.`)
    .max(RECHECK_DAYS_LIMITS.max, `Re-check after (days): use ${RECHECK_DAYS_LIMITS.min} to ${RECHECK_DAYS_LIMITS.max}.`),
});
