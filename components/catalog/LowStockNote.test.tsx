// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { LowStockNote } from "./LowStockNote";

afterEach(cleanup);

describe("LowStockNote", () => {
  it("counts the items that are low, in words", () => {
    render(<LowStockNote count={3} />);
    expect(screen.getByTestId("low-stock-count").textContent).toBe("Low stock3 items are at or under their low-stock mark.");
  });
  it("says nothing when no item is low", () => {
    const { container } = render(<LowStockNote count={0} />);
    expect(container.textContent).toBe("");
  });
});
