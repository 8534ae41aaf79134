// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { type FigureColumn, FigureTable } from "./FigureTable";

afterEach(cleanup);

type Size = { text: string; diameterMm: number };
// 265/70R17: 431.8 + 2 × 185.5 = 802.8 mm; 285/70R17: 431.8 + 2 × 199.5 = 830.8 mm (ISO 4000-1 / ETRTO designation arithmetic).
const SIZES: Size[] = [
  { text: "265/70R17", diameterMm: 802.8 },
  { text: "285/70R17", diameterMm: 830.8 },
];
const COLUMNS: FigureColumn<Size>[] = [
  { id: "size", header: "Size", cell: (s) => s.text },
  { id: "diameter", header: "Diameter", align: "end", cell: (s) => `${s.diameterMm} mm`, cellTestId: (s) => `diameter-${s.text}` },
];

describe("FigureTable", () => {
  it("heads columns and rows, so each figure is named by its row and column", () => {
    render(<FigureTable columns={COLUMNS} rows={SIZES} rowKey={(s) => s.text} caption="Two sizes" rowTestId={(s) => `row-${s.text}`} />);
    const table = screen.getByRole("table", { name: "Two sizes" });
    expect(
      within(table)
        .getAllByRole("columnheader")
        .map((h) => [h.textContent, h.getAttribute("scope")]),
    ).toEqual([
      ["Size", "col"],
      ["Diameter", "col"],
    ]);
    expect(
      within(table)
        .getAllByRole("rowheader")
        .map((h) => [h.textContent, h.getAttribute("scope")]),
    ).toEqual([
      ["265/70R17", "row"],
      ["285/70R17", "row"],
    ]);
    expect(screen.getByTestId("row-285/70R17").textContent).toBe("285/70R17830.8 mm");
    expect(screen.getByTestId("diameter-265/70R17").tagName).toBe("TD");
  });

  it("says so in one full-width row when there is nothing to list", () => {
    render(<FigureTable columns={COLUMNS} rows={[]} rowKey={(s) => s.text} empty="No size" />);
    const cell = screen.getByRole("cell", { name: "No size" });
    expect(cell.getAttribute("colspan")).toBe("2");
  });

  it("puts a wide table in a named region that takes the keyboard's focus", () => {
    render(<FigureTable columns={COLUMNS} rows={SIZES} rowKey={(s) => s.text} scrollRegion={{ label: "Sizes (scrolls sideways)" }} />);
    const region = screen.getByRole("region", { name: "Sizes (scrolls sideways)" });
    expect(region.tabIndex).toBe(0);
    expect(within(region).getByRole("table")).toBeTruthy();
  });
});
