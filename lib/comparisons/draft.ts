/**
 * What people type into the comparison form (text per field): the form text for a validated
 * comparison input, and the tire field's pull on the wheel diameter. Reading the text back (every
 * field's message) and rewriting it for a unit switch is readDraft.ts, apart so that the first
 * screen, which only shows text, does not ship it.
 */
import { DEFAULT_FLANGE_IN } from "@/lib/fitment/offset";
import { KM_PER_MILE, inToMm, mmToIn } from "@/lib/fitment/units";
import { formatLength } from "@/lib/fitment/length";
import { parseTireSize } from "@/lib/fitment/tireSize";
import type { BackspacingReference, Setup } from "@/lib/setup/model";
import { tidy } from "@/lib/setup/read";
import type { DisplayPrefs } from "./format";
import type { ComparisonInput } from "./model";

export interface SetupDraft {
  tire: string;
  diameter: string;
  width: string;
  mode: "offset" | "backspacing";
  offset: string;
  backspacing: string;
  reference: BackspacingReference;
  flange: string;
  spacer: string;
}

export interface VehicleDraft {
  kpi: string;
  axle: string;
  top: string;
  /** Cruise speeds, comma-separated, in mph (inch units) or km/h (metric units). */
  cruise: string;
  /** Fender line from the hub face, in the display unit; empty = not entered. */
  fender: string;
  /** First-gear ratio; empty = not entered (no crawl ratio then). */
  first: string;
  /** Transfer-case low-range ratio; empty = not entered. */
  low: string;
  /**
   * The exact values behind `cruise` and `fender` as last generated from an input: while the
   * text is unchanged these are read back, so switching units does not round 60 mph to 60.27.
   */
  exact?: { cruise: string | null; cruiseMph: number[]; fender: string | null; fenderMm: number | null };
}

export interface Draft {
  current: SetupDraft;
  planned: SetupDraft;
  vehicle: VehicleDraft;
}

/** Field errors keyed by the input path, e.g. `planned.position.backspacingIn`. */
export type DraftErrors = Record<string, string>;

const plain = (v: number, decimals = 4): string => String(tidy(Number(v.toFixed(decimals))));

/** Inches as typed text: "4.75" or "4-3/4" (sixteenths) without the unit. */
export function inchText(inches: number, prefs: DisplayPrefs): string {
  if (prefs.lengths === "fraction") return formatLength(inToMm(inches), { unit: "in", fraction: 16 }).replace(/ in$/, "");
  return plain(inches);
}

function setupDraft(s: Setup, prefs: DisplayPrefs): SetupDraft {
  const p = s.position;
  return {
    tire: s.tire,
    diameter: plain(s.wheelDiameterIn),
    width: plain(s.wheelWidthIn),
    mode: p.mode,
    offset: p.mode === "offset" ? plain(p.offsetMm, 2) : "",
    backspacing: p.mode === "backspacing" ? inchText(p.backspacingIn, prefs) : "",
    reference: p.mode === "backspacing" ? p.reference : "flange",
    flange: inchText(p.mode === "backspacing" ? p.flangeIn : DEFAULT_FLANGE_IN, prefs),
    spacer: s.spacerMm === 0 ? "" : plain(s.spacerMm, 2),
  };
}

/** Unit-dependent vehicle fields (cruise speeds, fender line) as text in the display unit. */
export function vehicleUnitFields(input: ComparisonInput, prefs: DisplayPrefs): Pick<VehicleDraft, "cruise" | "fender" | "exact"> {
  const v = input.vehicle;
  const cruise = v.cruiseSpeedsMph.map((mph) => (prefs.units === "metric" ? plain(mph * KM_PER_MILE, 0) : plain(mph, 1))).join(", ");
  const fender =
    v.fenderLineMm === null ? "" : prefs.units === "metric" ? plain(v.fenderLineMm, 0) : inchText(mmToIn(v.fenderLineMm), prefs);
  return { cruise, fender, exact: { cruise, cruiseMph: v.cruiseSpeedsMph, fender, fenderMm: v.fenderLineMm } };
}

/** The form text for a comparison input. */
export function draftFromInput(input: ComparisonInput, prefs: DisplayPrefs): Draft {
  const v = input.vehicle;
  return {
    current: setupDraft(input.current, prefs),
    planned: setupDraft(input.planned, prefs),
    vehicle: {
      kpi: v.kingpinInclinationDeg === null ? "" : plain(v.kingpinInclinationDeg, 2),
      axle: plain(v.axleRatio, 3),
      top: plain(v.transmissionRatio, 3),
      first: v.firstGearRatio === null ? "" : plain(v.firstGearRatio, 3),
      low: v.transferLowRatio === null ? "" : plain(v.transferLowRatio, 3),
      ...vehicleUnitFields(input, prefs),
    },
  };
}

const NUMBER_RE = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

/** A plain number as typed (a typographic minus and `unitSuffix` allowed), tidied; null when it is not one. */
export function readNumber(text: string, unitSuffix?: RegExp): number | null {
  let t = text.trim().replace(/\u2212/g, "-");
  if (unitSuffix) t = t.replace(unitSuffix, "").trim();
  if (!NUMBER_RE.test(t)) return null;
  const v = Number(t);
  return Number.isFinite(v) ? tidy(v) : null;
}

/**
 * If the wheel diameter followed the old tire (or was empty), it follows the new one: typing
 * 35x12.50R15 after a 17 in size moves the wheel diameter to 15.
 */
export function followTire(d: SetupDraft, tire: string): SetupDraft {
  const rimOf = (t: string): number | null => {
    try {
      return parseTireSize(t).rimDiameterIn;
    } catch {
      return null;
    }
  };
  const next = rimOf(tire);
  const old = rimOf(d.tire);
  const dia = readNumber(d.diameter);
  const followed = d.diameter.trim() === "" || old === null || dia === old;
  return { ...d, tire, diameter: next !== null && followed ? String(next) : d.diameter };
}
