/**
 * What the work order's sign-offs accept, shared by the sheet's forms and the route handlers.
 * Fields arrive as typed (text); the output carries numbers in SI-ish units the sheet stores:
 * torque in N·m, pressure in kPa, weights in grams. Messages name the field as the sheet labels it.
 */
import { z } from "zod";
import {
  FitmentInputError,
  TORQUE_UNIT_SYMBOL,
  commaRefusal,
  hasNumberComma,
  parseTorqueEntry,
  psiToKpa,
  requireTorqueNm,
  torqueFromNm,
  torqueToNm,
  type TorqueUnit,
} from "@/lib/fitment";
import { WHEEL_POSITIONS, WORK_ORDER_STATUSES } from "@/lib/platform/db/types";
import { readDotDateCode } from "./dotCode";
import { type TirePressureLimits, pressureRefusal } from "./pressureLimit";
import { FIELD_LABEL, MATCH_MOUNT_METHODS, PRESSURE_UNITS, RECHECK_DAYS_LIMITS, type PressureEntryUnit } from "./vocabulary";

/** The torque field's label in a unit, e.g. "Maker's torque (ft·lb)". */
export const torqueFieldLabel = (unit: TorqueUnit) => `${FIELD_LABEL.torque} (${TORQUE_UNIT_SYMBOL[unit]})`;
export const pressureFieldLabel = (unit: PressureEntryUnit) => `${FIELD_LABEL.pressure} (${unit})`;

/**
 * The torque a fastener of each step can plausibly be given, N·m (common practice, no source; the
 * figures behind them from memory). Wide on purpose: they catch a slipped digit or a figure meant
 * in the other unit, and never stand in for the maker's figure, which the field asks for.
 * - Lug nuts 40–700 N·m (about 30–516 ft·lb): from small side-by-side wheels (about 30–60 ft·lb)
 *   through cars and light trucks (about 75–165 ft·lb) to the hub-piloted M22 nuts of heavy duals
 *   (about 450–500 ft·lb).
 * - Beadlock ring bolts 5–70 N·m (about 3.7–51.6 ft·lb): small bolts (5/16 or 3/8 in., M8–M10),
 *   usually given 10–30 ft·lb by the ring makers.
 * `example` is a figure inside the band in each unit, shown in the refusal.
 */
export const TORQUE_BANDS_NM = {
  lug_torque: { fastener: "lug nuts", min: 40, max: 700, example: { ftlb: 140, nm: 190 } },
  beadlock: { fastener: "beadlock ring bolts", min: 5, max: 70, example: { ftlb: 17, nm: 23 } },
} as const satisfies Record<string, { fastener: string; min: number; max: number; example: Record<TorqueUnit, number> }>;
export type TorqueStep = keyof typeof TORQUE_BANDS_NM;

const tenth = (n: number) => Math.round(n * 10) / 10;

/**
 * The refusal of a torque outside its fastener's band, in the unit typed with N·m beside it, with
 * what the figure may have been meant as (the other unit, a digit too many or too few) when that
 * lands in the band; null inside it. The band's ends in ft·lb are rounded inward to 0.1, so every
 * figure shown as inside is accepted (1 ft·lb = 1.355818 N·m, NIST SP 811 B.9).
 *
 * @example
 * torqueBandRefusal(1400, "ftlb", "lug_torque", "Maker's torque (ft·lb)");
 * // "Maker's torque (ft·lb): 1400 ft·lb (1898.1 N·m) is outside what lug nuts are torqued to, … Did you mean 140 ft·lb? …"
 */
