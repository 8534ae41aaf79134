// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { PageLoading } from "./PageLoading";

afterEach(cleanup);

describe("PageLoading", () => {
  it("says it is loading and holds a whole screen's height, so the footer is below the fold until the page arrives", () => {
    render(<PageLoading label="Loading the workspace" />);
    const box = screen.getByRole("status");
    expect(box.textContent).toBe("Loading the workspace…");
    // jsdom lays nothing out: the class is what reserves the height (Tailwind: min-height 100svh).
    expect(box.className.split(" ")).toContain("min-h-[100svh]");
  });
});
