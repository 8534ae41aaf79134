// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { computeComparison } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { HeadlineChanges, WarningList } from "./ResultsPanel";
import { SetupDetailTable } from "./SetupDetailTable";

const inch: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const metric: DisplayPrefs = { units: "metric", lengths: "decimal" };
const stat = (id: string) => {
  const el = screen.getByTestId(id);
  return {
    label: el.querySelector("dt")?.textContent,
    value: el.querySelectorAll("dd")[0]?.textContent,
    sub: el.querySelectorAll("dd")[1]?.textContent,
  };
};

afterEach(cleanup);

// The demo: 265/70R17 (802.8 mm, ISO 4000-1) against 37 in (939.8 mm); r = 939.8 / 802.8 = 1.17065.
// Speed ∝ rolling circumference (handbook): actual = indicated × r; the speedometer reads (1 − 1/r) low.
const SENTENCE = "Actual speed is 17.1 % above the speedometer; the speedometer reads 14.6 % low.";

describe("headline crawl ratio (first gear × transfer-case low × axle; common 4x4 handbook definition, common practice, no written source)", () => {
  it("shows the crawl ratio on the current and the suggested axle ratio, and what the 37 in tire makes each act like", () => {
    const input = { ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, firstGearRatio: 4.03, transferLowRatio: 2.72 } };
    render(<HeadlineChanges result={computeComparison(input)} prefs={inch} />);
    // 4.03 × 2.72 × 3.73 = 40.8868; × 802.8 / 939.8 (ISO 4000-1 diameters) = 34.9265, −14.6 %.
    expect(stat("change-crawl")).toEqual({
      label: "Crawl ratio",
      value: "40.89:1",
      sub: "4.03 × 2.72 × 3.73; planned tire: acts like 34.93:1 (−14.6 %)",
    });
    // 4.03 × 2.72 × 4.30 = 47.1349; × 802.8 / 939.8 = 40.2638.
    expect(stat("change-crawl-regeared")).toEqual({
      label: "Crawl ratio regeared",
      value: "47.13:1",
      sub: "with 4.30; planned tire: acts like 40.26:1",
    });
  });

  it("is left out until both gear ratios are entered", () => {
    render(<HeadlineChanges result={computeComparison(DEFAULT_INPUT)} prefs={inch} />);
    expect(screen.queryByTestId("change-crawl")).toBeNull();
  });
});

describe("headline speedometer figure", () => {
  it("metric readers get a round 100 km/h indicated and both percentages named", () => {
    render(<HeadlineChanges result={computeComparison(DEFAULT_INPUT)} prefs={metric} />);
    // 100 × 1.17065 = 117.07 km/h.
    expect(stat("change-speed")).toEqual({ label: "True speed at 100 km/h shown", value: "117.1 km/h", sub: SENTENCE });
  });

  it("imperial readers get 60 mph indicated and the same plain statement", () => {
    render(<HeadlineChanges result={computeComparison(DEFAULT_INPUT)} prefs={inch} />);
    // 60 × 1.17065 = 70.24 mph.
    expect(stat("change-speed")).toEqual({ label: "True speed at 60 mph shown", value: "70.2 mph", sub: SENTENCE });
  });

  it("no bare signed percentage and no converted 96.6 km/h anywhere in the metric headline", () => {
    const { container } = render(<HeadlineChanges result={computeComparison(DEFAULT_INPUT)} prefs={metric} />);
    expect(container.textContent).not.toMatch(/speedometer \+17\.1 %|96\.6 km\/h shown/);
  });

  it("cruise speeds entered in km/h show back as typed (100 km/h, not 99.9 or 62 mph alone)", () => {
    const input = { ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, cruiseSpeedsMph: [100 / 1.609344, 113 / 1.609344] } };
    render(<HeadlineChanges result={computeComparison(input)} prefs={metric} />);
    expect(stat("change-rpm").label).toBe("RPM at 100 km/h");
    expect(stat("change-rpm-regeared").sub).toBe("at 100 km/h with 4.30");
    cleanup();
    render(<HeadlineChanges result={computeComparison(input)} prefs={inch} />);
    // 100 km/h = 62.137 mph (1 mi = 1.609344 km exactly, NIST SP 811).
    expect(stat("change-rpm").label).toBe("RPM at 62.1 mph (100 km/h)");
  });
});

describe("speedometer warning", () => {
  it("reads in the reader's unit with both percentages named", () => {
    render(<WarningList result={computeComparison(DEFAULT_INPUT)} prefs={metric} />);
    const item = within(screen.getByTestId("warnings"))
      .getAllByRole("listitem")
      .find((li) => li.getAttribute("data-kind") === "speedometer");
    expect(item?.querySelector("p")?.textContent).toBe(
      "Caution: Speedometer reads 14.6 % low: at an indicated 100 km/h you are actually going 117.1 km/h (actual speed is 17.1 % above the speedometer)",
    );
  });
});

describe("spacer thickness under the unit toggle", () => {
  const frac: DisplayPrefs = { units: "imperial", lengths: "fraction" };
  const withSpacer = (spacerMm: number) => computeComparison({ ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, spacerMm } });
  const wheelCell = () => screen.getByRole("row", { name: /^Wheel/ }).querySelectorAll("td")[1]?.textContent;
  const spacerNote = () =>
    within(screen.getByTestId("warnings"))
      .getAllByRole("listitem")
      .find((li) => li.getAttribute("data-kind") === "spacer")
      ?.querySelector("p")?.textContent;

  it("a 25 mm spacer is never shown as a 1 in one (25 mm = 0.984 in; 1 in = 25.4 mm exactly, NIST SP 811)", () => {
    render(
      <>
        <SetupDetailTable result={withSpacer(25)} prefs={frac} />
        <WarningList result={withSpacer(25)} prefs={frac} />
      </>,
    );
    expect(wheelCell()).toMatch(/\+ 0\.98 in \(25 mm\) spacer/);
    expect(spacerNote()).toBe("Note: Planned setup uses a 0.98 in (25 mm) spacer");
  });

  it("a 1 in spacer (25.4 mm) is never shown as a 25 mm one", () => {
    render(
      <>
        <SetupDetailTable result={withSpacer(25.4)} prefs={metric} />
        <WarningList result={withSpacer(25.4)} prefs={metric} />
      </>,
    );
    expect(wheelCell()).toMatch(/\+ 25\.4 mm spacer/);
    expect(spacerNote()).toBe("Note: Planned setup uses a 25.4 mm spacer");
    cleanup();
    render(<SetupDetailTable result={withSpacer(25.4)} prefs={frac} />);
    expect(wheelCell()).toMatch(/\+ 1 in \(25\.4 mm\) spacer/);
  });
});