export function torqueBandRefusal(typed: number, unit: TorqueUnit, step: TorqueStep, label: string): string | null {
  const band = TORQUE_BANDS_NM[step];
  const inBand = (n: number, u: TorqueUnit) => {
    const nm = torqueToNm(n, u);
    return nm >= band.min && nm <= band.max;
  };
  if (inBand(typed, unit)) return null;
  const other: TorqueUnit = unit === "ftlb" ? "nm" : "ftlb";
  const words = (n: number, u: TorqueUnit) => `${tenth(n)} ${TORQUE_UNIT_SYMBOL[u]}`;
  const ends = {
    min: Math.ceil(torqueFromNm(band.min, unit) * 10 - 1e-9) / 10,
    max: Math.floor(torqueFromNm(band.max, unit) * 10 + 1e-9) / 10,
  };
  const bandWords = unit === "nm" ? `${band.min} to ${band.max} N·m` : `${ends.min} to ${ends.max} ft·lb (${band.min} to ${band.max} N·m)`;
  const meant = [
    inBand(typed, other) && words(typed, other),
    inBand(typed / 10, unit) && words(typed / 10, unit),
    inBand(typed * 10, unit) && words(typed * 10, unit),
  ].filter((m): m is string => !!m);
  const guess = meant.length ? `Did you mean ${meant.slice(0, 2).join(" or ")}? ` : "";
  return (
    `${label}: ${words(typed, unit)} (${words(torqueFromNm(torqueToNm(typed, unit), other), other)}) is outside what ${band.fastener} are torqued to, ` +
    `${bandWords} (common practice, no source): a typo or a figure in the other unit? ${guess}` +
    `Type the maker's figure in the unit it is given in, e.g. ${words(band.example[unit], unit)}.`
  );
}

/** Accepted cold pressures: from a spare's low figure to a load range E tire's maximum, with room (kPa). */
export const PRESSURE_LIMITS_KPA = { min: psiToKpa(10), max: psiToKpa(120) } as const;
/** A cold pressure the field accepts in each unit, shown in its refusals. */
export const PRESSURE_EXAMPLE: Record<PressureEntryUnit, string> = { psi: "35 psi", kPa: "240 kPa" };

/**
 * One plain decimal number typed in a field: no comma (decimal mark or thousands?), no range, in
 * [min, max]. Returns the number, or a message that starts with the label; `example` is a figure
 * the field accepts, in its unit, shown when a comma is refused.
 *
 * @example
 * readDecimal("-0.25", "Camber left (°)", -10, 10, "-0.25"); // -0.25
 * readDecimal("1,5", "Camber left (°)", -10, 10, "-0.25"); // "Camber left (°): "1,5" is ambiguous — a comma can mark decimals or thousands; …"
 */
export function readDecimal(text: string, label: string, min: number, max: number, example: string): number | string {
  const t = String(text ?? "")
    .trim()
    .replace(/\u2212/g, "-");
  if (t === "") return `${label}: enter a number.`;
  if (hasNumberComma(t)) return `${label}: ${commaRefusal(JSON.stringify(t), example)}.`;
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t)) return `${label}: "${t}" is not one number.`;
  const n = Number(t);
  if (n < min || n > max) return `${label}: use ${min} to ${max}, got ${t}.`;
  return n;
}

const decimal = (label: string, min: number, max: number, example: string) =>
  z.string({ error: `${label}: enter a number.` }).transform((s, ctx) => {
    const r = readDecimal(s, label, min, max, example);
    if (typeof r === "string") {
      ctx.addIssue({ code: "custom", message: r });
      return z.NEVER;
    }
    return r;
  });

const position = z.enum(WHEEL_POSITIONS, { error: "Position: pick LF, RF, LR, RR or spare." });
const torqueUnit = z.enum(["ftlb", "nm"], { error: `${FIELD_LABEL.unit}: pick ft·lb or N·m.` });
const confirmed = (label: string) => z.literal(true, { error: `${label}: tick it once it is done.` });

/**
 * The maker's torque, read in its unit, held to the fastener's band (TORQUE_BANDS_NM) and then
 * range-checked in N·m; the issue sits on `torque`. The band comes first because it lies inside
 * the engine's range and its message says what the figure may have been meant as (3000 ft·lb on a
 * lug nut: "Did you mean 300 ft·lb?"), which the engine's generic range message cannot.
 */
function torqueNmOf(v: { torque: string; unit: TorqueUnit }, step: TorqueStep, ctx: z.RefinementCtx): number {
  const label = torqueFieldLabel(v.unit);
  const refuse = (message: string) => {
    ctx.addIssue({ code: "custom", path: ["torque"], message });
    return z.NEVER;
  };
  try {
    const typed = parseTorqueEntry(v.torque, v.unit, label);
    const outside = Number.isFinite(typed) ? torqueBandRefusal(typed, v.unit, step, label) : null;
    return outside ? refuse(outside) : requireTorqueNm(torqueToNm(typed, v.unit), v.unit, label);
  } catch (e) {
    return refuse(e instanceof FitmentInputError ? e.message : `${label}: enter one figure.`);
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
    const torqueNm = torqueNmOf(v, "beadlock", ctx);
    return { step: v.step, position: v.position, data: { ringBolts: v.ringBolts, torqueNm, unit: v.unit } };
  });

