import { describe, expect, it } from "vitest";
import { expectAxeClean, filePage, pageWidth } from "./support/browser";
import { call, signedInDemo } from "./support/http";

/*
 * The shop's quotes list as counter staff use it (the demo shop's quotes, db/seeds/05_demo_shop.ts):
 * searched by a quote number typed as printed, filtered by status, the address keeps the search,
 * the export downloads the same search; at 1280 and 390 px, with no serious axe finding.
 */
const session = filePage();

describe("the quotes list", () => {
  it("finds a quote by its printed number and by status, keeps the search in the address, at 1280 and 390 px", async () => {
    const page = await signedInDemo(session.page(), "shop_owner");
    await page.goto("/shop/quotes");
    await page.getByRole("heading", { level: 1, name: "Quotes" }).waitFor();
    const rows = page.getByRole("region", { name: "Quotes" }).getByRole("row");
    const all = (await rows.count()) - 1;
    expect(all).toBeGreaterThan(1);

    const first = (await rows.nth(1).getByRole("link").textContent())!; // "Q-1006"
    await page.getByLabel("Search").fill(first.toLowerCase());
    await page.getByRole("button", { name: "Find" }).click();
    await page.waitForURL((u) => u.searchParams.get("q") === first.toLowerCase());
    await expect.poll(() => rows.count()).toBe(2);
    expect(await page.getByText("1 quote matches").isVisible()).toBe(true);
    await expectAxeClean(page, "quote-list-search-1280");

    // The export link carries the same search; the server answers a CSV of that one quote.
    const href = (await page.getByRole("link", { name: "Export CSV" }).getAttribute("href"))!;
    expect(href).toBe(`/api/shop/quotes/export?q=${encodeURIComponent(first.toLowerCase())}`);
    const csv = await (await call("shop_owner", "GET", href)).text();
    expect(csv.trim().split(/\r?\n/)).toHaveLength(2);
    expect(csv).toContain(first);

    await page.getByRole("link", { name: "Clear" }).click();
    await page.waitForURL((u) => u.pathname === "/shop/quotes" && !u.search);
    await page.getByLabel("Status").selectOption("draft");
    await page.getByRole("button", { name: "Find" }).click();
    await page.waitForURL((u) => u.searchParams.get("status") === "draft");
    await expect.poll(async () => (await rows.allTextContents()).slice(1).every((t) => t.includes("Draft"))).toBe(true);

    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto("/shop/quotes?status=draft");
    expect(await pageWidth(page)).toBeLessThanOrEqual(390);
    await expectAxeClean(page, "quote-list-390");
  });

  it("names the control when the address holds a value the form could not send", async () => {
    const page = session.page();
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.goto("/shop/quotes?status=paid");
    await page.getByText("Pick one of the statuses in the list.").waitFor();
    expect(await page.getByLabel("Status").getAttribute("aria-invalid")).toBe("true");
  });
});
