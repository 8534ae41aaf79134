import { describe, expect, it } from "vitest";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { typed } from "@/lib/comparisons/measureEntry";
import { MEASURE_KEYS, type MeasureKey } from "./loadProfile";
import { readProfileForm } from "./loadProfileForm";

const IMPERIAL: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const METRIC: DisplayPrefs = { units: "metric", lengths: "decimal" };
const CURRENT = { text: "265/70R17 113T", diameterMm: 802.8 };
const blank = () => Object.fromEntries(MEASURE_KEYS.map((k) => [k, typed("")])) as Record<MeasureKey, ReturnType<typeof typed>>;

describe("readProfileForm", () => {
  it("reads figures in the label's unit and stores SI (1 psi = 6.894757 kPa, 1 in = 25.4 mm: NIST SP 811)", () => {
    const entries = {
      ...blank(),
      placardFrontKpa: typed("35"),
      placardRearKpa: typed("38"),
      wheelbaseMm: typed("114"),
      midHeightMm: typed("10-1/2"),
    };
    const r = readProfileForm({ entries, placardTire: " 265/70R17 113T ", vehicleKind: "light-truck" }, IMPERIAL, CURRENT);
    expect(r.errors).toEqual({});
    expect(r.profile?.placardTire).toBe("265/70R17 113T");
    expect(r.profile?.placardFrontKpa).toBeCloseTo(241.3165, 3);
    expect(r.profile?.wheelbaseMm).toBeCloseTo(2895.6, 9);
    expect(r.profile?.midHeightMm).toBeCloseTo(266.7, 9);
    expect(r.profile?.frontAxleKg).toBeNull();
  });

  it("refuses bar typed in a kPa field with the conversion (1 bar = 100 kPa), storing nothing", () => {
    const entries = { ...blank(), placardFrontKpa: typed("2.4 bar"), placardRearKpa: typed("240") };
    const r = readProfileForm({ entries, placardTire: "265/70R17 113T", vehicleKind: "light-truck" }, METRIC, CURRENT);
    expect(r.profile).toBeNull();
    expect(r.errors.placardFrontKpa).toBe(
      "Placard cold pressure, front (kPa): the field is in kPa; “2.4 bar” is 240 kPa — enter that, or switch the units.",
    );
  });

  it("passes the profile's own checks through (a body point inside the tire)", () => {
    const entries = { ...blank(), frontCornerHeightMm: typed("300"), frontCornerAheadMm: typed("100") };
    const r = readProfileForm({ entries, placardTire: "", vehicleKind: "light-truck" }, METRIC, CURRENT);
    expect(r.profile).toBeNull();
    expect(r.errors.frontCornerHeightMm).toMatch(/^Front corner height \(mm\): .*inside the tire's circle/);
  });
});
