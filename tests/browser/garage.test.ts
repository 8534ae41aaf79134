import { randomBytes } from "node:crypto";
import type { Page } from "playwright-core";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { expectAxeClean, filePage, launch, panelsShown, seriousViolations, shot, signInAs, withBrowserPage } from "./support/browser";
import { DEMO, DEMO_PASSWORD } from "./support/http";

// The file's one page: filePage opens it before the tests and closes it after them.
const browser = filePage();
let page: Page;
beforeAll(() => {
  page = browser.page();
});
let vehicleUrl = "";
const stamp = Date.now().toString(36);

const axeClean = (name: string) => expectAxeClean(page, name);

/** A noisy PNG (random pixels do not compress, so the upload takes a moment when throttled). */
async function noisyPng(w: number, h: number): Promise<Buffer> {
  return sharp(randomBytes(w * h * 3), { raw: { width: w, height: h, channels: 3 } })
    .png()
    .toBuffer();
}

describe("the garage in Chromium", () => {
  it("shows the demo garage with its photos to the member", async () => {
    await signInAs(page, DEMO.member, DEMO_PASSWORD);
    await page.getByRole("link", { name: "Garage" }).first().click();
    await page.waitForURL(/\/garage$/);
    await expect.poll(() => page.getByRole("link", { name: "Gravel Hauler" }).isVisible()).toBe(true);
    await axeClean("garage-list");
    await page.getByRole("link", { name: "Gravel Hauler" }).click();
    await page.waitForURL(/\/garage\/d4000000-0000-4000-8000-000000000001/);
    const thumb = page.getByTestId("photo-thumb").first();
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), { timeout: 15000 }).toBe(360);
    await axeClean("garage-demo-vehicle");
  });

  it("creates a vehicle, refusing a bad bolt pattern first", async () => {
    await page.goto("/garage/new");
    await page.getByLabel("Name", { exact: true }).fill(`Dune Skiff ${stamp}`);
    await page.getByLabel("Year").fill("2011");
    await page.getByLabel("Model").fill("Mid-size pickup");
    await page.getByLabel("Bolt pattern").fill("5x4.5x1");
    await page.locator("#f-stockSetup-tire").fill("265/70R17");
    await page.locator("#f-stockSetup-d").fill("17");
    await page.locator("#f-stockSetup-w").fill("8");
    await page.locator("#f-stockSetup-offset").fill("25");
    await page.getByRole("button", { name: "Copy the stock setup here" }).click();
    await page.getByLabel("Lift height (in)").fill("2-1/2");
    await page.getByLabel("Axle ratio").fill("3.73");
    await page.getByRole("button", { name: "Add vehicle" }).click();
    await expect.poll(() => page.locator("#f-boltPattern-error").textContent()).toMatch(/not a bolt pattern/);
    await axeClean("garage-new-errors");
    await page.getByLabel("Bolt pattern").fill("5x4.5");
    await expect.poll(() => page.locator("#f-boltPattern-hint").textContent()).toMatch(/5x4\.5 in = 5x114\.3 mm/);
    await page.getByRole("button", { name: "Add vehicle" }).click();
    await page.waitForURL(/\/garage\/[0-9a-f-]{36}$/);
    vehicleUrl = new URL(page.url()).pathname;
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe(`Dune Skiff ${stamp}`);
    await expect.poll(() => page.getByText("5x4.5 in = 5x114.3 mm").isVisible()).toBe(true);
    // 2-1/2 in = 63.5 mm exactly (NIST SP 811); the page follows the Units switch, inches (decimals) first by default.
    await expect.poll(() => page.getByText("2.5 in (63.5 mm)").isVisible()).toBe(true);
  });

  it("adds measured points (inches with a fraction from the unit choice, inches in the text)", async () => {
    await page.locator("#f-point-label").fill("Frame rail, full left lock");
    await page.locator("#f-point-direction").selectOption("inboard");
    await page.locator("#f-point-suspensionState").selectOption("full-lock");
    await page.locator("#f-point-distance").fill("1-1/4");
    await page.getByRole("button", { name: "Add point" }).click();
    await expect.poll(() => page.getByTestId("clearance-point").count()).toBe(1);
    // 1-1/4 in = 31.75 mm, shown to 0.1 mm, after the inches the Units switch puts first
    await expect.poll(() => page.getByTestId("clearance-point").first().textContent()).toMatch(/1\.25 in \(31\.8 mm\)/);

    await page.locator("#f-point-label").fill("Bumper corner, full right lock");
    await page.locator("#f-point-direction").selectOption("fore-aft");
    await page.locator("#f-point-distance").fill("3/4 in");
    await page.getByRole("button", { name: "Add point" }).click();
    await expect.poll(() => page.getByTestId("clearance-point").count()).toBe(2);
    await axeClean("garage-vehicle-points");
  });

  it("uploads a photo by the file picker with a progress bar, then shows its thumbnail; a fake image is refused", async () => {
    const cdp = await browser.context().newCDPSession(page);
    await cdp.send("Network.enable");
    await cdp.send("Network.emulateNetworkConditions", {
      offline: false,
      latency: 20,
      downloadThroughput: -1,
      uploadThroughput: 300 * 1024,
    });
    const png = await noisyPng(700, 500);
    expect(png.length).toBeGreaterThan(800 * 1024);
    const input = page.getByTestId("drop-vehicle").locator('input[type="file"]');
    await input.setInputFiles({ name: "skiff.png", mimeType: "image/png", buffer: png });
    await expect.poll(() => page.getByTestId("upload-progress").getAttribute("value"), { timeout: 15000 }).toMatch(/^[1-9]\d?$/);
    await shot(page, "garage-upload-progress");
    await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    await expect.poll(() => page.getByTestId("upload-message").first().textContent(), { timeout: 30000 }).toMatch(/skiff\.png uploaded/);
    await expect
      .poll(() => page.getByAltText("Photo: skiff.png").evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), {
        timeout: 15000,
      })
      .toBe(360);

    await input.setInputFiles({ name: "not-really.png", mimeType: "image/png", buffer: Buffer.from("this is text, not a picture") });
    await expect.poll(() => page.getByTestId("upload-message").first().textContent()).toMatch(/not a JPEG, PNG or WebP/);
    await axeClean("garage-vehicle-photo");
  });

  it("predicts the points for a planned setup and flags a contact", async () => {
    await panelsShown(page, "Loading plan a setup");
    await page.locator("#f-planned-tire").fill("35x12.50R17LT");
    await page.locator("#f-planned-w").fill("9");
    await page.locator("#f-planned-offset").fill("-12");
    const table = page.getByTestId("predictions");
    await expect.poll(() => table.textContent()).toMatch(/Contact/);
    // Both points are at full lock; no KPI recorded, so the steering axis runs through the current
    // tire's centre line, 25 mm inboard of the hub face (offset +25). 35x12.50R17LT on 17x9 −12
    // (section 317.5 − 0.4 × 25.4 = 307.34 mm, UN R30): outer corner 165.67 + 25 = 190.67 mm from the
    // axis, inner 141.67 − 25 = 116.67; 265/70R17 on 17x8 +25: both 132.5.
    // Bumper corner: √(401.4² + 132.5²) = 422.703 → √(444.5² + 190.67²) = 483.669, 19.05 − 60.965 = −41.9 mm → contact.
    await expect.poll(() => table.locator("tr", { hasText: "Bumper corner" }).textContent()).toMatch(/Contact/);
    // Frame rail: 422.703 → √(444.5² + 116.67²) = 459.556, 31.75 − 36.853 = −5.1 mm → contact (the inner
    // reach alone, 15.8 mm more room, used to call it clear).
    await expect.poll(() => table.locator("tr", { hasText: "Frame rail" }).textContent()).toMatch(/Contact/);
    await expect
      .poll(() => table.locator("tr", { hasText: "Frame rail" }).textContent())
      .toMatch(/inner tread corner swinging about the steering axis/);
    await expect.poll(() => page.getByTestId("prediction-note").textContent()).toMatch(/How this is predicted/);
    await page.getByTestId("prediction-note").locator("summary").click();
    // 25 mm / 25.4 = 0.984 in (NIST SP 811), in the page's inch units.
    await expect.poll(() => page.getByTestId("prediction-note").textContent()).toMatch(/0\.98 in inboard of the hub face/);
    await expect.poll(() => page.url()).toMatch(/pt=35x12\.50R17LT/);
    const href = await page.getByTestId("open-workspace").getAttribute("href");
    expect(href).toMatch(/^\/workspace\?ct=265\/70R17&cd=17&cw=8&co=25&pt=35x12\.50R17LT&pd=17&pw=9&po=-12/);
    await axeClean("garage-vehicle-plan");
  });

  it("opens the install checklist, ticks an item and keeps it after a reload", async () => {
    await page.getByRole("link", { name: "Install checklist" }).click();
    await page.waitForURL(/\/checklist\?/);
    await expect.poll(() => page.getByText(/Contact at Bumper corner/).isVisible()).toBe(true);
    await expect.poll(() => page.getByText(/star pattern: 1-3-5-2-4/).isVisible()).toBe(true);
    await expect.poll(() => page.getByText(/re-check lug torque after the first 50–100 miles/i).isVisible()).toBe(true);
    const box = page.locator('input[data-item="alignment"]');
    await box.check();
    await expect.poll(() => page.getByTestId("checklist-status").textContent()).toMatch(/^1 of \d+ done/);
    await page.reload();
    await expect.poll(() => page.locator('input[data-item="alignment"]').isChecked()).toBe(true);
    await axeClean("garage-checklist");
    await page.emulateMedia({ media: "print" });
    await shot(page, "garage-checklist-print");
    expect(await page.getByRole("button", { name: "Print the checklist" }).isVisible()).toBe(false);
    await page.emulateMedia({ media: "screen" });
  });

  it("runs the finder in a worker, sorts and filters, and links a candidate to the workspace", async () => {
    await page.goto(`${vehicleUrl}/finder`);
    await page.getByLabel("Target diameter (in)").fill("33");
    // Typing is never blocked: the field holds every keystroke while searches run.
    await page.getByLabel("From (in)", { exact: true }).pressSequentially("31", { delay: 30 });
    await page.getByLabel("To (in)", { exact: true }).pressSequentially("34-1/2", { delay: 30 });
    expect(await page.getByLabel("To (in)", { exact: true }).inputValue()).toBe("34-1/2");
    await expect.poll(() => page.getByTestId("finder-summary").textContent(), { timeout: 20000 }).toMatch(/fits among [\d,]+ combinations/);
    // Every measured point is applied (333 fits, best 200 shown, and 32 sizes excluded entirely when
    // written); each excluded size is shown by its nearest miss and the limit that decided it.
    await expect
      .poll(() => page.getByTestId("finder-summary").textContent())
      .toMatch(
        /^[\d,]+ fits among [\d,]+ combinations in \d+ ms — the best 200 shown\. [\d,]+ more were excluded by the measured points or the poke limit, \d+ tire sizes entirely \(listed below\)\.$/,
      );
    // Nearest the 33 in target: 33x12.50R17LT (838.2 mm, R 419.1) on 17x9 +25, corners 153.67 mm from the
    // axis: √(419.1² + 153.67²) = 446.38 vs 422.703 → 19.05 − 23.68 = −4.63 mm at the bumper corner,
    // needing 12.7 + 4.63 = 17.3 mm (11/16 in); the frame rail keeps only 31.75 − 23.68 = 8.07 mm.
    const excluded = page.getByTestId("finder-excluded").getByTestId("excluded-size");
    await expect
      .poll(() => excluded.first().textContent())
      .toMatch(
        /^33x12\.50R17LT.*17x9 \+25 mm.*Excluded: touches bumper corner, full right lock \(measured at full lock\) — needs 17\.3 mm \(11\/16 in\) more; 1 other limit fails too\./,
      );
    const rows = page.getByTestId("finder-results").locator("tbody tr");
    await expect.poll(() => rows.count()).toBeGreaterThan(3);
    // The best 200 come 25 a page, and at 1280 px every column shows, the links included: the
    // table's box does not scroll sideways and the last link ends inside the window.
    expect(await rows.count()).toBe(25);
    expect(await page.getByTestId("finder-page-rows").textContent()).toBe("Rows 1–25 of 200");
    const box = page.getByTestId("finder-results").locator("xpath=..");
    expect(await box.evaluate((el) => el.scrollWidth - el.clientWidth)).toBeLessThanOrEqual(0);
    const lastLink = await rows.first().getByRole("link", { name: "Predict" }).boundingBox();
    expect(lastLink!.x + lastLink!.width).toBeLessThanOrEqual(1280);
    const pages = page.getByRole("navigation", { name: "Pages of fitments" });
    await pages.getByRole("button", { name: "Next" }).click();
    await expect.poll(() => page.getByTestId("finder-page-rows").textContent()).toBe("Rows 26–50 of 200");
    expect(await rows.first().locator("td").first().textContent()).toBe("26");
    // Any figure sorts: by offset, the page's offsets never go down, and sorting starts at page 1.
    await page.getByRole("button", { name: /^Offset/ }).click();
    await expect.poll(() => page.getByTestId("finder-page-rows").textContent()).toBe("Rows 1–25 of 200");
    const offsets = (await rows.locator("td:nth-child(5)").allTextContents()).map((t) =>
      Number(t.replace(/[^\d.−-]/g, "").replace("−", "-")),
    );
    expect(offsets).toEqual([...offsets].sort((a, b) => a - b));
    await page.getByRole("button", { name: /^Offset/ }).click();
    await page.getByRole("button", { name: /^Offset/ }).click();
    await expect.poll(() => page.getByTestId("finder-results").locator("th", { hasText: "Offset" }).getAttribute("aria-sort")).toBe(null);
    await page.getByRole("button", { name: /^Diameter/ }).click();
    await expect
      .poll(() => page.getByTestId("finder-results").locator("th", { hasText: "Diameter" }).getAttribute("aria-sort"))
      .toBe("ascending");
    await page.getByLabel("Filter by tire size or wheel").fill("17x9");
    await expect.poll(async () => (await rows.allTextContents()).every((t) => t.includes("17x9"))).toBe(true);
    await axeClean("garage-finder");
    const href = (await page.getByTestId("candidate-workspace").first().getAttribute("href")) ?? "";
    const q = new URL(href, "http://x").searchParams;
    expect(href.startsWith("/workspace?")).toBe(true);
    expect(q.get("ct")).toBe("265/70R17");
    expect(q.get("pd")).toBe("17");
    expect(q.get("pw")).toBe("9");
    expect(q.get("po")).toMatch(/^-?\d+$/);
    expect(q.get("v")).toBe(vehicleUrl.split("/").pop());
  });

  it("opens the tallest candidate in the workspace with the vehicle picked, and sees it keep the margin at both points", async () => {
    // The finder now keeps only what the predictions keep at the margin. Tallest of the 17x9 rows:
    // 265/70R17 (802.8 mm) on 17x9 +25: section 265 + 0.4 × 25.4 = 275.16 mm, both corners 137.58 mm
    // from the axis: √(401.4² + 137.58²) = 424.323 vs 422.703 → bumper corner 19.05 − 1.62 = 17.43 mm,
    // frame rail 31.75 − 1.62 = 30.13 mm: both clear of the 12.7 mm margin.
    await page.getByRole("button", { name: /^Diameter/ }).click();
    await expect
      .poll(() => page.getByTestId("finder-results").locator("th", { hasText: "Diameter" }).getAttribute("aria-sort"))
      .toBe("descending");
    const top = page.getByTestId("finder-results").locator("tbody tr").first();
    await top.getByTestId("candidate-workspace").click();
    await page.waitForURL(/\/workspace\?.*v=/);
    const panel = page.getByTestId("garage-panel");
    await expect.poll(() => panel.isVisible(), { timeout: 15000 }).toBe(true);
    expect(await page.locator("#ws-vehicle option:checked").textContent()).toBe(`Dune Skiff ${stamp}`);
    await expect.poll(() => page.getByTestId("garage-summary").textContent()).toMatch(/^All 2 points keep the margin\. Margin/);
    const predictions = page.getByTestId("workspace-predictions");
    await expect.poll(() => predictions.locator("tr", { hasText: "Bumper corner" }).textContent()).toMatch(/Clear/);
    // The frame rail is the nearest inboard part: its line is drawn on the cross-section.
    expect(await page.getByTestId("inner-limit").count()).toBe(1);
    await axeClean("garage-workspace-candidate");
  });

  it("saves the comparison for the vehicle and opens its install checklist from the workspace and from the list", async () => {
    const name = `Skiff plan ${stamp}`;
    await page.getByRole("button", { name: "Save comparison…" }).click();
    await page.getByLabel("Name of the comparison").fill(name);
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await expect.poll(() => page.getByTestId("save-status").innerText()).toContain(`Saved as “${name}”`);
    await expect.poll(() => page.url()).toMatch(/saved=[0-9a-f-]{36}/);
    await page.getByTestId("saved-checklist").click();
    await page.waitForURL(/\/checklist\?comparison=/);
    await expect.poll(() => page.getByText(/From the saved comparison/).isVisible()).toBe(true);
    // The saved plan is the finder's candidate that keeps the margin (17.43 and 30.13 mm above):
    // nothing to trim, the cycle-the-suspension check remains.
    await expect.poll(() => page.locator('input[data-item="cycle"]').count()).toBe(1);
    expect(await page.locator('input[data-item^="trim:"]').count()).toBe(0);
    await page.locator('input[data-item="spare"]').check();
    await expect.poll(() => page.getByTestId("checklist-status").textContent()).toMatch(/^1 of \d+ done/);
    await axeClean("garage-checklist-from-comparison");

    await page.goto("/comparisons");
    await page.getByLabel("Search by name or tire size").fill(stamp);
    const card = page.getByTestId("saved-comparison").filter({ has: page.getByRole("heading", { name }) });
    await expect.poll(() => card.count()).toBe(1);
    await card.getByTestId("comparison-checklist").click();
    await page.waitForURL(/\/checklist\?comparison=/);
    await expect.poll(() => page.locator('input[data-item="spare"]').isChecked()).toBe(true);
  });

  it("fits a 375 px phone screen: the vehicle page with a plan, and the finder, scroll only vertically", async () => {
    await withBrowserPage({ width: 375, height: 800 }, async (p) => {
      await signInAs(p, DEMO.member, DEMO_PASSWORD);
      await p.goto("/garage/d4000000-0000-4000-8000-000000000002?pt=33x12.50R15LT&pd=15&pw=8&pb=3.75&pr=flange");
      await panelsShown(p, "Loading plan a setup");
      await expect.poll(() => p.getByTestId("predictions").isVisible(), { timeout: 15000 }).toBe(true);
      expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
      await shot(p, "garage-375-vehicle");
      expect(await seriousViolations(p)).toEqual([]);
      await p.goto("/garage/d4000000-0000-4000-8000-000000000002/finder");
      await expect.poll(() => p.getByTestId("finder-summary").isVisible(), { timeout: 20000 }).toBe(true);
      expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    });
  });

  it("keeps another member's vehicle out of reach (404 for the admin)", async () => {
    const other = await launch();
    try {
      const p = await other.context.newPage();
      await signInAs(p, DEMO.admin, DEMO_PASSWORD);
      // The page streams behind its loading state, so the not-found page arrives with the shell's
      // status; the API answers a real 404.
      await p.goto(vehicleUrl);
      await expect.poll(() => p.getByRole("heading", { name: "Nothing here" }).isVisible()).toBe(true);
      expect(await p.getByText("Dune Skiff").count()).toBe(0);
      const api = await p.goto(`/api${vehicleUrl.replace("/garage", "/vehicles")}`);
      expect(api?.status()).toBe(404);
      const photo = await p.goto("/api/photos/d4000000-0000-4000-8000-000000000201?variant=thumb");
      expect(photo?.status()).toBe(200);
    } finally {
      await other.close();
    }
  });
});
