import { describe, expect, it } from "vitest";
import { commaRefusal, hasNumberComma } from "./commaEntry";
import { parseLength } from "./length";
import { parseTorqueEntry } from "./tightening";

// A comma is a decimal mark in some countries and a thousands separator in others ("1,500" is
// 1.5 or 1500): common practice, no source. The readers refuse it rather than guess.
describe("hasNumberComma", () => {
  it("finds a comma in the figure, before any unit", () => {
    for (const t of ["1,5", "2,2 bar", "32,5 psi", "3,900 lb", ",5", "-1,5", "\u22121,5", " 1,500 "])
      expect(hasNumberComma(t), t).toBe(true);
    for (const t of ["1.5", "32.5 psi", "3900 lb", "4-3/4", "", "wide, very"]) expect(hasNumberComma(t), t).toBe(false);
  });
});

describe("one comma refusal for every reader", () => {
  it("says the comma is why and gives the example", () => {
    expect(commaRefusal('"18,5"', "17.5")).toBe(
      '"18,5" is ambiguous — a comma can mark decimals or thousands; write decimals with a point and no thousands separator (e.g. 17.5)',
    );
  });
  it("the torque and length readers use it", () => {
    expect(() => parseTorqueEntry("18,5", "ftlb", "Maker's torque (ft·lb)")).toThrow(
      `Maker's torque (ft·lb): ${commaRefusal('"18,5"', "17.5")}`,
    );
    expect(() => parseLength("1,5", "in")).toThrow(commaRefusal('"1,5"', "4.75"));
    expect(() => parseLength("1,5 mm", "mm")).toThrow(commaRefusal('"1,5 mm"', "120.5"));
  });
});
