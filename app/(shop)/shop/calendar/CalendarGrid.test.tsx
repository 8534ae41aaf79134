// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { calendarWith, liftStretch } from "@/lib/shop/bookings/calendarFixture";
import { CalendarGrid } from "./CalendarGrid";

vi.mock("next/link", () => import("@/tests/support/nextLink"));
afterEach(cleanup);

// Denver is UTC−7 in December (49 CFR §71.9): 15:00Z is 8:00 AM on the shop's clock. The booking is invented.
const data = calendarWith("2026-12-14T16:20:00.000Z", [liftStretch("2026-12-14T16:20:00.000Z")]);

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
