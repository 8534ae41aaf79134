// @vitest-environment jsdom
import { screen, waitFor } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { freshWorkspaceEachTest, headline, renderDefault } from "./workspaceTestUtil";

// The reading code (./reading.ts) arrives after the page; here it arrives when the test opens the gate.
// One test per file: once arrived it stays for the page (useReading.ts), as in a browser tab.
vi.setConfig({ testTimeout: 20_000 });
const gate = vi.hoisted(() => {
  let open: () => void = () => undefined;
  const opened = new Promise<void>((resolve) => (open = resolve));
  return { opened, open: () => open() };
});
vi.mock("./reading", async (importOriginal) => {
  await gate.opened;
  return importOriginal();
});
vi.mock("@/components/comparison/LazyComparisonCharts", () => ({ LazyComparisonCharts: () => <div data-testid="charts-stub" /> }));

freshWorkspaceEachTest();

describe("entries made before the reading code arrives", () => {
  it("keeps the text and the units it was typed in, then reads it and converts it when the code lands", async () => {
    const user = renderDefault();
    await user.click(screen.getByText(/^Vehicle details/));
    const ratioBefore = headline("change-ratio");
    const axle = screen.getByLabelText(/^Axle ratio/);
    await user.clear(axle);
    await user.type(axle, "4.10");
    // The text stays as typed; nothing is read yet, so the results and the address are unchanged.
    expect(axle).toHaveProperty("value", "4.10");
    expect(headline("change-ratio")).toBe(ratioBefore);
    expect(window.location.search).toBe("");
    // A unit switch waits too: the cruise speeds are not relabelled km/h while they still read 60, 70 mph.
    await user.click(screen.getByRole("radio", { name: "Metric" }));
    expect(screen.getByRole("radio", { name: "Inch" })).toHaveProperty("checked", true);
    expect(screen.getByLabelText(/^Cruise speeds \(mph\)/)).toHaveProperty("value", "60, 70");

    gate.open();
    // 265/70R17 = 802.8 mm, 37 in = 939.8 mm (ISO 4000-1; 1 in = 25.4 mm, NIST SP 811): restoring ratio
    // 4.10 × 939.8 / 802.8 = 4.80, nearest common ratio 4.88.
    await waitFor(() => expect(headline("change-ratio")).toBe("4.88"));
    // The address follows in an effect after that render: on a loaded machine it may land a moment later.
    await waitFor(() => expect(window.location.search).toContain("axle=4.1"));
    expect(screen.getByLabelText(/^Axle ratio/)).toHaveProperty("value", "4.10");
    // The stored choice applies now, converted: 60 and 70 mph × 1.609344 = 96.6 and 112.7 km/h, shown 97, 113 (NIST SP 811).
    await waitFor(() => expect(screen.getByRole("radio", { name: "Metric" })).toHaveProperty("checked", true));
    expect(screen.getByLabelText(/^Cruise speeds \(km\/h\)/)).toHaveProperty("value", "97, 113");
  });
});
