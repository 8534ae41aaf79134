import { describe, expect, it } from "vitest";
import { buildChecklist } from "./checklist";
import { DEMO_PROFILE } from "./loadTestUtil";
import { CUR, PLAN, VEHICLE } from "./testUtil";

const vehicle = { ...VEHICLE, currentSetup: { ...CUR, tire: "265/70R17 113T" } };
const planned = { ...PLAN, tire: "37x12.50R17LT 124Q LRD" };
const item = (c: ReturnType<typeof buildChecklist>, id: string) => c.items.find((i) => i.id === id);

describe("the install checklist with the vehicle's placard and body points", () => {
  it("says the cold pressure to set per axle in psi with kPa and bar, with the caution", () => {
    const c = buildChecklist({ vehicle, clearances: [], planned, marginMm: 12.7, loadProfile: DEMO_PROFILE });
    // Flotation load range D road minimum: 0.5833 × 50 psi = 29.2 psi = 201 kPa = 2.01 bar (NIST SP 811; FMVSS 138 ratio by proportion).
    expect(item(c, "pressure")?.title).toBe("Pressure: set cold to front 29.2 psi (201 kPa, 2.01 bar), rear 29.2 psi (201 kPa, 2.01 bar)");
    expect(item(c, "pressure")?.detail).toMatch(
      /From the vehicle's placard and scale ticket: the equivalent pressure, never below the road minimum\./,
    );
    expect(item(c, "pressure")?.detail).toMatch(/never inflate above the maximum on the sidewall or the wheel\.$/);
  });

  it("lists the angle changes as an item to check after fitting", () => {
    const c = buildChecklist({ vehicle, clearances: [], planned, marginMm: 12.7, loadProfile: DEMO_PROFILE });
    expect(item(c, "trail-angles")?.title).toMatch(
      /^Trail angles: approach [\d.]+° → [\d.]+° \(\+[\d.]+°\), departure .*, ramp breakover .*\(\+[\d.]+°\)$/,
    );
  });

  it("keeps the general pressure item and no angle item without a profile", () => {
    const c = buildChecklist({ vehicle, clearances: [], planned, marginMm: 12.7 });
    expect(item(c, "pressure")?.title).toMatch(/^Pressure: from the tire maker's load\/inflation table/);
    expect(item(c, "trail-angles")).toBeUndefined();
  });
});
