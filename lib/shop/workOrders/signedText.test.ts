import { describe, expect, it } from "vitest";
import { pressureWords, signedText, torqueWords } from "./signedText";

describe("signed step words", () => {
  it("shows torque in both units (NIST SP 811 B.9: 1 ft·lbf = 1.355818 N·m)", () => {
    expect(torqueWords(17 * 1.355818, "ftlb")).toBe("17 ft·lb (23 N·m)");
    expect(torqueWords(190, "nm")).toBe("190 N·m (140.1 ft·lb)");
  });

  it("shows pressure in both units (NIST SP 811 B.8: 1 psi = 6.894757 kPa)", () => {
    expect(pressureWords(35 * 6.894757, "psi")).toBe("35 psi (241 kPa)");
    expect(pressureWords(240, "kPa")).toBe("240 kPa (34.8 psi)");
  });

  it("says on the record when a pressure below the road minimum was set to the tire maker's load table", () => {
    expect(signedText({ step: "pressure", data: { pressureKpa: 30 * 6.894757, unit: "psi", makerTable: false } })).toBe(
      "Set cold to 30 psi (207 kPa)",
    );
    expect(signedText({ step: "pressure", data: { pressureKpa: 30 * 6.894757, unit: "psi", makerTable: true } })).toBe(
      "Set cold to 30 psi (207 kPa), below the road minimum, to the tire maker's load table for this load",
    );
  });

  it("reads a fitted step back with its DOT week and year", () => {
    expect(signedText({ step: "fitted", data: { tire: "T", wheel: "W", dotCode: "2326", dotWeek: 23, dotYear: 2026 } })).toBe(
      "T on W; DOT date code 2326 (week 23 of 2026)",
    );
    expect(signedText({ step: "match_mount", data: { method: "light_point_to_valve" } })).toBe("Light-point mark to the valve stem");
  });
});
