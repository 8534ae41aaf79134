// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import type { LoadPlan } from "@/lib/comparisons/loadPlan";
import { LoadPressurePanel } from "./LoadPressurePanel";

// The chart loads lazily through clientLazy (recharts); the stub shows what it was given.
vi.mock("./LazyLoadPressureChart", () => ({
  LazyLoadPressureChart: ({ plan }: { plan: LoadPlan }) => <div data-testid="load-chart-stub">{plan.curve.length} points</div>,
}));
afterEach(cleanup);

const IMPERIAL: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const METRIC: DisplayPrefs = { units: "metric", lengths: "decimal" };
const PLANNED = "37x12.50R17LT 124Q LRD";

async function fill(user: ReturnType<typeof userEvent.setup>, figures: Record<string, string>) {
  for (const [label, text] of Object.entries(figures)) {
    const field = screen.getByLabelText(label);
    await user.clear(field);
    await user.type(field, text);
  }
}

describe("LoadPressurePanel", () => {
  it("shows the pressure to set, the equivalent pressure and the chart, and converts the figures on a unit switch", async () => {
    const user = userEvent.setup();
    const { rerender } = render(<LoadPressurePanel currentTire="265/70R17 113T" plannedTire={PLANNED} prefs={IMPERIAL} />);
    expect(screen.getByLabelText("Placard tire size")).toHaveProperty("value", "265/70R17 113T");
    await user.clear(screen.getByLabelText("Placard tire size"));
    await user.type(screen.getByLabelText("Placard tire size"), "P265/70R17 113S");
    await fill(user, {
      "Placard pressure, front (psi)": "35",
      "Placard pressure, rear (psi)": "35",
      "Front axle load (lb)": "3086",
      "Rear axle load (lb)": "2646",
    });
    // 37x12.50R17LT LRD: 50 psi maximum (flotation load range D, from memory); road minimum 140/240 of it = 29.2 psi
    // (FMVSS 138 Table 1 ratio by proportion, no source); 29.17 psi = 201.1 kPa (NIST SP 811).
    expect(screen.getByTestId("set-front").textContent).toBe("29.2 psi (201 kPa, 2.01 bar)");
    // Equivalent: 1150 kg / 1.10 at 35 psi (LI 113, FMVSS 120) → 50 · (1045.5/1600)^(1/0.585) = 24.2 psi (TRA load formula).
    expect(screen.getByTestId("equivalent-front").textContent).toMatch(/^24\.2 psi \(167 kPa, 1\.67 bar\)below the road minimum/);
    expect(screen.getByTestId("sidewall-max").textContent).toMatch(/^Maximum on the sidewall: 3,527 lb \(1,600 kg\) at 50\.0 psi/);
    expect(screen.getByTestId("load-chart-stub").textContent).toBe("41 points");
    // The engine's advice reads psi first like the table: 166.6 kPa = 24.2 psi, 201.1 kPa = 29.2 psi (NIST SP 811).
    expect(screen.getByText(/^The load needs only/).textContent).toMatch(
      /^The load needs only 24\.2 psi \(166\.6 kPa\), below the road minimum 29\.2 psi \(201\.1 kPa\)/,
    );

    rerender(<LoadPressurePanel currentTire="265/70R17 113T" plannedTire={PLANNED} prefs={METRIC} />);
    // Converted, never relabelled: 35 psi = 241.3 kPa, 3086 lb = 1399.8 kg (NIST SP 811).
    expect(screen.getByLabelText("Placard pressure, front (kPa)")).toHaveProperty("value", "241");
    expect(screen.getByLabelText("Front axle load (kg)")).toHaveProperty("value", "1399.8");
    expect(screen.getByTestId("set-front").textContent).toBe("201 kPa (2.01 bar, 29.2 psi)");
    expect(screen.getByText(/^The load needs only/).textContent).toMatch(
      /^The load needs only 166\.6 kPa \(24\.2 psi\), below the road minimum 201\.1 kPa/,
    );

    rerender(<LoadPressurePanel currentTire="265/70R17 113T" plannedTire={PLANNED} prefs={IMPERIAL} />);
    expect(screen.getByLabelText("Placard pressure, front (psi)")).toHaveProperty("value", "35");
    expect(screen.getByLabelText("Front axle load (lb)")).toHaveProperty("value", "3086");
  });

  it("writes the engine's notes in the panel's units: a passenger tire's derated load in lb first on an lb panel", async () => {
    const user = userEvent.setup();
    render(<LoadPressurePanel currentTire="P265/70R17 113S" plannedTire="P275/65R18 114T" prefs={IMPERIAL} />);
    await fill(user, {
      "Placard pressure, front (psi)": "35",
      "Placard pressure, rear (psi)": "35",
      "Front axle load (lb)": "3086",
      "Rear axle load (lb)": "2646",
    });
    // LI 114 = 1180 kg (ISO 4000-1 load index table) ÷ 1.10 on a light truck (FMVSS 120 S5.1.2) = 1072.7 kg;
    // 1180 / 0.45359237 = 2601.5 lb, 1072.7 / 0.45359237 = 2364.9 lb (NIST SP 811).
    expect(screen.getByText(/^Load rating/).textContent).toBe(
      "Load rating 2,601 lb (1,180 kg) ÷ 1.10 = 2,365 lb (1,072.7 kg) on a light truck (FMVSS 120 S5.1.2).",
    );
  });

  it("puts the engine's message beside an axle load the planned tire cannot carry, and computes nothing", async () => {
    const user = userEvent.setup();
    render(<LoadPressurePanel currentTire="P265/70R17 113S" plannedTire={PLANNED} prefs={METRIC} />);
    await fill(user, {
      "Placard pressure, front (kPa)": "240",
      "Placard pressure, rear (kPa)": "240",
      "Front axle load (kg)": "1400",
      "Rear axle load (kg)": "3400",
    });
    const field = screen.getByLabelText("Rear axle load (kg)");
    expect(field.getAttribute("aria-invalid")).toBe("true");
    const described = (field.getAttribute("aria-describedby") ?? "").split(" ").map((id) => document.getElementById(id)?.textContent ?? "");
    expect(described.join(" ")).toMatch(
      /Rear axle load \(kg\): one tire carries half the axle, and 1,700 kg is above the maximum load of 37x12\.50R17LT 124Q LRD, 1,600 kg/,
    );
    expect(screen.queryByTestId("set-front")).toBeNull();
    expect(screen.getByTestId("load-status").textContent).toMatch(/Nothing is computed/);
  });

  it("refuses a bar figure in a kPa field, with the conversion, and keeps an unreadable figure on a switch with a note", async () => {
    const user = userEvent.setup();
    const { rerender } = render(<LoadPressurePanel currentTire="P265/70R17 113S" plannedTire={PLANNED} prefs={METRIC} />);
    await fill(user, { "Placard pressure, front (kPa)": "2.4 bar", "Placard pressure, rear (kPa)": "35-40" });
    expect(
      screen.getByText("Placard pressure, front (kPa): the field is in kPa; “2.4 bar” is 240 kPa — enter that, or switch the units."),
    ).toBeTruthy();
    rerender(<LoadPressurePanel currentTire="P265/70R17 113S" plannedTire={PLANNED} prefs={IMPERIAL} />);
    expect(screen.getByLabelText("Placard pressure, rear (psi)")).toHaveProperty("value", "35-40");
    // Neither figure read, so both keep their text and say the unit changed under them.
    expect(screen.getAllByText(/The unit is now psi; this text, typed in kPa, was not converted/)).toHaveLength(2);
  });

  it("shows the aired-down guidance as common practice with the makers' limits", () => {
    render(<LoadPressurePanel currentTire="P265/70R17 113S" plannedTire={PLANNED} prefs={IMPERIAL} />);
    expect(screen.getByRole("heading", { name: /airing down \(common practice, no source\)/ })).toBeTruthy();
    expect(screen.getByText(/Beadlocks/)).toBeTruthy();
    expect(screen.getByText(/Never go below what the tire maker and the wheel maker allow/)).toBeTruthy();
    expect(screen.getByText(/Air back up to the road pressure before driving on the road/)).toBeTruthy();
  });
});
