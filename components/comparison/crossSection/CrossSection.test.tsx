// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import { renderToStaticMarkup } from "react-dom/server";
import { afterEach, describe, expect, it } from "vitest";
import { computeComparison } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { type ComparisonInput, DEFAULT_INPUT } from "@/lib/comparisons/model";
import type { Setup } from "@/lib/setup/model";
import { stockPart } from "@/lib/fitment/crossSectionTestUtil";
import { SETUP_A, SETUP_B, garageLimits } from "@/lib/comparisons/crossSection/testUtil";
import { CrossSection } from "./CrossSection";

afterEach(cleanup);

const inch: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const frac: DisplayPrefs = { units: "imperial", lengths: "fraction" };
const metric: DisplayPrefs = { units: "metric", lengths: "decimal" };

/*
 * Figures worked by hand (as in lib/fitment/crossSection.test.ts): 1 in = 25.4 mm exactly (NIST
 * SP 811); 265/70R17 D = 431.8 + 2 × 185.5 = 802.8 mm (ISO 4000-1); 35x12.50R17 D = 889 mm and
 * section on a 9 in rim 317.5 − 0.4 × 25.4 = 307.34 mm (TRA designation, UN R30 §6.1.1.1); on a
 * 17x9 −12 wheel it reaches 153.67 − 12 = 141.67 mm = 5.58 in (5-9/16 in) inboard and 165.67 mm =
 * 6.52 in outboard; backspacing to the flange 4.5 − 12/25.4 + 0.5 = 4.53 in = 115 mm (offset.ts,
 * common practice, no source); ground clearance (889 − 802.8)/2 = +43.1 mm = +1.7 in.
 */
const A = SETUP_A;
/** 285/75R16 on 16x8 +0 on a 38 mm spacer: 38 mm = 1.496 in → "1.5 in (38 mm)" as bought. */
const B = SETUP_B;
const withPlanned = (planned: Setup, vehicle: Partial<ComparisonInput["vehicle"]> = {}): ComparisonInput => ({
  ...DEFAULT_INPUT,
  planned,
  vehicle: { ...DEFAULT_INPUT.vehicle, ...vehicle },
});

const labels = () => [...document.querySelectorAll("[data-testid=cross-section] text")].map((t) => t.textContent ?? "");