const beadSeat = z
  .object({ step: z.literal("bead_seat"), position, acknowledged: confirmed(FIELD_LABEL.acknowledged) })
  .transform((v) => ({ step: v.step, position: v.position, data: { acknowledged: true } }));

/**
 * The cold pressure set. With the quoted tire's limits (the sheet's form has them; the server checks
 * them in signStep, where it reads the quote) it is held to them by pressureRefusal, the one rule
 * both apply. `makerTable` is the technician's tick for a figure below the road minimum taken from
 * the tire maker's load table (pressureLimit.ts says why a tick); signStep keeps it on the record
 * only when the figure is below that minimum, so the record never claims a tick that did nothing.
 */
const pressureStep = (limits: TirePressureLimits | null) =>
  z
    .object({
      step: z.literal("pressure"),
      position,
      pressure: z.string({ error: `${FIELD_LABEL.pressure}: enter the figure.` }),
      pressureUnit: z.enum(PRESSURE_UNITS, { error: `${FIELD_LABEL.pressureUnit}: pick psi or kPa.` }),
      makerTable: z.boolean({ error: `${FIELD_LABEL.makerTable}: tick it or leave it.` }).default(false),
    })
    .transform((v, ctx) => {
      const label = pressureFieldLabel(v.pressureUnit);
      const toUnit = (kpa: number) => (v.pressureUnit === "kPa" ? Math.round(kpa) : Math.round(kpa / psiToKpa(1)));
      const r = readDecimal(
        v.pressure,
        label,
        toUnit(PRESSURE_LIMITS_KPA.min),
        toUnit(PRESSURE_LIMITS_KPA.max),
        PRESSURE_EXAMPLE[v.pressureUnit],
      );
      const kpa = typeof r === "number" ? (v.pressureUnit === "kPa" ? r : psiToKpa(r)) : 0;
      const refused = typeof r === "string" ? r : pressureRefusal(kpa, v.pressureUnit, limits, label, v.makerTable);
      if (refused) {
        ctx.addIssue({ code: "custom", path: ["pressure"], message: refused });
        return z.NEVER;
      }
      return { step: v.step, position: v.position, data: { pressureKpa: kpa, unit: v.pressureUnit, makerTable: v.makerTable } };
    });

const balance = z
  .object({
    step: z.literal("balance"),
    position,
    innerGrams: decimal(FIELD_LABEL.innerGrams, 0, 500, "12.5"),
    outerGrams: decimal(FIELD_LABEL.outerGrams, 0, 500, "12.5"),
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
    const torqueNm = torqueNmOf(v, "lug_torque", ctx);
    return { step: v.step, position: v.position, data: { torqueNm, unit: v.unit } };
  });

/** Readings in degrees; the ranges hold any truck's readings with room, and refuse a slipped decimal point. */
const readings = z.object({
  camberLeft: decimal(FIELD_LABEL.camberLeft, -10, 10, "-0.25"),
  camberRight: decimal(FIELD_LABEL.camberRight, -10, 10, "-0.25"),
  casterLeft: decimal(FIELD_LABEL.casterLeft, -5, 15, "3.5"),
  casterRight: decimal(FIELD_LABEL.casterRight, -5, 15, "3.5"),
  toeTotal: decimal(FIELD_LABEL.toeTotal, -5, 5, "0.1"),
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

/**
 * One step signed off, held to the quoted tire's pressure limits when they are known: the sheet's
 * form passes the work order's, and the server applies the same rule once it has read the quote.
 */
export const signStepSchemaFor = (limits: TirePressureLimits | null) =>
  z.discriminatedUnion("step", [fitted, matchMount, beadlock, beadSeat, pressureStep(limits), balance, lugTorque, alignment, trimming], {
    error: "Step: reload the sheet; that step is not known.",
  });
/** One step signed off: which step of which position, and what was recorded (the route's body). */
export const signStepSchema = signStepSchemaFor(null);
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
