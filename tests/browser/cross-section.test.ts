import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";
import { type ComparisonInput, DEFAULT_INPUT } from "@/lib/comparisons/model";
import { SETUP_A, SETUP_B, SETUP_C } from "@/lib/comparisons/crossSection/testUtil";
import { encodeComparison } from "@/lib/comparisons/url";
import { PREFS_STORAGE_KEY } from "@/lib/comparisons/format";
import { launch, pageWidth, seriousViolations, shot, SHOTS } from "./support/browser";

/*
 * The workspace's cross-section as Chromium lays it out, on a 375 px phone and at 1280 px: no two
 * labels of the drawing overlap (their rendered boxes, measured in the page), none leaves the
 * drawing, and the page does not scroll sideways on the phone. Setups as in
 * lib/fitment/crossSection.test.ts (worked there by hand): 35x12.50R17 on 17x9 −12, 285/75R16 on
 * 16x8 +0 with a 38 mm spacer, 33x12.50R15 on 15x10 −44 (entered as 3.25 in of backspacing to the
 * bead seat: (3.25 − 5) × 25.4 = −44.45 mm). Screenshots go to tests/browser/screenshots/.
 */
const [A, B, C] = [SETUP_A, SETUP_B, SETUP_C];

const CASES: [string, ComparisonInput, { units: "imperial" | "metric"; lengths: "decimal" | "fraction" }][] = [
  [
    "stock-to-a",
    { ...DEFAULT_INPUT, planned: A, vehicle: { ...DEFAULT_INPUT.vehicle, kingpinInclinationDeg: 8, fenderLineMm: 139.7 } },
    { units: "imperial", lengths: "decimal" },
  ],
  ["a-to-b-spacer", { ...DEFAULT_INPUT, current: A, planned: B }, { units: "metric", lengths: "decimal" }],
  ["b-to-c", { ...DEFAULT_INPUT, current: B, planned: C }, { units: "imperial", lengths: "fraction" }],
];

type Rect = { label: string; left: number; top: number; right: number; bottom: number };

/** Every text of the drawing with its rendered box (after the rotation of the height labels). */
const labelRects = (page: Page): Promise<Rect[]> =>
  page
    .getByTestId("cross-section")
    .locator("text")
    .evaluateAll((els) =>
      els.map((el) => {
        const r = el.getBoundingClientRect();
        return { label: el.textContent ?? "", left: r.left, top: r.top, right: r.right, bottom: r.bottom };
      }),
    );

/** Pairs of labels whose boxes share more than half a pixel each way (anti-aliasing). */
function overlaps(rects: Rect[]): string[] {
  const out: string[] = [];
  const tol = 0.5;
  for (let i = 0; i < rects.length; i++) {
    for (let j = i + 1; j < rects.length; j++) {
      const a = rects[i]!;
      const b = rects[j]!;
      if (a.left < b.right - tol && b.left < a.right - tol && a.top < b.bottom - tol && b.top < a.bottom - tol)
        out.push(`“${a.label}” × “${b.label}”`);
    }
  }
  return out;
}

for (const width of [375, 1280]) {
  describe(`cross-section at ${width} px`, () => {
    let browser: Awaited<ReturnType<typeof launch>>;
    afterAll(async () => {
      await browser?.close();
    });

    for (const [name, input, prefs] of CASES) {
      it(`${name}: both setups drawn, no two labels overlap, all inside the drawing`, async () => {
        browser ??= await launch({ width, height: 900 });
        const page = await browser.context.newPage();
        try {
          await page.addInitScript(([key, value]) => window.localStorage.setItem(key, value), [
            PREFS_STORAGE_KEY,
            JSON.stringify(prefs),
          ] as const);
          await page.goto(`/workspace?${encodeComparison(input)}`, { waitUntil: "networkidle" });
          const svg = page.getByTestId("cross-section");
          await svg.scrollIntoViewIfNeeded();
          await expect.poll(() => svg.isVisible()).toBe(true);
          await page.evaluate(() => document.fonts.ready.then(() => undefined));
          expect(await svg.locator("[data-setup=current]").count()).toBe(1);
          expect(await svg.locator("[data-setup=planned]").count()).toBe(1);
          // The reader's units reach the labels (the stored choice is read after hydration).
          const unit = prefs.units === "metric" ? / mm$/ : / in$/;
          await expect
            .poll(async () => (await svg.locator("[data-dimension=planned-reach-inboard] text").textContent()) ?? "")
            .toMatch(unit);

          const rects = await labelRects(page);
          expect(rects.length).toBeGreaterThan(15);
          expect(overlaps(rects)).toEqual([]);
          const box = (await svg.boundingBox())!;
          const outside = rects
            .filter(
              (r) =>
                r.left < box.x - 0.5 || r.right > box.x + box.width + 0.5 || r.top < box.y - 0.5 || r.bottom > box.y + box.height + 0.5,
            )
            .map((r) => r.label);
          expect(outside).toEqual([]);
          if (width === 375) expect(await pageWidth(page)).toBeLessThanOrEqual(width);

          await shot(page, `cross-section-page-${name}-${width}`); // creates the folder
          await svg.screenshot({ path: `${SHOTS}/cross-section-${name}-${width}.png` });
          if (name === "stock-to-a") expect(await seriousViolations(page)).toEqual([]);
        } finally {
          await page.close();
        }
      });
    }
  });
}
