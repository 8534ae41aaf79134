import { describe, expect, it } from "vitest";
import type { BayKind, QuoteLineUnit } from "@/lib/platform/db/types";
import { type WorkLine, workloadOf } from "./workload";

/** A catalog service line: `quantity` units of `unit` at the shop's `minutesPerUnit` in a bay of `bayKind`. */
const service = (
  description: string,
  quantity: number,
  minutesPerUnit: number,
  bayKind: BayKind,
  unit: QuoteLineUnit = "each",
): WorkLine => ({
  kind: "service",
  unit,
  quantity,
  description,
  time: { minutesPerUnit, bayKind },
});

// Bay times are the shop's own settings; the figures here are invented (common practice, no source).
describe("a quote's bay time", () => {
  it("adds per-wheel and per-vehicle services, part hours of hourly work, and orders the bays trim → lift → rack", () => {
    const w = workloadOf([
      { kind: "tire", unit: "each", quantity: 4, description: "Tire" },
      { kind: "wheel", unit: "each", quantity: 4, description: "Wheel" },
      service("Alignment", 1, 60, "alignment_rack"),
      service("Mount and balance", 4, 20, "lift_bay"),
      service("Beadlock assembly", 4, 30, "lift_bay"),
      service("Fender trimming", 1.5, 60, "fabrication_bay", "hour"),
      service("Disposal", 4, 0, "lift_bay"),
    ]);
    expect(w.segments).toEqual([
      { bayKind: "fabrication_bay", minutes: 90 },
      { bayKind: "lift_bay", minutes: 80 + 120 },
      { bayKind: "alignment_rack", minutes: 60 },
    ]);
    expect(w.minutes).toBe(350);
    expect(w.parts.map((p) => p.description)).toEqual(["Alignment", "Mount and balance", "Beadlock assembly", "Fender trimming"]);
  });

  it("counts hand-written hourly labour as lift time and rounds part minutes up", () => {
    const w = workloadOf([
      { kind: "custom", unit: "hour", quantity: 0.25, description: "Extra labour" },
      { kind: "custom", unit: "each", quantity: 1, description: "Valve caps" },
      service("Check", 0.1, 60, "lift_bay", "hour"),
      service("Odd", 3, 7.5, "lift_bay"),
    ]);
    // 15 + 6 + 22.5 = 43.5 → 44 whole minutes.
    expect(w.segments).toEqual([{ bayKind: "lift_bay", minutes: 44 }]);
  });

  it("a quote of parts alone takes no bay time", () => {
    expect(workloadOf([{ kind: "tire", unit: "each", quantity: 4, description: "Tire" }])).toEqual({ segments: [], minutes: 0, parts: [] });
  });
});
