// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { ReactNode } from "react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { keyFigures } from "@/lib/comparisons/keyFigures";
import { type ComparisonInput, DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { encodeComparison } from "@/lib/comparisons/url";
import type { SavedComparison } from "@/lib/comparisons/api";
import { SaveComparison } from "./SaveComparison";
import { Workspace } from "./Workspace";

// Typing through user-event in jsdom is slow on a shared machine; the default 5 s is too tight.
vi.setConfig({ testTimeout: 20_000 });
vi.mock("@/components/comparison/LazyComparisonCharts", () => ({ LazyComparisonCharts: () => <div data-testid="charts-stub" /> }));
vi.mock("next/link", () => ({
  default: ({ href, children, ...rest }: { href: string; children: ReactNode }) => (
    <a href={href} {...rest}>
      {children}
    </a>
  ),
}));

const ID = "c4000000-0000-4000-8000-0000000000bb";
const NAME = "Quarry road build";
const opened = { id: ID, name: NAME, vehicleId: null, input: DEFAULT_INPUT };

/** The server: a PATCH stores the input it is sent and answers with the saved comparison. */
function fakeServer() {
  const fetchMock = vi.fn(async (_url: string, init?: RequestInit) => {
    const body = JSON.parse(String(init?.body ?? "{}")) as { input: ComparisonInput };
    const comparison: SavedComparison = {
      id: ID,
      name: NAME,
      vehicleId: null,
      input: body.input,
      figures: keyFigures(body.input),
      share: null,
      createdAt: "2026-11-30T10:00:00.000Z",
      updatedAt: "2026-11-30T10:05:00.000Z",
    };
    return new Response(JSON.stringify({ comparison }), { status: 200 });
  });
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

function renderWorkspace(saved: typeof opened | null) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={qc}>
      <Workspace
        initialInput={DEFAULT_INPUT}
        initialProblems={[]}
        savedId={saved?.id ?? null}
        saveSlot={<SaveComparison saved={saved} />}
      />
    </QueryClientProvider>,
  );
}

function renderOpened() {
  window.history.replaceState(null, "", `/workspace?${encodeComparison(DEFAULT_INPUT)}&saved=${ID}`);
  return renderWorkspace(opened);
}

/**
 * The address bar rewritten by someone else than the workspace, without `saved` (Next's router
 * writes back the URL it knows of on its own history updates, and it is not told of every write).
 */
const addressBarRewritten = () => window.history.replaceState(null, "", `/workspace?${encodeComparison(DEFAULT_INPUT)}`);

const planned = () => within(screen.getByRole("region", { name: "Planned setup" }));
const control = () => within(screen.getByTestId("save-control"));
/** True when leaving the page now would be held back by the browser's "leave site?" prompt. */
const unloadHeld = () => {
  const ev = new Event("beforeunload", { cancelable: true });
  window.dispatchEvent(ev);
  return ev.defaultPrevented;
};
/** Clicks a link and tells whether the navigation was stopped (default prevented). */
async function clickStopped(user: ReturnType<typeof userEvent.setup>, link: HTMLElement): Promise<boolean> {
  let stopped = false;
  const seen = (ev: Event) => {
    stopped = ev.defaultPrevented;
    ev.preventDefault(); // jsdom cannot navigate; the test only reads what the guard decided.
  };
  document.addEventListener("click", seen);
  await user.click(link);
  document.removeEventListener("click", seen);
  return stopped;
}

beforeEach(() => window.localStorage.clear());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

