/**
 * The two readers of a setup in a query string (the codec is url.ts):
 * `decodeSetupParams` never fails (the workspace: each value that cannot be used falls back and
 * is reported as a `LinkProblem`), `setupFromQuery` is strict (the garage pages: null unless the
 * link gives a whole valid setup).
 */
import { DEFAULT_FLANGE_IN } from "@/lib/fitment/offset";
import { parseTireSize } from "@/lib/fitment/tireSize";
import { checkSetup } from "./check";
import { BACKSPACING_REFERENCE_LABEL, SETUP_FIELD_LABEL } from "./fields";
import {
  type BackspacingReference,
  type Position,
  SETUP_LIMITS,
  type Setup,
  type SetupForm,
  TIRE_TEXT_MAX,
  positionOffsetMm,
} from "./model";
import { readLengthValue } from "./read";
import {
  type LinkProblem,
  type ParamKey,
  type QueryLike,
  REFERENCE_PARAM_VALUE,
  SETUP_PARAM,
  type SetupPrefix,
  shownNumber,
  toParams,
} from "./url";

/**
 * A reference as a link gives it: what it names, "default" when the link gives none (the
 * flange edge), or null when it names neither. The stored spelling `bead-seat` is read too.
 */
export function readReferenceParam(raw: string | null): BackspacingReference | "default" | null {
  if (raw === null) return "default";
  if (raw === REFERENCE_PARAM_VALUE.flange) return "flange";
  if (raw === REFERENCE_PARAM_VALUE["bead-seat"] || raw === "bead-seat") return "bead-seat";
  return null;
}

/**
 * Reads one setup from query parameters, strictly (unlike the workspace's tolerant reader):
 * null when missing or invalid, so a page never acts on a setup the user did not give.
 *
 * @example
 * setupFromQuery("p", "pt=35x12.50R17LT&pd=17&pw=9&pb=4-1/2&pr=bead");
 * // { tire: "35x12.50R17LT", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "backspacing", backspacingIn: 4.5, reference: "bead-seat", flangeIn: 0.5 }, spacerMm: 0 }
 */
export function setupFromQuery(prefix: SetupPrefix, q: QueryLike): Setup | null {
  const p = toParams(q);
  const get = (key: ParamKey) => p.get(`${prefix}${SETUP_PARAM[key]}`) ?? undefined;
  const tire = get("tire");
  if (!tire) return null;
  const reference = readReferenceParam(get("reference") ?? null);
  if (reference === null) return null;
  const position: SetupForm["position"] =
    get("backspacingIn") !== undefined
      ? {
          mode: "backspacing",
          backspacingIn: get("backspacingIn"),
          reference: reference === "default" ? "flange" : reference,
          flangeIn: get("flangeIn") ?? String(DEFAULT_FLANGE_IN),
        }
      : { mode: "offset", offsetMm: get("offsetMm") ?? "" };
  const r = checkSetup(
    {
      tire,
      wheelDiameterIn: get("wheelDiameterIn") ?? "",
      wheelWidthIn: get("wheelWidthIn") ?? "",
      position,
      spacerMm: get("spacerMm") ?? "",
    },
    [],
    { text: true },
  );
  return r.ok ? r.value : null;
}

export type Bounds = { min: number; max: number };
/** A parameter's value, or why it cannot be used. */
export type ParamRead = { value: number } | { reason: string };

/** Why a value is outside its bounds, in the link's unit (`unit` with its leading space, or "°"). */
export const outsideReason = ({ min, max }: Bounds, unit: string) => `is outside ${shownNumber(min)}–${shownNumber(max)}${unit}`;

/** A length parameter read as a form reads it (fractions and units), within bounds, or why not. */
function readLengthParam(raw: string, unit: "in" | "mm", bounds: Bounds): ParamRead {
  if (raw.trim() === "") return { reason: "is empty" };
  const r = readLengthValue(raw, unit, true);
  if ("problem" in r)
    return {
      reason: r.problem === "fraction" ? `is a fraction, which is read only in inches (write ${raw.trim()} in)` : "is not a number",
    };
  if (r.value < bounds.min || r.value > bounds.max) return { reason: outsideReason(bounds, ` ${unit}`) };
  return { value: r.value === 0 ? 0 : r.value };
}

/** The setup parameters by the screen's labels (fields.ts). */
const PARAM_LABEL: Record<ParamKey, string> = {
  tire: SETUP_FIELD_LABEL.tire,
  wheelDiameterIn: SETUP_FIELD_LABEL.wheelDiameterIn,
  wheelWidthIn: SETUP_FIELD_LABEL.wheelWidthIn,
  offsetMm: SETUP_FIELD_LABEL["position.offsetMm"],
  backspacingIn: SETUP_FIELD_LABEL["position.backspacingIn"],
  reference: SETUP_FIELD_LABEL["position.reference"],
  flangeIn: SETUP_FIELD_LABEL["position.flangeIn"],
  spacerMm: SETUP_FIELD_LABEL.spacerMm,
};

const positionText = (pos: Position): string =>
  pos.mode === "offset"
    ? `an offset of ${shownNumber(pos.offsetMm)} mm`
    : `a backspacing of ${shownNumber(pos.backspacingIn)} in to the ${BACKSPACING_REFERENCE_LABEL[pos.reference]}`;

/**
 * Reads one setup from a link, tolerantly: never throws, always returns a setup. A parameter
 * that is missing takes the value of `fallback` (a wheel diameter: the tire's rim diameter);
 * one that is not understood, out of bounds, in conflict with another or left over does too,
 * and is reported in `problems` as `side · field label` with the value used instead.
 */
