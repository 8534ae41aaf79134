import { describe, expect, it } from "vitest";
import type { CatalogItem } from "./api";
import { catalogItemFormValues, catalogItemSchema } from "./itemSchema";
import { INVENTED_WHEEL, formFieldsOf } from "./wheelTestUtil";

const wheel = { ...formFieldsOf({ ...INVENTED_WHEEL, wheel_width_in: "9", wheel_offset_mm: "-12" }), qtyOnHand: "", lowStockAt: "" };

describe("catalogItemSchema", () => {
  it("reads the form's text through the CSV's rules: blank on hand counts 0 for a wheel, blank mark is never", () => {
    const r = catalogItemSchema.parse(wheel);
    // The bolt pattern is kept in the unit it was written in, as the CSV import keeps it.
    expect(r.item).toMatchObject({ kind: "wheel", price_cents: 18900, qty_on_hand: 0, wheel_offset_mm: -12, bolt_pattern: "6x5.5" });
    expect(r.lowStockAt).toBeNull();
  });

  it("puts each message on the field that the form labels, worded with the form's label", () => {
    const r = catalogItemSchema.safeParse({ ...wheel, wheelOffsetMm: "", wheelBackspacingIn: "4.5", wheelBackspacingReference: "middle" });
    expect(r.success).toBe(false);
    const issues = r.error!.issues.map((i) => [i.path.join("."), i.message]);
    expect(issues).toEqual([["wheelBackspacingReference", "Say where the backspacing was measured to: flange or bead-seat."]]);
    const both = catalogItemSchema.safeParse({ ...wheel, wheelBackspacingIn: "4.5" });
    expect(both.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["wheelOffsetMm", "Give the offset or the backspacing, not both."],
    ]);
  });

  it("refuses a low-stock mark that is not a whole number", () => {
    const r = catalogItemSchema.safeParse({ ...wheel, lowStockAt: "2.5" });
    expect(r.error!.issues.map((i) => i.path.join("."))).toEqual(["lowStockAt"]);
  });

  it("shows a stored item in the fields it came from, and reads back to the same item", () => {
    const stored = {
      id: "1",
      kind: "wheel",
      sku: "WH-T1",
      description: "Invented 17x9 wheel",
      priceCents: 18900,
      qtyOnHand: 4,
      tireSize: null,
      tireRimIn: null,
      tireDiameterMm: null,
      wheelDiameterIn: 17,
      wheelWidthIn: 9,
      wheelOffsetMm: -12,
      wheelBackspacingIn: null,
      wheelBackspacingReference: null,
      boltPattern: "6x139.7",
      centerBoreMm: 108,
      beadlock: true,
      serviceType: null,
      serviceUnit: null,
      qtyReserved: 0,
      qtyAvailable: 4,
      lowStockAt: 2,
      lowStock: false,
      archivedAt: null,
      createdAt: "2026-01-01T00:00:00.000Z",
      updatedAt: "2026-01-01T00:00:00.000Z",
    } satisfies CatalogItem;
    const values = catalogItemFormValues(stored);
    expect(values).toMatchObject({ price: "189.00", qtyOnHand: "4", beadlock: "yes", wheelOffsetMm: "-12", lowStockAt: "2" });
    const back = catalogItemSchema.parse(values);
    expect(back.item).toMatchObject({ price_cents: 18900, qty_on_hand: 4, beadlock: true, center_bore_mm: 108, bolt_pattern: "6x139.7" });
    expect(back.lowStockAt).toBe(2);
  });
});
