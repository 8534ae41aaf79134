import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, panelsShown, seriousViolations, shot } from "./support/browser";

// A vehicle whose door placard reads P265/70R17 113S at 35 psi front and rear, weighed at
// 3,086 lb front and 2,646 lb rear (an invented scale ticket), fitting 37x12.50R17LT 124Q LRD.
// Expected: 29.2 psi to set (the planned tire's road minimum: 140/240 of its 50 psi, FMVSS 138
// Table 1 ratio applied by proportion, no source); equivalent pressure 24.2 psi (TRA load formula,
// 1150 kg ÷ 1.10 per FMVSS 120 at 35 psi → 50 · (1045.5/1600)^(1/0.585)).
const QUERY = "/workspace";

for (const width of [1280, 390]) {
  describe(`load and pressure, trail angles at ${width} px`, () => {
    let session: Awaited<ReturnType<typeof launch>>;
    let page: Page;
    beforeAll(async () => {
      session = await launch({ width, height: 900 });
      page = await session.context.newPage();
    });
    afterAll(() => session.close());

    async function units(name: "Inch" | "Metric") {
      await page.getByRole("radio", { name, exact: true }).check({ force: true });
    }

    it("shows the pressure to set, the equivalent pressure, the chart and the angle changes in both unit systems", async () => {
      await page.goto(QUERY);
      await panelsShown(page, "Loading load and pressure", "Loading trail angles");
      await units("Inch");
      await page.getByLabel("Placard tire size").fill("P265/70R17 113S");
      await page.getByLabel("Placard pressure, front (psi)").fill("35");
      await page.getByLabel("Placard pressure, rear (psi)").fill("35");
      await page.getByLabel("Front axle load (lb)").fill("3086");
      await page.getByLabel("Rear axle load (lb)").fill("2646");
      await expect.poll(() => page.getByTestId("set-front").textContent()).toBe("29.2 psi (201 kPa, 2.01 bar)");
      await expect.poll(() => page.getByTestId("equivalent-front").textContent()).toMatch(/^24\.2 psi/);
      await expect.poll(() => page.getByTestId("load-chart").isVisible()).toBe(true);

      await page.getByLabel("Front corner height (in)").fill("24");
      await page.getByLabel("Front corner ahead of the front axle (in)").fill("35");
      await page.getByLabel("Wheelbase (in)").fill("118");
      await page.getByLabel("Lowest point midway, height (in)").fill("11");
      await page.getByLabel("Suspension lift (optional) (in)").fill("2");
      await expect.poll(() => page.getByTestId("angle-approach").textContent()).toMatch(/^Approach[\d.]+°[\d.]+°\+[\d.]+°$/);
      await expect.poll(() => page.getByTestId("angle-breakover").textContent()).toMatch(/\+[\d.]+°$/);
      await expect.poll(() => page.getByTestId("brake-torque").textContent()).toMatch(/brake torque for the same stop/);
      await page.getByTestId("load-chart").scrollIntoViewIfNeeded();
      await shot(page, `load-pressure-inch-${width}`);
      expect(await seriousViolations(page)).toEqual([]);

      await units("Metric");
      // Converted, never relabelled: 35 psi = 241.3 kPa, 3086 lb = 1399.8 kg, 24 in = 609.6 mm (NIST SP 811).
      await expect.poll(() => page.getByLabel("Placard pressure, front (kPa)").inputValue()).toBe("241");
      await expect.poll(() => page.getByLabel("Front axle load (kg)").inputValue()).toBe("1399.8");
      await expect.poll(() => page.getByLabel("Front corner height (mm)").inputValue()).toBe("609.6");
      await expect.poll(() => page.getByTestId("set-front").textContent()).toBe("201 kPa (2.01 bar, 29.2 psi)");
      await expect.poll(() => page.getByTestId("load-chart").textContent()).toMatch(/\(kg\) against cold pressure \(kPa\)/);
      await page.getByTestId("load-chart").scrollIntoViewIfNeeded();
      await shot(page, `load-pressure-metric-${width}`);
    });

    it("puts the engine's message beside an axle load the planned tire cannot carry", async () => {
      await page.getByLabel("Rear axle load (kg)").fill("3400");
      await expect
        .poll(() =>
          page.getByText(/Rear axle load \(kg\): one tire carries half the axle, and 1,700 kg is above the maximum load/).isVisible(),
        )
        .toBe(true);
      await expect.poll(() => page.getByTestId("set-front").count()).toBe(0);
      await shot(page, `load-pressure-refused-${width}`);
    });
  });
}
