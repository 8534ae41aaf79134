import { describe, expect, it } from "vitest";
import { describeFieldErrors, fieldLabel } from "./fieldLabels";

describe("field errors in the screen's words", () => {
  it("counts lines from 1 as the editor does and names the column", () => {
    expect(fieldLabel("lines.8.discountCents")).toBe("Line 9 — discount");
    expect(fieldLabel("lines.0.quantity")).toBe("Line 1 — quantity");
    expect(fieldLabel("lines.2.unitPriceCents")).toBe("Line 3 — unit price");
    expect(fieldLabel("lines.2.catalogItemId")).toBe("Line 3 — catalog item");
    expect(fieldLabel("discountCents")).toBe("Quote discount");
    expect(fieldLabel("notes")).toBe("Notes for the customer");
    expect(fieldLabel("vehicle.hubBoreMm")).toBe("Hub bore (mm)");
    expect(fieldLabel("wheelItemId")).toBe("Wheel");
  });

  it("lists the messages in line order, quote fields first", () => {
    expect(
      describeFieldErrors({
        "lines.10.quantity": ["Enter a quantity."],
        "lines.8.discountCents": ["Too much."],
        discountCents: ["Cannot be negative."],
      }),
    ).toEqual(["Quote discount: Cannot be negative.", "Line 9 — discount: Too much.", "Line 11 — quantity: Enter a quantity."]);
    expect(describeFieldErrors(undefined)).toEqual([]);
  });
});
