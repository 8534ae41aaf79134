import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { filePage, launch, seriousViolations, shot } from "./support/browser";
import { call, signedInDemo } from "./support/http";
import { waitForMail } from "./support/outbox";
import { VEHICLE } from "../integration/support/shopFixture";

/*
 * Stock at the counter, against the seeded demo shop: the owner adds a tire with the single-item
 * editor, corrects it, a customer accepts a quote for four of them, and the owner sees four held,
 * two left and the low-stock mark (4 by default) in the item's page, the catalog table and the
 * shop's dashboard. The wheel is one no other browser test holds (Basin Steel 17x9, 24 on hand).
 */
async function checkA11y(page: Page, what: string) {
  expect(await seriousViolations(page), what).toEqual([]);
}

const owner = filePage();

describe("stock", () => {
  it("the owner adds and edits an item, and sees what an accepted quote holds and what is left", async () => {
    const run = Date.now().toString(36).toUpperCase();
    const sku = `TR-STK-${run}`;
    const page = await signedInDemo(owner.page(), "shop_owner");

    // Add one tire without a file.
    await page.goto("/shop/catalog");
    await page.getByRole("link", { name: "Add an item" }).click();
    await page.waitForURL(/\/shop\/catalog\/new$/);
    await page.getByLabel("SKU").fill(sku);
    await page.getByLabel("Description").fill(`Invented trail tire 35x12.50R17LT ${run}`);
    await page.getByLabel("Price ($)").fill("399");
    await page.getByLabel("On hand").fill("6");
    await page.getByLabel("Tire size").fill("35x12.50R17LT");
    await checkA11y(page, "new catalog item");
    await page.getByRole("button", { name: "Add item" }).click();
    await page.waitForURL(/\/shop\/catalog\/[0-9a-f-]{36}$/);
    const itemUrl = page.url();
    const figures = page.getByTestId("stock-figures");
    await expect.poll(() => figures.textContent()).toBe("On hand6Held by accepted quotes0Available6 available");

    // A price typed with a decimal comma is refused on its field, in the CSV's words; a correct one saves.
    await page.getByLabel("Price ($)").fill("389,00");
    await page.getByRole("button", { name: "Save item" }).click();
    await page.getByText("Price must be dollars like 249.99 (0 to 1,000,000), got “389,00”.").waitFor();
    expect(await page.getByLabel("Price ($)").getAttribute("aria-invalid")).toBe("true");
    await checkA11y(page, "catalog item with a refused price");
    await page.getByLabel("Price ($)").fill("389.00");
    await page.getByRole("button", { name: "Save item" }).click();
    await page.getByText(`${sku} saved.`).waitFor();

    // A quote for four of them, sent and accepted by the customer on their link.
    const email = `stock-${run.toLowerCase()}@example.test`;
    const c = await call("shop_staff", "POST", "/api/shop/customers", { name: `Stock Customer ${run}`, phone: "", email });
    expect(c.status).toBe(201);
    const customerId = ((await c.json()) as { customer: { id: string } }).customer.id;
    const find = async (q: string) =>
      ((await (await call("shop_staff", "GET", `/api/shop/catalog?q=${q}`)).json()) as { items: { id: string; sku: string }[] }).items.find(
        (i) => i.sku === q,
      )!.id;
    const q = await call("shop_staff", "POST", "/api/shop/quotes", {
      customerId,
      vehicle: { ...VEHICLE, description: "Stock test pickup" },
      tireItemId: await find(sku),
      wheelItemId: await find("BS-1790-6550"),
      quantity: 4,
    });
    expect(q.status).toBe(201);
    const quoteId = ((await q.json()) as { id: string }).id;
    expect((await call("shop_staff", "POST", `/api/shop/quotes/${quoteId}/send`, {})).status).toBe(200);
    const token = /\/q\/([A-Za-z0-9_-]{43})/.exec((await waitForMail(email, /^Your quote Q-/)).text)![1]!;
    expect((await call("anonymous", "POST", `/api/q/${token}`, { action: "accept" })).status).toBe(200);

    // The item's page: four held, two left, at the low-stock mark.
    await page.goto(itemUrl);
    await expect.poll(() => figures.textContent()).toBe("On hand6Held by accepted quotes4Available2 availableLow stock");
    await shot(page, "stock-item-held");

    // The catalog table says the same, and the dashboard counts it.
    await page.goto("/shop/catalog");
    await page.getByLabel("Search SKU, description, size or bolt pattern").fill(sku);
    const row = page.getByTestId("catalog-row").filter({ hasText: sku });
    await expect.poll(() => row.textContent(), { timeout: 15000 }).toContain("2 availableLow stock");
    await checkA11y(page, "catalog with stock columns");
    await shot(page, "stock-catalog-table");
    await page.goto("/shop");
    expect(await page.getByTestId("low-stock-count").textContent()).toMatch(/^Low stock\d+ items? (is|are) at or under/);
  });
  it("the owner archives an item, finds it among the archived items on a 390 px phone, and brings it back", async () => {
    const run = Date.now().toString(36).toUpperCase();
    const sku = `WH-ARC-${run}`;
    const made = await call("shop_owner", "POST", "/api/shop/catalog", {
      kind: "wheel",
      sku,
      description: `Invented steel wheel 17x8 ${run}`,
      price: "149",
      qtyOnHand: "4",
      wheelDiameterIn: "17",
      wheelWidthIn: "8",
      wheelOffsetMm: "0",
      boltPattern: "6x5.5",
      centerBoreMm: "108",
    });
    expect(made.status, await made.clone().text()).toBe(201);
    const { item } = (await made.json()) as { item: { id: string } };
    const phone = await launch({ width: 390, height: 844 });
    try {
      const page = await signedInDemo(await phone.context.newPage(), "shop_owner");
      await page.goto(`/shop/catalog/${item.id}`);
      await page.getByRole("button", { name: "Archive item" }).click();
      await page.getByRole("button", { name: "Bring back into the catalog" }).waitFor();

      // Gone from the catalog's list; there under "Archived items only".
      await page.goto("/shop/catalog");
      await page.getByLabel("Search SKU, description, size or bolt pattern").fill(sku);
      await expect.poll(() => page.getByText("0 items", { exact: true }).isVisible()).toBe(true);
      await page.getByRole("checkbox", { name: "Archived items only" }).check();
      const row = page.getByTestId("catalog-row").filter({ hasText: sku });
      await expect.poll(() => row.count()).toBe(1);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
      await checkA11y(page, "archived catalog items at 390 px");
      await shot(page, "catalog-archived-390");
      await row.getByRole("link", { name: `Edit ${sku}` }).click();
      await page.waitForURL(new RegExp(`/shop/catalog/${item.id}$`));
      await page.getByRole("button", { name: "Bring back into the catalog" }).click();
      await page.getByRole("button", { name: "Archive item" }).waitFor();
      const listed = (await (await call("shop_owner", "GET", `/api/shop/catalog?q=${sku}`)).json()) as { total: number };
      expect(listed.total).toBe(1);
    } finally {
      await phone.close();
    }
  });
});