describe("CrossSection", () => {
  it("draws both setups in section, each with its wheel and tire, told apart by line style and words", () => {
    render(<CrossSection result={computeComparison(withPlanned(A))} prefs={inch} />);
    const svg = screen.getByTestId("cross-section");
    const cur = svg.querySelector("[data-setup=current]")!;
    const pla = svg.querySelector("[data-setup=planned]")!;
    // Tire (2 halves), casing inside (2 + 2), disc, pad and rim (2 each), centreline.
    expect(cur.querySelectorAll("path")).toHaveLength(13);
    expect(pla.querySelectorAll("path")).toHaveLength(13);
    // Solid against dashed: more than colour.
    expect(cur.getAttribute("stroke-dasharray")).toBeNull();
    expect(pla.getAttribute("stroke-dasharray")).toMatch(/^\d/);
    expect(svg.querySelector("[data-ground=planned]")!.getAttribute("stroke-dasharray")).toMatch(/^\d/);
    // Words on the drawing: the legend with the tires, and a name on each tire.
    expect(labels()).toEqual(
      expect.arrayContaining(["Current 265/70R17 113T", "Planned 35x12.50R17", "Current", "Planned", "hub face", "axle"]),
    );
    const legend = [...svg.querySelectorAll("[data-legend] path")].map((p) => p.getAttribute("stroke-dasharray"));
    expect(legend[0]).toBeNull();
    expect(legend[1]).toMatch(/^\d/);
  });

  it("is one image with a title and a description naming every figure", () => {
    render(<CrossSection result={computeComparison(withPlanned(A))} prefs={inch} />);
    const img = screen.getByRole("img", { name: /Cross-section of both setups at the hub, to scale/ });
    const desc = document.getElementById(img.getAttribute("aria-labelledby")!.split(" ")[1]!)!;
    expect(desc.tagName.toLowerCase()).toBe("desc");
    expect(desc.textContent).toContain(
      "Planned: 35x12.50R17 on a 17 × 9 in wheel, offset −12 mm, backspacing 4.53 in to the flange edge; the tire reaches 5.58 in inboard and 6.52 in outboard of the hub face and is 35 in tall.",
    );
    expect(desc.textContent).toContain("The planned setup sits 1.7 in higher (ground clearance +1.7 in).");
  });

  it("offers the figures as a table for screen readers", () => {
    render(<CrossSection result={computeComparison(withPlanned(A))} prefs={metric} />);
    const table = within(screen.getByTestId("cross-section-table")).getByRole("table", { name: "Figures drawn in the cross-section" });
    const row = (name: string) =>
      [
        ...within(table)
          .getByRole("row", { name: new RegExp(`^${name}`) })
          .querySelectorAll("td"),
      ].map((c) => c.textContent);
    expect(row("Reach inboard of the hub face")).toEqual(["158 mm", "142 mm"]);
    expect(row("Backspacing")).toEqual(["139 mm to the flange edge", "115 mm to the flange edge"]);
    expect(row("Offset")).toEqual(["+25 mm", "−12 mm"]);
    expect(row("Overall diameter")).toEqual(["803 mm", "889 mm"]);
    expect(row("Ground clearance change")).toEqual(["+43 mm (the planned setup sits higher)"]);
    expect(screen.getByTestId("cross-section-table").className).toContain("sr-only");
  });

  it.each([
    {
      unit: "inches",
      prefs: inch,
      labels: [
        "inboard 5.58 in",
        "outboard 6.52 in",
        "backspacing 4.53 in",
        "flange 0.5 in",
        "offset −12 mm",
        "offset +25 mm",
        "diameter 35 in",
        "diameter 31.61 in",
        "ground clearance +1.7 in",
      ],
    },
    // 5.5776 in × 16 = 89.2 → 89/16 = 5-9/16 in; 4.5276 × 16 = 72.4 → 4-1/2 in.
    { unit: "sixteenths", prefs: frac, labels: ["inboard 5-9/16 in", "backspacing 4-1/2 in", "flange 1/2 in"] },
    {
      unit: "millimetres",
      prefs: metric,
      labels: [
        "inboard 142 mm",
        "outboard 166 mm",
        "backspacing 115 mm",
        "flange 13 mm",
        "offset −12 mm",
        "diameter 889 mm",
        "diameter 803 mm",
        "ground clearance +43 mm",
      ],
    },
  ])("labels the dimensions in $unit", ({ prefs, labels: expected }) => {
    render(<CrossSection result={computeComparison(withPlanned(A))} prefs={prefs} />);
    expect(labels()).toEqual(expect.arrayContaining(expected));
  });

  it("draws a spacer between the hub face and the wheel, with its thickness as bought", () => {
    const r = computeComparison(withPlanned(B));
    render(<CrossSection result={r} prefs={inch} />);
    const svg = screen.getByTestId("cross-section");
    expect(svg.querySelector("[data-testid=spacer-planned]")).not.toBeNull();
    expect(svg.querySelector("[data-testid=spacer-current]")).toBeNull();
    // The block runs from the hub face (x = 0) to the wheel's mounting face 38 mm outboard.
    const d = svg.querySelector("[data-testid=spacer-planned]")!.getAttribute("d")!;
    expect(d).toMatch(/^M 0 /);
    expect(d).toContain("L 38 ");
    expect(labels()).toContain("spacer 1.5 in (38 mm)");
    cleanup();
    render(<CrossSection result={r} prefs={metric} />);
    expect(labels()).toContain("spacer 38 mm");
  });

  it("shows backspacing to the bead seat when it was entered so, without a flange allowance dimension", () => {
    const planned: Setup = { ...A, position: { mode: "backspacing", backspacingIn: 4, reference: "bead-seat", flangeIn: 0.5 } };
    render(<CrossSection result={computeComparison(withPlanned(planned))} prefs={inch} />);
    expect(labels()).toContain("backspacing 4 in (bead seat)");
    expect(document.querySelector("[data-dimension=planned-flange-allowance]")).toBeNull();
    expect(document.querySelector("[data-dimension=current-flange-allowance]")).not.toBeNull();
  });

  it("with a garage vehicle: its inner limit and fender lip where they are, parts marked by predicted status", () => {
    const limits = garageLimits(
      stockPart("Frame rail", "inboard", "ride-height", 30, 45.83, "clear"),
      stockPart("Flare", "outboard", "ride-height", 20, -38.17, "contact"),
      stockPart("Bumper corner", "fore-aft", "full-lock", 19.05, 3, "tight"),
    );
    render(<CrossSection result={computeComparison(withPlanned(A))} prefs={metric} limits={limits} />);
    const svg = screen.getByTestId("cross-section");
    expect(svg.querySelector("[data-testid=inner-limit]")!.getAttribute("x1")).toBe("-187.5");
    expect(svg.querySelector("[data-testid=fender-lip]")!.getAttribute("x1")).toBe("127.5");
    expect([...svg.querySelectorAll("[data-part]")].map((p) => p.getAttribute("data-status"))).toEqual(["clear", "contact"]);
    expect(labels()).toEqual(expect.arrayContaining(["inner limit", "fender lip", "Frame rail: clear", "Flare: contact"]));
    expect(screen.getByText(/One point lies outside this section/)).toBeTruthy();
    const vehicle = within(screen.getByTestId("cross-section-table")).getByRole("table", { name: "Vehicle parts and lines drawn" });
    expect(within(vehicle).getByRole("row", { name: /^Flare/ }).textContent).toContain(
      "128 mm outboard of the hub face at hub height; −38 mm predicted with the planned setup, predicted contact",
    );
    expect(within(vehicle).getByRole("row", { name: /^Bumper corner/ }).textContent).toContain("not in this section");
  });

  it("draws the steering axis with its inclination only when one is entered", () => {
    render(<CrossSection result={computeComparison(withPlanned(A, { kingpinInclinationDeg: 8 }))} prefs={inch} />);
    expect(screen.getByTestId("steering-axis")).toBeTruthy();
    expect(labels()).toContain("steering axis 8.0°");
    cleanup();
    render(<CrossSection result={computeComparison(withPlanned(A))} prefs={inch} />);
    expect(screen.queryByTestId("steering-axis")).toBeNull();
  });

  it("places the fender line at the figure entered, in mm", () => {
    render(<CrossSection result={computeComparison(withPlanned(A, { fenderLineMm: 139.7 }))} prefs={inch} />);
    expect(screen.getByTestId("cross-section").querySelectorAll('line[x1="139.7"]')).toHaveLength(1);
  });

  it("renders on the server to the same markup every time (no browser API, hydration-safe numbers)", () => {
    const r = computeComparison(withPlanned(B, { kingpinInclinationDeg: 10.5 }));
    const a = renderToStaticMarkup(<CrossSection result={r} prefs={inch} />);
    const b = renderToStaticMarkup(
      <CrossSection result={computeComparison(withPlanned(B, { kingpinInclinationDeg: 10.5 }))} prefs={inch} />,
    );
    expect(a).toBe(b);
    expect(a).toContain('data-testid="cross-section"');
    // Coordinates are rounded to 0.01 mm.
    expect(a.match(/\d\.\d{3,}/g)).toBeNull();
  });
});
