import { describe, expect, it } from "vitest";
import type { Setup } from "./model";
import { type LinkProblem, problemText, setupQuery } from "./url";
import { setupByOffset } from "./testUtil";
import { decodeSetupParams, setupFromQuery } from "./urlRead";

const PLAN = setupByOffset("35x12.50R17LT", 17, 9, -12);
const BS: Setup = { ...PLAN, position: { mode: "backspacing", backspacingIn: 4.5, reference: "bead-seat", flangeIn: 0.5 }, spacerMm: 12 };

describe("a setup in a link (moved from the garage's tests)", () => {
  it("round-trips a backspacing setup with spacer", () => {
    const q = setupQuery("p", BS);
    expect(q).toBe("pt=35x12.50R17LT&pd=17&pw=9&pb=4.5&pr=bead&ps=12");
    expect(setupFromQuery("p", new URLSearchParams(q))).toEqual(BS);
    expect(setupFromQuery("p", new URLSearchParams("pt=nonsense"))).toBeNull();
  });
});

describe("lengths in a link read as a form reads them", () => {
  it("takes 4-1/2, 4 1/2, 4½ and 4.5 for the same backspacing (the strict reader of the garage pages)", () => {
    for (const b of ["4-1/2", "4+1/2", "4%C2%BD", "4.5", "4.5in"]) {
      expect(setupFromQuery("p", `pt=35x12.50R17LT&pd=17&pw=9&pb=${b}&pr=bead&ps=12`), b).toEqual(BS);
    }
    // 8-1/2 in wide: 8.5 in exactly; a 1 in spacer is 25.4 mm (NIST SP 811).
    expect(setupFromQuery("p", "pt=35x12.50R17LT&pd=17&pw=8-1/2&po=-12&ps=1+in")).toEqual({ ...PLAN, wheelWidthIn: 8.5, spacerMm: 25.4 });
  });

  it("refuses a bare fraction in a mm parameter instead of reading 1.5 mm, and says so", () => {
    expect(setupFromQuery("p", "pt=35x12.50R17LT&pd=17&pw=9&po=-12&ps=1-1/2")).toBeNull();
    const problems: LinkProblem[] = [];
    const s = decodeSetupParams("p", new URLSearchParams("ps=1-1/2"), PLAN, "Planned setup", problems);
    expect(s.spacerMm).toBe(0);
    expect(problems.map(problemText)).toEqual([
      "Planned setup · Spacer (mm, optional): “1-1/2” is a fraction, which is read only in inches (write 1-1/2 in); using no spacer.",
    ]);
  });

  it("reads the stored spelling of the bead-seat reference (bead-seat) as well as the link's (bead); anything else is no setup to the strict reader", () => {
    expect(setupFromQuery("p", "pt=35x12.50R17LT&pd=17&pw=9&pb=4.5&pr=bead-seat&ps=12")).toEqual(BS);
    expect(setupFromQuery("p", "pt=35x12.50R17LT&pd=17&pw=9&pb=4.5&pr=rim&ps=12")).toBeNull();
    // No reference: the flange edge, as the workspace reads it.
    expect(setupFromQuery("p", "pt=35x12.50R17LT&pd=17&pw=9&pb=4.5")?.position).toEqual({
      mode: "backspacing",
      backspacingIn: 4.5,
      reference: "flange",
      flangeIn: 0.5,
    });
  });
});
