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
    expect(loadColumns(DEMO_PROFILE, VEHICLE, IMPERIAL).map((c) => c.id)).toEqual([
      "pressure",
      "loadIndex",
      "approach",
      "departure",
      "breakover",
    ]);
    const noRear = { ...DEMO_PROFILE, rearCornerHeightMm: null, rearCornerBehindMm: null };
    expect(loadColumns(noRear, VEHICLE, IMPERIAL).map((c) => c.id)).toEqual(["pressure", "loadIndex", "approach", "breakover"]);
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

describe("the finder's load index needed column", () => {
  // Load to carry on the demo truck: 265/70R17 113T (LI 113 = 1150 kg, ISO 4000-1) at 250 kPa (ETRTO, from
  // memory), ÷ 1.10 on a light truck (FMVSS 120 S5.1.2), at 35 psi: 1045.45 × √(241.317/250) = 1027.15 kg.
  const column = (prefs: DisplayPrefs) => loadColumns(DEMO_PROFILE, VEHICLE, prefs).find((c) => c.id === "loadIndex")!;

  it("gives the least index per size: 109 (1030 kg) for a flotation LT size, 113 (1150 kg) for a passenger size on a light truck", () => {
    const col = column(METRIC);
    // LT: 1027.15 kg → ISO 4000-1 LI 109 = 1030 kg (108 = 1000 kg).
    expect(col.sortValue!(fit("35x12.50R17LT"))).toBe(109);
    // Passenger on a light truck: 1027.15 × 1.10 = 1129.9 kg → LI 113 = 1150 kg (112 = 1120 kg).
    expect(col.sortValue!(fit("285/70R17"))).toBe(113);
    render(<>{col.cell!(fit("285/70R17"), 0)}</>);
    const cell = screen.getByTestId("finder-load-index");
    expect(cell.textContent).toBe("≥ 1131,150 kg (2,535 lb)");
    expect(cell.getAttribute("title")).toMatch(/× 1.10 for a passenger size on a light truck \(FMVSS 120 S5.1.2\)/);
  });

  it("ranks the LT sizes first and says the pounds first in inch units (1 lb = 0.45359237 kg, NIST SP 811)", () => {
    const col = column(IMPERIAL);
    const sorted = [fit("285/70R17"), fit("35x12.50R17LT")].sort((a, b) => Number(col.sortValue!(a)) - Number(col.sortValue!(b)));
    expect(sorted.map((m) => m.tire.text)).toEqual(["35x12.50R17LT", "285/70R17"]);
    render(<>{col.cell!(fit("35x12.50R17LT"), 0)}</>);
    expect(screen.getByTestId("finder-load-index").textContent).toBe("≥ 1092,271 lb (1,030 kg)");
  });

  it("is absent without axle loads (nothing to carry is known)", () => {
    const noLoads = { ...DEMO_PROFILE, frontAxleKg: null, rearAxleKg: null, frontGawrKg: null, rearGawrKg: null };
    expect(loadColumns(noLoads, VEHICLE, METRIC).map((c) => c.id)).not.toContain("loadIndex");
  });
});
