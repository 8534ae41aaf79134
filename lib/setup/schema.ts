/**
 * A setup — tire, wheel, where the wheel sits, spacer — as forms and route handlers take it.
 *
 * Field names and output types follow the comparison input (tire, wheelDiameterIn,
 * wheelWidthIn, position { mode "offset" | "backspacing" }, spacerMm) so the two can become one
 * schema. Forms send text: inch fields accept fractions (`4-3/4`, `4¾`, `4 7/8 in`, `3.5"`) and mm
 * fields accept `120 mm` or `1 in` but refuse a bare fraction (`1-1/2` is inches, never 1.5 mm),
 * all read by the engine's `parseLength`; API callers may send plain numbers. The output is
 * always numbers in the engine's units. Messages name each field as the forms label it
 * (lib/comparisons/fields.ts), with an example the field accepts and bounds in its unit.
 *
 * Besides the bounds, the schema asks the engine what only it knows (the size designation, the
 * wheel diameter matching the tire, an offset or backspacing that keeps the mounting face inside
 * the wheel), so a value that passes never makes the engine throw.
 */
import { z } from "zod";
import { SETUP_FIELD_EXAMPLE as EX, SETUP_FIELD_LABEL as L, boundText, lengthMessages } from "@/lib/comparisons/fields";
import { DEFAULT_FLANGE_ALLOWANCE_IN, LIMITS, positionOffsetMm as modelPositionOffsetMm, toEngineSetup } from "@/lib/comparisons/model";
import {
  DEFAULT_FLANGE_IN,
  FitmentInputError,
  MM_PER_IN,
  parseLength,
  parseTireSize,
} from "@/lib/fitment";

/** The comparison model's bounds: one set of limits for forms, handlers and the URL. */
export const SETUP_LIMITS = {
  wheelDiameterIn: LIMITS.wheelDiameterIn,
  wheelWidthIn: LIMITS.wheelWidthIn,
  offsetMm: LIMITS.offsetMm,
  backspacingIn: LIMITS.backspacingIn,
  flangeIn: LIMITS.flangeIn,
  spacerMm: LIMITS.spacerMm,
} as const;

type Bounds = { min: number; max: number };
const round6 = (v: number) => {
  const r = Math.round(v * 1e6) / 1e6;
  return r === 0 ? 0 : r;
};

/**
 * A length typed as text or given as a number; returns the number in `out` units. `unit` is the
 * unit the field is labelled in: a bare number is read in it, and a fraction only where it is
 * inches (`1-1/2` in a mm field is refused, `1-1/2 in` is read). `bounds` are in `out` units;
 * messages state them in `unit`, name the field by `label` (as the screen labels it) and give
 * `example`, which the field must accept. Empty text is "missing" (required) or null (optional).
 */
export function lengthField(label: string, unit: "in" | "mm", bounds: Bounds, example: string, out: "in" | "mm" = unit) {
  const m = lengthMessages(label, unit, example);
  const shown = (v: number, side: "min" | "max") => (unit === out ? String(v) : boundText(unit === "in" ? v / MM_PER_IN : v * MM_PER_IN, side, 2));
  return z
    .union([z.number(), z.string()], { error: m.empty })
    .transform((v, ctx) => {
      if (typeof v === "number") return v;
      const t = v.trim().replace(/\u2212/g, "-");
      if (!t) {
        ctx.addIssue({ code: "custom", message: m.empty });
        return z.NEVER;
      }
      try {
        const mm = parseLength(t, unit);
        return round6(out === "mm" ? mm : mm / MM_PER_IN);
      } catch {
        let fraction = false;
        try {
          fraction = unit === "mm" && Number.isFinite(parseLength(t, "in"));
        } catch {
          fraction = false;
        }
        ctx.addIssue({ code: "custom", message: fraction ? m.fraction(t) : m.unreadable });
        return z.NEVER;
      }
    })
    .pipe(
      z
        .number()
        .refine(Number.isFinite, m.unreadable)
        .refine((x) => x >= bounds.min && x <= bounds.max, m.bounds(shown(bounds.min, "min"), shown(bounds.max, "max"))),
    );
}

/** An optional length: missing, empty text or null gives null. */
export function optionalLengthField(label: string, unit: "in" | "mm", bounds: Bounds, example: string, out: "in" | "mm" = unit) {
  return blankAs(label, null, lengthField(label, unit, bounds, example, out).nullable());
}

/**
 * Missing, null or blank text as `empty`, anything else through `field`. Blank first, then one
 * schema: a union of "" and the field would report a bad entry as "Invalid input" instead of
 * the field's own message.
 */
function blankAs<T extends z.ZodType<unknown, string | number | null>>(label: string, empty: null | number, field: T) {
  return z
    .union([z.null(), z.number(), z.string()], { error: `${label}: enter a number or text.` })
    .optional()
    .transform((v) => (v === null || v === undefined || (typeof v === "string" && v.trim() === "") ? empty : v))
    .pipe(field);
}

/** A plain number (a year, a ratio, degrees) typed as text or given as a number; `label` as the screen labels the field. */
export function numberField(label: string, bounds: Bounds, example: string, opts: { integer?: boolean; unit?: string } = {}) {
  const unreadable = `${label}: enter a number, e.g. ${example}.`;
  return z
    .union([z.number(), z.string()], { error: unreadable })
    .transform((v, ctx) => {
      if (typeof v === "number") return v;
      const t = v.trim().replace(/\u2212/g, "-");
      if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t)) {
        ctx.addIssue({ code: "custom", message: unreadable });
        return z.NEVER;
      }
      return Number(t);
    })
    .pipe(
      z
        .number()
        .refine(Number.isFinite, unreadable)
        .refine((x) => !opts.integer || Number.isInteger(x), `${label}: enter a whole number, e.g. ${example}.`)
        .refine((x) => x >= bounds.min && x <= bounds.max, `${label}: must be between ${bounds.min} and ${bounds.max}${opts.unit ?? ""}, e.g. ${example}.`),
    );
}

