import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type WorkOrder, unsignedSteps } from "@/lib/shop/workOrders/api";
import { bodyFor } from "../integration/support/workOrderSteps";
import { launch, seriousViolations, shot } from "./support/browser";
import { call } from "./support/http";
import { waitForMail } from "./support/outbox";

/*
 * The end of the job for the customer: the demo shop's booked quote (db/seeds/05_demo_shop.ts
 * Q-1003, Ilse Varga-Pond) is marked done (signed here through the API where
 * shop-work-order.test.ts has not done it already), the completion e-mail with the invoice
 * arrives, and the customer pays the balance on the provider's page from the link in it.
 */
const PAID_QUOTE = "d0000000-0000-4000-8000-000000000003";
const CUSTOMER = "ilse@example.test";

let browser: Awaited<ReturnType<typeof launch>>;
beforeAll(async () => {
  browser = await launch({ width: 390, height: 844 });
});
afterAll(async () => {
  await browser?.close();
});

async function workOrderDone(): Promise<void> {
  const opened = await call("shop_staff", "POST", "/api/shop/work-orders", { quoteId: PAID_QUOTE });
  const { id } = (await opened.json()) as { id: string };
  const read = async () =>
    ((await (await call("shop_staff", "GET", `/api/shop/work-orders/${id}`)).json()) as { workOrder: WorkOrder }).workOrder;
  let w = await read();
  if (w.status === "done") return;
  if (w.status === "booked")
    expect((await call("shop_staff", "POST", `/api/shop/work-orders/${id}/status`, { to: "in_bay" })).status).toBe(200);
  w = await read();
  for (const s of unsignedSteps(w)) {
    expect((await call("shop_staff", "PUT", `/api/shop/work-orders/${id}/steps`, bodyFor(s.position, s.step))).status).toBe(200);
  }
  expect((await call("shop_staff", "POST", `/api/shop/work-orders/${id}/status`, { to: "done" })).status).toBe(200);
}

describe("completion and the balance", () => {
  it("the customer receives the completion e-mail with the invoice and pays the balance on the provider's page", async () => {
    await workOrderDone();
    const mail = await waitForMail(CUSTOMER, /^Done: your wheels and tires at .+ \(quote Q-1003\)$/);
    expect(mail.text).toMatch(/Quote total: \$[\d,]+\.\d\d\nDeposit paid: −\$[\d,]+\.\d\d\nBalance due: \$[\d,]+\.\d\d/);
    expect(mail.text).toContain("re-checked after the first 50–100 miles");
    const [, owed, link] = /Pay the balance of (\$[\d,]+\.\d\d) here: (\S+)/.exec(mail.text)!;

    const page = await browser.context.newPage();
    await page.goto(link!);
    const panel = page.getByRole("region", { name: "Invoice and payments" });
    expect(await panel.getByTestId("invoice-status").textContent()).toBe(`${owed} to pay`);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    expect(await seriousViolations(page), "invoice on the customer's page").toEqual([]);
    await shot(page, "balance-due-phone");

    await panel.getByRole("button", { name: `Pay the ${owed} balance` }).click();
    await page.getByLabel("Card number").waitFor();
    expect(await page.getByTestId("pay-amount").textContent()).toBe(owed);
    await page.getByLabel("Card number").fill("4242 4242 4242 4242");
    await page.getByLabel("Expiry (MM/YY)").fill("12/30");
    await page.getByLabel("CVC").fill("123");
    await page.getByRole("button", { name: `Pay ${owed}` }).click();
    await page.waitForURL(/\/q\/[A-Za-z0-9_-]{43}\?paid=balance$/);
    await page.getByTestId("invoice-status").filter({ hasText: "Paid" }).waitFor();
    expect(await page.getByRole("button", { name: /balance$/ }).count()).toBe(0);
    await shot(page, "balance-paid-phone");

    const receipt = await waitForMail(CUSTOMER, new RegExp(`^Receipt: \\${owed} balance for quote Q-1003 at `));
    expect(receipt.text).toContain("Your invoice is paid in full.");
  });
});