export function decodeSetupParams(prefix: SetupPrefix, p: URLSearchParams, fallback: Setup, side: string, problems: LinkProblem[]): Setup {
  const get = (k: ParamKey) => p.get(`${prefix}${SETUP_PARAM[k]}`);
  const note = (k: ParamKey, reason: string, used: string) =>
    problems.push({ field: `${side} · ${PARAM_LABEL[k]}`, given: get(k) ?? "", reason, used });
  const length = (k: ParamKey, unit: "in" | "mm", bounds: Bounds, used: () => string): number | undefined => {
    const raw = get(k);
    if (raw === null) return undefined;
    const r = readLengthParam(raw, unit, bounds);
    if ("value" in r) return r.value;
    note(k, r.reason, used());
    return undefined;
  };

  let tire = fallback.tire;
  let rim = fallback.wheelDiameterIn;
  const rawTire = get("tire");
  if (rawTire !== null) {
    try {
      if (rawTire.trim().length > TIRE_TEXT_MAX) throw new Error("too long");
      rim = parseTireSize(rawTire).rimDiameterIn;
      tire = rawTire.trim();
    } catch (e) {
      note(
        "tire",
        e instanceof Error && e.message === "too long" ? `is longer than ${TIRE_TEXT_MAX} characters` : "is not a tire size",
        fallback.tire,
      );
    }
  }
  let diameter = length("wheelDiameterIn", "in", SETUP_LIMITS.wheelDiameterIn, () => `${shownNumber(rim)} in (the tire's rim diameter)`);
  if (diameter !== undefined && diameter !== rim) {
    note("wheelDiameterIn", `does not match the ${shownNumber(rim)} in tire`, `${shownNumber(rim)} in`);
    diameter = undefined;
  }
  const width = length("wheelWidthIn", "in", SETUP_LIMITS.wheelWidthIn, () => `${shownNumber(fallback.wheelWidthIn)} in`);
  const wheelWidthIn = width ?? fallback.wheelWidthIn;
  const fits = (pos: Position) => {
    try {
      positionOffsetMm(pos, wheelWidthIn);
      return true;
    } catch {
      return false;
    }
  };
  const fallbackPosition: Position = fits(fallback.position) ? fallback.position : { mode: "offset", offsetMm: 0 };
  const instead = () => positionText(fallbackPosition);

  const rawB = get("backspacingIn");
  const rawO = get("offsetMm");
  let position: Position | undefined;
  // A valid backspacing wins over an offset; a bad backspacing falls to a valid offset.
  const offsetOf = () => (rawO === null ? undefined : readLengthParam(rawO, "mm", SETUP_LIMITS.offsetMm));
  const bs = length("backspacingIn", "in", SETUP_LIMITS.backspacingIn, () => {
    const o = offsetOf();
    return o && "value" in o ? `the link's offset, ${shownNumber(o.value)} mm` : instead();
  });
  if (bs !== undefined) {
    const read = readReferenceParam(get("reference"));
    if (read === null)
      note(
        "reference",
        `is not ${REFERENCE_PARAM_VALUE.flange} or ${REFERENCE_PARAM_VALUE["bead-seat"]}`,
        `the ${BACKSPACING_REFERENCE_LABEL.flange}`,
      );
    const reference: BackspacingReference = read === null || read === "default" ? "flange" : read;
    const f = length("flangeIn", "in", SETUP_LIMITS.flangeIn, () => `${shownNumber(DEFAULT_FLANGE_IN)} in`);
    position = { mode: "backspacing", backspacingIn: bs, reference, flangeIn: f ?? DEFAULT_FLANGE_IN };
    if (rawO !== null) note("offsetMm", "is left out: the link also gives a backspacing", `the backspacing, ${shownNumber(bs)} in`);
  } else {
    const off = length("offsetMm", "mm", SETUP_LIMITS.offsetMm, instead);
    if (off !== undefined) position = { mode: "offset", offsetMm: off };
    // A reference or flange allowance means nothing without a backspacing.
    for (const k of ["reference", "flangeIn"] as const) {
      if (get(k) !== null)
        note(
          k,
          rawB === null ? "is left out: the link gives no backspacing" : "is left out with the backspacing",
          position ? positionText(position) : instead(),
        );
    }
  }
  if (position !== undefined && !fits(position)) {
    note(
      position.mode === "offset" ? "offsetMm" : "backspacingIn",
      `puts the mounting face outside a ${shownNumber(wheelWidthIn)} in wide wheel`,
      instead(),
    );
    position = undefined;
  }
  if (position === undefined && rawB === null && rawO === null && fallbackPosition !== fallback.position) {
    problems.push({
      field: `${side} · ${PARAM_LABEL.offsetMm}`,
      given: "",
      reason: `is not in the link, and the default, ${positionText(fallback.position)}, does not fit a ${shownNumber(wheelWidthIn)} in wide wheel`,
      used: instead(),
    });
  }

  const spacer = length("spacerMm", "mm", SETUP_LIMITS.spacerMm, () => "no spacer");
  return { tire, wheelDiameterIn: diameter ?? rim, wheelWidthIn, position: position ?? fallbackPosition, spacerMm: spacer ?? 0 };
}

/** True when the query carries a parameter of either setup. */
export function hasSetupParams(p: URLSearchParams): boolean {
  const letters = Object.values(SETUP_PARAM).join("");
  return [...p.keys()].some((k) => new RegExp(`^[cp][${letters}]$`).test(k));
}
