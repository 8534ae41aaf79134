// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { DEFAULT_INPUT } from "@/lib/comparisons/model";
import type { VehicleDetail } from "@/lib/garage/types";
import { PlannedPanel } from "./PlannedPanel";

vi.setConfig({ testTimeout: 20_000 });
vi.mock("next/link", () => ({
  default: ({ href, children, ...rest }: { href: string; children: ReactNode }) => (
    <a href={href} {...rest}>
      {children}
    </a>
  ),
}));
afterEach(cleanup);

const setup = DEFAULT_INPUT.current;
const detail: VehicleDetail = {
  vehicle: {
    id: "v1",
    name: "Quarry hauler",
    year: null,
    make: null,
    model: null,
    trim: null,
    frontSuspension: "solid-axle",
    boltPattern: "6x139.7",
    hubBoreMm: null,
    stockSetup: setup,
    currentSetup: setup,
    liftHeightMm: null,
    kingpinInclinationDeg: null,
    axleRatio: 3.73,
    transmissionRatio: 1,
    clearanceMarginMm: 12.7,
    notes: "",
    createdAt: "2026-01-01T00:00:00.000Z",
    updatedAt: "2026-01-01T00:00:00.000Z",
  },
  clearances: [],
  photos: [],
};

describe("plan a setup: the margin's messages name it as labelled", () => {
  it("says “Safety margin”, not “Margin”, when a bare 12 is typed", async () => {
    const user = userEvent.setup();
    render(<PlannedPanel detail={detail} initialPlanned={null} />);
    const margin = screen.getByLabelText("Safety margin");
    await user.clear(margin);
    await user.type(margin, "12");
    expect(await screen.findByText("Safety margin: say which unit 12 is in, e.g. 1/2 in or 12 mm.")).toBeTruthy();
  });
});