describe("a saved comparison with unsaved edits", () => {
  it("shows the unsaved state only while the comparison differs from what was saved", async () => {
    const user = userEvent.setup();
    renderOpened();
    expect(control().queryByText("Unsaved changes")).toBeNull();
    expect(unloadHeld()).toBe(false);
    const offset = planned().getByLabelText("Offset (mm)");
    await user.clear(offset);
    await user.type(offset, "-25");
    expect(control().getByText("Unsaved changes")).toBeTruthy();
    expect(unloadHeld()).toBe(true);
    // Typing the saved value back leaves nothing unsaved.
    await user.clear(offset);
    await user.type(offset, "-12");
    expect(control().queryByText("Unsaved changes")).toBeNull();
    expect(unloadHeld()).toBe(false);
  });

  it("counts a half-typed field as unsaved", async () => {
    const user = userEvent.setup();
    renderOpened();
    await user.clear(planned().getByLabelText("Offset (mm)"));
    expect(control().getByText("Unsaved changes")).toBeTruthy();
    expect(unloadHeld()).toBe(true);
  });

  it("asks before an in-app link leaves, stays when the person cancels, goes when they confirm", async () => {
    const user = userEvent.setup();
    renderOpened();
    const confirm = vi.spyOn(window, "confirm").mockReturnValue(false);
    const mine = control().getByRole("link", { name: "My comparisons" });
    expect(await clickStopped(user, mine)).toBe(false);
    expect(confirm).not.toHaveBeenCalled();
    const offset = planned().getByLabelText("Offset (mm)");
    await user.clear(offset);
    await user.type(offset, "-25");
    expect(await clickStopped(user, mine)).toBe(true);
    expect(confirm).toHaveBeenCalledTimes(1);
    expect(confirm.mock.calls[0]?.[0]).toMatch(/unsaved changes to “Quarry road build”/);
    confirm.mockReturnValue(true);
    expect(await clickStopped(user, mine)).toBe(false);
  });

  it("is clean again once the changes are saved", async () => {
    const user = userEvent.setup();
    const fetchMock = fakeServer();
    renderOpened();
    const offset = planned().getByLabelText("Offset (mm)");
    await user.clear(offset);
    await user.type(offset, "-25");
    expect(control().getByText("Unsaved changes")).toBeTruthy();
    await user.click(control().getByRole("button", { name: "Save changes" }));
    await waitFor(() => expect(screen.getByTestId("save-status").textContent).toContain(`Changes saved to “${NAME}”`));
    expect(JSON.parse(String(fetchMock.mock.calls[0]?.[1]?.body)).input.planned.position).toEqual({ mode: "offset", offsetMm: -25 });
    expect(control().queryByText("Unsaved changes")).toBeNull();
    expect(unloadHeld()).toBe(false);
  });
});

describe("the saved comparison stays in the link", () => {
  it("an edit keeps saved= whatever the address bar held before it", async () => {
    const user = userEvent.setup();
    renderOpened();
    addressBarRewritten();
    const offset = planned().getByLabelText("Offset (mm)");
    await user.clear(offset);
    await user.type(offset, "-25");
    expect(window.location.search).toContain("po=-25");
    expect(new URLSearchParams(window.location.search).get("saved")).toBe(ID);
    // A discrete change (the mode switch) too.
    await user.click(planned().getByRole("radio", { name: "Backspacing" }));
    expect(new URLSearchParams(window.location.search).get("saved")).toBe(ID);
  });

  it("a comparison saved as new is named in the link, and stays there through the next edits", async () => {
    const user = userEvent.setup();
    fakeServer();
    window.history.replaceState(null, "", "/workspace");
    renderWorkspace(null);
    await user.click(control().getByRole("button", { name: "Save comparison…" }));
    await user.click(control().getByRole("button", { name: "Save" }));
    await waitFor(() => expect(new URLSearchParams(window.location.search).get("saved")).toBe(ID));
    addressBarRewritten();
    const offset = planned().getByLabelText("Offset (mm)");
    await user.clear(offset);
    await user.type(offset, "-25");
    expect(new URLSearchParams(window.location.search).get("saved")).toBe(ID);
  });
});

describe("the server refusing a comparison", () => {
  it("names the fields as the workspace labels them, never as input paths", async () => {
    const user = userEvent.setup();
    vi.stubGlobal(
      "fetch",
      vi.fn(
        async () =>
          new Response(
            JSON.stringify({
              error: "Some fields need attention.",
              fieldErrors: { "input.current.wheelWidthIn": ["x"], "input.vehicle.cruiseSpeedsMph.1": ["y"] },
            }),
            { status: 422 },
          ),
      ),
    );
    renderOpened();
    const offset = planned().getByLabelText("Offset (mm)");
    await user.clear(offset);
    await user.type(offset, "-25");
    await user.click(control().getByRole("button", { name: "Save changes" }));
    await waitFor(() => expect(screen.getByTestId("save-status").textContent).toContain("did not accept"));
    const text = screen.getByTestId("save-status").textContent ?? "";
    expect(text).toContain("The server did not accept the comparison: check Current setup · Wheel width (in), Cruise speeds (mph).");
    expect(text).not.toMatch(/input\./);
  });
});
