/**
 * Does a wheel go on this vehicle's hub? Two checks the counter makes before a wheel is quoted:
 *
 * - bolt pattern: same bolt count and pitch circle, compared through the engine's
 *   `parseBoltPattern` (so 6x5.5 and 6x139.7 are the same drilling: 5.5 in × 25.4 = 139.7 mm,
 *   NIST SP 811). A different drilling does not bolt on: refused.
 * - centre bore against the hub's pilot diameter (common practice, no source):
 *   a bore smaller than the hub cannot seat on it (refused); a bore the size of the hub
 *   centres the wheel on the hub (hub-centric); a larger bore centres it on the lug nuts only,
 *   and hub-centric rings (outside = the wheel's bore, inside = the hub) are the usual fix.
 *   Catalog figures are given to 0.1 mm, so bores within 0.05 mm of the hub count as equal.
 *
 * When either diameter is unknown the counter is told to measure it; nothing is assumed.
 * Pure: imports only the engine.
 */
import { boltPatternsEquivalent, parseBoltPattern } from "@/lib/fitment";

/** Half the 0.1 mm step bores and hubs are listed in. */
export const BORE_MATCH_TOLERANCE_MM = 0.05;

export type HubFindingCode =
  | "bolt-pattern-matches"
  | "bolt-pattern-differs"
  | "bolt-pattern-unknown"
  | "hub-centric"
  | "needs-rings"
  | "bore-too-small"
  | "hub-bore-unknown"
  | "bore-unknown";

export interface HubFinding {
  /** refuse: the wheel does not go on; caution: it goes on with something done or checked; ok. */
  level: "refuse" | "caution" | "ok";
  code: HubFindingCode;
  message: string;
  /** For "needs-rings": the ring's outside (the wheel's bore) and inside (the hub) diameters. */
  rings?: { outerMm: number; innerMm: number };
}

export interface HubSide {
  boltPattern: string;
  hubBoreMm: number | null;
}
export interface WheelSide {
  boltPattern: string | null;
  centerBoreMm: number | null;
}

const mm = (x: number) => `${Number(x.toFixed(1))} mm`;

/**
 * @example
 * checkWheelOnHub({ boltPattern: "6x5.5", hubBoreMm: 108 }, { boltPattern: "6x139.7", centerBoreMm: 106.1 })
 *   .map((f) => f.code); // ["bolt-pattern-matches", "bore-too-small"]
 */
export function checkWheelOnHub(vehicle: HubSide, wheel: WheelSide): HubFinding[] {
  const out: HubFinding[] = [];
  if (!wheel.boltPattern) {
    out.push({
      level: "caution",
      code: "bolt-pattern-unknown",
      message: `The wheel's bolt pattern is not recorded: check it against the vehicle's ${vehicle.boltPattern} before fitting.`,
    });
  } else {
    let same: boolean | null;
    try {
      same = boltPatternsEquivalent(parseBoltPattern(wheel.boltPattern), parseBoltPattern(vehicle.boltPattern));
    } catch {
      same = null;
    }
    if (same === null)
      out.push({
        level: "caution",
        code: "bolt-pattern-unknown",
        message: `The bolt patterns ${wheel.boltPattern} and ${vehicle.boltPattern} could not be compared: check the drilling by hand.`,
      });
    else if (same)
      out.push({
        level: "ok",
        code: "bolt-pattern-matches",
        message: `Bolt pattern ${wheel.boltPattern} is the vehicle's ${vehicle.boltPattern}.`,
      });
    else
      out.push({
        level: "refuse",
        code: "bolt-pattern-differs",
        message: `The wheel is drilled ${wheel.boltPattern}; the vehicle is ${vehicle.boltPattern}: it does not bolt on.`,
      });
  }
  const { hubBoreMm: hub } = vehicle;
  const bore = wheel.centerBoreMm;
  if (hub === null && bore === null) {
    out.push({
      level: "caution",
      code: "hub-bore-unknown",
      message: "Neither the hub bore nor the wheel's centre bore is recorded: measure both before fitting.",
    });
  } else if (hub === null) {
    out.push({
      level: "caution",
      code: "hub-bore-unknown",
      message: `The vehicle's hub bore is not recorded: measure the hub and check it against the wheel's ${mm(bore!)} centre bore before fitting.`,
    });
  } else if (bore === null) {
    out.push({
      level: "caution",
      code: "bore-unknown",
      message: `The wheel's centre bore is not in the catalog: check it against the ${mm(hub)} hub before fitting.`,
    });
  } else if (bore < hub - BORE_MATCH_TOLERANCE_MM) {
    out.push({
      level: "refuse",
      code: "bore-too-small",
      message: `The wheel's ${mm(bore)} centre bore is smaller than the vehicle's ${mm(hub)} hub: it will not seat on this vehicle.`,
    });
  } else if (bore <= hub + BORE_MATCH_TOLERANCE_MM) {
    out.push({ level: "ok", code: "hub-centric", message: `Centre bore ${mm(bore)} fits the ${mm(hub)} hub (hub-centric).` });
  } else {
    out.push({
      level: "caution",
      code: "needs-rings",
      message: `The wheel's ${mm(bore)} centre bore is larger than the vehicle's ${mm(hub)} hub: fit hub-centric rings (${mm(bore)} outside, ${mm(hub)} inside), one per wheel, so the wheel centres on the hub and not on the lug nuts alone.`,
      rings: { outerMm: bore, innerMm: hub },
    });
  }
  return out;
}

/** The findings that stop a wheel being quoted for this vehicle, as one sentence. */
export function hubRefusal(findings: readonly HubFinding[]): string | null {
  const r = findings.filter((f) => f.level === "refuse");
  return r.length ? r.map((f) => f.message).join(" ") : null;
}

/** A description for a ring line the counter may add. */
export function ringLineDescription(rings: { outerMm: number; innerMm: number }): string {
  return `Hub-centric rings ${mm(rings.outerMm)} × ${mm(rings.innerMm)} (one per wheel)`;
}
