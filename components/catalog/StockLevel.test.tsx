// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { StockLevel } from "./StockLevel";

afterEach(cleanup);

describe("StockLevel", () => {
  it("shows what is available and the low-stock badge when the item is at its mark", () => {
    render(<StockLevel item={{ qtyAvailable: 2, qtyReserved: 4, lowStock: true }} />);
    expect(screen.getByText("2 available")).toBeTruthy();
    expect(screen.getByText("Low stock")).toBeTruthy();
  });
  it("shows no badge above the mark", () => {
    render(<StockLevel item={{ qtyAvailable: 9, qtyReserved: 0, lowStock: false }} />);
    expect(screen.getByText("9 available")).toBeTruthy();
    expect(screen.queryByText("Low stock")).toBeNull();
  });
  it("says an item is not counted rather than showing a number", () => {
    render(<StockLevel item={{ qtyAvailable: null, qtyReserved: 0, lowStock: false }} />);
    expect(screen.getByText("not counted")).toBeTruthy();
  });
});
