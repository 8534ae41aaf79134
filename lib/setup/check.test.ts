import { describe, expect, it } from "vitest";
import { FLANGE_ALLOWANCE_LIMITS_IN, RIM_WIDTH_LIMITS_IN, SPACER_LIMITS_MM, WHEEL_DIAMETER_LIMITS_IN } from "@/lib/fitment";
import { checkSetup } from "./check";
import { SETUP_LIMITS } from "./model";
import { setupSchema } from "./schema";
import { setupByOffset } from "./testUtil";

const PLANNED = setupByOffset("37x12.50R17LT 124Q LRD", 17, 9, -12);

/** The messages of a setup given as numbers (a stored setup, the comparison API), by field path. */
const issues = (v: unknown) => {
  const r = checkSetup(v);
  return r.ok ? {} : Object.fromEntries(r.issues.map((i) => [i.path.join("."), i.message]));
};

describe("checkSetup (moved from the comparison schema's tests)", () => {
  it("passes the engine's tire-size message with accepted examples", () => {
    expect(issues({ ...PLANNED, tire: "37x12.5" }).tire).toMatch(/accepted forms: 265\/70R17/);
    expect(issues({ ...PLANNED, tire: "" }).tire).toBe("Tire size: enter a tire size, e.g. 265/70R17.");
    // The engine's message already names the field: it reads once, with the likely size offered.
    const slashed = issues({ ...PLANNED, tire: "285/70/17" }).tire;
    expect(slashed).toMatch(
      /^Tire size: "285\/70\/17" — not a recognised tire size designation; did you mean 285\/70R17\? \(accepted forms:/,
    );
    expect(slashed?.match(/Tire size/g)).toHaveLength(1);
  });

  it("needs the wheel diameter of the tire's rim", () => {
    expect(issues({ ...PLANNED, wheelDiameterIn: 18 }).wheelDiameterIn).toBe(
      "Wheel diameter (in): a 17 in tire needs a 17 in wheel; this wheel is 18 in.",
    );
  });

  it("bounds each number with a message and an example", () => {
    expect(issues({ ...PLANNED, wheelWidthIn: 2 })).toEqual({
      wheelWidthIn: "Wheel width (in): must be between 3 and 20 in, e.g. 9 or 8-1/2.",
    });
    expect(issues({ ...PLANNED, spacerMm: -5 }).spacerMm).toMatch(/between 0 and 100 mm/);
    expect(
      issues({ ...PLANNED, position: { mode: "backspacing", backspacingIn: 4, reference: "rim", flangeIn: 0.5 } })["position.reference"],
    ).toMatch(/flange/);
  });

  it("rejects an offset that puts the mounting face outside the wheel (engine limit W/2 + 76.2 mm)", () => {
    // 9 in wheel: limit 114.3 + 76.2 = 190.5 mm (1 in = 25.4 mm, NIST SP 811; the 3 in margin is common practice, no source).
    expect(issues({ ...PLANNED, position: { mode: "offset", offsetMm: 195 } })["position.offsetMm"]).toMatch(
      /outside a 9 in wide wheel \(at most ±190\.5 mm on this width\)/,
    );
    expect(issues({ ...PLANNED, position: { mode: "offset", offsetMm: 190 } })).toEqual({});
  });
});

describe("one set of messages", () => {
  it("a form's text and an API's numbers get the same message for the same mistake", () => {
    const text = (v: unknown) => {
      const r = setupSchema.safeParse(v);
      return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [i.path.join("."), i.message]));
    };
    const cases: [unknown, unknown][] = [
      [
        { ...PLANNED, wheelDiameterIn: 18 },
        { ...PLANNED, wheelDiameterIn: "18" },
      ],
      [
        { ...PLANNED, wheelWidthIn: 25 },
        { ...PLANNED, wheelWidthIn: "25" },
      ],
      [
        { ...PLANNED, position: { mode: "offset", offsetMm: 195 } },
        { ...PLANNED, position: { mode: "offset", offsetMm: "195" } },
      ],
      [
        { ...PLANNED, position: { mode: "backspacing", backspacingIn: 12.5, reference: "bead-seat", flangeIn: 0.5 } },
        { ...PLANNED, position: { mode: "backspacing", backspacingIn: "12-1/2", reference: "bead-seat", flangeIn: "1/2" } },
      ],
      [
        { ...PLANNED, tire: "" },
        { ...PLANNED, tire: "  " },
      ],
    ];
    for (const [numbers, typed] of cases) {
      expect(issues(numbers)).not.toEqual({});
      expect(text(typed)).toEqual(issues(numbers));
    }
  });

  it("a backspacing outside the wheel names the field, the reference and an example", () => {
    // 9 in wheel, 12.5 in to the bead seat: offset (12.5 − 4.5) × 25.4 = 203.2 mm, beyond the
    // 114.3 + 76.2 = 190.5 mm the engine allows (W/2 plus a 3 in margin; common practice, no source).
    expect(
      issues({ ...PLANNED, position: { mode: "backspacing", backspacingIn: 12.5, reference: "bead-seat", flangeIn: 0.5 } })[
        "position.backspacingIn"
      ],
    ).toBe("Backspacing (in): 12.5 in to the bead seat puts the mounting face outside a 9 in wide wheel, e.g. 4-3/4, 4¾ or 4.75.");
  });

  it("numbers only where a setup is stored: text is refused there with the field's own words", () => {
    expect(issues({ ...PLANNED, wheelWidthIn: "9" }).wheelWidthIn).toBe("Wheel width (in): enter inches, e.g. 9 or 8-1/2.");
    expect(checkSetup({ ...PLANNED, wheelWidthIn: "9" }, [], { text: true }).ok).toBe(true);
  });

  it("a comma in a length is refused as the reason, on the form and in its schema alike (decimals or thousands? common practice, no source)", () => {
    const why = "is ambiguous — a comma can mark decimals or thousands; write decimals with a point and no thousands separator";
    const r = checkSetup({ ...PLANNED, wheelWidthIn: "8,5", spacerMm: "1,5" }, [], { text: true });
    expect(r.ok ? {} : Object.fromEntries(r.issues.map((i) => [i.path.join("."), i.message]))).toEqual({
      wheelWidthIn: `Wheel width (in): “8,5” ${why} (e.g. 9 or 8-1/2).`,
      spacerMm: `Spacer (mm, optional): “1,5” ${why} (e.g. 25).`,
    });
    const z = setupSchema.safeParse({ ...PLANNED, wheelWidthIn: "8,5" });
    expect(z.success ? null : z.error.issues[0]?.message).toBe(`Wheel width (in): “8,5” ${why} (e.g. 9 or 8-1/2).`);
  });

  it("says what a setup is when it is none, with the path it was given at", () => {
    expect(checkSetup("big", ["currentSetup"])).toEqual({
      ok: false,
      issues: [{ path: ["currentSetup"], message: "Give a setup: tire, wheel diameter and width, position and spacer." }],
    });
  });
});

describe("bounds come from the engine", () => {
  it("wheel diameter, width, flange allowance and spacer are the engine's constants", () => {
    expect(SETUP_LIMITS.wheelDiameterIn).toBe(WHEEL_DIAMETER_LIMITS_IN);
    expect(SETUP_LIMITS.wheelWidthIn).toBe(RIM_WIDTH_LIMITS_IN);
    expect(SETUP_LIMITS.flangeIn).toBe(FLANGE_ALLOWANCE_LIMITS_IN);
    expect(SETUP_LIMITS.spacerMm).toBe(SPACER_LIMITS_MM);
  });
});
