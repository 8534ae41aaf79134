import { writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, payWithTestCard, seriousViolations, shot, signInAs, withBrowserPage } from "./support/browser";
import { DEMO, DEMO_PASSWORD } from "./support/http";
import { PLACARD_TYPED_IN_INCHES } from "./support/placard";

const OUTBOX = process.env.OUTBOX_URL ?? "http://127.0.0.1:2526";

async function checkA11y(page: Page, what: string) {
  expect(await seriousViolations(page), what).toEqual([]);
}

interface Message {
  id: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string }[];
}
async function latestMailTo(address: string, since: number): Promise<Message> {
  for (let i = 0; i < 40; i++) {
    const list = (await (await fetch(`${OUTBOX}/messages?to=${encodeURIComponent(address)}`)).json()) as (Message & {
      receivedAt: string;
    })[];
    const fresh = list.find((m) => new Date(m.receivedAt).getTime() >= since);
    if (fresh) return fresh;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no mail to ${address}`);
}

let staff: Awaited<ReturnType<typeof launch>>;
let customer: Awaited<ReturnType<typeof launch>>;
let owner: Awaited<ReturnType<typeof launch>>;
beforeAll(async () => {
  [staff, customer, owner] = await Promise.all([launch(), launch({ width: 390, height: 844 }), launch()]);
});
afterAll(async () => {
  await Promise.all([staff?.close(), customer?.close(), owner?.close()]);
});

describe("the shop counter, end to end", () => {
  it("staff quote a fitment and send it; the customer accepts and pays the deposit on the provider's page", async () => {
    const page = await staff.context.newPage();
    await signInAs(page, DEMO.shop_staff, DEMO_PASSWORD);
    await page.goto("/shop");
    await checkA11y(page, "/shop");
    await shot(page, "shop-counter-home");

    // Staff never see the owner's pages.
    await page.goto("/shop/settings");
    await page.waitForURL(/\/forbidden/);

    await page.goto("/shop/quotes/new");
    await page.getByLabel("Phone, e-mail or name").fill("(555) 0160");
    await page.getByRole("button", { name: "Find", exact: true }).click();
    await page.getByRole("button", { name: "Use Ilse Varga-Pond" }).click();
    await expect.poll(() => page.getByTestId("chosen-customer").textContent(), { timeout: 15000 }).toContain("Ilse Varga-Pond");
    await page.getByRole("button", { name: /Half-ton pickup/ }).click();
    await expect.poll(() => page.getByLabel("Bolt pattern").inputValue(), { timeout: 15000 }).toBe("6x5.5");
    await page.getByRole("button", { name: "Find fitments" }).click();
    await page.getByRole("heading", { name: "3. Pick a tire and wheel" }).waitFor();
    await checkA11y(page, "/shop/quotes/new with picks");
    await shot(page, "shop-counter-picks");
    // Only 6-lug wheels are offered: the 8-lug and 5-lug demo wheels never appear.
    const picks = page.locator('input[name="pick"]');
    expect(await picks.count()).toBeGreaterThan(0);
    expect(await page.getByText("for 8-lug").count()).toBe(0);
    expect(await page.getByText("for 5-lug").count()).toBe(0);
    // Pick the beadlock wheel with the 35 in mud-terrain.
    const row = page.locator("li", { hasText: "Scree Claw MT mud-terrain 35x12.50R17LT" }).filter({ hasText: "Talus Beadlock" }).first();
    await row.locator('input[name="pick"]').check();
    await page.getByRole("button", { name: "Create draft quote" }).click();
    await page.waitForURL(/\/shop\/quotes\/[0-9a-f-]{36}$/);
    const quoteUrl = page.url();
    await page.getByRole("heading", { name: /Quote Q-\d+/ }).waitFor();
    const lines = await page
      .locator('input[aria-label^="Description of line"]')
      .evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));
    expect(lines.some((l) => /Beadlock ring assembly/.test(l))).toBe(true); // suggested for a beadlock wheel
    expect(lines.some((l) => /Mount and balance/.test(l))).toBe(true);
    await checkA11y(page, "quote editor");
    await shot(page, "shop-counter-draft");

    // Edit: a quote discount of 40.00; the server recomputes the totals.
    const before = await page.getByTestId("quote-totals").textContent();
    await page.getByLabel("Quote discount ($)").fill("40");
    await page.getByRole("button", { name: "Save lines" }).click();
    await page.getByText("Saved. Totals were computed by the server.").waitFor();
    expect(await page.getByTestId("quote-totals").textContent()).not.toBe(before);
    expect(await page.getByTestId("quote-totals").textContent()).toContain("−$40.00");
    const deposit = /Deposit \(25 %\)(\$[\d,]+\.\d\d)/.exec((await page.getByTestId("quote-totals").textContent()) ?? "")?.[1];
    expect(deposit).toBeDefined();

    const since = Date.now() - 1000;
    await page.getByRole("button", { name: "Send to customer" }).click();
    await page.getByText("Sent to ilse@example.test").waitFor();

    // The customer opens the message in the fake outbox and follows the link.
    const mail = await latestMailTo("ilse@example.test", since);
    expect(mail.attachments.map((a) => a.contentType)).toEqual(["application/pdf"]);
    const link = /(http:\/\/\S+\/q\/[A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
    expect(link).toBeDefined();
    const c = await customer.context.newPage();
    await c.goto(link!);
    await c.getByRole("heading", { name: /Quote Q-\d+ for Ilse Varga-Pond/ }).waitFor();
    expect(await c.getByTestId("public-deposit").textContent()).toBe(deposit);
    // On a 390 px phone the customer's page never scrolls sideways (its lines become cards).
    expect(await c.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await checkA11y(c, "public quote page");
    await shot(c, "shop-counter-public-quote");
    await c.getByRole("button", { name: "Accept the quote" }).click();
    await c.getByRole("button", { name: /Pay the .* deposit/ }).click();
    await c.waitForURL(/\/pay\/cs_test_/);
    expect(await c.getByTestId("pay-amount").textContent()).toBe(deposit);
    await checkA11y(c, "fake pay page");
    await shot(c, "shop-counter-pay-page");
    await payWithTestCard(c, "Ilse Varga-Pond");
    expect(await c.getByTestId("public-status").textContent()).toBe("Deposit paid");
    await checkA11y(c, "public quote page, paid");
    await shot(c, "shop-counter-public-paid");

    // Back at the counter the quote shows the deposit paid, with who did what.
    await page.goto(quoteUrl);
    expect(await page.getByTestId("quote-status").textContent()).toBe("Deposit paid");
    const history = (await page.getByTestId("quote-history").textContent()) ?? "";
    expect(history).toMatch(/Draft — Teo Marrow.*Sent — Teo Marrow.*Accepted — customer.*Deposit paid — payment provider/s);
    await shot(page, "shop-counter-paid");
  });

  it("the owner imports a CSV with a row report and a progress bar, and browses the catalog", async () => {
    const page = await owner.context.newPage();
    await signInAs(page, DEMO.shop_owner, DEMO_PASSWORD);
    await page.goto("/shop/catalog/import");
    await checkA11y(page, "/shop/catalog/import");
    const file = join(tmpdir(), `hubface-import-${process.pid}.csv`);
    const run = Date.now().toString(36).toUpperCase();
    writeFileSync(
      file,
      [
        "kind,sku,description,price,qty_on_hand,tire_size",
        `tire,BT${run}-1,Browser test tire one,199.00,4,LT285/75R16`,
        `tire,BT${run}-2,Browser test tire two,209.00,4,two-eighty-five`,
        `tire,BT${run}-3,Browser test tire three,219.00,4,33x12.50R15LT`,
      ].join("\n"),
    );
    await page.setInputFiles("#catalog-file", file);
    await page.getByTestId("import-summary").waitFor();
    expect(await page.getByTestId("import-summary").textContent()).toBe(
      "3 rows read · 2 ready (2 new, 0 updated) · 1 row skipped, 1 problem",
    );
    expect(await page.getByTestId("import-error").allTextContents()).toEqual([expect.stringMatching(/^3tire_size.*two-eighty-five/)]);
    await checkA11y(page, "import preview");
    await shot(page, "shop-catalog-import-preview");
    await page.getByRole("button", { name: "Import 2 rows (skip 1 with problems)" }).click();
    await page.getByText("2 items imported.").waitFor();
    await shot(page, "shop-catalog-import-done");

    await page.goto("/shop/catalog");
    await page.getByLabel("Search SKU, description, size or bolt pattern").fill(`BT${run}`);
    await expect.poll(() => page.getByTestId("catalog-row").count(), { timeout: 15000 }).toBe(2);
    await page.getByLabel("Kind").selectOption("wheel");
    await expect.poll(() => page.getByTestId("catalog-row").count(), { timeout: 15000 }).toBe(0);
    await page.getByLabel("Kind").selectOption("");
    await page.getByLabel("Search SKU, description, size or bolt pattern").fill("");
    await page.getByRole("button", { name: /^Price/ }).click();
    await checkA11y(page, "/shop/catalog");
    await shot(page, "shop-catalog");

    for (const path of ["/shop/settings", "/shop/staff", "/shop/quotes"]) {
      await page.goto(path);
      await page.locator("h1").first().waitFor();
      await checkA11y(page, path);
      await shot(page, `shop${path.replaceAll("/", "-")}`);
    }
  });

  it("the staff quote page fits a 390 px phone: the lines scroll inside their own focusable region", async () => {
    await withBrowserPage({ width: 390, height: 844 }, async (page) => {
      await signInAs(page, DEMO.shop_staff, DEMO_PASSWORD);
      // The demo draft quote (db/seeds/05_demo_shop.ts, DEMO_QUOTES.draft).
      await page.goto("/shop/quotes/d0000000-0000-4000-8000-000000000001");
      await page.getByRole("heading", { name: /Quote Q-\d+/ }).waitFor();
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
      const region = page.getByRole("region", { name: /Quote lines/ });
      expect(await region.evaluate((el) => el.scrollWidth > el.clientWidth && el.tabIndex === 0)).toBe(true);
      await checkA11y(page, "quote editor at 390 px");
      await shot(page, "shop-quote-phone");
      // An edit shows the unsaved state; the demo vehicle's 106.1 mm hub asks for rings under the 108 mm Basin Steel wheel.
      await page.getByLabel("Notes for the customer").fill("Phone check");
      await page.getByTestId("unsaved").waitFor();
      expect(await page.getByTestId("hub-checks").textContent()).toMatch(/hub-centric rings/);
    });
  });
  it("the counter takes a placard, axle weights and body points typed in inches, converts them to metric, quotes the pressure and angles, and fills them again from the saved vehicle", async () => {
    const page = await staff.context.newPage();
    await signInAs(page, DEMO.shop_staff, DEMO_PASSWORD);
    const vehicle = `Flatbed hauler ${Date.now().toString(36)}`;
    await page.goto("/shop/quotes/new");
    await page.getByLabel("Phone, e-mail or name").fill("Rook");
    await page.getByRole("button", { name: "Find", exact: true }).click();
    await page.getByRole("button", { name: "Use Rook Tamsin" }).click();
    await expect.poll(() => page.getByTestId("chosen-customer").textContent(), { timeout: 15000 }).toContain("Rook Tamsin");
    await page.getByLabel("Vehicle", { exact: true }).fill(vehicle);
    await page.getByLabel("Bolt pattern").fill("6x5.5");
    await page.getByLabel("Tire size", { exact: true }).fill("265/70R17 113T");
    await page.getByLabel("Wheel diameter (in)").fill("17");
    await page.getByLabel("Wheel width (in)").fill("8");
    await page.getByRole("textbox", { name: "Offset (mm)" }).fill("25");
    await page.getByRole("radio", { name: "Inch", exact: true }).check({ force: true });
    await page.getByRole("radio", { name: "Truck, SUV, van" }).check({ force: true });
    for (const [label, text] of Object.entries(PLACARD_TYPED_IN_INCHES))
      await page.getByLabel(label, { exact: true }).pressSequentially(text);
    // The unit switch converts what was typed (NIST SP 811: 1 psi = 6.894757 kPa, 1 lb = 0.45359237 kg, 1 in = 25.4 mm).
    await page.getByRole("radio", { name: "Metric", exact: true }).check({ force: true });
    await expect.poll(() => page.getByLabel("Placard cold pressure, front (kPa)").inputValue()).toBe("241");
    expect(await page.getByLabel("Front axle weight, scale ticket (kg)").inputValue()).toBe("1399.8");
    expect(await page.getByLabel("Front corner height (mm)").inputValue()).toBe("609.6");
    expect(await page.getByLabel("Wheelbase (mm)").inputValue()).toBe("2997.2");
    await checkA11y(page, "counter placard in metric");
    await shot(page, "shop-counter-placard-metric");
    await page.getByRole("checkbox", { name: "Save this vehicle to the customer" }).check();
    await page.getByRole("button", { name: "Find fitments" }).click();
    await page.getByRole("heading", { name: "3. Pick a tire and wheel" }).waitFor();
    await page.locator("li", { hasText: "Scree Claw MT mud-terrain 35x12.50R17LT" }).first().locator('input[name="pick"]').check();
    await page.getByRole("button", { name: "Create draft quote" }).click();
    await page.waitForURL(/\/shop\/quotes\/[0-9a-f-]{36}$/);
    await page.getByRole("heading", { name: /Quote Q-\d+/ }).waitFor();
    // 35x12.50R17LT 121Q load range E (65 psi, from memory): what the P265/70R17 113S carries at 35 psi on a light truck
    // (1150 kg ÷ 1.10, FMVSS 120) it carries at 65 × (1045.5/1450)^(1/0.585) = 37.2 psi (TRA load formula); the road
    // minimum 0.5833 × 65 = 37.9 psi (261 kPa) is higher and is set.
    const summary = page.getByRole("heading", { name: "Fitment summary" }).locator("..");
    await expect.poll(() => summary.textContent()).toContain("Cold pressure to setfront 37.9 psi (261 kPa), rear 37.9 psi (261 kPa)");
    const text = (await summary.textContent()) ?? "";
    for (const kind of ["Approach", "Departure", "Ramp breakover"]) {
      const m = new RegExp(`${kind} angle(\\d+\\.\\d)° → (\\d+\\.\\d)°`).exec(text);
      expect(m, kind).not.toBeNull();
      // A taller tire raises every body point (SAE J1100 geometry): each angle grows.
      expect(Number(m![2])).toBeGreaterThan(Number(m![1]));
    }
    expect(text).toMatch(/Trail angles: from the body points the shop measured/);
    await shot(page, "shop-counter-quote-pressure-angles");

    // A new quote for the same customer: the saved vehicle fills the placard and body points again.
    await page.goto("/shop/quotes/new");
    await page.getByLabel("Phone, e-mail or name").fill("Rook");
    await page.getByRole("button", { name: "Find", exact: true }).click();
    await page.getByRole("button", { name: "Use Rook Tamsin" }).click();
    await page.getByRole("button", { name: new RegExp(`^${vehicle}`) }).click();
    await expect.poll(() => page.getByLabel("Tire size on the placard").inputValue()).toBe("P265/70R17 113S");
    await page.getByRole("radio", { name: "Inch", exact: true }).check({ force: true });
    await expect.poll(() => page.getByLabel("Placard cold pressure, front (psi)").inputValue()).toBe("35");
    expect(await page.getByLabel("Rear axle weight, scale ticket (lb)").inputValue()).toBe("2646");
    expect(await page.getByLabel("Lowest point midway, height (in)").inputValue()).toBe("11");
    expect(await page.getByRole("radio", { name: "Truck, SUV, van" }).isChecked()).toBe(true);
    await page.close();
  });
});
