import { describe, expect, it } from "vitest";
import { expectAxeClean, filePage, pageWidth } from "./support/browser";
import { signedInDemo } from "./support/http";

/*
 * The owner's overview of the demo shop (db/seeds/05_demo_shop.ts): reached from the shop's tabs,
 * at phone width (390 px) and on a desk (1280 px), inside the screen and with no serious axe
 * finding; the takings chart arrives when scrolled to and its figures are in the table beside it.
 * Staff are not shown the tab and cannot open the page.
 */
const session = filePage();

describe("the owner's overview", () => {
  it("the owner opens it from the shop's tabs and reads the week, the deposits and the takings at 1280 and 390 px", async () => {
    const page = await signedInDemo(session.page(), "shop_owner");
    await page.goto("/shop");
    await page.getByRole("navigation", { name: "Shop" }).getByRole("link", { name: "Overview" }).click();
    await page.waitForURL(/\/shop\/overview$/);
    await page.getByRole("heading", { level: 1, name: "Overview" }).waitFor();
    for (const region of ["This week in the bays", "Deposits held", "Takings, last 14 days"]) {
      await page.getByRole("region", { name: region, exact: true }).waitFor();
    }
    expect(await page.getByTestId("deposits-total").textContent()).toMatch(/^\$[\d,]+\.\d\d$/);
    const placeholder = page.getByRole("status", { name: "Loading chart" });
    // The chart may mount between the count and the scroll (it was near already): nothing left to scroll to then.
    if (await placeholder.count()) await placeholder.scrollIntoViewIfNeeded({ timeout: 5000 }).catch(() => undefined);
    await page.getByTestId("takings-chart").waitFor({ state: "attached", timeout: 20000 });
    await page.getByText("Takings as a table").click();
    expect(await page.getByRole("table", { name: "Takings by day" }).getByRole("row").count()).toBe(15);
    await expectAxeClean(page, "shop-overview-1280");

    await page.setViewportSize({ width: 390, height: 844 });
    await page.reload();
    await page.getByRole("heading", { level: 1, name: "Overview" }).waitFor();
    expect(await pageWidth(page)).toBeLessThanOrEqual(390);
    await expectAxeClean(page, "shop-overview-390");
    await session.context().clearCookies();
  });

  it("staff see no Overview tab and cannot open the page", async () => {
    const page = session.page();
    await page.setViewportSize({ width: 1280, height: 900 });
    await signedInDemo(page, "shop_staff");
    await page.goto("/shop");
    expect(await page.getByRole("navigation", { name: "Shop" }).getByRole("link", { name: "Overview" }).count()).toBe(0);
    await page.goto("/shop/overview");
    // requirePageCaller sends a signed-in caller without the role to the forbidden page (in the browser once the shell streamed).
    await page.waitForURL(/\/forbidden/);
    await session.context().clearCookies();
  });
});
