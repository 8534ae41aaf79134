import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, panelsShown, seriousViolations, shot, signInAs } from "./support/browser";
import { DEMO, DEMO_PASSWORD } from "./support/http";
import { PLACARD_TYPED_IN_INCHES } from "./support/placard";

/** The vehicle page's panels below the fold, mounted when scrolled near (MountWhenNear). */
const VEHICLE_PANELS = ["Loading placard, axle weights and body points", "Loading plan a setup"];

// An invented truck: door placard P265/70R17 113S at 35 psi front and rear, weighed at 3,086 lb
// front and 2,646 lb rear, body points measured on its 265/70R17 tires; planned 37x12.50R17LT
// 124Q load range D on 17x9 wheels. Expected, as in the workspace's load-pressure test: 29.2 psi to
// set (the planned tire's road minimum, 140/240 of its 50 psi, the engine's proportion of FMVSS 138
// Table 1), equivalent pressure 24.2 psi (TRA load formula: 1150 kg ÷ 1.10 at 35 psi → 50 ·
// (1045.5/1600)^(1/0.585)); every body point 68.5 mm higher (939.8 − 802.8 mm, halved), so every
// angle grows.
const SETUP = { tire: "265/70R17 113T", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 };
const PLANNED = "pt=37x12.50R17LT%20124Q%20LRD&pd=17&pw=9&po=-12";
const stamp = Date.now().toString(36);

let session: Awaited<ReturnType<typeof launch>>;
let page: Page;
let vehicleId = "";

beforeAll(async () => {
  session = await launch();
  page = await session.context.newPage();
});
afterAll(() => session.close());

async function units(name: "Inch" | "Metric") {
  await page.getByRole("radio", { name, exact: true }).check({ force: true });
}

