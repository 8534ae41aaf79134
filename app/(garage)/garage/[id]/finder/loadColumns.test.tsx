// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { type FitmentMatch, parseTireSize } from "@/lib/fitment";
import { DEMO_PROFILE } from "@/lib/garage/loadTestUtil";
import { VEHICLE } from "@/lib/garage/testUtil";
import { loadColumns } from "./loadColumns";

afterEach(cleanup);
const IMPERIAL: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const METRIC: DisplayPrefs = { units: "metric", lengths: "decimal" };

/** A fit as the worker hands it over; these columns read only the tire and the wheel. */
const fit = (tire: string) => ({ tire: parseTireSize(tire), wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } }) as FitmentMatch;
const FITS = [fit("35x12.50R17LT 121Q LRE"), fit("37x12.50R17LT 124Q LRD"), fit("285/70R17 116T")];

describe("the finder's pressure and angle columns", () => {
  it("are absent without a stored profile, and only for the angles measured", () => {
    expect(loadColumns(null, VEHICLE, IMPERIAL)).toEqual([]);
    expect(loadColumns(DEMO_PROFILE, VEHICLE, IMPERIAL).map((c) => c.id)).toEqual(["pressure", "approach", "departure", "breakover"]);
    const noRear = { ...DEMO_PROFILE, rearCornerHeightMm: null, rearCornerBehindMm: null };
    expect(loadColumns(noRear, VEHICLE, IMPERIAL).map((c) => c.id)).toEqual(["pressure", "approach", "breakover"]);
  });

  it("rank by the approach angle: the taller tire raises the front corner more (SAE J1100 geometry)", () => {
    const approach = loadColumns(DEMO_PROFILE, VEHICLE, IMPERIAL).find((c) => c.id === "approach")!;
    const byAngle = [...FITS].sort((a, b) => Number(approach.sortValue!(b)) - Number(approach.sortValue!(a))).map((m) => m.tire.text);
    // 37 in (939.8 mm) > 35 in (889 mm) > 285/70R17 (2 × 285 × 0.70 + 431.8 = 830.8 mm): ISO 4000-1 / TRA arithmetic.
    expect(byAngle).toEqual(["37x12.50R17LT 124Q LRD", "35x12.50R17LT 121Q LRE", "285/70R17 116T"]);
  });

  it("show the pressure to set per axle in every unit, the chosen one first, and sort by the higher axle", () => {
    const pressure = (prefs: DisplayPrefs) => loadColumns(DEMO_PROFILE, VEHICLE, prefs).find((c) => c.id === "pressure")!;
    render(<>{pressure(IMPERIAL).cell!(FITS[1]!, 0)}</>);
    // The flotation road minimum 0.5833 × 50 psi = 29.2 psi (201 kPa, 2.01 bar; 1 psi = 6.894757 kPa, NIST SP 811).
    expect(screen.getByTestId("finder-pressure").textContent).toBe("F 29.2 psi (201 kPa, 2.01 bar)R 29.2 psi (201 kPa, 2.01 bar)");
    cleanup();
    render(<>{pressure(METRIC).cell!(FITS[1]!, 0)}</>);
    expect(screen.getByTestId("finder-pressure").textContent).toContain("F 201 kPa (2.01 bar, 29.2 psi)");
    expect(pressure(METRIC).sortValue!(FITS[1]!)).toBeCloseTo(0.5833 * 344.7379, 0);
  });

  it("say a fit's size names no load index instead of claiming it cannot carry the load (the finder's sizes carry none)", () => {
    const pressure = loadColumns(DEMO_PROFILE, VEHICLE, IMPERIAL).find((c) => c.id === "pressure")!;
    render(<>{pressure.cell!(fit("285/70R17"), 0)}</>);
    expect(screen.getByText("load index not known").getAttribute("title")).toMatch(/has no load index/);
    expect(screen.queryByText(/cannot carry/)).toBeNull();
    expect(pressure.sortValue!(fit("285/70R17"))).toBeNull();
  });
});
