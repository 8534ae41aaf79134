import { formatNumber } from "@/lib/comparisons/format";
import { TORQUE_UNIT_SYMBOL, torqueFromNm, type TorqueUnit } from "@/lib/fitment";

export const otherUnit = (unit: TorqueUnit): TorqueUnit => (unit === "ftlb" ? "nm" : "ftlb");

/**
 * A torque in the chosen unit first and the other in brackets, to 0.1 — both always shown, since
 * a wrench may read either.
 *
 * @example torquePair(24.404724, "ftlb"); // "18.0 ft·lb (24.4 N·m)"
 */
export function torquePair(nm: number, unit: TorqueUnit, trimZero = false): string {
  const show = (u: TorqueUnit) => {
    const s = formatNumber(torqueFromNm(nm, u), 1);
    return `${trimZero ? s.replace(/\.0$/, "") : s} ${TORQUE_UNIT_SYMBOL[u]}`;
  };
  return `${show(unit)} (${show(otherUnit(unit))})`;
}
