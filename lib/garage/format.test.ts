import { describe, expect, it } from "vitest";
import { MINUS, formatLen } from "@/lib/comparisons/format";
import { bothUnits, signedLen } from "./format";

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

// Hand-checked: 1 in = 25.4 mm exactly (NIST SP 811). 38.1 / 25.4 = 1.5 in; 40 / 25.4 = 1.5748 in → 1.57 in,
// 25.2 sixteenths → 1-9/16 in; −4.3 / 25.4 = −0.1693 in → −0.17 in, 2.71 sixteenths → −3/16 in.
describe("bothUnits follows the reader's Units choice", () => {
  it("inch mode puts inches first, as decimals or sixteenths, the millimetres in brackets", () => {
    const decimal = { units: "imperial", lengths: "decimal" } as const;
    const fraction = { units: "imperial", lengths: "fraction" } as const;
    expect(bothUnits(38.1, decimal)).toBe("1.5 in (38.1 mm)");
    expect(bothUnits(38.1, fraction)).toBe("1-1/2 in (38.1 mm)");
    expect(bothUnits(40, decimal)).toBe("1.57 in (40 mm)");
    expect(bothUnits(40, fraction)).toBe("1-9/16 in (40 mm)");
    expect(bothUnits(-4.3, decimal)).toBe(`${MINUS}0.17 in (${MINUS}4.3 mm)`);
    expect(bothUnits(0.7, fraction)).toBe("0.028 in (0.7 mm)"); // 0.0276 in: never "0 in"
  });

  it("metric mode keeps millimetres first, the inches beside them as chosen", () => {
    expect(bothUnits(40, { units: "metric", lengths: "fraction" })).toBe("40 mm (1-9/16 in)");
    expect(bothUnits(40, { units: "metric", lengths: "decimal" })).toBe("40 mm (1.57 in)");
  });
});

describe("signedLen: a change in the reader's units", () => {
  it("writes inches with a sign in inch mode and mm in metric (37 / 25.4 = 1.457 in, NIST SP 811)", () => {
    expect(signedLen(37, { units: "imperial", lengths: "decimal" })).toBe("+1.46 in");
    expect(signedLen(-9.525, { units: "imperial", lengths: "fraction" })).toBe(`${MINUS}3/8 in`); // 3/8 in = 9.525 mm
    expect(signedLen(37, { units: "metric", lengths: "decimal" })).toBe("+37 mm");
    expect(signedLen(0.02, { units: "imperial", lengths: "decimal" })).toBe("±0 in");
  });
});
