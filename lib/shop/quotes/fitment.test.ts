import { describe, expect, it } from "vitest";
import { fitmentChangeRows, rankPicks, summarize } from "./fitment";

const current = { boltPattern: "6x5.5", tireSize: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };

describe("counter fitment summary", () => {
  it("reads the engine's comparison: 265/70R17 → 315/70R17", () => {
    // D = d + 2H (ISO 4000-1): 265/70R17 = 802.8 mm, 315/70R17 = 872.8 mm → +70 mm, +35 mm under the axle.
    const s = summarize(current, "315/70R17", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: true });
    expect(s.diameterChangeMm).toBeCloseTo(70, 6);
    expect(s.groundClearanceChangeMm).toBeCloseTo(35, 6);
    // Speedometer: actual = indicated × D_planned / D_current = 60 × 872.8 / 802.8 = 65.23 mph (lib/fitment README).
    expect(s.actualMphAt60).toBeCloseTo((60 * 872.8) / 802.8, 6);
    // 3.73 × 802.8 / 872.8 = 3.4309: an 8 % drop, past the 5 % rule (common practice, no source).
    expect(s.regear?.effectiveRatio).toBeCloseTo((3.73 * 802.8) / 872.8, 6);
    expect(s.warnings.some((w) => /taller/.test(w))).toBe(true);
    expect(s.modifications.some((m) => /lift or levelling/.test(m))).toBe(true);
    expect(s.alignmentSuggested).toBe(true);
    expect(s.planned.beadlock).toBe(true);
  });

  it("shows the changes as rows in mm and inches, signed, with the regear line (1 in = 25.4 mm, NIST SP 811)", () => {
    const rows = fitmentChangeRows(summarize(current, "315/70R17", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: true }));
    // +70 mm = +2.76 in, shown to 0.1 in
    expect(rows[0]).toEqual(["Overall diameter", "+70 mm (+2.8 in)"]);
    expect(rows[1]).toEqual(["Ground clearance under the axle", "+35 mm (+1.4 in)"]);
    // 3.73 × 872.8 / 802.8 = 4.055 restores the ratio; 4.10 is the nearest common ratio (common practice, no source).
    expect(rows.at(-1)).toEqual(["Effective axle ratio", "3.73 → 3.43; regear to about 4.10"]);
    const same = fitmentChangeRows(summarize(current, "265/70R17", { diameterIn: 17, widthIn: 8, offsetMm: 25, beadlock: false }));
    expect(same[0]).toEqual(["Overall diameter", "±0 mm (±0.0 in)"]);
    expect(same.map(([k]) => k)).not.toContain("Effective axle ratio");
  });

  it("the same setup changes nothing and needs nothing", () => {
    const s = summarize(current, "265/70R17", { diameterIn: 17, widthIn: 8, offsetMm: 25, beadlock: false });
    expect(s.diameterChangeMm).toBe(0);
    expect(s.warnings).toEqual([]);
    expect(s.modifications).toEqual([]);
    expect(s.regear).toBeNull();
  });

  it("regear by the workspace's rule: the restoring ratio 5 % or more from the axle ratio, either way (common practice, no source)", () => {
    // 295/70R17: D = 431.8 + 2 × 206.5 = 844.8 mm (ISO 4000-1); 844.8 / 802.8 = 1.0523: restoring 3.73 × 1.0523 = 3.925, 5.2 % above 3.73.
    const taller = summarize(current, "295/70R17", { diameterIn: 17, widthIn: 9, offsetMm: 0, beadlock: false });
    expect(taller.regear).toMatchObject({ axleRatio: 3.73, suggestedRatio: 3.92 });
    expect(taller.regear?.effectiveRatio).toBeCloseTo((3.73 * 802.8) / 844.8, 9);
    expect(taller.modifications).toContain(
      "Regear from 3.73 to about 3.92 to restore the effective ratio (assuming a 3.73 axle; enter the vehicle's ratio).",
    );
    // 235/70R17 on a 4.10 axle: D = 431.8 + 2 × 164.5 = 760.8 mm; restoring 4.10 × 760.8 / 802.8 = 3.886, 5.2 % below: 3.92 is nearest.
    const shorter = summarize({ ...current, axleRatio: 4.1 }, "235/70R17", { diameterIn: 17, widthIn: 7.5, offsetMm: 25, beadlock: false });
    expect(shorter.regear?.suggestedRatio).toBe(3.92);
  });

  it("ranks only wheels of an equivalent bolt pattern and tires of the wheel's diameter", () => {
    const wheels = [
      { id: "w-in", diameterIn: 17, widthIn: 8.5, offsetMm: 0, boltPattern: "6x139.7", beadlock: false }, // ≡ 6x5.5 (5.5 × 25.4 = 139.7)
      { id: "w-five", diameterIn: 17, widthIn: 8.5, offsetMm: 0, boltPattern: "5x5.5", beadlock: false },
      { id: "w-18", diameterIn: 18, widthIn: 9, offsetMm: 0, boltPattern: "6x5.5", beadlock: false },
    ];
    const tires = [
      { id: "t-33", size: "285/70R17" },
      { id: "t-35", size: "35x12.50R17LT" },
      { id: "t-18", size: "275/65R18" },
      { id: "t-bad", size: "not a size" },
    ];
    const r = rankPicks(current, tires, wheels);
    expect(r.wheelsFitting).toBe(2);
    expect(r.picks.map((p) => `${p.tireId}/${p.wheelId}`).sort()).toEqual(["t-18/w-18", "t-33/w-in", "t-35/w-in"]);
    // Ranked: fewer warnings first, then larger diameter gain.
    for (let i = 1; i < r.picks.length; i++) {
      const [a, b] = [r.picks[i - 1]!.summary, r.picks[i]!.summary];
      expect(
        a.warnings.length < b.warnings.length || (a.warnings.length === b.warnings.length && a.diameterChangeMm >= b.diameterChangeMm),
      ).toBe(true);
    }
  });
});
