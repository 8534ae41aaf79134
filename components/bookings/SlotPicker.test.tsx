// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ApiError } from "@/lib/platform/client/api";
import type { SlotsAnswer } from "@/lib/shop/bookings/api";
import { SlotPicker } from "./SlotPicker";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// Times are invented; Denver is UTC−7 in December (49 CFR §71.9): 15:00Z = 8:00 AM.
const answer = (over: Partial<SlotsAnswer> = {}): SlotsAnswer => ({
  timeZone: "America/Denver",
  today: "2026-12-10",
  minutes: 340,
  length: "5 h 40 min",
  segments: [
    { bayKind: "lift_bay", minutes: 280 },
    { bayKind: "alignment_rack", minutes: 60 },
  ],
  unavailable: null,
  booking: null,
  days: [
    {
      date: "2026-12-14",
      label: "Monday, December 14, 2026",
      slots: [
        { start: "2026-12-14T15:00:00.000Z", end: "2026-12-14T20:40:00.000Z", label: "8:00 AM" },
        { start: "2026-12-14T15:30:00.000Z", end: "2026-12-14T21:10:00.000Z", label: "8:30 AM" },
      ],
    },
    { date: "2026-12-16", label: "Wednesday, December 16, 2026", closed: "Stock count", slots: [] },
  ],
  ...over,
});

function serve(a: SlotsAnswer) {
  const urls: string[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string) => {
      urls.push(url);
      return new Response(JSON.stringify(a), { status: 200 });
    }),
  );
  return urls;
}

const renderPicker = (onPick: (start: string) => Promise<void>) =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <SlotPicker idPrefix="t" slotsUrl="/api/q/x/slots" actionLabel={(w) => `Book ${w}`} onPick={onPick} />
    </QueryClientProvider>,
  );

describe("the install time picker", () => {
  it("names each start with its day, says why a day is shut, and books the chosen one", async () => {
    serve(answer());
    const onPick = vi.fn(async () => undefined);
    renderPicker(onPick);
    const radio = await screen.findByRole("radio", { name: "8:30 AM, Monday, December 14, 2026" });
    expect(screen.getByText(/lift bay 4 h 40 min, then alignment rack 1 h/)).toBeTruthy();
    expect(screen.getByText("closed: Stock count")).toBeTruthy();
    await userEvent.click(screen.getByRole("button", { name: "Book the chosen time" }));
    expect(screen.getByText("Install time: pick one of the offered times.")).toBeTruthy();
    expect(onPick).not.toHaveBeenCalled();
    await userEvent.click(radio);
    await userEvent.click(screen.getByRole("button", { name: "Book 8:30 AM, Monday, December 14, 2026" }));
    expect(onPick).toHaveBeenCalledWith("2026-12-14T15:30:00.000Z");
  });

  it("shows the server's refusal beside the group (tied by aria-describedby) and reloads the starts", async () => {
    const urls = serve(answer());
    const onPick = vi.fn(async () => {
      throw new ApiError(409, {
        error: "taken",
        fieldErrors: { start: ["Install time: that time was taken a moment ago by another booking. Pick another time."] },
      });
    });
    renderPicker(onPick);
    await userEvent.click(await screen.findByRole("radio", { name: "8:00 AM, Monday, December 14, 2026" }));
    await userEvent.click(screen.getByRole("button", { name: /^Book 8:00 AM/ }));
    const message = await screen.findByText(/taken a moment ago/);
    const group = screen.getByRole("group", { name: "Install time" });
    expect(group.getAttribute("aria-describedby")).toBe(message.id);
    await waitFor(() => expect(urls.length).toBe(2));
  });

  it("says why nothing can be booked", async () => {
    serve(answer({ unavailable: "Install time: this work needs an alignment rack, and the shop has none set up.", days: [] }));
    renderPicker(vi.fn());
    expect(await screen.findByText("Install time: this work needs an alignment rack, and the shop has none set up.")).toBeTruthy();
  });
});
