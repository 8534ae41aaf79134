// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { loadProfileSchema } from "@/lib/garage/loadSchema";
import { DEMO_CURRENT, DEMO_PROFILE } from "@/lib/garage/loadTestUtil";
import type { LoadProfile } from "@/lib/garage/loadProfile";
import { LoadProfileForm } from "./LoadProfileForm";

vi.setConfig({ testTimeout: 20_000 });
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const IMPERIAL: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const METRIC: DisplayPrefs = { units: "metric", lengths: "decimal" };
const VEHICLE = "a4000000-0000-4000-8000-000000000001";

function renderForm(profile: LoadProfile | null, prefs: DisplayPrefs) {
  const sent: unknown[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (_url: string, init?: RequestInit) => {
      const body = JSON.parse(String(init?.body ?? "{}"));
      sent.push(body);
      return new Response(JSON.stringify({ profile: body }), { status: 200 });
    }),
  );
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const ui = (p: DisplayPrefs) => (
    <QueryClientProvider client={qc}>
      <LoadProfileForm vehicleId={VEHICLE} profile={profile} current={DEMO_CURRENT} prefs={p} />
    </QueryClientProvider>
  );
  const r = render(ui(prefs));
  return { sent, switchTo: (p: DisplayPrefs) => r.rerender(ui(p)) };
}

/** A placard and a breakover pair typed in inch units. */
const INCH_FORM = {
  "Tire size on the placard": "265/70R17 113T",
  "Placard cold pressure, front (psi)": "35",
  "Placard cold pressure, rear (psi)": "35",
  "Wheelbase (in)": "114",
  "Lowest point midway, height (in)": "10.5",
};

/** Types each text into the field with that label. */
async function fill(user: ReturnType<typeof userEvent.setup>, fields: Record<string, string>) {
  for (const [label, text] of Object.entries(fields)) await user.type(screen.getByLabelText(label), text);
}

describe("the vehicle's placard and body points form", () => {
  it("shows stored SI figures in the chosen units and converts them on a switch (1 psi = 6.894757 kPa, NIST SP 811)", async () => {
    const { switchTo } = renderForm(DEMO_PROFILE, IMPERIAL);
    expect(screen.getByLabelText("Placard cold pressure, front (psi)")).toHaveProperty("value", "35");
    expect(screen.getByLabelText("Front axle weight, scale ticket (lb)")).toHaveProperty("value", "3150");
    switchTo(METRIC);
    expect(screen.getByLabelText("Placard cold pressure, front (kPa)")).toHaveProperty("value", "241");
    expect(screen.getByLabelText("Wheelbase (mm)")).toHaveProperty("value", "2896");
  });

  it("refuses bar in a kPa field and a body point inside the tire, sending nothing", async () => {
    const user = userEvent.setup();
    const { sent } = renderForm(null, METRIC);
    await fill(user, {
      "Tire size on the placard": "265/70R17 113T",
      "Placard cold pressure, front (kPa)": "2.4 bar",
      "Placard cold pressure, rear (kPa)": "240",
    });
    await user.click(screen.getByRole("button", { name: "Save placard and body points" }));
    expect(await screen.findByText(/“2.4 bar” is 240 kPa/)).toBeTruthy();
    expect(screen.getByText("Nothing was saved: see the messages beside the fields.")).toBeTruthy();
    await user.clear(screen.getByLabelText("Placard cold pressure, front (kPa)"));
    await fill(user, {
      "Placard cold pressure, front (kPa)": "240",
      "Front corner height (mm)": "300",
      "Front corner ahead of the front axle (mm)": "100",
    });
    expect(await screen.findByText(/inside the tire's circle/)).toBeTruthy();
    await user.click(screen.getByRole("button", { name: "Save placard and body points" }));
    expect(sent).toHaveLength(0);
  });

  it("sends SI figures the handler's schema reads", async () => {
    const user = userEvent.setup();
    const { sent } = renderForm(null, IMPERIAL);
    await fill(user, INCH_FORM);
    await user.click(screen.getByRole("button", { name: "Save placard and body points" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    const body = loadProfileSchema.parse(sent[0]);
    expect(body.units).toBe("imperial");
    expect(body.placardRearKpa).toBeCloseTo(241.3165, 3);
    expect(body.wheelbaseMm).toBeCloseTo(2895.6, 9);
    expect(await screen.findByText("Saved.")).toBeTruthy();
  });
});
