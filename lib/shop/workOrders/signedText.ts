/**
 * A signed step's record in words, for the sheet and its printout: torque in both units (a
 * wrench may read either), pressure in the unit it was set in with the other beside it.
 */
import { TORQUE_UNIT_SYMBOL, kpaToPsi, torqueFromNm, type TorqueUnit } from "@/lib/fitment";
import type { SignedOff } from "./api";
import { FIELD_LABEL, MATCH_MOUNT_LABEL, type MatchMountMethod } from "./vocabulary";

const one = (n: number) => (Math.round(n * 10) / 10).toString();

/**
 * @example
 * torqueWords(23.049, "ftlb"); // "17 ft·lb (23 N·m)"
 */
export function torqueWords(nm: number, unit: TorqueUnit): string {
  const other: TorqueUnit = unit === "ftlb" ? "nm" : "ftlb";
  return `${one(torqueFromNm(nm, unit))} ${TORQUE_UNIT_SYMBOL[unit]} (${one(torqueFromNm(nm, other))} ${TORQUE_UNIT_SYMBOL[other]})`;
}

/**
 * @example
 * pressureWords(241.3165, "psi"); // "35 psi (241 kPa)"
 */
export function pressureWords(kpa: number, unit: "psi" | "kPa"): string {
  return unit === "psi" ? `${one(kpaToPsi(kpa))} psi (${Math.round(kpa)} kPa)` : `${Math.round(kpa)} kPa (${one(kpaToPsi(kpa))} psi)`;
}

type Readings = Record<"camberLeft" | "camberRight" | "casterLeft" | "casterRight" | "toeTotal", number>;
const readingWords = (r: Readings) =>
  `camber ${r.camberLeft}° / ${r.camberRight}°, caster ${r.casterLeft}° / ${r.casterRight}°, total toe ${r.toeTotal}°`;

/** Every field a stored step may hold (schema.ts's output); each step has its own few. */
interface StepData extends Readings {
  tire: string;
  wheel: string;
  dotCode: string;
  dotWeek: number;
  dotYear: number;
  method: MatchMountMethod;
  ringBolts: number;
  torqueNm: number;
  unit: string;
  pressureKpa: number;
  /** Set below the road minimum on the tire maker's load table (the technician's tick). */
  makerTable?: boolean;
  innerGrams: number;
  outerGrams: number;
  before: Readings;
  after: Readings;
  note: string;
}

/** What a signed step recorded, in one line. */
export function signedText(s: Pick<SignedOff, "step" | "data">): string {
  const d = s.data as unknown as StepData;
  switch (s.step) {
    case "fitted":
      return `${d.tire} on ${d.wheel}; DOT date code ${d.dotCode} (week ${d.dotWeek} of ${d.dotYear})`;
    case "match_mount":
      return MATCH_MOUNT_LABEL[d.method] ?? String(d.method);
    case "beadlock":
      return `${d.ringBolts} ring bolts to ${torqueWords(d.torqueNm, d.unit as TorqueUnit)}, all passes in order`;
    case "bead_seat":
      return "Beads seated following the cautions";
    case "pressure":
      return `Set cold to ${pressureWords(d.pressureKpa, d.unit as "psi" | "kPa")}${
        d.makerTable ? ", below the road minimum, to the tire maker's load table for this load" : ""
      }`;
    case "balance":
      return `${FIELD_LABEL.innerGrams.replace(" (g)", "")} ${d.innerGrams} g, outer ${d.outerGrams} g`;
    case "lug_torque":
      return `Lug nuts to ${torqueWords(d.torqueNm, d.unit as TorqueUnit)} in the star order, all passes`;
    case "alignment":
      return `Before: ${readingWords(d.before)}. After: ${readingWords(d.after)}.`;
    case "trimming":
      return `Trimming done${d.note ? `: ${d.note}` : ""}`;
  }
}
