// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { HAULER } from "@/lib/garage/testUtil";
import { FinderPanel } from "./FinderPanel";

vi.setConfig({ testTimeout: 30_000 });
vi.mock("next/link", () => import("@/tests/support/nextLink"));
// The load columns read the vehicle's profile over the network; this test is about the goals' hints only.
vi.mock("./useFinderLoad", () => ({ useFinderLoad: () => ({ columns: [], note: null }) }));
/** The search's worker: never answers, so only the form is on trial. */
class SilentWorker {
  onmessage: unknown = null;
  postMessage() {}
  terminate() {}
}
vi.stubGlobal("Worker", SilentWorker);
afterEach(cleanup);

const pokeHint = () =>
  document.getElementById(screen.getByLabelText("Most extra poke (mm)").getAttribute("aria-describedby")!.split(" ")[0]!)!;

describe("the finder's goals", () => {
  it("keeps quoting the current setup's outboard reach while another goal does not read", async () => {
    const user = userEvent.setup();
    render(<FinderPanel vehicle={HAULER} clearances={[]} />);
    // 265/70R17 on offset +25: half the 265 mm nominal section width (the size designation, ISO 4000-1)
    // outboard of the wheel's centre line, less the 25 mm the hub face sits outboard of it: 132.5 − 25 = 107.5 mm.
    await waitFor(() => expect(pokeHint().textContent).toMatch(/^Beyond the current setup's 107\.5 mm outboard reach/));
    await user.type(screen.getByLabelText("Rim width to (in)"), "8,5x");
    await waitFor(() => expect(screen.getByText("Fix the highlighted goals to search.")).toBeTruthy());
    expect(screen.getByLabelText("Rim width to (in)").getAttribute("aria-invalid")).toBe("true");
    expect(pokeHint().textContent).toMatch(/^Beyond the current setup's 107\.5 mm outboard reach/);
    expect(pokeHint().textContent).not.toMatch(/ 0 mm/);
  });
});
