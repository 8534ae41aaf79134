import { describe, expect, it } from "vitest";
import { MINUS, formatLen } from "@/lib/comparisons/format";
import { bothUnits } from "./format";

// 1 in = 25.4 mm exactly (NIST SP 811), so 1/16 in = 1.5875 mm and 1/32 in = 0.79375 mm.
describe("bothUnits: millimetres with the inch fraction beside them", () => {
  it("gives the nearest sixteenth", () => {
    expect(bothUnits(38.1)).toBe("38.1 mm (1-1/2 in)"); // 1.5 in
    expect(bothUnits(10.2)).toBe("10.2 mm (3/8 in)"); // 0.402 in = 6.43 sixteenths
    expect(bothUnits(0.8)).toBe("0.8 mm (1/16 in)"); // 0.504 of a sixteenth rounds up
  });

  it("never shows a figure under 1/32 in as 0 in: thousandths of an inch instead", () => {
    expect(bothUnits(0.7)).toBe("0.7 mm (0.028 in)"); // 0.7 / 25.4 = 0.0276 in
    expect(bothUnits(0.79)).toBe("0.8 mm (0.031 in)"); // just under 1/32 in = 0.03125 in
    expect(bothUnits(0.1)).toBe("0.1 mm (0.004 in)");
  });

  it("keeps 0 in when the millimetres read 0 too", () => {
    expect(bothUnits(0)).toBe("0 mm (0 in)");
    expect(bothUnits(0.03)).toBe("0 mm (0 in)");
    expect(bothUnits(-0.03)).toBe("0 mm (0 in)");
  });

  it("writes negatives with the true minus sign (U+2212), as the rest of the app does", () => {
    expect(bothUnits(-4.3)).toBe(`${MINUS}4.3 mm (${MINUS}3/16 in)`); // 0.169 in = 2.71 sixteenths
    expect(bothUnits(-0.3)).toBe(`${MINUS}0.3 mm (${MINUS}0.012 in)`); // 0.3 / 25.4 = 0.0118 in
    expect(bothUnits(-38.1)).toBe(`${MINUS}38.1 mm (${MINUS}1-1/2 in)`); // the hyphen joins whole and fraction only
  });
});

describe("bothUnits writes lengths as the workspace does", () => {
  it("is the workspace's formatLen in each unit: one function for both (1 in = 25.4 mm exactly, NIST SP 811)", () => {
    const metric = { units: "metric", lengths: "decimal" } as const;
    const frac = { units: "imperial", lengths: "fraction" } as const;
    for (const mm of [0.7, -0.3, 0.1, 38.1, -4.3, 0.03, 0]) {
      expect(bothUnits(mm), String(mm)).toBe(`${formatLen(mm, metric, { decimals: 1 })} (${formatLen(mm, frac)})`);
    }
  });
});
