import type { Locator, Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { launch, shot } from "./support/browser";

/**
 * Types into every workspace field the way people do — click, select all, delete, then one key
 * at a time with a short pause — and checks after each field that the text stayed as typed, the
 * focus stayed in the field (the vehicle details panel stays open) and the figure it drives.
 *
 * Figures (the demo comparison: current 265/70R17 on 17×8 +25 mm, planned 37x12.50R17LT on
 * 17×9 −12 mm):
 * - Diameters: 265/70R17 = 17 × 25.4 + 2 × 0.70 × 265 = 802.8 mm (ISO 4000-1 / ETRTO); 37 in =
 *   939.8 mm and 35 in = 889 mm (1 in = 25.4 mm exactly, NIST SP 811).
 * - Engine speed (handbook): rpm = mph × axle × top gear × 63 360 / (π × D in) / 60; for the
 *   37 in tire 63 360 / (π × 37) = 545.08 turns per mile.
 * - Ratio to restore the old engine speeds = axle × D planned / D current (handbook); the
 *   suggestion is the nearest of the engine's common ratios (COMMON_AXLE_RATIOS).
 * - Track: each side moves by the change of effective offset (offset plus spacer), so the track
 *   changes by twice that (offset convention: common practice, no source).
 * - Backspacing to the flange edge → offset = (backspacing − flange allowance − width / 2) × 25.4
 *   (common practice, no source).
 */

const VIEWPORTS = [
  { name: "1280", size: { width: 1280, height: 900 } },
  { name: "390", size: { width: 390, height: 844 } },
] as const;

const planned = (page: Page) => page.getByRole("region", { name: "Planned setup" });
const current = (page: Page) => page.getByRole("region", { name: "Current setup" });
const figure = (page: Page, id: string) => page.getByTestId(id).locator("dd").first();
const figureSub = (page: Page, id: string) => page.getByTestId(id).locator("dd").nth(1);
const vehicleSummary = (page: Page) => page.locator("summary", { hasText: /^Vehicle details/ });
const vehiclePanel = (page: Page) => page.locator("details", { has: vehicleSummary(page) });

/** The planned side shows the offset `offset` once and the track change figure reads `track`. */
async function expectOffsetAndTrack(page: Page, offset: RegExp, track: string): Promise<void> {
  await expect.poll(() => planned(page).getByText(offset).count()).toBe(1);
  await expect.poll(() => figure(page, "change-track").textContent()).toBe(track);
}

/** Click, select all, delete, then type one key at a time; the text must stay as typed and keep the focus. */
async function retype(page: Page, field: Locator, text: string): Promise<void> {
  await field.click();
  await page.keyboard.press("ControlOrMeta+A");
  await page.keyboard.press("Backspace");
  await field.pressSequentially(text, { delay: 70 });
  await page.waitForTimeout(150);
  expect(await field.inputValue()).toBe(text);
  expect(await field.evaluate((el) => el === document.activeElement)).toBe(true);
}

async function vehicleField(page: Page, label: RegExp, text: string): Promise<void> {
  await retype(page, page.getByLabel(label), text);
  // The panel is the person's to close: retyping a figure never closes it.
  expect(await vehiclePanel(page).evaluate((d) => (d as HTMLDetailsElement).open)).toBe(true);
}

async function noFieldErrors(page: Page): Promise<void> {
  await expect.poll(() => page.getByTestId("results-status").textContent()).toBe("Results follow your entries as you type.");
}

describe.each(VIEWPORTS)("typing into every workspace field at $name px (Chromium)", ({ name, size }) => {
  it("keeps each entry as typed and computes the figures it drives", async () => {
    const browser = await launch(size);
    try {
      const page = await browser.context.newPage();
      await page.goto("/workspace", { waitUntil: "networkidle" });
      // 802.8 → 939.8 mm: +137 mm = +5.39 in.
      await expect.poll(() => figure(page, "change-diameter").textContent()).toBe("+5.39 in");

      await vehicleSummary(page).click();
      expect(await vehiclePanel(page).evaluate((d) => (d as HTMLDetailsElement).open)).toBe(true);

      // Axle 4.10: restore 4.10 × 939.8 / 802.8 = 4.80 → nearest common ratio 4.88 (4.00, the
      // figure left when the panel closed after the "4", gives 4.68 → 4.56).
      await vehicleField(page, /^Axle ratio/, "4.10");
      await expect.poll(() => figure(page, "change-ratio").textContent()).toBe("4.88");
      // 60 mph × 4.10 × 1.00 × 545.08 / 60 = 2,235 rpm.
      await expect.poll(() => figure(page, "change-rpm").textContent()).toBe("2,235");
      await expect.poll(() => page.url()).toContain("axle=4.1");

      // Cruise speeds 55 and 65: the engine-speed rows are at 55 and 65 mph, not 5.
      await vehicleField(page, /^Cruise speeds/, "55, 65");
      await expect.poll(() => page.url()).toContain("cruise=55,65");
      await expect.poll(() => page.getByTestId("change-rpm").locator("dt").textContent()).toBe("RPM at 55 mph");
      // 55 × 4.10 × 545.08 / 60 = 2,049 rpm.
      expect(await figure(page, "change-rpm").textContent()).toBe("2,049");

      // Top gear 0.70: 55 × 4.10 × 0.70 × 545.08 / 60 = 1,434 rpm; the suggested axle ratio does not depend on it.
      await vehicleField(page, /^Top-gear ratio/, "0.70");
      await expect.poll(() => figure(page, "change-rpm").textContent()).toBe("1,434");
      expect(await figure(page, "change-ratio").textContent()).toBe("4.88");

      // Kingpin inclination 8°.
      await vehicleField(page, /^Kingpin inclination/, "8");
      await expect.poll(() => figureSub(page, "change-scrub").textContent()).toBe("with 8.0° KPI");

      // Crawl ratio = first gear × transfer-case low × axle (common 4x4 handbook definition, common
      // practice, no written source): 4.03 × 2.72 × 4.10 = 44.94:1; on the suggested 4.88, 53.49:1.
      await vehicleField(page, /^First-gear ratio/, "4.03");
      await vehicleField(page, /^Transfer-case low ratio/, "2.72");
      await expect.poll(() => figure(page, "change-crawl").textContent()).toBe("44.94:1");
      // The 37 in tire acts like 44.94 × 802.8 / 939.8 = 38.39:1.
      expect(await figureSub(page, "change-crawl").textContent()).toContain("acts like 38.39:1");
      expect(await figure(page, "change-crawl-regeared").textContent()).toBe("53.49:1");
      await expect.poll(() => page.url()).toContain("first=4.03&low=2.72");

      // Fender line 5-1/2 in = 139.7 mm from the hub face; the drawing places it there (its units are mm).
      await vehicleField(page, /^Fender line from hub face \(in\)/, "5-1/2");
      await expect.poll(() => page.url()).toContain("fender=139.7");
      await expect.poll(() => page.getByTestId("cross-section").locator('line[x1="139.7"]').count()).toBe(1);
      await noFieldErrors(page);

      // Planned offset −25 mm: each side moves 25 − (−25) = 50 mm; track +100 mm = +3.94 in.
      await retype(page, planned(page).getByLabel("Offset (mm)", { exact: true }), "-25");
      await expect.poll(() => figure(page, "change-track").textContent()).toBe("+3.94 in");

      // Spacer 1-1/2 in = 38.1 mm: effective offset −63.1 mm; track +2 × 88.1 = 176.2 mm = +6.94 in.
      // (Half typed, "1-1/2" is refused — a fraction is inches, never 1.5 mm — until " in" follows.)
      await retype(page, planned(page).getByLabel("Spacer (mm, optional)", { exact: true }), "1-1/2 in");
      await expect.poll(() => figure(page, "change-track").textContent()).toBe("+6.94 in");
      await noFieldErrors(page);

      // Backspacing 4⅝ in to the flange edge on the 9 in wheel: (4.625 − 0.5 − 4.5) × 25.4 = −9.525 mm;
      // with the spacer −47.625 mm: track +2 × 72.625 = 145.25 mm = +5.72 in.
      await planned(page)
        .locator("label", { hasText: /^Backspacing$/ })
        .click();
      await retype(page, planned(page).getByLabel("Backspacing (in)", { exact: true }), "4⅝");
      await expectOffsetAndTrack(page, /Offset −9\.5 mm/, "+5.72 in");

      // Flange allowance 5/8: (4.625 − 0.625 − 4.5) × 25.4 = −12.7 mm; track +2 × 75.8 = 151.6 mm = +5.97 in.
      await retype(page, planned(page).getByLabel("Flange allowance (in)", { exact: true }), "5/8");
      await expectOffsetAndTrack(page, /Offset −12\.7 mm/, "+5.97 in");

      // Wheel width 10 in: (4.625 − 0.625 − 5) × 25.4 = −25.4 mm; track +2 × 88.5 = 177 mm = +6.97 in.
      await retype(page, planned(page).getByLabel("Wheel width (in)", { exact: true }), "10");
      await expectOffsetAndTrack(page, /Offset −25\.4 mm/, "+6.97 in");

      // Planned tire 35x12.50R17LT: 889 − 802.8 = 86.2 mm = +3.39 in.
      await retype(page, planned(page).getByLabel("Tire size", { exact: true }), "35x12.50R17LT");
      await expect.poll(() => figure(page, "change-diameter").textContent()).toBe("+3.39 in");

      // Current wheel diameter retyped: 17 stays 17, nothing changes, nothing flagged.
      await retype(page, current(page).getByLabel("Wheel diameter (in)", { exact: true }), "17");
      await noFieldErrors(page);
      expect(await figure(page, "change-diameter").textContent()).toBe("+3.39 in");

      // The vehicle figures typed first are all still there.
      expect(await page.getByLabel(/^Axle ratio/).inputValue()).toBe("4.10");
      expect(await page.getByLabel(/^Cruise speeds/).inputValue()).toBe("55, 65");
      expect(await page.getByLabel(/^Top-gear ratio/).inputValue()).toBe("0.70");
      expect(await page.getByLabel(/^First-gear ratio/).inputValue()).toBe("4.03");
      expect(await page.getByLabel(/^Fender line from hub face/).inputValue()).toBe("5-1/2");
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await shot(page, `workspace-typed-${name}`);
      await page.close();
    } finally {
      await browser.close();
    }
  });
});
