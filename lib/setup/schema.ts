/**
 * Zod for forms and route handlers: the one adapter of `checkSetup` (check.ts) — same rules,
 * same paths, same messages — and the length and number fields other forms share. Forms send
 * text: inch fields accept fractions (`4-3/4`, `4¾`, `4 7/8 in`, `3.5"`) and mm fields accept
 * `120 mm` or `1 in` but refuse a bare fraction (`1-1/2` is inches, never 1.5 mm), all read by
 * the engine's `parseLength` (read.ts); API callers may send plain numbers. The output is always
 * numbers in the engine's units.
 */
import { z } from "zod";
import { DEFAULT_FLANGE_IN, MM_PER_IN } from "@/lib/fitment";
import { type Checked, checkSetup } from "./check";
import { boundText, lengthMessages } from "./messages";
import type { Setup, SetupForm } from "./model";
import { readLengthValue, tidy } from "./read";

/**
 * A zod schema that runs a zod-free check: its issues become zod's (same paths and messages)
 * and its clean copy is the output. `I` is what the schema takes (a form's text, say).
 *
 * @example
 * const setupSchema = zodFromCheck<Setup, SetupForm>((v) => checkSetup(v, [], { text: true }));
 */
export function zodFromCheck<T, I = unknown>(check: (v: unknown) => Checked<T>): z.ZodType<T, I> {
  return z
    .unknown()
    .superRefine((v, ctx) => {
      const r = check(v);
      if (!r.ok) for (const i of r.issues) ctx.addIssue({ code: "custom", path: i.path, message: i.message });
    })
    .transform((v) => {
      const r = check(v);
      // superRefine has already rejected anything invalid, so this is always ok here.
      return (r.ok ? r.value : v) as T;
    }) as unknown as z.ZodType<T, I>;
}

/** A setup from a form or a request: text or numbers in, a `Setup` out (check.ts). */
export const setupSchema = zodFromCheck<Setup, SetupForm>((v) => checkSetup(v, [], { text: true }));

const plain = (v: number) => String(v);

/**
 * Form text for a stored setup (numbers as text, the way the form holds them).
 *
 * @example
 * setupToForm({ tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 }).position;
 * // { mode: "offset", offsetMm: "25", backspacingIn: "", reference: "flange", flangeIn: "0.5" }
 */
export function setupToForm(s: Setup): SetupForm {
  const p = s.position;
  return {
    tire: s.tire,
    wheelDiameterIn: plain(s.wheelDiameterIn),
    wheelWidthIn: plain(s.wheelWidthIn),
    position: {
      mode: p.mode,
      offsetMm: p.mode === "offset" ? plain(p.offsetMm) : "",
      backspacingIn: p.mode === "backspacing" ? plain(p.backspacingIn) : "",
      reference: p.mode === "backspacing" ? p.reference : "flange",
      flangeIn: plain(p.mode === "backspacing" ? p.flangeIn : DEFAULT_FLANGE_IN),
    },
    spacerMm: s.spacerMm ? plain(s.spacerMm) : "",
  };
}

/** A blank setup for new forms. */
export const EMPTY_SETUP_FORM: SetupForm = {
  tire: "",
  wheelDiameterIn: "",
  wheelWidthIn: "",
  position: { mode: "offset", offsetMm: "", backspacingIn: "", reference: "flange", flangeIn: plain(DEFAULT_FLANGE_IN) },
  spacerMm: "",
};

type Bounds = { min: number; max: number };

/**
 * A length typed as text or given as a number; returns the number in `out` units. `unit` is the
 * unit the field is labelled in: a bare number is read in it, and a fraction only where it is
 * inches. `bounds` are in `out` units; messages state them in `unit`, name the field by `label`
 * (as the screen labels it) and give `example`, which the field must accept.
 */
export function lengthField(label: string, unit: "in" | "mm", bounds: Bounds, example: string, out: "in" | "mm" = unit) {
  const m = lengthMessages(label, unit, example);
  const shown = (v: number, side: "min" | "max") =>
    unit === out ? String(v) : boundText(unit === "in" ? v / MM_PER_IN : v * MM_PER_IN, side, 2);
  return z
    .union([z.number(), z.string()], { error: m.empty })
    .transform((v, ctx) => {
      if (typeof v === "number") return v;
      const r = readLengthValue(v, unit, true);
      if ("value" in r) return unit === out ? r.value : tidy(unit === "in" ? r.value * MM_PER_IN : r.value / MM_PER_IN);
      ctx.addIssue({ code: "custom", message: m.because(r.problem, v) });
      return z.NEVER;
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
        .refine(
          (x) => x >= bounds.min && x <= bounds.max,
          `${label}: must be between ${bounds.min} and ${bounds.max}${opts.unit ?? ""}, e.g. ${example}.`,
        ),
    );
}

export function optionalNumberField(label: string, bounds: Bounds, example: string, opts: { integer?: boolean; unit?: string } = {}) {
  return blankAs(label, null, numberField(label, bounds, example, opts).nullable());
}
