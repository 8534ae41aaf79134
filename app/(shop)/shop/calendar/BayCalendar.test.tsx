// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { act, cleanup, render, renderHook, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { ReactNode } from "react";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import type { CalendarAnswer, SlotsAnswer } from "@/lib/shop/bookings/api";
import { calendarWith, liftStretch } from "@/lib/shop/bookings/calendarFixture";
import { BayCalendar } from "./BayCalendar";
import { bayEvents } from "./bayEvents";
import { useBookingMove } from "./useBookingMove";

vi.mock("next/link", () => import("@/tests/support/nextLink"));
vi.mock("next/navigation", () => ({ useRouter: () => ({ push: vi.fn() }) }));
// The calendar's drag selection asks the document what is under the pointer; jsdom has no layout to answer.
beforeAll(() => {
  document.elementFromPoint ??= () => null;
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// Denver is UTC−7 in December (49 CFR §71.9): 15:00Z is 8:00 AM on the shop's clock. The booking is invented:
// 8:00–9:20 AM on Lift 1 of a shop open 8:00 AM–5:00 PM.
const week = calendarWith("2026-12-14T16:20:00.000Z", [liftStretch("2026-12-14T16:20:00.000Z")]);
const day = { ...week, days: ["2026-12-14"], hours: { "2026-12-14": week.hours["2026-12-14"]! } };
const TAKEN = "That time was just taken: pick another one.";

/** Answers the move route with a refusal (once `held` resolves) and the slots route with one free start; records what was sent. */
function serveRefusal(held: Promise<void> = Promise.resolve(), refuse = true, kind: SlotsAnswer["kind"] = "install") {
  const sent: { url: string; method: string; body?: unknown }[] = [];
  const slots: SlotsAnswer = {
    kind,
    timeZone: "America/Denver",
    today: "2026-12-10",
    minutes: 80,
    length: "1 h 20 min",
    segments: [{ bayKind: "lift_bay", minutes: 80 }],
    unavailable: null,
    booking: null,
    days: [
      {
        date: "2026-12-14",
        label: "Monday, December 14, 2026",
        slots: [{ start: "2026-12-14T17:00:00.000Z", end: "2026-12-14T18:20:00.000Z", label: "10:00 AM" }],
      },
    ],
  };
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string, init?: RequestInit) => {
      sent.push({ url, method: init?.method ?? "GET", body: init?.body ? JSON.parse(String(init.body)) : undefined });
      if (url.includes("/slots")) return new Response(JSON.stringify(slots), { status: 200 });
      if (init?.method === "PUT") await held;
      if (init?.method === "DELETE")
        return new Response(JSON.stringify({ booking: { ...day.bookings[0], status: "cancelled" } }), { status: 200 });
      if (init?.method === "PUT")
        return refuse
          ? new Response(JSON.stringify({ error: TAKEN, fieldErrors: { start: [TAKEN] } }), { status: 409 })
          : new Response(JSON.stringify({ booking: day.bookings[0] }), { status: 200 });
      return new Response(JSON.stringify(day), { status: 200 });
    }),
  );
  return sent;
}

const client = () => new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: 30_000 } } });
const wrap = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client()}>{children}</QueryClientProvider>;
const renderCalendar = (data: CalendarAnswer = day) =>
  render(<BayCalendar initial={data} today="2026-12-14" askedDays />, { wrapper: wrap });

const booking = () => screen.getByRole("button", { name: /Q-1003 · Ilse Varga-Pond/ });

