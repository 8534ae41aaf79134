/**
 * A setup — tire, wheel, where the wheel sits, spacer — as forms and route handlers take it.
 *
 * Field names and output types follow the comparison input (tire, wheelDiameterIn,
 * wheelWidthIn, position { mode "offset" | "backspacing" }, spacerMm) so the two can become one
 * schema. Forms send text: inch fields accept fractions (`4-3/4`, `4 7/8 in`, `3.5"`) and mm
 * fields accept `120 mm` or `1 in`, all read by the engine's `parseLength`; API callers may send
 * plain numbers. The output is always numbers in the engine's units.
 *
 * Besides the bounds, the schema asks the engine what only it knows (the size designation, the
 * wheel diameter matching the tire, an offset or backspacing that keeps the mounting face inside
 * the wheel), so a value that passes never makes the engine throw.
 */
import { z } from "zod";
import { DEFAULT_FLANGE_ALLOWANCE_IN, LIMITS, positionOffsetMm as modelPositionOffsetMm, toEngineSetup } from "@/lib/comparison/model";
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
const cap = (s: string) => `${s[0]?.toUpperCase() ?? ""}${s.slice(1)}`;
const round6 = (v: number) => {
  const r = Math.round(v * 1e6) / 1e6;
  return r === 0 ? 0 : r;
};

/**
 * A length typed as text or given as a number; returns the number in `out` units. A bare number
 * is read in `unit` and the result is given in `out` (default `unit`). Empty text is "missing" (required) or null (optional).
 */
export function lengthField(label: string, unit: "in" | "mm", bounds: Bounds, example: string, out: "in" | "mm" = unit) {
  const unitLabel = out === "in" ? " in" : " mm";
  return z
    .union([z.number(), z.string()], { error: `Enter ${label} (e.g. ${example}).` })
    .transform((v, ctx) => {
      if (typeof v === "number") return v;
      const t = v.trim();
      if (!t) {
        ctx.addIssue({ code: "custom", message: `Enter ${label} (e.g. ${example}).` });
        return z.NEVER;
      }
      try {
        const mm = parseLength(t, unit);
        return round6(out === "mm" ? mm : mm / MM_PER_IN);
      } catch {
        ctx.addIssue({ code: "custom", message: `${cap(label)} should look like ${example}${unit === "in" ? ", 4-3/4 or 4 7/8 in" : " or 1 in"}.` });
        return z.NEVER;
      }
    })
    .pipe(
      z
        .number()
        .refine(Number.isFinite, `Enter ${label} as a number (e.g. ${example}).`)
        .refine((x) => x >= bounds.min && x <= bounds.max, `${cap(label)} must be between ${bounds.min} and ${bounds.max}${unitLabel} (e.g. ${example}).`),
    );
}

/** An optional length: missing, empty text or null gives null. */
export function optionalLengthField(label: string, unit: "in" | "mm", bounds: Bounds, example: string, out: "in" | "mm" = unit) {
  return z
    .union([z.null(), z.literal(""), lengthField(label, unit, bounds, example, out)])
    .optional()
    .transform((v) => (v === "" || v === undefined ? null : v));
}

/** A plain number typed as text or given as a number. */
export function numberField(label: string, bounds: Bounds, example: string, opts: { integer?: boolean; unit?: string } = {}) {
  return z
    .union([z.number(), z.string()], { error: `Enter ${label} (e.g. ${example}).` })
    .transform((v, ctx) => {
      if (typeof v === "number") return v;
      const t = v.trim();
      if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t)) {
        ctx.addIssue({ code: "custom", message: `Enter ${label} as a number (e.g. ${example}).` });
        return z.NEVER;
      }
      return Number(t);
    })
    .pipe(
      z
        .number()
        .refine(Number.isFinite, `Enter ${label} as a number (e.g. ${example}).`)
        .refine((x) => !opts.integer || Number.isInteger(x), `Enter ${label} as a whole number (e.g. ${example}).`)
        .refine((x) => x >= bounds.min && x <= bounds.max, `${cap(label)} must be between ${bounds.min} and ${bounds.max}${opts.unit ?? ""} (e.g. ${example}).`),
    );
}

export function optionalNumberField(label: string, bounds: Bounds, example: string, opts: { integer?: boolean; unit?: string } = {}) {
  return z
    .union([z.null(), z.literal(""), numberField(label, bounds, example, opts)])
    .optional()
    .transform((v) => (v === "" || v === undefined ? null : v));
}

export const backspacingReferenceSchema = z.enum(["flange", "bead-seat"], {
  error: 'Say where the backspacing was measured to: "flange" (the flange edge) or "bead-seat".',
});

export const positionSchema = z.discriminatedUnion(
  "mode",
  [
    z.object({ mode: z.literal("offset"), offsetMm: lengthField("the offset", "mm", SETUP_LIMITS.offsetMm, "-12") }),
    z.object({
      mode: z.literal("backspacing"),
      backspacingIn: lengthField("the backspacing", "in", SETUP_LIMITS.backspacingIn, "4.5"),
      reference: backspacingReferenceSchema,
      flangeIn: lengthField("the flange allowance", "in", SETUP_LIMITS.flangeIn, "0.5"),
    }),
  ],
  { error: 'Give the wheel position as an offset (mode "offset") or a backspacing (mode "backspacing").' },
);

/** The offset (mm) a position stands for (the comparison model's rule); throws FitmentInputError outside the wheel. */
export const positionOffsetMm: (position: z.output<typeof positionSchema>, wheelWidthIn: number) => number = modelPositionOffsetMm;

export const setupSchema = z
  .object({
    tire: z
      .string({ error: "Enter a tire size (e.g. 265/70R17)." })
      .trim()
      .min(1, "Enter a tire size (e.g. 265/70R17).")
      .max(80, "That tire size is too long (e.g. 265/70R17)."),
    wheelDiameterIn: numberField("the wheel diameter", SETUP_LIMITS.wheelDiameterIn, "17", { unit: " in" }),
    wheelWidthIn: lengthField("the wheel width", "in", SETUP_LIMITS.wheelWidthIn, "9"),
    position: positionSchema,
    spacerMm: z
      .union([z.literal(""), lengthField("the spacer thickness", "mm", SETUP_LIMITS.spacerMm, "25")])
      .optional()
      .transform((v) => (v === undefined || v === "" ? 0 : v)),
  })
  .superRefine((s, ctx) => {
    let rim: number;
    try {
      rim = parseTireSize(s.tire).rimDiameterIn;
    } catch (e) {
      ctx.addIssue({ code: "custom", path: ["tire"], message: e instanceof Error ? e.message : "Not a tire size (e.g. 265/70R17)." });
      return;
    }
    if (s.wheelDiameterIn !== rim) {
      ctx.addIssue({ code: "custom", path: ["wheelDiameterIn"], message: `A ${rim} in tire needs a ${rim} in wheel; this wheel is ${s.wheelDiameterIn} in.` });
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
          ? `An offset of ${s.position.mode === "offset" ? s.position.offsetMm : ""} mm puts the mounting face outside a ${s.wheelWidthIn} in wide wheel (e.g. -12).`
          : `That backspacing puts the mounting face outside a ${s.wheelWidthIn} in wide wheel (e.g. 4.5).`,
      });
    }
  });

/** What the form holds (text allowed) and what comes out (numbers). */
export type SetupFormValues = z.input<typeof setupSchema>;
export type SetupValues = z.output<typeof setupSchema>;
export type PositionValues = z.output<typeof positionSchema>;

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
