import { describe, expect, it } from "vitest";
import { RECHECK_LINK_DAYS, recheckLinkExpiry, recheckLinkLive, recheckUrl, recheckWork } from "./recheckLink";

describe("the re-check link", () => {
  it("times the re-check as one 30-minute lift-bay stretch (common practice, no source)", () => {
    expect(recheckWork()).toEqual({ segments: [{ bayKind: "lift_bay", minutes: 30 }], minutes: 30 });
  });

  it("times the re-check by the shop's own length when it has set one", () => {
    expect(recheckWork(45)).toEqual({ segments: [{ bayKind: "lift_bay", minutes: 45 }], minutes: 45 });
  });

  it("expires 30 days after it is made, counted in whole 86 400 s days (NIST SP 811 table 6: 1 d = 86 400 s)", () => {
    expect(RECHECK_LINK_DAYS).toBe(30);
    expect(recheckLinkExpiry(new Date("2027-03-01T16:00:00Z")).toISOString()).toBe("2027-03-31T16:00:00.000Z");
  });

  it("works until the expiry instant and not at it; a job never mailed has no link", () => {
    const at = new Date("2027-03-31T16:00:00Z");
    expect(recheckLinkLive(at, new Date(at.getTime() - 1))).toBe(true);
    expect(recheckLinkLive(at, at)).toBe(false);
    expect(recheckLinkLive(null, new Date(0))).toBe(false);
  });

  it("points at the public page under the app's origin, without a doubled slash", () => {
    expect(recheckUrl("https://hubface.test/", "tok")).toBe("https://hubface.test/recheck/tok");
  });
});
