import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chartsShown, launch, seriousViolations, shot, withBrowserPage } from "./support/browser";

let browser: Awaited<ReturnType<typeof launch>>;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const planned = (page: Page) => page.getByRole("region", { name: "Planned setup" });
const current = (page: Page) => page.getByRole("region", { name: "Current setup" });
const figure = (page: Page, id: string) => page.getByTestId(id).locator("dd").first();

async function fill(page: Page, region: ReturnType<typeof planned>, label: string, value: string) {
  const field = region.getByLabel(label, { exact: true });
  await field.fill(value);
  await field.blur();
}

describe("comparison workspace in Chromium", () => {
  let link = "";

  it("an enthusiast enters two setups and sees the numbers and the drawing", async () => {
    const page = await browser.context.newPage();
    await page.goto("/workspace", { waitUntil: "networkidle" });
    await fill(page, current(page), "Tire size", "265/70R17");
    await fill(page, current(page), "Wheel width (in)", "8");
    await fill(page, current(page), "Offset (mm)", "25");
    await fill(page, planned(page), "Tire size", "35x12.50R17LT");
    await fill(page, planned(page), "Wheel width (in)", "9");
    await fill(page, planned(page), "Offset (mm)", "-12");
    // 35 in = 889 mm (1 in = 25.4 mm exactly); 265/70R17 = 431.8 + 2 × 185.5 = 802.8 mm (ISO 4000-1): +86.2 mm = +3.39 in.
    await expect.poll(() => figure(page, "change-diameter").textContent()).toBe("+3.39 in");
    // Wheel-plane shift 25 − (−12) = 37 mm per side: track +74 mm = +2.91 in (offset convention: common practice, no source).
    expect(await figure(page, "change-track").textContent()).toBe("+2.91 in");
    // Speedometer: 60 × 889 / 802.8 = 66.44 mph (ratio of diameters, handbook).
    expect(await figure(page, "change-speed").textContent()).toBe("66.4 mph");
    await expect.poll(() => page.getByTestId("cross-section").isVisible()).toBe(true);
    await chartsShown(page);
    expect(await page.getByTestId("warnings").locator("[data-kind=speedometer]").count()).toBe(1);
    link = page.url();
    expect(link).toContain("pt=35x12.50R17LT");
    await shot(page, "workspace-two-setups");
    expect(await seriousViolations(page)).toEqual([]);
    await page.close();
  });

  it("the URL reproduces the comparison in a fresh page", async () => {
    const other = await launch();
    try {
      const page = await other.context.newPage();
      await page.goto(link, { waitUntil: "networkidle" });
      expect(await planned(page).getByLabel("Tire size", { exact: true }).inputValue()).toBe("35x12.50R17LT");
      expect(await planned(page).getByLabel("Offset (mm)", { exact: true }).inputValue()).toBe("-12");
      expect(await figure(page, "change-diameter").textContent()).toBe("+3.39 in");
      expect(await seriousViolations(page)).toEqual([]);
    } finally {
      await other.close();
    }
  });

  it("back and forward step through the edits", async () => {
    const page = await browser.context.newPage();
    await page.goto(link, { waitUntil: "networkidle" });
    await fill(page, planned(page), "Wheel width (in)", "10");
    await expect.poll(() => page.url()).toContain("pw=10");
    await fill(page, planned(page), "Offset (mm)", "-25");
    await expect.poll(() => page.url()).toContain("po=-25");
    await page.goBack();
    await expect.poll(() => planned(page).getByLabel("Offset (mm)", { exact: true }).inputValue()).toBe("-12");
    expect(await planned(page).getByLabel("Wheel width (in)", { exact: true }).inputValue()).toBe("10");
    await page.goBack();
    await expect.poll(() => planned(page).getByLabel("Wheel width (in)", { exact: true }).inputValue()).toBe("9");
    await page.goForward();
    await expect.poll(() => planned(page).getByLabel("Wheel width (in)", { exact: true }).inputValue()).toBe("10");
    await page.goForward();
    await expect.poll(() => planned(page).getByLabel("Offset (mm)", { exact: true }).inputValue()).toBe("-25");
    await page.close();
  });

  it("the unit choice applies everywhere and is remembered", async () => {
    const page = await browser.context.newPage();
    await page.goto(link, { waitUntil: "networkidle" });
    await page.locator("label", { hasText: /^Metric$/ }).click();
    await expect.poll(() => figure(page, "change-diameter").textContent()).toBe("+86.2 mm");
    await page.reload();
    await expect.poll(() => figure(page, "change-diameter").textContent()).toBe("+86.2 mm");
    await page.locator("label", { hasText: /^Inch$/ }).click();
    await page.close();
  });

  it("works at 375 px", async () => {
    await withBrowserPage({ width: 375, height: 812 }, async (page) => {
      await page.goto(`${link}&kpi=8&fender=150`, { waitUntil: "networkidle" });
      await chartsShown(page);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await shot(page, "workspace-375");
      expect(await seriousViolations(page)).toEqual([]);
    });
  });
});

