import { describe, expect, it } from "vitest";
import { CUR, PLAN } from "@/lib/garage/testUtil";
import { angleRows, bodyPointsSchema, quoteAngles } from "./counterBodyPoints";
import { COUNTER_BODY_POINTS } from "./placardTestUtil";

// The invented counter truck's body points, measured on 265/70R17 (802.8 mm: 17 × 25.4 + 2 × 0.70 × 265, ISO 4000-1 nominal).
const POINTS = COUNTER_BODY_POINTS;
const CURRENT_TIRE = { text: "265/70R17", diameterMm: 802.8 };
const parse = (v: unknown) => bodyPointsSchema(() => CURRENT_TIRE).safeParse(v);
const messages = (v: unknown) => {
  const r = parse(v);
  return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [i.path.join("."), i.message]));
};

/**
 * An independent construction (plane geometry, the SAE J1100 definition): the line through a body
 * point (a ahead of the axle, h high) tangent to the tire's circle (radius r, resting on the ground)
 * rises at atan2(h − r, a) + asin(r / √(a² + (h − r)²)) from the ground.
 */
const tangentDeg = (a: number, h: number, r: number) => ((Math.atan2(h - r, a) + Math.asin(r / Math.hypot(a, h - r))) * 180) / Math.PI;

describe("quoteAngles: the trail angles now and with the quoted tires", () => {
  it("35x12.50R17LT (889 mm) on a truck measured on 265/70R17: every body point raised by the 43.1 mm radius change", () => {
    const a = quoteAngles(POINTS, CUR, PLAN);
    const rc = 802.8 / 2;
    const rp = 889 / 2;
    const lift = rp - rc;
    const byKind = Object.fromEntries(a.angles.map((x) => [x.kind, x]));
    expect(byKind.approach!.currentDeg).toBeCloseTo(tangentDeg(900, 750, rc), 6);
    expect(byKind.approach!.plannedDeg).toBeCloseTo(tangentDeg(900, 750 + lift, rp), 6);
    expect(byKind.departure!.currentDeg).toBeCloseTo(tangentDeg(1100, 800, rc), 6);
    expect(byKind.departure!.plannedDeg).toBeCloseTo(tangentDeg(1100, 800 + lift, rp), 6);
    // Breakover: the supplement of the angle between the two tangents from the midway point, 2 × each side's.
    expect(byKind.breakover!.currentDeg).toBeCloseTo(2 * tangentDeg(3570 / 2, 420, rc), 6);
    expect(byKind.breakover!.plannedDeg).toBeCloseTo(2 * tangentDeg(3570 / 2, 420 + lift, rp), 6);
    for (const x of a.angles) expect(x.plannedDeg).toBeGreaterThan(x.currentDeg);
    expect(a.messages).toEqual([]);
    const approach = angleRows(a)[0]!;
    expect(approach[0]).toBe("Approach angle");
    expect(approach[1]).toBe(`${tangentDeg(900, 750, rc).toFixed(1)}° → ${tangentDeg(900, 750 + lift, rp).toFixed(1)}°`);
  });

  it("only the angles whose points were measured", () => {
    const a = quoteAngles(
      { ...POINTS, rearCornerHeightMm: null, rearCornerBehindMm: null, midHeightMm: null, wheelbaseMm: null },
      CUR,
      PLAN,
    );
    expect(a.angles.map((x) => x.kind)).toEqual(["approach"]);
  });
});

describe("bodyPointsSchema: the garage's checks, messages naming the fields as the counter labels them", () => {
  it("keeps the points in mm and reads nothing typed as no body points", () => {
    expect(parse(POINTS)).toEqual({ success: true, data: POINTS });
    expect(parse({ units: "metric" })).toEqual({ success: true, data: null });
  });

  it("refuses a negative height, an absurd wheelbase and a corner height without its distance, each beside its field", () => {
    expect(messages({ ...POINTS, frontCornerHeightMm: -750 })).toEqual({
      frontCornerHeightMm: expect.stringMatching(/^Front corner height \(mm\): /),
    });
    expect(messages({ ...POINTS, wheelbaseMm: 35700 })).toEqual({ wheelbaseMm: expect.stringMatching(/^Wheelbase \(mm\): /) });
    expect(messages({ ...POINTS, rearCornerBehindMm: null })).toEqual({
      rearCornerBehindMm: expect.stringMatching(/^Rear corner behind the rear axle \(mm\): enter it too/),
    });
  });

  it("refuses a body point inside the current tire's circle, in the unit system it was typed in", () => {
    // 200 mm high, 100 mm ahead of the axle: inside the 401.4 mm radius of 265/70R17.
    const m = messages({ ...POINTS, units: "imperial", frontCornerHeightMm: 200, frontCornerAheadMm: 100 });
    expect(Object.keys(m)).toEqual(["frontCornerHeightMm"]);
    expect(m.frontCornerHeightMm).toMatch(/^Front corner height \(in\): .*measured with the current tire, 265\/70R17/);
  });
});
