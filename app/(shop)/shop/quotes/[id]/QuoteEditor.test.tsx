// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { summarize } from "@/lib/shop/quotes/fitment";
import { renderWithQuery } from "@/app/(shop)/shop/shopTestUtil";
import { router } from "@/tests/support/navigation";
import { queryKeys } from "@/lib/platform/query/keys";
import { INSTALL_WITHOUT_SHEET } from "@/lib/shop/workOrders/vocabulary";
import { QuoteEditor } from "./QuoteEditor";
import type { QuoteDetail as Detail } from "@/lib/shop/quotes/api";

vi.mock("next/link", () => import("@/tests/support/nextLink"));
vi.mock("next/navigation", () => import("@/tests/support/navigation"));
afterEach(() => {
  cleanup();
  vi.clearAllMocks();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const ID = "d0000000-0000-4000-8000-0000000000aa";
const fit = summarize(
  { boltPattern: "6x5.5", tireSize: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } },
  "35x12.50R17LT",
  { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: false },
);
const line = (n: number, over: Partial<Detail["lines"][number]> = {}): Detail["lines"][number] => ({
  id: `l000000${n}-0000-4000-8000-000000000000`,
  position: n,
  kind: "custom",
  unit: "each",
  catalogItemId: null,
  sku: "",
  description: `Line ${n}`,
  quantity: 1,
  unitPriceCents: 1000,
  discountCents: 0,
  taxable: false,
  lineTotalCents: 1000,
  wheelBoltPattern: null,
  wheelCenterBoreMm: null,
  ...over,
});
function detail(
  over: Partial<Detail["quote"]> = {},
  lines = [line(1), line(2, { unit: "hour", description: "Labour", unitPriceCents: 12500, lineTotalCents: 12500 })],
): Detail {
  return {
    quote: {
      id: ID,
      number: 1042,
      customerId: "c",
      vehicleId: null,
      createdBy: null,
      status: "draft",
      vehicleDescription: "Test pickup",
      boltPattern: "6x5.5",
      currentSetup: { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 },
      axleRatio: null,
      hubBoreMm: 108,
      tireItemId: null,
      wheelItemId: null,
      wheelQty: 4,
      fitment: fit,
      discountCents: 0,
      taxRateBp: 825,
      depositPct: 25,
      subtotalCents: 13500,
      taxableCents: 0,
      taxCents: 0,
      totalCents: 13500,
      depositCents: 3375,
      notes: "",
      validUntil: null,
      createdAt: "2026-12-01T10:00:00.000Z",
      updatedAt: "2026-12-01T10:00:00.123Z",
      ...over,
    },
    lines,
    events: [],
    customer: { id: "c", name: "Dace Holloway", phone: "555-0132", email: "dace@example.test" },
    createdByName: "Sam Staff",
    hubChecks: [],
    timeZone: "America/Denver",
  };
}

type Call = { url: string; method: string; body: unknown };
function server(answers: (c: Call) => { status: number; body: unknown }) {
  const calls: Call[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string, init?: RequestInit) => {
      const c = { url, method: init?.method ?? "GET", body: init?.body ? JSON.parse(String(init.body)) : undefined };
      calls.push(c);
      const a = answers(c);
      return new Response(JSON.stringify(a.body), { status: a.status });
    }),
  );
  return calls;
}
const renderEditor = (d = detail()) => renderWithQuery(<QuoteEditor initial={d} labourRateCents={12500} />, { retry: false });

