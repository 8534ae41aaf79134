// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import type { ShopOverview } from "@/lib/shop/overview";
import { ShopOverviewView } from "./ShopOverviewView";

afterEach(cleanup);

const days = Array.from({ length: 14 }, (_, i) => {
  const date = `2026-12-${String(3 + i).padStart(2, "0")}`;
  return { date, depositsCents: 0, balancesCents: 0, refundsCents: 0, netCents: 0 };
});
days[12] = { date: "2026-12-15", depositsCents: 0, balancesCents: 323086, refundsCents: 107696, netCents: 215390 };

const overview: ShopOverview = {
  timeZone: "America/Denver",
  week: {
    from: "2026-12-14",
    to: "2026-12-20",
    bays: [
      { bayId: "b1", bayName: "Lift 1", bayKind: "lift_bay", bookings: 2, bookedMinutes: 210, openMinutes: 2400 },
      { bayId: "b2", bayName: "Rack", bayKind: "alignment_rack", bookings: 0, bookedMinutes: 0, openMinutes: 2400 },
    ],
  },
  deposits: {
    items: [
      {
        quoteId: "q1",
        quoteNumber: 1001,
        customerName: "Ada Customer",
        vehicle: "Ranch truck",
        heldCents: 107696,
        paidAt: "2026-12-03T16:00:00.000Z",
        installAt: "2026-12-14T16:00:00.000Z",
      },
      {
        quoteId: "q5",
        quoteNumber: 1005,
        customerName: "Bo Customer",
        vehicle: "Hauler",
        heldCents: 97696,
        paidAt: "2026-12-16T07:30:00.000Z",
        installAt: null,
      },
    ],
    totalCents: 205392,
  },
  takings: { from: "2026-12-03", to: "2026-12-16", days, totalCents: 215390 },
};

describe("ShopOverviewView", () => {
  it("lists each bay's bookings, hours booked against hours open and the share (210 of 2,400 min = 3.5 of 40 h, 9 %)", () => {
    render(<ShopOverviewView overview={overview} />);
    const rows = within(screen.getByTestId("overview-bays")).getAllByRole("row");
    expect(rows.map((r) => r.textContent)).toEqual([
      "BayKindBookingsBookedOpenShare booked",
      "Lift 1Lift bay23.5 h40 h9 %",
      "RackAlignment rack00 h40 h0 %",
    ]);
    expect(screen.getByText("Monday, December 14, 2026 to Sunday, December 20, 2026")).toBeTruthy();
  });

  it("lists the deposits held with their total, each linked to its quote, with the install time on the shop's clock", () => {
    render(<ShopOverviewView overview={overview} />);
    // 1,076.96 + 976.96 = 2,053.92 (by hand)
    expect(screen.getByTestId("deposits-total").textContent).toBe("$2,053.92");
    const table = screen.getByTestId("overview-deposits-table");
    expect(within(table).getByRole("link", { name: "Q-1001" }).getAttribute("href")).toBe("/shop/quotes/q1");
    expect(within(table).getByText("Mon, Dec 14, 2026, 9:00 AM MST")).toBeTruthy();
    expect(within(table).getByText("Not booked")).toBeTruthy();
  });

  it("gives the takings as a table too: one row per day, refunds netted off; the chart is hidden from screen readers", () => {
    render(<ShopOverviewView overview={overview} />);
    expect(screen.getByRole("heading", { name: "Takings, last 14 days" })).toBeTruthy();
    expect(screen.getByTestId("takings-total").textContent).toBe("$2,153.90");
    const rows = within(screen.getByTestId("takings-table")).getAllByRole("row");
    expect(rows).toHaveLength(15);
    expect(rows[13]!.textContent).toBe("Tue, Dec 15$0.00$3,230.86$1,076.96$2,153.90");
    expect(screen.getByRole("table", { name: "Takings by day" })).toBeTruthy();
    for (const region of ["This week in the bays", "Deposits held", "Takings, last 14 days"])
      expect(screen.getByRole("region", { name: region })).toBeTruthy();
  });
});