export function optionalNumberField(label: string, bounds: Bounds, example: string, opts: { integer?: boolean; unit?: string } = {}) {
  return blankAs(label, null, numberField(label, bounds, example, opts).nullable());
}

export const backspacingReferenceSchema = z.enum(["flange", "bead-seat"], {
  error: 'Say where the backspacing was measured to: "flange" (the flange edge) or "bead-seat".',
});

export const positionSchema = z.discriminatedUnion(
  "mode",
  [
    z.object({ mode: z.literal("offset"), offsetMm: lengthField(L["position.offsetMm"], "mm", SETUP_LIMITS.offsetMm, EX["position.offsetMm"]) }),
    z.object({
      mode: z.literal("backspacing"),
      backspacingIn: lengthField(L["position.backspacingIn"], "in", SETUP_LIMITS.backspacingIn, EX["position.backspacingIn"]),
      reference: backspacingReferenceSchema,
      flangeIn: lengthField(L["position.flangeIn"], "in", SETUP_LIMITS.flangeIn, EX["position.flangeIn"]),
    }),
  ],
  { error: 'Give the wheel position as an offset (mode "offset") or a backspacing (mode "backspacing").' },
);

/** The offset (mm) a position stands for (the comparison model's rule); throws FitmentInputError outside the wheel. */
export const positionOffsetMm: (position: z.output<typeof positionSchema>, wheelWidthIn: number) => number = modelPositionOffsetMm;

export const setupSchema = z
  .object({
    tire: z
      .string({ error: `${L.tire}: enter a tire size, e.g. ${EX.tire}.` })
      .trim()
      .min(1, `${L.tire}: enter a tire size, e.g. ${EX.tire}.`)
      .max(80, `${L.tire}: too long for a tire size, e.g. ${EX.tire}.`),
    wheelDiameterIn: lengthField(L.wheelDiameterIn, "in", SETUP_LIMITS.wheelDiameterIn, EX.wheelDiameterIn),
    wheelWidthIn: lengthField(L.wheelWidthIn, "in", SETUP_LIMITS.wheelWidthIn, EX.wheelWidthIn),
    position: positionSchema,
    // Empty: no spacer.
    spacerMm: blankAs(L.spacerMm, 0, lengthField(L.spacerMm, "mm", SETUP_LIMITS.spacerMm, EX.spacerMm)),
  })
  .superRefine((s, ctx) => {
    let rim: number;
    try {
      rim = parseTireSize(s.tire).rimDiameterIn;
    } catch (e) {
      ctx.addIssue({ code: "custom", path: ["tire"], message: `${L.tire}: ${e instanceof Error ? e.message : `not a tire size, e.g. ${EX.tire}.`}` });
      return;
    }
    if (s.wheelDiameterIn !== rim) {
      ctx.addIssue({ code: "custom", path: ["wheelDiameterIn"], message: `${L.wheelDiameterIn}: a ${rim} in tire needs a ${rim} in wheel; this wheel is ${s.wheelDiameterIn} in.` });
    }
    try {
      positionOffsetMm(s.position, s.wheelWidthIn);
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      const offset = s.position.mode === "offset";
      ctx.addIssue({
        code: "custom",
        path: ["position", offset ? "offsetMm" : "backspacingIn"],
        message: offset
          ? `${L["position.offsetMm"]}: ${s.position.mode === "offset" ? s.position.offsetMm : ""} mm puts the mounting face outside a ${s.wheelWidthIn} in wide wheel.`
          : `${L["position.backspacingIn"]}: that backspacing puts the mounting face outside a ${s.wheelWidthIn} in wide wheel.`,
      });
    }
  });

/** What the form holds (text allowed) and what comes out (numbers). */
export type SetupFormValues = z.input<typeof setupSchema>;
export type SetupValues = z.output<typeof setupSchema>;

export { toEngineSetup };

/**
 * Form text for a stored setup (numbers as text, the way the form holds them). The position
 * carries the fields of both modes so switching mode in a form starts from sensible values; the
 * schema keeps only those of the chosen mode.
 */
export function setupToForm(s: SetupValues): SetupFormValues {
  const position = {
    mode: s.position.mode,
    offsetMm: s.position.mode === "offset" ? String(s.position.offsetMm) : "",
    backspacingIn: s.position.mode === "backspacing" ? String(s.position.backspacingIn) : "",
    reference: s.position.mode === "backspacing" ? s.position.reference : "flange",
    flangeIn: String(s.position.mode === "backspacing" ? s.position.flangeIn : DEFAULT_FLANGE_IN),
  } as SetupFormValues["position"];
  return {
    tire: s.tire,
    wheelDiameterIn: String(s.wheelDiameterIn),
    wheelWidthIn: String(s.wheelWidthIn),
    position,
    spacerMm: s.spacerMm ? String(s.spacerMm) : "",
  };
}

export { DEFAULT_FLANGE_ALLOWANCE_IN };

/** A blank setup for new forms. */
export const EMPTY_SETUP_FORM: SetupFormValues = {
  tire: "",
  wheelDiameterIn: "",
  wheelWidthIn: "",
  position: { mode: "offset", offsetMm: "", backspacingIn: "", reference: "flange", flangeIn: String(DEFAULT_FLANGE_IN) } as SetupFormValues["position"],
  spacerMm: "",
};
