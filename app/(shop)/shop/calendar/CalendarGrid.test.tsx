// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { CalendarAnswer } from "@/lib/shop/bookings/api";
import { CalendarGrid } from "./CalendarGrid";

vi.mock("next/link", () => ({
  default: ({ href, children, ...rest }: { href: string; children: ReactNode }) => (
    <a href={href} {...rest}>
      {children}
    </a>
  ),
}));
afterEach(cleanup);

// Denver is UTC−7 in December (49 CFR §71.9): 15:00Z is 8:00 AM on the shop's clock. The booking is invented.
const data: CalendarAnswer = {
  timeZone: "America/Denver",
  from: "2026-12-14",
  days: ["2026-12-14", "2026-12-15"],
  hours: { "2026-12-14": { opens: 480, closes: 1020 }, "2026-12-15": null },
  bays: [
    { id: "lift", name: "Lift 1", kind: "lift_bay" },
    { id: "rack", name: "Rack", kind: "alignment_rack" },
  ],
  bookings: [
    {
      id: "b1",
      quoteId: "q1",
      status: "booked",
      startsAt: "2026-12-14T15:00:00.000Z",
      endsAt: "2026-12-14T16:20:00.000Z",
      when: "",
      timeZone: "America/Denver",
      sequence: 0,
      bookedBy: "customer",
      quoteNumber: 1003,
      customerName: "Ilse Varga-Pond",
      vehicleDescription: "Half-ton pickup",
      bays: [
        { bayId: "lift", bayName: "Lift 1", bayKind: "lift_bay", startsAt: "2026-12-14T15:00:00.000Z", endsAt: "2026-12-14T16:20:00.000Z" },
      ],
    },
  ],
};

describe("the staff calendar", () => {
  it("shows each day's bays, marks a closed day, and links each booking to its quote with its time and bay in words", () => {
    render(<CalendarGrid data={data} />);
    const link = screen.getByRole("link", { name: /Q-1003 · Ilse Varga-Pond/ });
    expect(link.getAttribute("href")).toBe("/shop/quotes/q1");
    expect(link.textContent).toContain("Half-ton pickup, 8:00 AM–9:20 AM, Lift 1");
    // Column 2 of the grid is the first day's first bay; rows start at 3 below the two header rows; 8:00–9:20 is rows 0–6.
    expect(link.getAttribute("style")).toMatch(/grid-column: 2;.*grid-row: 3 \/ 9/);
    expect(screen.getByText("Tuesday, December 15, 2026").textContent).toContain("closed");
    expect(screen.getAllByText("Lift 1").length).toBeGreaterThanOrEqual(2);
    expect(screen.getByRole("region", { name: "Bookings by bay" }).getAttribute("tabindex")).toBe("0");
  });

  it("says what to do when the shop has no bays", () => {
    render(<CalendarGrid data={{ ...data, bays: [], bookings: [] }} />);
    expect(screen.getByText(/No bays are set up yet/)).toBeTruthy();
  });
});
