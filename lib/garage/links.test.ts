import { describe, expect, it } from "vitest";
import type { SetupValues } from "@/lib/setup/schema";
import { setupFromQuery, setupQuery, workspaceHref } from "./links";
import { CUR, PLAN } from "./testUtil";

describe("links in the workspace's query format", () => {
  it("matches the workspace's own example encoding", () => {
    const planned: SetupValues = { ...PLAN, tire: "37x12.50R17LT" };
    expect(workspaceHref(CUR, planned, { kingpinInclinationDeg: null, axleRatio: 3.73, transmissionRatio: 1 })).toBe(
      "/workspace?ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12",
    );
    expect(workspaceHref(CUR, planned, { kingpinInclinationDeg: 8, axleRatio: 4.1, transmissionRatio: 0.7 })).toMatch(/&kpi=8&axle=4\.1&top=0\.7$/);
  });

  it("round-trips a backspacing setup with spacer", () => {
    const s: SetupValues = { ...PLAN, position: { mode: "backspacing", backspacingIn: 4.5, reference: "bead-seat", flangeIn: 0.5 }, spacerMm: 12 };
    const q = setupQuery("p", s);
    expect(q).toBe("pt=35x12.50R17LT&pd=17&pw=9&pb=4.5&pr=bead&ps=12");
    expect(setupFromQuery("p", new URLSearchParams(q))).toEqual(s);
    expect(setupFromQuery("p", new URLSearchParams("pt=nonsense"))).toBeNull();
  });
});
