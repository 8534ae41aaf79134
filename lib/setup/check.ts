/**
 * `checkSetup`: the one validation of a setup, zod-free so the workspace checks as you type
 * without shipping zod (schema.ts adapts it for forms and route handlers). Besides the bounds it
 * asks the engine what only the engine knows (the tire size designation, the wheel diameter
 * matching the tire's rim diameter, an offset or backspacing that keeps the mounting face inside
 * the wheel), so a setup that passes never makes the engine throw.
 */
import { FitmentInputError, TireSizeError } from "@/lib/fitment/errors";
import { parseTireSize } from "@/lib/fitment/tireSize";
import { SETUP_FIELD_EXAMPLE as EX, SETUP_FIELD_LABEL as L, type SetupFieldPath } from "./fields";
import { SETUP_MESSAGE, lengthMessages } from "./messages";
import {
  BACKSPACING_REFERENCES,
  type BackspacingReference,
  type Position,
  SETUP_LIMITS,
  type Setup,
  TIRE_TEXT_MAX,
  positionOffsetMm,
} from "./model";
import { readLengthValue } from "./read";

/** One problem of an input: the path of the field and a message naming it, with an example. */
export interface Issue {
  path: (string | number)[];
  message: string;
}

export type Checked<T> = { ok: true; value: T } | { ok: false; issues: Issue[] };

export const isObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** Each length field of a setup: the unit its label states and its bounds (in that unit). */
const LENGTH_FIELDS = {
  wheelDiameterIn: { unit: "in", bounds: SETUP_LIMITS.wheelDiameterIn },
  wheelWidthIn: { unit: "in", bounds: SETUP_LIMITS.wheelWidthIn },
  "position.offsetMm": { unit: "mm", bounds: SETUP_LIMITS.offsetMm },
  "position.backspacingIn": { unit: "in", bounds: SETUP_LIMITS.backspacingIn },
  "position.flangeIn": { unit: "in", bounds: SETUP_LIMITS.flangeIn },
  spacerMm: { unit: "mm", bounds: SETUP_LIMITS.spacerMm },
} as const satisfies Partial<Record<SetupFieldPath, { unit: "in" | "mm"; bounds: { min: number; max: number } }>>;

export interface CheckSetupOptions {
  /**
   * Text as a form holds it: lengths with fractions and units (read.ts), an empty spacer as none.
   * Without it every length must be a number (stored setups, the comparison API, decoded links).
   */
  text?: boolean;
}

/**
 * Validates one setup; the value returned holds only the known fields, numbers in the engine's
 * units and the tire text trimmed. Issues carry `path` before the field's own path.
 *
 * @example
 * checkSetup({ tire: "265/70R17", wheelDiameterIn: "17", wheelWidthIn: "8-1/2", position: { mode: "offset", offsetMm: "25" }, spacerMm: "" }, [], { text: true });
 * // { ok: true, value: { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8.5, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 } }
 * checkSetup({ tire: "265/70R17", wheelDiameterIn: 18, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 });
 * // { ok: false, issues: [{ path: ["wheelDiameterIn"], message: "Wheel diameter (in): a 17 in tire needs a 17 in wheel; this wheel is 18 in." }] }
 */
export function checkSetup(v: unknown, path: Issue["path"] = [], opts: CheckSetupOptions = {}): Checked<Setup> {
  const issues: Issue[] = [];
  if (!isObject(v)) return { ok: false, issues: [{ path, message: SETUP_MESSAGE.notASetup }] };
  const at = (field: string): Issue["path"] => [...path, ...field.split(".")];
  /** A length within its bounds, or NaN after recording the message. */
  const length = (field: keyof typeof LENGTH_FIELDS, raw: unknown): number => {
    const { unit, bounds } = LENGTH_FIELDS[field];
    const m = lengthMessages(L[field], unit, EX[field]);
    const r = readLengthValue(raw, unit, opts.text === true);
    if ("value" in r && r.value >= bounds.min && r.value <= bounds.max) return r.value === 0 ? 0 : r.value;
    const message = "value" in r ? m.bounds(String(bounds.min), String(bounds.max)) : m.because(r.problem, String(raw));
    issues.push({ path: at(field), message });
    return NaN;
  };

  let tire: string | null = null;
  if (typeof v.tire !== "string" || v.tire.trim() === "") issues.push({ path: at("tire"), message: SETUP_MESSAGE.tireEmpty });
  else if (v.tire.trim().length > TIRE_TEXT_MAX) issues.push({ path: at("tire"), message: SETUP_MESSAGE.tireTooLong });
  else tire = v.tire.trim();
  const wheelDiameterIn = length("wheelDiameterIn", v.wheelDiameterIn);
  const wheelWidthIn = length("wheelWidthIn", v.wheelWidthIn);

  let position: Position | null = null;
  const p = v.position;
  if (!isObject(p) || (p.mode !== "offset" && p.mode !== "backspacing"))
    issues.push({ path: at("position"), message: SETUP_MESSAGE.positionMode });
  else if (p.mode === "offset") {
    const offsetMm = length("position.offsetMm", p.offsetMm);
    if (!Number.isNaN(offsetMm)) position = { mode: "offset", offsetMm };
  } else {
    const backspacingIn = length("position.backspacingIn", p.backspacingIn);
    const reference = (BACKSPACING_REFERENCES as readonly unknown[]).includes(p.reference) ? (p.reference as BackspacingReference) : null;
    if (reference === null) issues.push({ path: at("position.reference"), message: SETUP_MESSAGE.reference });
    const flangeIn = length("position.flangeIn", p.flangeIn);
    if (!Number.isNaN(backspacingIn) && !Number.isNaN(flangeIn) && reference !== null)
      position = { mode: "backspacing", backspacingIn, reference, flangeIn };
  }
  // Empty on a form: no spacer.
  const noSpacer = v.spacerMm === undefined || v.spacerMm === null || (typeof v.spacerMm === "string" && v.spacerMm.trim() === "");
  const spacerMm = opts.text && noSpacer ? 0 : length("spacerMm", v.spacerMm);

  // Cross-checks only on fields that passed their own bounds (no second message for one mistake).
  if (tire !== null) {
    let rim: number | null = null;
    try {
      rim = parseTireSize(tire).rimDiameterIn;
    } catch (e) {
      issues.push({
        path: at("tire"),
        // The label once, then what was typed (a person sees which text was refused) and the engine's reason.
        message: SETUP_MESSAGE.tireUnreadable(
          tire,
          e instanceof TireSizeError ? e.reason : e instanceof Error ? e.message : `not a tire size, e.g. ${EX.tire}.`,
        ),
      });
    }
    if (rim !== null && !Number.isNaN(wheelDiameterIn) && wheelDiameterIn !== rim)
      issues.push({ path: at("wheelDiameterIn"), message: SETUP_MESSAGE.rimMismatch(rim, wheelDiameterIn) });
  }
  if (position !== null && !Number.isNaN(wheelWidthIn)) {
    try {
      positionOffsetMm(position, wheelWidthIn);
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      issues.push(
        position.mode === "offset"
          ? { path: at("position.offsetMm"), message: SETUP_MESSAGE.offsetOutside(position.offsetMm, wheelWidthIn) }
          : {
              path: at("position.backspacingIn"),
              message: SETUP_MESSAGE.backspacingOutside(position.backspacingIn, position.reference, wheelWidthIn),
            },
      );
    }
  }
  if (issues.length > 0 || tire === null || position === null) return { ok: false, issues };
  return { ok: true, value: { tire, wheelDiameterIn, wheelWidthIn, position, spacerMm } };
}
