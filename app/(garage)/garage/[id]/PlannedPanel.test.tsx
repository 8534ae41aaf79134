// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { HAULER, detailOf } from "@/lib/garage/testUtil";
import { PlannedPanel } from "./PlannedPanel";

vi.setConfig({ testTimeout: 20_000 });
vi.mock("next/link", () => import("@/tests/support/nextLink"));
afterEach(cleanup);

const detail = detailOf(HAULER);

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
