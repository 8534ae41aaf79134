import { describe, expect, it } from "vitest";
import type { Setup } from "./model";
import { EMPTY_SETUP_FORM, setupSchema, setupToForm } from "./schema";
import { issueAt, setupByOffset } from "./testUtil";

const CUR = setupByOffset("265/70R17", 17, 8, 25);

describe("setup schema (fractions through the engine's parseLength)", () => {
  it("reads inch fractions and mm text into the engine's units", () => {
    const s = setupSchema.parse({
      tire: "265/70R17",
      wheelDiameterIn: "17",
      wheelWidthIn: "8-1/2",
      position: { mode: "backspacing", backspacingIn: "4-3/4", reference: "flange", flangeIn: "1/2" },
      spacerMm: "1 in",
    });
    expect(s.wheelWidthIn).toBe(8.5);
    expect(s.position).toEqual({ mode: "backspacing", backspacingIn: 4.75, reference: "flange", flangeIn: 0.5 });
    expect(s.spacerMm).toBe(25.4); // 1 in = 25.4 mm exactly (NIST SP 811)
  });

  it("refuses a wheel that does not match the tire and an offset outside the wheel", () => {
    const r = setupSchema.safeParse({ ...CUR, wheelDiameterIn: 18, position: { mode: "offset", offsetMm: 190 } });
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join("."));
    expect(paths).toEqual(expect.arrayContaining(["wheelDiameterIn"]));
  });
});

describe("units in the setup fields: a field reads the unit its label states", () => {
  it("refuses a spacer of 1-1/2 (a fraction in a mm field) instead of 1.5 mm; 1-1/2 in is 38.1 mm (NIST SP 811)", () => {
    const r = setupSchema.safeParse({ ...CUR, spacerMm: "1-1/2" });
    expect(r.success).toBe(false);
    expect(issueAt(r, "spacerMm")).toBe(
      "Spacer (mm, optional): “1-1/2” is a fraction, which is read only in inches — write “1-1/2 in”, or mm as a decimal, e.g. 25 (leave empty for none).",
    );
    expect(setupSchema.parse({ ...CUR, spacerMm: "1-1/2 in" }).spacerMm).toBeCloseTo(38.1, 9);
    expect(issueAt(setupSchema.safeParse({ ...CUR, position: { mode: "offset", offsetMm: "1/2" } }), "position.offsetMm")).toMatch(
      /^Offset \(mm\): “1\/2” is a fraction/,
    );
  });

  it("reads Unicode fractions in inch fields", () => {
    const s = setupSchema.parse({
      ...CUR,
      wheelWidthIn: "8½",
      position: { mode: "backspacing", backspacingIn: "4¾", reference: "flange", flangeIn: "½" },
    });
    expect(s.wheelWidthIn).toBe(8.5);
    expect(s.position).toEqual({ mode: "backspacing", backspacingIn: 4.75, reference: "flange", flangeIn: 0.5 });
  });
});

describe("form text for a setup", () => {
  it("reads back to the same setup, with an empty spacer as none", () => {
    const bs: Setup = {
      ...CUR,
      position: { mode: "backspacing", backspacingIn: 4.75, reference: "bead-seat", flangeIn: 0.625 },
      spacerMm: 12,
    };
    expect(setupSchema.parse(setupToForm(bs))).toEqual(bs);
    expect(setupSchema.parse(setupToForm(CUR))).toEqual(CUR);
    expect(setupToForm(CUR).spacerMm).toBe("");
  });

  it("a blank form names each missing field", () => {
    const r = setupSchema.safeParse(EMPTY_SETUP_FORM);
    expect(Object.keys(Object.fromEntries((r.error?.issues ?? []).map((i) => [i.path.join("."), 1])))).toEqual([
      "tire",
      "wheelDiameterIn",
      "wheelWidthIn",
      "position.offsetMm",
    ]);
  });
});