describe("converter in Chromium", () => {
  it("round-trips lengths, pressure and torque and lists equivalent sizes", async () => {
    const page = await browser.context.newPage();
    await page.goto("/convert", { waitUntil: "networkidle" });
    await page.getByLabel("Millimetres").fill("152.4");
    // 152.4 mm / 25.4 = 6 in exactly (NIST SP 811).
    expect(await page.getByLabel("Inches").inputValue()).toBe("6");
    await page.getByLabel("Inches").fill("4-3/4");
    // 4.75 × 25.4 = 120.65 mm.
    expect(await page.getByLabel("Millimetres").inputValue()).toBe("120.65");
    await page.getByLabel("Millimetres").fill("120.651");
    await page.getByLabel("Millimetres").fill("120.65");
    expect(await page.getByLabel("Inches").inputValue()).toBe("4.75");
    await page.getByLabel("psi").fill("35");
    // 35 psi × 6.894757 = 241.3 kPa (NIST SP 811; convert-units agrees within 1e-6).
    expect(await page.getByLabel("kPa").inputValue()).toBe("241.3");
    await page.getByLabel("kPa").fill("241.3");
    expect(Number(await page.getByLabel("psi").inputValue())).toBeCloseTo(35, 1);
    await page.getByLabel("ft·lb").fill("100");
    // 1 ft·lbf = 1.355818 N·m (NIST SP 811).
    expect(await page.getByLabel("N·m").inputValue()).toBe("135.58");
    await page.getByLabel("Tire size").fill("285/75R17");
    await expect.poll(() => page.getByTestId("equivalents").locator("tbody tr").count()).toBeGreaterThan(0);
    // Engine README example: the nearest flotation size to 285/75R17 is 34x10.50R17LT.
    expect(await page.getByTestId("equivalents").locator("tbody tr th").first().textContent()).toBe("34x10.50R17LT");
    // ISO 4000-1 / ETRTO: 431.8 + 2 × 285 × 0.75 = 859.3 mm = 33.83 in; 285 mm = 11.22 in (NIST SP 811 inch).
    expect(await page.getByTestId("nominal").textContent()).toBe("285/75R17 ≈ 33.8 × 11.2 in on 17 in");
    await shot(page, "converter");
    expect(await seriousViolations(page)).toEqual([]);
    await page.close();
  });
});

describe("beadlock ring helper in Chromium", () => {
  it("draws 24 and 32 bolts in crisscross order with the torque passes", async () => {
    const page = await browser.context.newPage();
    await page.goto("/beadlock", { waitUntil: "networkidle" });
    await page.getByLabel("Bolts on the ring").fill("24");
    await expect.poll(() => page.getByTestId("ring-bolt").count()).toBe(24);
    // Crisscross: bolt 1, then the bolt opposite (13 of 24), then a quarter round (common practice, no source).
    expect(await page.getByTestId("ring-order").textContent()).toMatch(/1 → 13 → 7 → 19/);
    await page.getByLabel(/Maker's torque/).fill("17");
    // 17 ft·lb × 1.355818 = 23.0 N·m; passes at 30 / 60 / 100 % and a check pass.
    const passes = page.getByTestId("torque-passes").locator("tbody tr");
    expect(await passes.count()).toBe(4);
    expect(await passes.nth(2).locator("td").nth(2).textContent()).toBe("23.0");
    expect(await page.getByText(/safety cage/).count()).toBe(1);
    await shot(page, "ring-24");
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByLabel("Bolts on the ring").fill("32");
    await expect.poll(() => page.getByTestId("ring-bolt").count()).toBe(32);
    expect(await page.getByTestId("ring-order").textContent()).toMatch(/^Bolt order: 1 → 17 → 9 → 25/);
    await shot(page, "ring-32");
    await page.close();
  });
});
