// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { tighteningSequence } from "@/lib/fitment";
import { RingHelper } from "./RingHelper";

afterEach(() => {
  cleanup();
  // The helper remembers the ring in this tab (ringMemory.ts): every test starts from a fresh tab.
  sessionStorage.clear();
});
// user-event drives every key and click through the DOM; on a busy shared machine that is slow.
vi.setConfig({ testTimeout: 20_000 });

/** The helper on its first screen, with a user to drive it. */
const renderHelper = () => {
  const user = userEvent.setup();
  render(<RingHelper />);
  return user;
};
/** Clears the bolt count and types `text` in its place; gives the field. */
const retypeBoltCount = async (user: ReturnType<typeof userEvent.setup>, text: string) => {
  const count = screen.getByLabelText("Bolts on the ring");
  await user.clear(count);
  await user.type(count, text);
  return count;
};
const torqueField = () => screen.getByLabelText(/^Maker's torque/) as HTMLInputElement;
/** The passes table as [pass, share, ft·lb, N·m] text per row. */
const passRows = () =>
  Array.from(screen.getByTestId("torque-passes").querySelectorAll("tbody tr")).map((tr) =>
    Array.from(tr.querySelectorAll("th, td"))
      .slice(0, 4)
      .map((c) => c.textContent?.trim()),
  );
/** Every message tied to a field through aria-describedby. */
const describedText = (el: HTMLElement) =>
  (el.getAttribute("aria-describedby") ?? "")
    .split(" ")
    .map((id) => document.getElementById(id)?.textContent ?? "")
    .join(" ");

// 18 ft·lb × 1.355818 (NIST SP 811 B.9) = 24.404724 N·m; passes at 30 / 60 / 100 % and a check pass
// (common practice, no source): 5.4 ft·lb = 7.32 N·m, 10.8 ft·lb = 14.64 N·m, 18 ft·lb = 24.40 N·m.
const PASSES_18_FTLB = [
  ["1", "30 %", "5.4", "7.3"],
  ["2", "60 %", "10.8", "14.6"],
  ["3", "100 %", "18.0", "24.4"],
  ["4: check every bolt", "100 %", "18.0", "24.4"],
];

describe("beadlock ring helper: torque unit switch", () => {
  it("converts 18 ft·lb to 24.4 N·m on switching (NIST SP 811: 1 ft·lbf = 1.355818 N·m) and every pass keeps its real torque", async () => {
    const user = renderHelper();
    await user.type(torqueField(), "18");
    expect(passRows()).toEqual(PASSES_18_FTLB);
    await user.click(screen.getByRole("radio", { name: "N·m" }));
    expect(screen.getByLabelText("Maker's torque (N·m)")).toHaveProperty("value", "24.4");
    expect(passRows()).toEqual(PASSES_18_FTLB);
    // Back and forth: the exact value stays behind the text, so nothing drifts (18, not 17.99).
    for (let i = 0; i < 3; i++) {
      await user.click(screen.getByRole("radio", { name: "ft·lb" }));
      expect(screen.getByLabelText("Maker's torque (ft·lb)")).toHaveProperty("value", "18");
      await user.click(screen.getByRole("radio", { name: "N·m" }));
      expect(screen.getByLabelText("Maker's torque (N·m)")).toHaveProperty("value", "24.4");
    }
    expect(passRows()).toEqual(PASSES_18_FTLB);
  }, 20_000);

  it("reads a figure typed after the switch in the unit shown", async () => {
    const user = renderHelper();
    await user.click(screen.getByRole("radio", { name: "N·m" }));
    await user.type(torqueField(), "23");
    // 23 N·m ÷ 1.355818 = 16.96 ft·lb (NIST SP 811 B.9)
    expect(passRows()[2]).toEqual(["3", "100 %", "17.0", "23.0"]);
    await user.click(screen.getByRole("radio", { name: "ft·lb" }));
    expect(torqueField().value).toBe("17");
    expect(passRows()[2]).toEqual(["3", "100 %", "17.0", "23.0"]);
  });

  const refused: [string, RegExp][] = [
    ["16-18", /range/],
    ["18,5", /comma/],
    ["18 N·m", /chosen unit is ft·lb/],
    ["abc", /not a number/],
    ["5000", /between 0\.8 and 1475\.1 ft·lb/],
  ];
  for (const [text, why] of refused) {
    it(`refuses ${JSON.stringify(text)} with a message naming "Maker's torque (ft·lb)" and shows no passes`, async () => {
      const user = renderHelper();
      await user.type(torqueField(), text);
      expect(torqueField().getAttribute("aria-invalid")).toBe("true");
      expect(describedText(torqueField())).toMatch(/Maker's torque \(ft·lb\)/);
      expect(describedText(torqueField())).toMatch(why);
      expect(screen.queryByTestId("torque-passes")).toBeNull();
    });
  }

  it("keeps the unit when the entry cannot be read, rather than relabelling a figure it cannot convert", async () => {
    const user = renderHelper();
    await user.type(torqueField(), "16-18");
    await user.click(screen.getByRole("radio", { name: "N·m" }));
    expect(screen.getByRole("radio", { name: "ft·lb" })).toHaveProperty("checked", true);
    const field = screen.getByLabelText("Maker's torque (ft·lb)");
    expect(field).toHaveProperty("value", "16-18");
    expect(describedText(field)).toMatch(/stays ft·lb/);
  });

  for (const text of ["0", "2.5", "24 bolts"]) {
    it(`with the torque entered, a bolt count of ${JSON.stringify(text)} makes the Passes card ask for the bolt count, not the torque`, async () => {
      const user = renderHelper();
      await user.type(torqueField(), "18");
      const count = await retypeBoltCount(user, text);
      expect(describedText(count)).toMatch(/Bolts on the ring: enter a whole number from 3 to 64/);
      expect(screen.queryByTestId("torque-passes")).toBeNull();
      expect(screen.getByTestId("passes-missing").textContent).toBe("Fix “Bolts on the ring” to see the passes in ft·lb and N·m.");
    });
  }

  it("asks the Passes card for what is missing: the torque, or both", async () => {
    const user = renderHelper();
    expect(screen.getByTestId("passes-missing").textContent).toBe(
      "Enter the ring maker's torque figure to see the passes in ft·lb and N·m.",
    );
    await retypeBoltCount(user, "0");
    expect(screen.getByTestId("passes-missing").textContent).toBe(
      "Fix “Bolts on the ring” and enter the ring maker's torque figure to see the passes in ft·lb and N·m.",
    );
    await user.type(torqueField(), "abc");
    expect(screen.getByTestId("passes-missing").textContent).toBe(
      "Fix “Bolts on the ring” and “Maker's torque (ft·lb)” to see the passes in ft·lb and N·m.",
    );
    await retypeBoltCount(user, "24");
    expect(screen.getByTestId("passes-missing").textContent).toBe("Fix “Maker's torque (ft·lb)” to see the passes in ft·lb and N·m.");
  });

  it("names the bolt count field in its message", async () => {
    const user = renderHelper();
    const count = await retypeBoltCount(user, "2");
    expect(describedText(count)).toMatch(/^.*Bolts on the ring: enter a whole number from 3 to 64/);
  });
});

describe("beadlock ring diagram", () => {
  it("shows each bolt's number big and its step in the order small and labelled (24 bolts)", () => {
    render(<RingHelper />);
    const order = tighteningSequence(24);
    const bolts = screen.getAllByTestId("ring-bolt");
    expect(bolts).toHaveLength(24);
    for (const g of bolts) {
      const bolt = Number(g.getAttribute("data-bolt"));
      const big = g.querySelector('[data-label="bolt"]');
      const small = g.querySelector('[data-label="step"]');
      expect(big?.textContent).toBe(String(bolt));
      expect(small?.textContent).toBe(`step ${order.indexOf(bolt) + 1}`);
      expect(Number(big?.getAttribute("font-size"))).toBeGreaterThan(Number(small?.getAttribute("font-size")) * 1.4);
    }
    // Bolt 13 sits opposite bolt 1 and is tightened second (common practice, no source).
    const b13 = bolts.find((g) => g.getAttribute("data-bolt") === "13");
    expect(b13?.querySelector('[data-label="step"]')?.textContent).toBe("step 2");
    expect(screen.getByTestId("ring-legend").textContent).toMatch(/big number.*bolt/i);
    expect(screen.getByTestId("ring-legend").textContent).toMatch(/step.*order/i);
  });
});

describe("beadlock tick-off", () => {
  const tick = () => within(screen.getByRole("region", { name: "Tick off as you go" }));
  const status = () => screen.getByTestId("tickoff-status").textContent ?? "";
  const nextOnDiagram = () => document.querySelector('[data-testid="ring-bolt"][data-next="true"]')?.getAttribute("data-bolt");

  it("finds the ring and the bolts ticked again after a reload of the page (same tab)", async () => {
    const user = userEvent.setup();
    render(<RingHelper />);
    await retypeBoltCount(user, "32");
    await user.click(screen.getByRole("radio", { name: "N·m" }));
    await user.type(torqueField(), "24.4");
    await user.click(screen.getByRole("radio", { name: "ft·lb" }));
    for (let i = 0; i < 3; i++) await user.click(tick().getByRole("button", { name: /^Mark bolt \d+ done$/ }));
    const before = status();
    expect(before).toMatch(/3 of 32/);
    // A reload: the component is gone and mounts again from the prerendered defaults.
    cleanup();
    render(<RingHelper />);
    expect((screen.getByLabelText("Bolts on the ring") as HTMLInputElement).value).toBe("32");
    // 24.4 N·m ÷ 1.355818 = 18.0 ft·lb (NIST SP 811 B.9), still in ft·lb, the exact N·m kept behind it.
    expect(torqueField().value).toBe("18");
    expect(status()).toBe(before);
    // A new ring (another count) does not inherit the ticks.
    await retypeBoltCount(user, "24");
    expect(status()).toMatch(/0 of 24/);
  });

  it("ticks bolts in order per pass, shows the next one, survives a unit switch and a re-render, and resets", async () => {
    const user = userEvent.setup();
    const { rerender } = render(<RingHelper />);
    await user.type(torqueField(), "18");
    expect(status()).toMatch(/Pass 1.*5\.4 ft·lb.*7\.3 N·m.*next: bolt 1\b/);
    expect(nextOnDiagram()).toBe("1");
    await user.click(tick().getByRole("button", { name: "Mark bolt 1 done" }));
    expect(status()).toMatch(/next: bolt 13\b/);
    expect(nextOnDiagram()).toBe("13");
    // Keyboard: the same button now names the next bolt and keeps the focus.
    expect(document.activeElement).toBe(tick().getByRole("button", { name: "Mark bolt 13 done" }));
    await user.keyboard("{Enter}");
    expect(tick().getByRole("checkbox", { name: "Bolt 13, step 2" })).toHaveProperty("checked", true);
    // A bolt can also be ticked out of turn from the list.
    await user.click(tick().getByRole("checkbox", { name: "Bolt 19, step 4" }));
    expect(status()).toMatch(/next: bolt 7\b/);
    expect(status()).toMatch(/3 of 24/);

    await user.click(screen.getByRole("radio", { name: "N·m" }));
    expect(status()).toMatch(/Pass 1.*7\.3 N·m.*5\.4 ft·lb.*3 of 24/);
    rerender(<RingHelper />);
    expect(tick().getByRole("checkbox", { name: "Bolt 19, step 4" })).toHaveProperty("checked", true);
    expect(nextOnDiagram()).toBe("7");

    await user.click(tick().getByRole("button", { name: "Reset the tick-off" }));
    expect(
      tick()
        .getAllByRole("checkbox")
        .every((c) => !(c as HTMLInputElement).checked),
    ).toBe(true);
    expect(status()).toMatch(/next: bolt 1\b/);
  });

  it("moves on to the next pass when one is complete and marks it done", async () => {
    const user = renderHelper();
    await retypeBoltCount(user, "4");
    await user.type(torqueField(), "18");
    // 4 bolts: 1, 3, 2, 4 (common practice, no source)
    for (const bolt of [1, 3, 2, 4]) await user.click(tick().getByRole("button", { name: `Mark bolt ${bolt} done` }));
    expect(tick().getByRole("radio", { name: "Pass 1 (done)" })).toBeTruthy();
    expect(tick().getByRole("radio", { name: "Pass 2" })).toHaveProperty("checked", true);
    expect(status()).toMatch(/Pass 2.*10\.8 ft·lb.*next: bolt 1\b/);
    // Tapping a bolt on the diagram ticks it in the pass shown.
    const b3 = document.querySelector('[data-testid="ring-bolt"][data-bolt="3"]') as Element;
    await user.click(b3);
    expect(tick().getByRole("checkbox", { name: "Bolt 3, step 2" })).toHaveProperty("checked", true);
    // Going back to pass 1 shows its ticks untouched.
    await user.click(tick().getByRole("radio", { name: "Pass 1 (done)" }));
    expect(
      tick()
        .getAllByRole("checkbox")
        .every((c) => (c as HTMLInputElement).checked),
    ).toBe(true);
  });

  it("clears the ticks when the ring changes (another bolt count or another real torque) and says so", async () => {
    const user = renderHelper();
    await user.type(torqueField(), "18");
    await user.click(tick().getByRole("button", { name: "Mark bolt 1 done" }));
    await user.type(torqueField(), "0");
    expect(status()).toMatch(/cleared/);
    expect(status()).toMatch(/next: bolt 1\b/);
  });
});

describe("beadlock print sheet", () => {
  it("prints the diagram, the passes in both units with the order to tick, and the cautions; not the controls", async () => {
    const user = userEvent.setup();
    const print = vi.spyOn(window, "print").mockImplementation(() => {});
    render(<RingHelper />);
    await user.type(torqueField(), "18");
    await user.click(screen.getByRole("button", { name: "Print this sheet" }));
    expect(print).toHaveBeenCalledOnce();
    print.mockRestore();

    const printed = (el: Element) => !el.closest(".no-print");
    expect(printed(screen.getByTestId("ring-diagram"))).toBe(true);
    expect(printed(screen.getByTestId("torque-passes"))).toBe(true);
    expect(printed(screen.getByTestId("ring-cautions"))).toBe(true);
    expect(printed(torqueField())).toBe(false);
    expect(printed(screen.getByRole("region", { name: "Tick off as you go" }))).toBe(false);
    // The sheet says what it was made for, in the chosen unit and the other.
    expect(screen.getByTestId("print-summary").textContent).toMatch(/24 bolts.*18 ft·lb.*24\.4 N·m/);
    // Each pass lists the order with a box per bolt to tick on paper.
    const order = screen.getAllByTestId("print-order");
    expect(order).toHaveLength(4);
    for (const o of order) expect(Array.from(o.querySelectorAll("li")).map((li) => Number(li.textContent))).toEqual(tighteningSequence(24));
  });

  it("shows the usual cautions on screen and on the sheet", () => {
    render(<RingHelper />);
    const c = screen.getByTestId("ring-cautions").textContent ?? "";
    expect(c).toMatch(/wheel and ring maker.*torque.*order.*govern/i);
    expect(c).toMatch(/in passes.*crisscross/i);
    expect(c).toMatch(/never (go )?(exceed|over|above) the maker's (torque|figure)/i);
    expect(c).toMatch(/re-check.*first (run|few miles)/i);
    expect(c).toMatch(/safety cage/i);
    expect(c).toMatch(/bead-seating pressure/i);
    expect(c).toMatch(/licensed/i);
  });
});
