import { describe, expect, it } from "vitest";
import { stockLevel } from "./stock";

// The rule is the product's own (common practice, no source): available = on hand − held, low at or under the mark.
describe("stockLevel", () => {
  it("subtracts what accepted quotes hold from what is on hand", () => {
    expect(stockLevel({ qtyOnHand: 12, qtyReserved: 5, lowStockAt: 4 })).toEqual({ available: 7, low: false });
  });
  it("is low at the mark and under it, not above it", () => {
    expect(stockLevel({ qtyOnHand: 8, qtyReserved: 4, lowStockAt: 4 }).low).toBe(true);
    expect(stockLevel({ qtyOnHand: 8, qtyReserved: 5, lowStockAt: 4 }).low).toBe(true);
    expect(stockLevel({ qtyOnHand: 9, qtyReserved: 4, lowStockAt: 4 }).low).toBe(false);
  });
  it("is never low without a mark, and never counted when the item is not tracked", () => {
    expect(stockLevel({ qtyOnHand: 0, qtyReserved: 0, lowStockAt: null })).toEqual({ available: 0, low: false });
    expect(stockLevel({ qtyOnHand: null, qtyReserved: 0, lowStockAt: 4 })).toEqual({ available: null, low: false });
  });
});