describe("the quote editor's unsaved changes", () => {
  it("says so while lines differ from the saved ones, and warns before leaving the page", async () => {
    server(() => ({ status: 500, body: {} }));
    const user = userEvent.setup();
    renderEditor();
    expect(screen.queryByTestId("unsaved")).toBeNull();
    const description = screen.getByLabelText("Description of line 1");
    await user.type(description, " changed");
    expect(screen.getByTestId("unsaved").textContent).toBe("Unsaved changes");
    // Leaving: the browser's prompt on unload, a confirm on in-app links.
    const unload = new Event("beforeunload", { cancelable: true });
    window.dispatchEvent(unload);
    expect(unload.defaultPrevented).toBe(true);
    const confirm = vi.spyOn(window, "confirm").mockReturnValue(false);
    const click = new MouseEvent("click", { bubbles: true, cancelable: true, button: 0 });
    screen.getByRole("link", { name: "All quotes" }).dispatchEvent(click);
    expect(confirm).toHaveBeenCalledWith(expect.stringMatching(/not saved/));
    expect(click.defaultPrevented).toBe(true);
    // Typed back to what is saved: nothing unsaved, no prompt.
    await user.clear(description);
    await user.type(description, "Line 1");
    expect(screen.queryByTestId("unsaved")).toBeNull();
    const again = new Event("beforeunload", { cancelable: true });
    window.dispatchEvent(again);
    expect(again.defaultPrevented).toBe(false);
  });

  it("Send saves the pending edits first, then sends the version it saved", async () => {
    const saved = detail({ updatedAt: "2026-12-01T10:05:00.456Z", subtotalCents: 15000 }, [
      line(1, { quantity: 2, lineTotalCents: 2000 }),
      line(2, { unit: "hour", description: "Labour", quantity: 1.5, unitPriceCents: 12500, lineTotalCents: 18750 }),
    ]);
    const calls = server((c) =>
      c.method === "PUT" ? { status: 200, body: saved } : { status: 200, body: { ...saved, quote: { ...saved.quote, status: "sent" } } },
    );
    const user = userEvent.setup();
    renderEditor();
    await user.clear(screen.getByLabelText("Quantity of line 2 (hours)"));
    await user.type(screen.getByLabelText("Quantity of line 2 (hours)"), "1 1/2");
    await user.click(screen.getByRole("button", { name: /send to customer/i }));
    await screen.findByText(/Sent to dace@example.test/);
    expect(calls.map((c) => `${c.method} ${c.url}`)).toEqual([`PUT /api/shop/quotes/${ID}`, `POST /api/shop/quotes/${ID}/send`]);
    expect((calls[0]!.body as { lines: { quantity: number }[] }).lines[1]!.quantity).toBe(1.5);
    // The save names the version the screen opened with, so a save made meanwhile elsewhere is not overwritten.
    expect((calls[0]!.body as { seenUpdatedAt: string }).seenUpdatedAt).toBe(detail().quote.updatedAt);
    expect(calls[1]!.body).toEqual({ seenUpdatedAt: "2026-12-01T10:05:00.456Z" });
  });

  it("does not send when the edits cannot be saved, and names the field as the screen does", async () => {
    const calls = server((c) =>
      c.method === "PUT"
        ? {
            status: 422,
            body: {
              error: "Some lines need attention.",
              fieldErrors: { "lines.1.discountCents": ["A line's discount cannot exceed the line's amount."] },
            },
          }
        : { status: 200, body: {} },
    );
    const user = userEvent.setup();
    renderEditor();
    // 1:20 is not exact in hundredths of an hour: refused in the browser, nothing sent at all.
    await user.clear(screen.getByLabelText("Quantity of line 2 (hours)"));
    await user.type(screen.getByLabelText("Quantity of line 2 (hours)"), "1:20");
    await user.click(screen.getByRole("button", { name: /send to customer/i }));
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toMatch(/Not sent/);
    expect(alert.textContent).toContain("Line 2 — quantity: 1:20 is 1.333… h");
    expect(calls).toHaveLength(0);
    // The server's refusal: "Line 2 — discount", never "lines.1.discountCents".
    await user.clear(screen.getByLabelText("Quantity of line 2 (hours)"));
    await user.type(screen.getByLabelText("Quantity of line 2 (hours)"), "1");
    await user.clear(screen.getByLabelText("Discount of line 2"));
    await user.type(screen.getByLabelText("Discount of line 2"), "500");
    await user.click(screen.getByRole("button", { name: /send to customer/i }));
    await waitFor(() =>
      expect(screen.getByRole("alert").textContent).toContain("Line 2 — discount: A line's discount cannot exceed the line's amount."),
    );
    expect(screen.getByRole("alert").textContent).not.toMatch(/lines\.1|Cents/);
    expect(calls.map((c) => c.method)).toEqual(["PUT"]);
    expect(screen.getByTestId("unsaved")).toBeTruthy();
  });
});

