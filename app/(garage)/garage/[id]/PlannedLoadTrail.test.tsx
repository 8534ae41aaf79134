// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it } from "vitest";
import { DEMO_PROFILE } from "@/lib/garage/loadTestUtil";
import { VEHICLE } from "@/lib/garage/testUtil";
import type { Setup } from "@/lib/setup/model";
import { PlannedLoadTrail } from "./PlannedLoadTrail";

afterEach(() => {
  cleanup();
  window.localStorage.clear();
});
const PLANNED: Setup = {
  ...VEHICLE.currentSetup,
  tire: "37x12.50R17LT 124Q LRD",
  wheelWidthIn: 9,
  position: { mode: "offset", offsetMm: -12 },
};

describe("the vehicle page's pressure to set and angle changes", () => {
  it("shows the pressure per axle with the caution and the angles, in both unit systems", async () => {
    const user = userEvent.setup();
    render(<PlannedLoadTrail vehicle={VEHICLE} planned={PLANNED} profile={DEMO_PROFILE} toggle />);
    // Flotation load range D: road minimum 0.5833 × 50 psi = 29.2 psi = 201 kPa (1 psi = 6.894757 kPa, NIST SP 811).
    expect(screen.getByTestId("set-front").textContent).toBe("29.2 psi (201 kPa, 2.01 bar)");
    expect(screen.getByText(/never inflate above the maximum on the sidewall or the wheel/)).toBeTruthy();
    const approach = within(screen.getByTestId("angle-approach")).getAllByRole("cell");
    expect(Number(approach[1]!.textContent!.replace("°", ""))).toBeGreaterThan(Number(approach[0]!.textContent!.replace("°", "")));
    expect(approach[2]!.textContent).toMatch(/^\+\d+\.\d°$/);
    await user.click(screen.getByLabelText("Metric"));
    expect(screen.getByTestId("set-front").textContent).toBe("201 kPa (2.01 bar, 29.2 psi)");
    expect(within(screen.getByTestId("angle-approach")).getAllByRole("cell")[2]!.textContent).toBe(approach[2]!.textContent);
  });

  it("says what to add when nothing is stored", () => {
    render(<PlannedLoadTrail vehicle={VEHICLE} planned={PLANNED} profile={null} />);
    expect(screen.getByText(/Add the placard and the axle weights/)).toBeTruthy();
    expect(screen.getByText(/Add the body points/)).toBeTruthy();
  });
});