describe("a garage vehicle's placard, axle weights and body points", () => {
  it("creates the vehicle", async () => {
    await signInAs(page, DEMO.member, DEMO_PASSWORD);
    const body = {
      name: `Ridge Runner ${stamp}`,
      frontSuspension: "solid-axle",
      boltPattern: "6x5.5",
      stockSetup: SETUP,
      currentSetup: SETUP,
    };
    const res = await page.evaluate(async (b) => {
      const r = await fetch("/api/vehicles", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(b) });
      return { status: r.status, json: await r.json() };
    }, body);
    expect(res.status).toBe(201);
    vehicleId = res.json.vehicle.id;
  });

  it("stores the placard and body points and shows the pressure to set and the angle changes in inches", async () => {
    await page.goto(`/garage/${vehicleId}?${PLANNED}`);
    await panelsShown(page, ...VEHICLE_PANELS);
    await units("Inch");
    await expect.poll(() => page.getByTestId("body-points-drawing").isVisible()).toBe(true);
    for (const [label, text] of Object.entries(PLACARD_TYPED_IN_INCHES)) await page.getByLabel(label, { exact: true }).fill(text);
    await page.getByRole("button", { name: "Save placard and body points" }).click();
    await expect.poll(() => page.getByText("Saved.").isVisible()).toBe(true);
    await expect.poll(() => page.getByTestId("set-front").textContent()).toBe("29.2 psi (201 kPa, 2.01 bar)");
    await expect.poll(() => page.getByTestId("equivalent-front").textContent()).toMatch(/^24\.2 psi/);
    await expect
      .poll(() =>
        page
          .getByText(/never inflate above the maximum on the sidewall or the wheel/)
          .first()
          .isVisible(),
      )
      .toBe(true);
    for (const kind of ["approach", "departure", "breakover"])
      await expect.poll(() => page.getByTestId(`angle-${kind}`).textContent()).toMatch(/[\d.]+°[\d.]+°\+[\d.]+°$/);
    await page.getByTestId("setup-load-trail").scrollIntoViewIfNeeded();
    await shot(page, "garage-load-inch");
    expect(await seriousViolations(page)).toEqual([]);
  });

  it("converts every figure to metric, keeps the angles, and reads the stored figures back after a reload", async () => {
    const approach = await page.getByTestId("angle-approach").textContent();
    await units("Metric");
    // 35 psi = 241.3 kPa, 3086 lb = 1399.8 kg, 24 in = 609.6 mm (NIST SP 811).
    await expect.poll(() => page.getByLabel("Placard cold pressure, front (kPa)").inputValue()).toBe("241");
    await expect.poll(() => page.getByLabel("Front axle weight, scale ticket (kg)").inputValue()).toBe("1399.8");
    await expect.poll(() => page.getByLabel("Front corner height (mm)").inputValue()).toBe("609.6");
    await expect.poll(() => page.getByTestId("set-front").textContent()).toBe("201 kPa (2.01 bar, 29.2 psi)");
    expect(await page.getByTestId("angle-approach").textContent()).toBe(approach);
    await page.reload();
    await panelsShown(page, ...VEHICLE_PANELS);
    await expect.poll(() => page.getByLabel("Wheelbase (mm)").inputValue()).toBe("2997.2");
    await expect.poll(() => page.getByTestId("set-front").textContent()).toBe("201 kPa (2.01 bar, 29.2 psi)");
    await page.getByTestId("setup-load-trail").scrollIntoViewIfNeeded();
    await shot(page, "garage-load-metric");
  });

  it("refuses an axle weight the placard tire cannot carry and a body point inside the tire, storing nothing", async () => {
    await page.getByLabel("Front axle weight, scale ticket (kg)").fill("2400");
    await page.getByLabel("Rear corner height (mm)").fill("300");
    await page.getByLabel("Rear corner behind the rear axle (mm)").fill("100");
    await page.getByRole("button", { name: "Save placard and body points" }).click();
    await expect
      .poll(() => page.getByText(/Front axle weight, scale ticket \(kg\): one tire carries half the axle/).isVisible())
      .toBe(true);
    await expect.poll(() => page.getByText(/Rear corner height \(mm\): .*inside the tire's circle/).isVisible()).toBe(true);
    await expect.poll(() => page.getByText("Nothing was saved: see the messages beside the fields.").isVisible()).toBe(true);
    await shot(page, "garage-load-refused");
    await page.reload();
    await panelsShown(page, ...VEHICLE_PANELS);
    await expect.poll(() => page.getByLabel("Front axle weight, scale ticket (kg)").inputValue()).toBe("1399.8");
  });

  it("ranks the finder's fits by the angles and by the load index they need, and says why a fit has no pressure", async () => {
    await page.goto(`/garage/${vehicleId}/finder`);
    await page.getByLabel(/^Target diameter/).fill("35");
    const header = page.getByRole("button", { name: /^Approach \(change\)/ });
    await expect.poll(() => header.isVisible(), { timeout: 30_000 }).toBe(true);
    // The finder's sizes carry no service description, so no fit has a load index to compute a pressure from: the cell says so
    // (it used to claim the fit could not carry the load).
    await expect.poll(() => page.getByText("load index not known").first().isVisible()).toBe(true);
    expect(await page.getByText("cannot carry the placard or axle load").count()).toBe(0);
    // What it can say instead: the least load index per size, and the fits rank by it (ISO 4000-1 table).
    await expect.poll(() => page.getByText(/Load index needed is the least load index a tire of that size/).isVisible()).toBe(true);
    await page.getByRole("button", { name: /^Load index needed/ }).click();
    const indexes = async () =>
      (await page.getByTestId("finder-load-index").allTextContents()).map((t) => Number(/^≥ (\d+)/.exec(t)?.[1] ?? NaN));
    await expect.poll(async () => (await indexes()).length).toBeGreaterThan(1);
    const ranked = await indexes();
    expect(ranked.every((li, i) => Number.isInteger(li) && (i === 0 || li >= ranked[i - 1]!))).toBe(true);
    await header.click();
    await header.click();
    await shot(page, "garage-load-finder");
    expect(await seriousViolations(page)).toEqual([]);
  });
});
