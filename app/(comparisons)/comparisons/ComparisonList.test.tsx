// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { keyFigures } from "@/lib/comparisons/keyFigures";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import type { SavedComparison } from "@/lib/comparisons/api";
import { ComparisonList, workspaceHref } from "./ComparisonList";

vi.mock("next/link", () => ({
  default: ({ href, children, ...rest }: { href: string; children: ReactNode }) => (
    <a href={href} {...rest}>
      {children}
    </a>
  ),
}));

const saved: SavedComparison = {
  id: "c4000000-0000-4000-8000-0000000000aa",
  name: "Quarry road build",
  vehicleId: null,
  input: DEFAULT_INPUT,
  figures: keyFigures(DEFAULT_INPUT),
  share: null,
  createdAt: "2026-11-30T10:00:00.000Z",
  updatedAt: "2026-11-30T10:00:00.000Z",
};

/** A fetch whose PATCH answer the test releases by hand; `holdRefetch`: lists asked for after it never arrive. */
function fakeServer(patch: { status: number; body: unknown }, holdRefetch = false) {
  let patched = false;
  let release!: () => void;
  const gate = new Promise<void>((r) => (release = r));
  let name = saved.name;
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    if (init?.method === "PATCH") {
      await gate;
      patched = true;
      if (patch.status === 200) name = JSON.parse(String(init.body)).name;
      return new Response(JSON.stringify(patch.status === 200 ? { comparison: { ...saved, name } } : patch.body), { status: patch.status });
    }
    if (patched && holdRefetch) return new Promise<Response>(() => {});
    return new Response(JSON.stringify({ comparisons: [{ ...saved, name }] }), { status: 200 });
  });
  vi.stubGlobal("fetch", fetchMock);
  return { release, fetchMock };
}

function renderList() {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: 60_000 } } });
  return render(
    <QueryClientProvider client={qc}>
      <ComparisonList initial={[saved]} />
    </QueryClientProvider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

async function rename(to: string) {
  const user = userEvent.setup();
  await user.click(screen.getByRole("button", { name: `Rename ${saved.name}` }));
  const field = screen.getByLabelText("New name");
  await user.clear(field);
  await user.type(field, to);
  await user.click(screen.getByRole("button", { name: "Save name" }));
}

describe("the saved comparison list", () => {
  it("shows a new name before the server answers, and keeps it when the server agrees", async () => {
    const server = fakeServer({ status: 200, body: null });
    renderList();
    await rename("Quarry road, 37s");
    expect(screen.getByTestId("comparison-name").textContent).toBe("Quarry road, 37s"); // optimistic
    server.release();
    await waitFor(() =>
      expect(server.fetchMock.mock.calls.some(([u, i]) => i?.method === "GET" && String(u).startsWith("/api/comparisons?"))).toBe(true),
    );
    expect(screen.getByTestId("comparison-name").textContent).toBe("Quarry road, 37s");
  });

  it("rolls the name back and says why when the server refuses (before any refetch arrives)", async () => {
    const server = fakeServer(
      { status: 422, body: { error: "Some fields need attention.", fieldErrors: { name: ["Keep the name to 120 characters."] } } },
      true,
    );
    renderList();
    await rename("Renamed but refused");
    expect(screen.getByTestId("comparison-name").textContent).toBe("Renamed but refused");
    server.release();
    await waitFor(() => expect(screen.getByTestId("comparison-name").textContent).toBe(saved.name));
    expect(screen.getByText(/Not renamed: Some fields need attention/)).toBeTruthy();
  });

  it("checks the name with the server's schema before sending", async () => {
    const server = fakeServer({ status: 200, body: null });
    renderList();
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: `Rename ${saved.name}` }));
    await user.clear(screen.getByLabelText("New name"));
    await user.click(screen.getByRole("button", { name: "Save name" }));
    expect(screen.getByText(/Give the comparison a name/)).toBeTruthy();
    expect(server.fetchMock.mock.calls.some(([, i]) => i?.method === "PATCH")).toBe(false);
  });

  it("says how the speedometer reads: 265/70R17 → 37 in reads 14.6 % low (1 − 802.8 / 939.8, ISO 4000-1 diameters), not “+17.1 %”", () => {
    renderList();
    const figure = screen.getByText("Speedometer").parentElement!;
    expect(figure.querySelector("dd")?.textContent).toBe("reads 14.6 % low");
    expect(figure.textContent).not.toMatch(/\+17\.1/);
  });

  it("opens a saved comparison in the workspace through the URL codec", () => {
    expect(workspaceHref(saved)).toBe(
      `/workspace?ct=265/70R17+113T&cd=17&cw=8&co=25&pt=37x12.50R17LT+124Q+LRD&pd=17&pw=9&po=-12&saved=${saved.id}`,
    );
  });
});
