/**
 * How long a quote's work keeps the truck, and in which kinds of bay: from the quote's lines
 * and the shop's bay time per service (lib/shop/bookings/vocabulary.ts has the defaults). Pure.
 */
import type { BayKind, QuoteLineKind, QuoteLineUnit } from "@/lib/platform/db/types";
import { BAY_KIND_SEQUENCE, HAND_WRITTEN_HOURS_BAY, SERVICE_TIME_DEFAULTS } from "./vocabulary";

export interface WorkLine {
  kind: QuoteLineKind;
  unit: QuoteLineUnit;
  /** In the unit the line is sold in: wheels, vehicles, or hours (hundredths allowed). */
  quantity: number;
  description: string;
  /** The bay time of the line's catalog service, when the line is one and its item still exists. */
  time?: { minutesPerUnit: number; bayKind: BayKind } | null;
}

export interface Segment {
  bayKind: BayKind;
  minutes: number;
}

export interface Workload {
  /** One stretch per kind of bay, in the order the job moves through them. */
  segments: Segment[];
  minutes: number;
  /** What each line adds, for the screen that explains the length. */
  parts: { description: string; bayKind: BayKind; minutes: number }[];
}

/** One line's bay time, or null when it takes none (parts, a hand-written item). */
function lineTime(line: WorkLine): { bayKind: BayKind; minutes: number } | null {
  if (line.time) return { bayKind: line.time.bayKind, minutes: line.quantity * line.time.minutesPerUnit };
  // Hourly labour written by hand, or a service whose catalog item is gone: the hours quoted.
  if ((line.kind === "custom" || line.kind === "service") && line.unit === "hour")
    return { bayKind: HAND_WRITTEN_HOURS_BAY, minutes: line.quantity * 60 };
  // A counted service whose item is gone: one job of unknown kind, timed as "other" once.
  if (line.kind === "service") return { bayKind: SERVICE_TIME_DEFAULTS.other.bayKind, minutes: SERVICE_TIME_DEFAULTS.other.minutes };
  return null;
}

/**
 * @example
 * workloadOf([
 *   { kind: "service", unit: "each", quantity: 4, description: "Mount and balance", time: { minutesPerUnit: 20, bayKind: "lift_bay" } },
 *   { kind: "service", unit: "each", quantity: 1, description: "Alignment", time: { minutesPerUnit: 60, bayKind: "alignment_rack" } },
 * ]).segments; // [{ bayKind: "lift_bay", minutes: 80 }, { bayKind: "alignment_rack", minutes: 60 }]
 */
export function workloadOf(lines: readonly WorkLine[]): Workload {
  const byKind = new Map<BayKind, number>();
  const parts: Workload["parts"] = [];
  for (const line of lines) {
    const t = lineTime(line);
    if (!t || t.minutes <= 0) continue;
    parts.push({ description: line.description, ...t });
    byKind.set(t.bayKind, (byKind.get(t.bayKind) ?? 0) + t.minutes);
  }
  // Whole minutes, rounded up: a part hour never shortens the time held.
  const segments = BAY_KIND_SEQUENCE.filter((k) => byKind.has(k)).map((bayKind) => ({
    bayKind,
    minutes: Math.ceil(byKind.get(bayKind)! - 1e-9),
  }));
  return { segments, minutes: segments.reduce((n, s) => n + s.minutes, 0), parts };
}