describe("the quote editor's catalog and figures", () => {
  const tpms = {
    id: "a0000000-0000-4000-8000-0000000000f1",
    kind: "service",
    sku: "SV-TPMS",
    description: "TPMS sensor service",
    priceCents: 1800,
    serviceType: "tpms",
    serviceUnit: "per_wheel",
    boltPattern: null,
    centerBoreMm: null,
  };
  const narrow = {
    id: "a0000000-0000-4000-8000-0000000000f2",
    kind: "wheel",
    sku: "WH-1061",
    description: "Forged 17x9 106.1 bore",
    priceCents: 28900,
    boltPattern: "6x139.7",
    centerBoreMm: 106.1,
    serviceUnit: null,
  };

  it("adds any catalog item, a TPMS service included, as a line with the wheel count", async () => {
    const calls = server((c) =>
      c.url.startsWith("/api/shop/catalog") ? { status: 200, body: { items: [tpms], total: 1 } } : { status: 500, body: {} },
    );
    const user = userEvent.setup();
    renderEditor();
    await user.type(screen.getByRole("searchbox", { name: "Add from the catalog" }), "TPMS");
    await user.click(within(screen.getByRole("search", { name: "Add from the catalog" })).getByRole("button", { name: "Find" }));
    // Role queries over the whole editor are slow in jsdom: look inside the found row.
    await user.click(within(await screen.findByTestId("catalog-pick")).getByRole("button", { name: "Add TPMS sensor service" }));
    expect(calls[0]!.url).toMatch(/q=TPMS/);
    expect(screen.getByLabelText("Description of line 3")).toHaveProperty("value", "TPMS sensor service");
    expect(screen.getByLabelText("Quantity of line 3")).toHaveProperty("value", "4");
    expect(screen.getByTestId("unsaved")).toBeTruthy();
  });

  it("flags a wheel whose bore is smaller than the vehicle's hub, and offers no Add for it", async () => {
    server(() => ({ status: 200, body: { items: [narrow], total: 1 } }));
    const user = userEvent.setup();
    renderEditor();
    await user.click(within(screen.getByRole("search", { name: "Add from the catalog" })).getByRole("button", { name: "Find" }));
    const row = await screen.findByTestId("catalog-pick");
    expect(row.textContent).toContain("Does not fit: The wheel's 106.1 mm centre bore is smaller than the vehicle's 108 mm hub");
    expect(within(row).queryByRole("button")).toBeNull();
  });

  it("shows the balance due after the deposit: 135.00 − 33.75 = 101.25", () => {
    server(() => ({ status: 500, body: {} }));
    renderEditor();
    expect(screen.getByTestId("quote-balance").textContent).toBe("$101.25");
  });
});

describe("the quote editor's status moves", () => {
  it("offers Mark installed on a paid deposit, but not once the deposit was asked back in full", () => {
    server(() => ({ status: 500, body: {} }));
    const paid = detail({ status: "deposit_paid" });
    const { unmount } = renderWithQuery(<QuoteEditor initial={paid} labourRateCents={12500} />, { retry: false });
    expect(screen.getByRole("button", { name: "Mark installed" })).toBeTruthy();
    unmount();
    renderWithQuery(<QuoteEditor initial={paid} labourRateCents={12500} depositGivenBack />, { retry: false });
    expect(screen.queryByRole("button", { name: "Mark installed" })).toBeNull();
  });
});

describe("the quote editor's dates", () => {
  it("reads the validity day and the history on the shop's clock, not the device's (vitest runs in UTC)", () => {
    // 03:30 UTC on Dec 4 is 8:30 PM on Dec 3 in Denver (MST, UTC−7: 49 CFR §71.9).
    const d = detail({ status: "sent", validUntil: "2026-12-04T03:30:00.000Z" });
    d.events = [
      { id: "1", fromStatus: "draft", toStatus: "sent", actorUserId: null, actor: "Sam Staff", note: "", at: "2026-12-04T03:30:00.000Z" },
    ];
    renderEditor(d);
    expect(screen.getByText(/valid until/).textContent).toContain("valid until Thursday, December 3, 2026");
    expect(screen.getByTestId("quote-history").textContent).toContain("Sam Staff, Thu, Dec 3, 2026, 8:30 PM MST");
  });
});

