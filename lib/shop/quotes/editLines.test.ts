import { describe, expect, it } from "vitest";
import { type EditLine, bodyOf, formOf, isDirty, lineFromCatalog } from "./editLines";

const hour: EditLine = {
  key: "a",
  kind: "custom",
  unit: "hour",
  catalogItemId: null,
  sku: "",
  description: "Labour",
  quantity: "1 1/2",
  unitPrice: "145",
  discount: "",
  taxable: false,
};
/** The same line as the request body holds it: 1 1/2 h → 1.5; $145 → 14 500 cents. */
const hourInCents = {
  kind: "custom",
  unit: "hour",
  catalogItemId: null,
  sku: "",
  description: "Labour",
  quantity: 1.5,
  unitPriceCents: 14500,
  discountCents: 0,
  taxable: false,
} as const;

describe("the editor's form", () => {
  it("becomes the request body in cents and hours (1 1/2 h → 1.5; 145 → 14500 cents)", () => {
    const r = bodyOf({ lines: [hour], discount: "", notes: "n" });
    expect(r.body).toEqual({
      lines: [hourInCents],
      discountCents: 0,
      notes: "n",
    });
  });

  it("names every problem as the screen does, counting lines from 1", () => {
    const r = bodyOf({
      lines: [hour, { ...hour, key: "b", unit: "each", quantity: "1.5", unitPrice: "12,50", description: " " }],
      discount: "-3",
      notes: "",
    });
    expect(r.problems).toEqual([
      "Line 2 — quantity: Count whole items: 1.5 is not a whole number.",
      "Line 2 — description: Describe the line.",
      "Line 2 — unit price: Enter the unit price in dollars, like 129.50.",
      "Quote discount: Enter the quote discount in dollars (0 or more).",
    ]);
  });

  it("is dirty only while it differs from what is saved", () => {
    const saved = formOf({
      lines: [{ id: "a", ...hourInCents }],
      quote: { discountCents: 0, notes: "" },
    });
    expect(saved.lines[0]!.quantity).toBe("1.5");
    expect(isDirty(saved, saved)).toBe(false);
    expect(isDirty({ ...saved, notes: "x" }, saved)).toBe(true);
    expect(isDirty({ ...saved, lines: [] }, saved)).toBe(true);
  });

  it("adds catalog items with the quote's wheel count when sold per wheel, one otherwise", () => {
    expect(
      lineFromCatalog({ id: "t", kind: "service", sku: "TP", description: "TPMS", priceCents: 1800, serviceUnit: "per_wheel" }, 5),
    ).toMatchObject({ quantity: "5", unit: "each", unitPrice: "18.00", taxable: false });
    expect(
      lineFromCatalog({ id: "f", kind: "service", sku: "FT", description: "Trim", priceCents: 14500, serviceUnit: "per_hour" }, 4),
    ).toMatchObject({ quantity: "1", unit: "hour" });
    expect(
      lineFromCatalog({ id: "w", kind: "wheel", sku: "W", description: "Wheel", priceCents: 100, serviceUnit: null }, 4),
    ).toMatchObject({ quantity: "4", kind: "wheel", taxable: true });
  });
});
