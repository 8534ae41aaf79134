import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeTotals, divRoundHalfUp } from "./totals";

const line = (quantity: number, unitPriceCents: number, taxable = true, discountCents = 0) => ({
  quantity,
  unitPriceCents,
  discountCents,
  taxable,
});

describe("quote totals in integer cents", () => {
  it("worked example: four tires and four wheels at 8.25 %", () => {
    // By hand: 4 × 389.00 + 4 × 189.00 = 2312.00; tax 2312.00 × 0.0825 = 190.74 exactly; total 2502.74;
    // deposit 25 % = 625.685 → 625.69 (half up).
    const t = computeTotals({ lines: [line(4, 38900), line(4, 18900)], discountCents: 0, taxRateBp: 825, depositPct: 25 });
    expect(t).toMatchObject({ subtotalCents: 231200, taxableCents: 231200, taxCents: 19074, totalCents: 250274, depositCents: 62569 });
  });

  it("rounds tax once on the total, half a cent up", () => {
    // 3 × 0.10 at 8.25 %: 0.30 × 0.0825 = 0.02475 → 0.02 (below half). Per line it would be 3 × round(0.00825) = 3 × 0.01 = 0.03.
    expect(
      computeTotals({ lines: [line(1, 10), line(1, 10), line(1, 10)], discountCents: 0, taxRateBp: 825, depositPct: 0 }).taxCents,
    ).toBe(2);
    // 1.00 × 6.5 % = 0.065 → 0.07 (exactly half goes up); 1.00 × 6.49 % = 0.0649 → 0.06.
    expect(computeTotals({ lines: [line(1, 100)], discountCents: 0, taxRateBp: 650, depositPct: 0 }).taxCents).toBe(7);
    expect(computeTotals({ lines: [line(1, 100)], discountCents: 0, taxRateBp: 649, depositPct: 0 }).taxCents).toBe(6);
    // 19.99 × 7.25 % = 1.449275 → 1.45.
    expect(computeTotals({ lines: [line(1, 1999)], discountCents: 0, taxRateBp: 725, depositPct: 0 }).taxCents).toBe(145);
  });

  it("taxes only taxable lines, after their share of the quote discount", () => {
    // Parts 400.00 taxable, labour 100.00 not taxable; quote discount 50.00 splits 40.00 / 10.00 by net.
    // Taxable base 360.00 × 10 % = 36.00; total 500.00 − 50.00 + 36.00 = 486.00.
    const t = computeTotals({ lines: [line(4, 10000), line(1, 10000, false)], discountCents: 5000, taxRateBp: 1000, depositPct: 50 });
    expect(t.lines.map((l) => l.quoteDiscountShareCents)).toEqual([4000, 1000]);
    expect(t).toMatchObject({ subtotalCents: 50000, taxableCents: 36000, taxCents: 3600, totalCents: 48600, depositCents: 24300 });
  });

  it("spreads a discount's odd cents by largest remainder, so shares sum exactly", () => {
    // 1.00 over three lines of 1.00: exact shares 0.333… each → 34, 33, 33 (tie: earlier line takes the cent).
    const t = computeTotals({ lines: [line(1, 100), line(1, 100), line(1, 100)], discountCents: 100, taxRateBp: 0, depositPct: 0 });
    expect(t.lines.map((l) => l.quoteDiscountShareCents)).toEqual([34, 33, 33]);
  });

  it("applies line discounts before the quote discount", () => {
    const t = computeTotals({ lines: [line(4, 3000, true, 2000)], discountCents: 0, taxRateBp: 0, depositPct: 0 });
    expect(t.lines[0]).toMatchObject({ grossCents: 12000, netCents: 10000 });
  });

  it("refuses negative quantities, negative prices and discounts larger than the amount", () => {
    expect(() => computeTotals({ lines: [line(-1, 100)], discountCents: 0, taxRateBp: 0, depositPct: 0 })).toThrow(/Quantity/);
    expect(() => computeTotals({ lines: [line(1.505, 100)], discountCents: 0, taxRateBp: 0, depositPct: 0 })).toThrow(/Quantity/);
    expect(() => computeTotals({ lines: [line(1, -100)], discountCents: 0, taxRateBp: 0, depositPct: 0 })).toThrow(/price/);
    expect(() => computeTotals({ lines: [line(1, 100, true, 101)], discountCents: 0, taxRateBp: 0, depositPct: 0 })).toThrow(/exceed/);
    expect(() => computeTotals({ lines: [line(1, 100)], discountCents: 101, taxRateBp: 0, depositPct: 0 })).toThrow(/exceed the subtotal/);
  });

  it("half-up integer division matches the decimal rule", () => {
    expect(divRoundHalfUp(5, 10)).toBe(1);
    expect(divRoundHalfUp(4, 10)).toBe(0);
    expect(divRoundHalfUp(15, 10)).toBe(2);
  });

  it("always: whole cents, shares add up, total = subtotal − discount + tax (property)", () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            quantity: fc.integer({ min: 1, max: 8 }),
            unitPriceCents: fc.integer({ min: 0, max: 200000 }),
            taxable: fc.boolean(),
          }),
          { minLength: 1, maxLength: 12 },
        ),
        fc.integer({ min: 0, max: 3000 }),
        fc.integer({ min: 0, max: 100 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (ls, bp, pct, frac) => {
          const lines = ls.map((l) => ({ ...l, discountCents: 0 }));
          const sub = lines.reduce((s, l) => s + l.quantity * l.unitPriceCents, 0);
          const discount = Math.floor(sub * frac);
          const t = computeTotals({ lines, discountCents: discount, taxRateBp: bp, depositPct: pct });
          expect(t.lines.reduce((s, l) => s + l.quoteDiscountShareCents, 0)).toBe(discount);
          expect(t.totalCents).toBe(t.subtotalCents - discount + t.taxCents);
          for (const v of [t.taxCents, t.totalCents, t.depositCents]) expect(Number.isInteger(v) && v >= 0).toBe(true);
          expect(Math.abs(t.taxCents - (t.taxableCents * bp) / 10000)).toBeLessThanOrEqual(0.5);
        },
      ),
    );
  });

  it("hourly labour in part hours stays exact in cents; a fraction of a cent on a line rounds half up", () => {
    // 1.5 h × 145.00 = 217.50; 0.25 h × 125.00 = 31.25 (arithmetic, exact).
    const t = computeTotals({
      lines: [line(1.5, 14500, false), line(0.25, 12500, false)],
      discountCents: 0,
      taxRateBp: 825,
      depositPct: 25,
    });
    expect(t.lines.map((l) => l.grossCents)).toEqual([21750, 3125]);
    // Total 248.75; deposit 25 % = 62.1875 → 62.19 (half up); balance 248.75 − 62.19 = 186.56.
    expect(t).toMatchObject({ totalCents: 24875, depositCents: 6219, balanceCents: 18656 });
    // 0.01 h × 9.99 = 0.0999 → 0.10; 0.5 h × 0.01 = 0.005 → 0.01 (exactly half goes up).
    expect(computeTotals({ lines: [line(0.01, 999)], discountCents: 0, taxRateBp: 0, depositPct: 0 }).subtotalCents).toBe(10);
    expect(computeTotals({ lines: [line(0.5, 1)], discountCents: 0, taxRateBp: 0, depositPct: 0 }).subtotalCents).toBe(1);
    expect(() => computeTotals({ lines: [line(1.255, 100)], discountCents: 0, taxRateBp: 0, depositPct: 0 })).toThrow(/two decimals/);
  });

  it("deposit and balance always add up to the total", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 10_000_000 }), fc.integer({ min: 0, max: 100 }), (price, pct) => {
        const t = computeTotals({ lines: [line(1, price)], discountCents: 0, taxRateBp: 825, depositPct: pct });
        return t.depositCents + t.balanceCents === t.totalCents && t.balanceCents >= 0;
      }),
    );
  });
});