describe("the quote editor's Mark installed", () => {
  /** A quote with its deposit paid whose job has a work order in `status`. */
  const renderWithWorkOrder = (status: "in_bay" | "done") =>
    renderWithQuery(
      <QuoteEditor
        initial={detail({ status: "deposit_paid" })}
        labourRateCents={12500}
        workOrder={{ id: "w0000000-0000-4000-8000-000000000001", status }}
      />,
      { retry: false },
    );
  // This app's rule (common practice, no source): a job with a work order is finished on its signed sheet.
  it("is not offered while the quote's work order is open: a link to the work order is, and nothing is sent", () => {
    const calls = server(() => ({ status: 500, body: {} }));
    renderWithWorkOrder("in_bay");
    expect(screen.queryByRole("button", { name: "Mark installed" })).toBeNull();
    const link = screen.getByRole("link", { name: "Finish the work order to mark installed" });
    expect(link.getAttribute("href")).toBe("/shop/work-orders/w0000000-0000-4000-8000-000000000001");
    expect(calls).toEqual([]);
  });

  it("is offered for a quote with its deposit paid and no work order, once the counter confirms no sheet was signed", async () => {
    const calls = server(() => ({ status: 200, body: detail({ status: "installed" }) }));
    const confirm = vi.spyOn(window, "confirm").mockReturnValue(true);
    const user = userEvent.setup();
    renderEditor(detail({ status: "deposit_paid" }));
    expect(screen.queryByRole("link", { name: "Finish the work order to mark installed" })).toBeNull();
    await user.click(screen.getByRole("button", { name: "Mark installed" }));
    expect(confirm).toHaveBeenCalledWith(INSTALL_WITHOUT_SHEET);
    await waitFor(() => expect(screen.getByTestId("quote-status").textContent).toBe("Installed"));
    expect(calls.map((c) => [c.url, c.body])).toEqual([[`/api/shop/quotes/${ID}/status`, { to: "installed" }]]);
  });

  it("without that confirmation nothing is sent and the quote stays deposit paid", async () => {
    const calls = server(() => ({ status: 200, body: detail({ status: "installed" }) }));
    vi.spyOn(window, "confirm").mockReturnValue(false);
    const user = userEvent.setup();
    renderEditor(detail({ status: "deposit_paid" }));
    await user.click(screen.getByRole("button", { name: "Mark installed" }));
    expect(calls).toEqual([]);
    expect(screen.getByTestId("quote-status").textContent).toBe("Deposit paid");
  });

  it("asks nothing when the job's work order is done (its sheet is the record)", async () => {
    const calls = server(() => ({ status: 200, body: detail({ status: "installed" }) }));
    const confirm = vi.spyOn(window, "confirm");
    const user = userEvent.setup();
    renderWithWorkOrder("done");
    await user.click(screen.getByRole("button", { name: "Mark installed" }));
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(confirm).not.toHaveBeenCalled();
  });

  it("re-renders the page's server panels at once (the released booking goes) and drops the cached bay time", async () => {
    server(() => ({ status: 200, body: detail({ status: "installed" }) }));
    vi.spyOn(window, "confirm").mockReturnValue(true);
    const user = userEvent.setup();
    const client = new QueryClient();
    const invalidate = vi.spyOn(client, "invalidateQueries");
    render(
      <QueryClientProvider client={client}>
        <QuoteEditor initial={detail({ status: "deposit_paid" })} labourRateCents={12500} />
      </QueryClientProvider>,
    );
    expect(router.refresh).not.toHaveBeenCalled();
    await user.click(screen.getByRole("button", { name: "Mark installed" }));
    await waitFor(() => expect(router.refresh).toHaveBeenCalledTimes(1));
    expect(invalidate.mock.calls.map(([f]) => f?.queryKey)).toEqual([queryKeys.shop.calendar.all, queryKeys.shop.slots.all]);
  });

  it("a refused move changes nothing on the page", async () => {
    server(() => ({ status: 409, body: { error: "A quote that is declined cannot become installed." } }));
    vi.spyOn(window, "confirm").mockReturnValue(true);
    const user = userEvent.setup();
    renderEditor(detail({ status: "deposit_paid" }));
    await user.click(screen.getByRole("button", { name: "Mark installed" }));
    await waitFor(() => expect(screen.getByText("A quote that is declined cannot become installed.")).toBeTruthy());
    expect(router.refresh).not.toHaveBeenCalled();
  });
});