describe("the staff calendar", () => {
  it("puts the booking in its bay's column at its time on the shop's clock, named with quote, customer, vehicle, bay and day", () => {
    const { container } = renderCalendar();
    const bays = [...container.querySelectorAll(".rbc-row-resource .rbc-header")].map((h) => h.textContent);
    expect(bays).toEqual(["Lift 1", "Rack"]);
    const columns = [...container.querySelectorAll(".rbc-time-content .rbc-day-slot")];
    expect(columns).toHaveLength(2);
    const b = booking();
    expect(columns[0]!.contains(b)).toBe(true);
    expect(b.textContent).toContain("8:00 AM – 9:20 AM");
    expect(b.textContent).toContain("Half-ton pickup");
    expect(b.textContent).toContain("Lift 1, Monday, December 14");
    // The grid runs 8:00 AM–5:00 PM (540 min): 8:00 is its top, 80 minutes are 80/540 = 14.81 % of it.
    expect(b.style.top).toBe("0%");
    expect(Number.parseFloat(b.style.height)).toBeCloseTo((80 / 540) * 100, 1);
    expect(screen.getByRole("region", { name: "Bookings by bay" }).getAttribute("tabindex")).toBe("0");
  });

  it("shows the week a column per day and bay, with a closed day marked", () => {
    const { container } = renderCalendar({
      ...week,
      from: "2026-12-13",
      days: ["2026-12-13", "2026-12-14", "2026-12-15", "2026-12-16", "2026-12-17", "2026-12-18", "2026-12-19"],
    });
    expect(container.querySelectorAll(".rbc-time-content .rbc-day-slot")).toHaveLength(14); // 7 days × 2 bays
    expect(screen.getAllByText("closed").length).toBeGreaterThanOrEqual(2); // Tuesday the 15th, under each bay
  });

  it("picks a booking from the keyboard: its quote's link, and Move… with the free starts; a refusal is said in a live region", async () => {
    const sent = serveRefusal();
    const user = userEvent.setup();
    renderCalendar();
    booking().focus();
    await user.keyboard("{Enter}");
    const panel = screen.getByRole("region", { name: "Selected booking" });
    expect(within(panel).getByRole("link", { name: "Open quote Q-1003" }).getAttribute("href")).toBe("/shop/quotes/q1");
    await user.click(within(panel).getByRole("button", { name: "Move…" }));
    await user.click(await within(panel).findByText("10:00 AM"));
    await user.click(within(panel).getByRole("button", { name: /^Move to 10:00 AM/ }));
    await within(panel).findByText(TAKEN);
    expect(sent.find((r) => r.method === "PUT")).toEqual({
      url: "/api/shop/bookings/b1",
      method: "PUT",
      body: { start: "2026-12-14T17:00:00.000Z" },
    });
    // Nothing moved on the calendar.
    expect(booking().style.top).toBe("0%");
  });

  it("a booking on a quote another staff member wrote: no dead quote link, its work order instead (made on first open)", async () => {
    const sent = serveRefusal();
    const user = userEvent.setup();
    const others = { ...day, bookings: day.bookings.map((b) => ({ ...b, quoteOpen: false })) };
    renderCalendar(others);
    booking().focus();
    await user.keyboard("{Enter}");
    const panel = screen.getByRole("region", { name: "Selected booking" });
    expect(within(panel).queryByRole("link", { name: /Open quote/ })).toBeNull();
    expect(within(panel).getByText(/Quote Q-1003 was written by someone else at the counter/)).toBeTruthy();
    await user.click(within(panel).getByRole("button", { name: "Open the work order" }));
    await waitFor(() =>
      expect(sent.find((r) => r.url === "/api/shop/work-orders")).toEqual({
        url: "/api/shop/work-orders",
        method: "POST",
        body: { quoteId: "q1" },
      }),
    );
  });

  it("links the work order once the job has one", async () => {
    const user = userEvent.setup();
    renderCalendar({ ...day, bookings: day.bookings.map((b) => ({ ...b, workOrderId: "w1" })) });
    booking().focus();
    await user.keyboard("{Enter}");
    const panel = screen.getByRole("region", { name: "Selected booking" });
    expect(within(panel).getByRole("link", { name: "Open the work order" }).getAttribute("href")).toBe("/shop/work-orders/w1");
    expect(within(panel).getByRole("link", { name: "Open quote Q-1003" })).toBeTruthy();
  });

  it("after a move, says so and reloads the calendar from the server", async () => {
    const sent = serveRefusal(Promise.resolve(), false);
    const user = userEvent.setup();
    renderCalendar();
    await user.click(booking());
    const panel = screen.getByRole("region", { name: "Selected booking" });
    await user.click(within(panel).getByRole("button", { name: "Move…" }));
    await user.click(await within(panel).findByText("10:00 AM"));
    await user.click(within(panel).getByRole("button", { name: /^Move to 10:00 AM/ }));
    await screen.findByText("Moved; the customer is e-mailed the updated calendar entry.");
    await waitFor(() => expect(sent.filter((r) => r.url.startsWith("/api/shop/bookings?"))).toHaveLength(1));
    expect(sent.find((r) => r.url.startsWith("/api/shop/bookings?"))!.url).toBe("/api/shop/bookings?from=2026-12-14&days=1");
  });

  it("moves a re-check as it moves an install: its own free starts under its own field name, sent to the booking's move route", async () => {
    const sent = serveRefusal(Promise.resolve(), false, "recheck");
    const user = userEvent.setup();
    renderCalendar({ ...day, bookings: [{ ...day.bookings[0]!, kind: "recheck" }] });
    await user.click(screen.getByRole("button", { name: /Q-1003 · Ilse Varga-Pond/ }));
    const panel = screen.getByRole("region", { name: "Selected booking" });
    expect(within(panel).getByRole("heading").textContent).toBe("Lug and ring re-check · Q-1003 · Ilse Varga-Pond");
    await user.click(within(panel).getByRole("button", { name: "Move…" }));
    expect(await within(panel).findByRole("group", { name: "Re-check time" })).toBeTruthy();
    expect(sent.find((r) => r.url.includes("/slots"))!.url).toBe("/api/shop/bookings/b1/slots?days=7");
    await user.click(within(panel).getByText("10:00 AM"));
    await user.click(within(panel).getByRole("button", { name: /^Move to 10:00 AM/ }));
    await screen.findByText("Moved; the customer is e-mailed the updated calendar entry.");
    expect(sent.find((r) => r.method === "PUT")).toEqual({
      url: "/api/shop/bookings/b1",
      method: "PUT",
      body: { start: "2026-12-14T17:00:00.000Z" },
    });
  });

  it("cancels the picked booking once the person confirms, and says the customer's calendar entry is withdrawn", async () => {
    const sent = serveRefusal();
    const confirm = vi.fn(() => true);
    vi.stubGlobal("confirm", confirm);
    const user = userEvent.setup();
    renderCalendar({ ...day, bookings: [{ ...day.bookings[0]!, kind: "recheck" }] });
    await user.click(booking());
    await user.click(within(screen.getByRole("region", { name: "Selected booking" })).getByRole("button", { name: "Cancel booking" }));
    expect(confirm).toHaveBeenCalledWith(
      "Cancel this lug and ring re-check booking? The customer is e-mailed a cancellation for their calendar.",
    );
    await screen.findByText("Booking cancelled; the customer's calendar entry is withdrawn by e-mail.");
    expect(sent.find((r) => r.method === "DELETE")).toEqual({ url: "/api/shop/bookings/b1", method: "DELETE", body: undefined });
  });

  it("opens on today's day view on a narrow screen when the link named no range", async () => {
    const sent = serveRefusal();
    vi.stubGlobal("matchMedia", (q: string) => ({ matches: q === "(max-width: 639px)", addEventListener() {}, removeEventListener() {} }));
    const weekAnswer = {
      ...week,
      from: "2026-12-13",
      days: ["2026-12-13", "2026-12-14", "2026-12-15", "2026-12-16", "2026-12-17", "2026-12-18", "2026-12-19"],
    };
    const { container } = render(<BayCalendar initial={weekAnswer} today="2026-12-14" askedDays={false} />, { wrapper: wrap });
    expect(screen.getByRole("button", { name: "Show the week" })).toBeTruthy();
    await waitFor(() => expect(container.querySelectorAll(".rbc-time-content .rbc-day-slot")).toHaveLength(2));
    expect(sent.map((r) => r.url)).toEqual(["/api/shop/bookings?from=2026-12-14&days=1"]);
  });

  it("says what to do when the shop has no bays", () => {
    renderCalendar({ ...day, bays: [], bookings: [] });
    expect(screen.getByText(/No bays are set up yet/)).toBeTruthy();
  });
});

describe("a dropped booking", () => {
  it("is drawn where it was dropped while the server decides, then put back with the server's refusal", async () => {
    let answer!: () => void;
    const sent = serveRefusal(new Promise((r) => (answer = r)));
    const { result } = renderHook(() => useBookingMove("America/Denver"), { wrapper: wrap });
    const events = bayEvents(day);
    let done!: Promise<void>;
    act(() => {
      done = result.current.drop(events[0]!, new Date(2026, 11, 14, 10, 0), "lift");
    });
    await waitFor(() => expect(result.current.pending).toBe(true));
    expect(result.current.place(events)[0]!.start.getHours()).toBe(10);
    answer();
    await act(() => done);
    expect(result.current.pending).toBe(false);
    expect(result.current.place(events)[0]!.start.getHours()).toBe(8);
    expect(result.current.message).toEqual({ tone: "error", text: `Not moved: ${TAKEN}` });
    // 10:00 AM MST is 17:00Z; the booking keeps its bay.
    expect(sent.find((r) => r.method === "PUT")?.body).toEqual({ start: "2026-12-14T17:00:00.000Z", bayId: "lift" });
  });
});
