// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { PlannedPanel } from "@/app/(garage)/garage/[id]/PlannedPanel";
import { type DisplayPrefs, PREFS_STORAGE_KEY, formatLen } from "@/lib/comparisons/format";
import { DEFAULT_INPUT } from "@/lib/comparisons/model";
import { formatLength } from "@/lib/fitment";
import { predictPoints, steeringAxisOf } from "@/lib/garage/predict";
import { HAULER, detailOf, point } from "@/lib/garage/testUtil";
import type { WorkspaceVehicle } from "@/lib/garage/types";
import GaragePanel from "./GaragePanel";

vi.mock("next/link", () => import("@/tests/support/nextLink"));
afterEach(() => {
  cleanup();
  window.localStorage.clear();
});

// An invented vehicle with 9° of kingpin inclination recorded and one point measured at full lock.
const metric: DisplayPrefs = { units: "metric", lengths: "decimal" };
const current = DEFAULT_INPUT.current;
const planned = DEFAULT_INPUT.planned;
const swayBar = point("p1", "inboard", 60, {
  label: "sway bar end, full right lock",
  suspensionState: "full-lock",
  measuredSetup: current,
  createdAt: "2026-01-01T00:00:00.000Z",
});
const wsVehicle: WorkspaceVehicle = {
  id: "v1",
  name: "Quarry hauler",
  currentSetup: current,
  kingpinInclinationDeg: 9,
  axleRatio: 3.73,
  transmissionRatio: 1,
  clearanceMarginMm: 12.7,
  clearances: [swayBar],
};
const detail = detailOf({ ...HAULER, kingpinInclinationDeg: 9 }, [swayBar]);
const predictedCell = (testId: string) =>
  within(screen.getByTestId(testId)).getAllByRole("row")[1]!.querySelectorAll("td")[3]!.textContent ?? "";

describe("full-lock predictions: the workspace's garage panel and the vehicle page agree", () => {
  it("turn the point about the same steering axis, placed by the vehicle's kingpin inclination", () => {
    render(
      <GaragePanel
        vehicles={[wsVehicle]}
        vehicleId="v1"
        planned={planned}
        prefs={metric}
        onPick={() => {}}
        onLimits={() => {}}
        onUseVehicle={() => {}}
      />,
    );
    // The vehicle page reads the reader's stored Units choice: the same metric one the workspace is given.
    window.localStorage.setItem(PREFS_STORAGE_KEY, JSON.stringify(metric));
    render(<PlannedPanel detail={detail} initialPlanned={planned} />);
    // The engine's own figure with the vehicle's axis (lib/fitment/clearance.ts), to the mm.
    const expected = predictPoints([swayBar], planned, 12.7, wsVehicle)[0]!.predictedMm;
    const withoutAxis = predictPoints([swayBar], planned, 12.7)[0]!.predictedMm;
    expect(Math.abs(expected - withoutAxis)).toBeGreaterThan(1);
    expect(predictedCell("workspace-predictions")).toBe(formatLen(expected, metric, { decimals: 0 }));
    // The vehicle page's mm, with the true minus sign (U+2212) like every other figure.
    expect(predictedCell("predictions").startsWith(formatLen(expected, metric, { decimals: 1 }))).toBe(true);
    // Both notes name the same axis.
    const axis = formatLength(steeringAxisOf(wsVehicle), { unit: "mm" });
    for (const note of screen.getAllByTestId("prediction-note")) expect(note.textContent).toContain(`${axis} inboard of the hub face`);
  });
});
