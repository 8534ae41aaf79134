import { describe, expect, it } from "vitest";
import type { CatalogItemRow } from "@/lib/platform/db/types";
import { summarize } from "@/lib/shop/quotes/fitment";
import { suggestedServiceLines } from "@/lib/shop/quotes/queries";

const svc = (sku: string, service_type: CatalogItemRow["service_type"], price_cents: number) =>
  ({ id: sku, sku, description: sku, price_cents, kind: "service", service_type, service_unit: "per_wheel" }) as CatalogItemRow;
const wheel = (beadlock: boolean) => ({ id: "w", kind: "wheel", beadlock }) as CatalogItemRow;
const current = { boltPattern: "6x5.5", tireSize: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };

describe("services suggested from the pick", () => {
  const all = [
    svc("MB", "mount_balance", 3000),
    svc("BL", "beadlock_assembly", 4500),
    svc("VS", "valve_stem", 500),
    svc("AL", "alignment", 12900),
    svc("DP", "disposal", 400),
  ];

  it("same size, plain wheel: mount and balance, valve stems and disposal per wheel, no alignment", () => {
    const fit = summarize(current, "265/70R17", { diameterIn: 17, widthIn: 8, offsetMm: 25, beadlock: false });
    expect(suggestedServiceLines(all, wheel(false), 4, fit).map((l) => `${l.sku}×${l.quantity}`)).toEqual(["MB×4", "VS×4", "DP×4"]);
  });

  it("a beadlock wheel and a 70 mm taller tire: beadlock assembly per wheel and an alignment; trimming at the fabrication rate when the catalog has none", () => {
    // 315/70R17 vs 265/70R17: +70 mm diameter (ISO 4000-1: D = d + 2H) — past the 25.4 mm alignment rule (common practice, no source).
    const fit = summarize(current, "315/70R17", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: true });
    const lines = suggestedServiceLines(all, wheel(true), 5, fit, 14500);
    expect(lines.map((l) => `${l.sku || l.description}×${l.quantity}`)).toEqual([
      "MB×5",
      "BL×5",
      "VS×5",
      "AL×1",
      "Fender trimming labour×1",
      "DP×5",
    ]);
    expect(lines.find((l) => l.kind === "custom")?.unit_price_cents).toBe(14500);
  });

  it("fender trimming follows the outer-reach finding (more than 25 mm further outboard; common practice, no source), not the words of a warning", () => {
    // 17x9 −12 against 17x8 +25: the wheel plane moves 37 mm outboard, past the 25 mm rule.
    const wide = summarize(current, "315/70R17", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: false });
    const trims = (fit: typeof wide) =>
      suggestedServiceLines(all, wheel(false), 4, fit, 14500).some((l) => l.description === "Fender trimming labour");
    expect(trims({ ...wide, warnings: [] })).toBe(true);
    const same = summarize(current, "265/70R17", { diameterIn: 17, widthIn: 8, offsetMm: 25, beadlock: false });
    expect(trims({ ...same, warnings: ["Reaches 30 mm (1.2 in) further outboard: check fender clearance."] })).toBe(false);
  });
});
