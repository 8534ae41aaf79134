// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { type FitmentMatch, parseTireSize } from "@/lib/fitment";
import { HAULER } from "@/lib/garage/testUtil";
import { FinderTable } from "./FinderTable";

vi.setConfig({ testTimeout: 30_000 });
vi.mock("next/link", () => import("@/tests/support/nextLink"));
afterEach(cleanup);

const TIRES = ["33x12.50R17LT", "35x12.50R17LT", "285/70R17"].map((t) => parseTireSize(t));
/**
 * 60 ranked fits, as the finder's worker hands them over; the figures only need to differ (the
 * table shows what it is given), offsets run −24 … +35 mm in a shuffled order.
 */
const ROWS: FitmentMatch[] = Array.from({ length: 60 }, (_, i) => {
  const tire = TIRES[i % 3]!;
  const offsetMm = ((i * 37) % 60) - 24;
  return {
    tire,
    wheel: { diameterIn: 17, widthIn: 8 + (i % 3), offsetMm },
    wheelId: null,
    boltPattern: null,
    sectionWidthMm: tire.sectionWidthMm,
    overallDiameterMm: 800 + i,
    effectiveOffsetMm: offsetMm,
    innerSwingMm: 100 + i,
    outerSwingMm: 150 - i,
    backspacingIn: 5,
    measuringRimWidthIn: 9,
    rank: i + 1,
    tightestClearance: i % 4 === 0 ? null : { pointIndex: 0, label: "Frame rail", predictedMm: 30 - i / 2 },
  };
});

const bodyRows = () => within(screen.getByTestId("finder-results").querySelector("tbody")!).getAllByRole("row");
const firstCells = () => bodyRows().map((r) => within(r).getAllByRole("cell")[0]!.textContent);
const column = (n: number) => bodyRows().map((r) => within(r).getAllByRole("cell")[n]!.textContent ?? "");

describe("the finder's results table", () => {
  it("shows 25 fits a page, in the engine's rank, and pages through the rest", async () => {
    const user = userEvent.setup();
    render(<FinderTable rows={ROWS} vehicle={HAULER} />);
    expect(firstCells()).toEqual(Array.from({ length: 25 }, (_, i) => String(i + 1)));
    expect(screen.getByTestId("finder-page-rows").textContent).toBe("Rows 1–25 of 60");
    // The table scrolls sideways in its own focusable region; the filter and the pages stay outside it, in view.
    const region = screen.getByRole("region", { name: /Fitments found/ });
    expect(region.tabIndex).toBe(0);
    expect(within(region).getByTestId("finder-results")).toBeTruthy();
    expect(within(region).queryByRole("searchbox")).toBeNull();
    expect(within(region).queryByRole("navigation")).toBeNull();
    const pages = screen.getByRole("navigation", { name: "Pages of fitments" });
    expect((within(pages).getByRole("button", { name: "Previous" }) as HTMLButtonElement).disabled).toBe(true);
    await user.click(within(pages).getByRole("button", { name: "Next" }));
    await user.click(within(pages).getByRole("button", { name: "Next" }));
    expect(firstCells()).toEqual(Array.from({ length: 10 }, (_, i) => String(i + 51)));
    expect(screen.getByTestId("finder-page-rows").textContent).toBe("Rows 51–60 of 60");
    expect(within(pages).getByText("Page 3 of 3")).toBeTruthy();
    expect((within(pages).getByRole("button", { name: "Next" }) as HTMLButtonElement).disabled).toBe(true);
  });

  it("sorts every figure column over all fits, not only the page shown, and starts again at page 1", async () => {
    const user = userEvent.setup();
    render(<FinderTable rows={ROWS} vehicle={HAULER} />);
    await user.click(screen.getByRole("button", { name: "Next" }));
    await user.click(screen.getByRole("button", { name: "Offset" }));
    expect(screen.getByTestId("finder-page-rows").textContent).toBe("Rows 1–25 of 60");
    const offsets = column(4).map((t) => Number(t.replace(" mm", "")));
    expect(offsets.slice(0, 3)).toEqual([-24, -23, -22]);
    expect(offsets).toEqual([...offsets].sort((a, b) => a - b));
    const sortable = [
      "Rank",
      "Tire size",
      "Diameter",
      "Wheel",
      "Offset",
      "Backspacing (bead seat)",
      "Reach inboard",
      "Reach outboard",
      "Tightest point",
    ];
    for (const name of sortable) expect(screen.getByRole("button", { name })).toBeTruthy();
    expect(within(screen.getByRole("columnheader", { name: "Compare" })).queryByRole("button")).toBeNull();
  });

  it("puts fits without a measured point last by tightest point, whichever way", async () => {
    const user = userEvent.setup();
    render(<FinderTable rows={ROWS} vehicle={HAULER} />);
    const tightest = screen.getByRole("button", { name: "Tightest point" });
    await user.click(tightest);
    await user.click(tightest);
    expect(column(8)[0]).toBe("Frame rail: 29.5 mm");
    await user.click(screen.getByRole("button", { name: "Next" }));
    await user.click(screen.getByRole("button", { name: "Next" }));
    expect(column(8).every((t) => t === "—")).toBe(true);
  });

  it("filters by wheel, counts what is left, and says so when nothing matches", async () => {
    const user = userEvent.setup();
    render(<FinderTable rows={ROWS} vehicle={HAULER} />);
    await user.click(screen.getByRole("button", { name: "Next" }));
    const filter = screen.getByLabelText("Filter by tire size or wheel");
    await user.type(filter, "17x9");
    expect(screen.getByTestId("finder-page-rows").textContent).toBe("Rows 1–20 of 20");
    expect(column(3).every((t) => t === "17x9")).toBe(true);
    await user.clear(filter);
    await user.type(filter, "40x");
    expect(screen.getByText("No fit matches “40x”.")).toBeTruthy();
  });

  it("starts a new search's fits at their first page", async () => {
    const user = userEvent.setup();
    const { rerender } = render(<FinderTable rows={ROWS} vehicle={HAULER} />);
    await user.click(screen.getByRole("button", { name: "Next" }));
    expect(firstCells()[0]).toBe("26");
    rerender(<FinderTable rows={ROWS.slice(0, 40)} vehicle={HAULER} />);
    expect(firstCells()[0]).toBe("1");
    expect(screen.getByTestId("finder-page-rows").textContent).toBe("Rows 1–25 of 40");
  });
});
