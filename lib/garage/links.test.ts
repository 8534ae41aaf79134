import { describe, expect, it } from "vitest";
import type { Setup } from "@/lib/setup/model";
import { vehicleWorkspaceUrl } from "./links";
import { CUR, PLAN } from "./testUtil";

describe("links in the workspace's query format", () => {
  it("matches the workspace's own example encoding", () => {
    const planned: Setup = { ...PLAN, tire: "37x12.50R17LT" };
    expect(vehicleWorkspaceUrl(CUR, planned, { kingpinInclinationDeg: null, axleRatio: 3.73, transmissionRatio: 1 })).toBe(
      "/workspace?ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12",
    );
    expect(vehicleWorkspaceUrl(CUR, planned, { kingpinInclinationDeg: 8, axleRatio: 4.1, transmissionRatio: 0.7 })).toMatch(
      /&kpi=8&axle=4\.1&top=0\.7$/,
    );
  });
});
