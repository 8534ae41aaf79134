import { describe, expect, it } from "vitest";
import { workloadOf } from "./workload";

// Bay times are the shop's own settings; the figures here are invented (common practice, no source).
describe("a quote's bay time", () => {
  it("adds per-wheel and per-vehicle services, part hours of hourly work, and orders the bays trim → lift → rack", () => {
    const w = workloadOf([
      { kind: "tire", unit: "each", quantity: 4, description: "Tire" },
      { kind: "wheel", unit: "each", quantity: 4, description: "Wheel" },
      { kind: "service", unit: "each", quantity: 1, description: "Alignment", time: { minutesPerUnit: 60, bayKind: "alignment_rack" } },
      { kind: "service", unit: "each", quantity: 4, description: "Mount and balance", time: { minutesPerUnit: 20, bayKind: "lift_bay" } },
      { kind: "service", unit: "each", quantity: 4, description: "Beadlock assembly", time: { minutesPerUnit: 30, bayKind: "lift_bay" } },
      {
        kind: "service",
        unit: "hour",
        quantity: 1.5,
        description: "Fender trimming",
        time: { minutesPerUnit: 60, bayKind: "fabrication_bay" },
      },
      { kind: "service", unit: "each", quantity: 4, description: "Disposal", time: { minutesPerUnit: 0, bayKind: "lift_bay" } },
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
      { kind: "service", unit: "hour", quantity: 0.1, description: "Check", time: { minutesPerUnit: 60, bayKind: "lift_bay" } },
      { kind: "service", unit: "each", quantity: 3, description: "Odd", time: { minutesPerUnit: 7.5, bayKind: "lift_bay" } },
    ]);
    // 15 + 6 + 22.5 = 43.5 → 44 whole minutes.
    expect(w.segments).toEqual([{ bayKind: "lift_bay", minutes: 44 }]);
  });

  it("a quote of parts alone takes no bay time", () => {
    expect(workloadOf([{ kind: "tire", unit: "each", quantity: 4, description: "Tire" }])).toEqual({ segments: [], minutes: 0, parts: [] });
  });
});
