import PgBoss from "pg-boss";
import pg from "pg";
import type { Locator } from "playwright-core";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type WorkOrder, unsignedSteps } from "@/lib/shop/workOrders/api";
import { bodyFor } from "../integration/support/workOrderSteps";
import { launch, seriousViolations, shot, signInAs } from "./support/browser";
import { DEMO, DEMO_PASSWORD, call } from "./support/http";
import { waitForMail } from "./support/outbox";

/*
 * The technician in the bay, on a phone (390 px): opens the work order of the demo shop's booked
 * quote (db/seeds/05_demo_shop.ts Q-1003, booked by db/seeds/06_demo_bookings.ts), starts it,
 * signs every step with figures typed as a technician would, and marks it done. On the way a photo
 * of the left front's lug nuts goes on that step, is opened full size, and stays once signed.
 *
 * Then the end of the job for the customer, Ilse Varga-Pond: the completion e-mail with the
 * invoice arrives and she pays the balance on the provider's page from the link in it; the clock
 * is moved on to the re-check's due time, the reminder arrives, and she books a re-check from its
 * link. One file, in this order: every step works on the demo shop's one booked quote.
 */
const PAID_QUOTE = "d0000000-0000-4000-8000-000000000003";

let phone: Awaited<ReturnType<typeof launch>>;
beforeAll(async () => {
  phone = await launch({ width: 390, height: 844 });
});
afterAll(async () => {
  await phone?.close();
});

/**
 * The torque part the beadlock and lug steps share (TorqueFields and the passes box): the maker's
 * figure typed in ft·lb, `check` of what the form makes of it, then all passes ticked done.
 */
async function fillTorque(form: Locator, ftLb: string, check: () => Promise<void>) {
  await form.getByLabel("Maker's torque (ft·lb)").fill(ftLb);
  await check();
  await form.getByLabel("All passes done in the order shown").check();
}

/** Fills one step's form the way a technician would; the form's label says which step. */
async function fill(form: Locator, step: string) {
  switch (step) {
    case "fitted":
      await form.getByLabel("DOT date code").fill("2325");
      return;
    case "match_mount":
      await form.getByLabel("Marks lined up").selectOption("uniformity_to_low_point");
      return;
    case "beadlock":
      await form.getByLabel("Bolts on the ring").fill("24");
      await fillTorque(form, "17", async () => {
        expect(await form.getByTestId("torque-plan").textContent()).toContain("17 ft·lb (23 N·m)");
      });
      return;
    case "bead_seat":
      await form.getByLabel("Beads seated following the cautions above").check();
      return;
    case "pressure":
      // The quote carries the demo pickup's door placard (db/seeds/05_demo_shop.ts): P265/70R17 113S at 35 psi, axle
      // ratings 3,700 / 3,900 lb. For 37x12.50R17LT 124Q load range D the equivalent pressure is 50 · (1045.5/1600)^(1/0.585)
      // = 24.2 psi (TRA load formula; 1150 kg ÷ 1.10, FMVSS 120), below the road minimum 0.5833 × 50 = 29.2 psi, which is set.
      expect(await form.getByText(/Cold pressure to set \(from the door placard on the quote\)/).textContent()).toContain(
        "front 29.2 psi (201 kPa), rear 29.2 psi (201 kPa)",
      );
      await form.getByLabel("Cold pressure set (psi)").fill("29.2");
      return;
    case "balance":
      await form.getByLabel("Inner plane weight (g)").fill("42.5");
      await form.getByLabel("Outer plane weight (g)").fill("0");
      return;
    case "lug_torque":
      await fillTorque(form, "140", async () => {
        // Typed in ft·lb, switched to N·m: the figure is converted, not relabelled (NIST SP 811 B.9: 140 ft·lbf = 189.8 N·m).
        await form.getByLabel("Torque unit").selectOption("nm");
        expect(await form.getByLabel("Maker's torque (N·m)").inputValue()).toBe("189.8");
      });
      return;
    case "alignment":
      for (const when of ["Before", "After"]) {
        const set = form.getByRole("group", { name: when });
        await set.getByLabel("Camber left (°)").fill("-0.25");
        await set.getByLabel("Camber right (°)").fill("-0.5");
        await set.getByLabel("Caster left (°)").fill("3.5");
        await set.getByLabel("Caster right (°)").fill("3.75");
        await set.getByLabel("Total toe (°)").fill("0.1");
      }
      return;
    case "trimming":
      await form.getByLabel("Trimming done").check();
      return;
  }
}

describe("work order in the bay", () => {
  it("the technician opens the work order at 390 px, signs each step and marks it done", async () => {
    const opened = await call("shop_staff", "POST", "/api/shop/work-orders", { quoteId: PAID_QUOTE });
    expect(opened.status).toBe(201);
    const { id } = (await opened.json()) as { id: string };

    const page = await phone.context.newPage();
    await signInAs(page, DEMO.shop_staff, DEMO_PASSWORD);
    await page.goto(`/shop/work-orders/${id}`);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toContain("Work order · Q-1003");
    // Nothing scrolls sideways on the phone.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    // The counter measured the demo pickup's body points (db/seeds/05_demo_shop.ts): the sheet shows the quote's angle
    // changes with the 37 in tires, each larger (a taller tire raises every body point; SAE J1100 geometry).
    const angles = page.getByRole("region", { name: "Trail angles" });
    for (const kind of ["Approach", "Departure", "Ramp breakover"]) {
      const change = (await angles.getByTestId(`trail-${kind} angle`).textContent()) ?? "";
      const m = /(\d+\.\d)° → (\d+\.\d)°/.exec(change);
      expect(m, kind).not.toBeNull();
      expect(Number(m![2])).toBeGreaterThan(Number(m![1]));
    }
    expect(await angles.getByText(/no lift or load change is counted/).isVisible()).toBe(true);
    await page.getByRole("button", { name: "Start: the truck is in the bay" }).click();
    await page.getByText("In the bay", { exact: true }).waitFor();
    expect(await seriousViolations(page), "work order in the bay").toEqual([]);
    await shot(page, "work-order-phone");

    // A photo of the left front's lug nuts, picked as from the phone's pictures, before the step is signed.
    const torque = page
      .getByRole("listitem")
      .filter({ has: page.getByRole("heading", { name: "Lug nuts torqued" }) })
      .first();
    const jpeg = await sharp({ create: { width: 640, height: 480, channels: 3, background: "#5a4632" } })
      .jpeg()
      .toBuffer();
    await torque.getByLabel("Add photos").setInputFiles({ name: "lf-lugs.jpg", mimeType: "image/jpeg", buffer: jpeg });
    await torque.getByText("lf-lugs.jpg added.").waitFor();
    const thumbs = page.getByRole("list", { name: "Photos of LF lug nuts torqued" });
    await thumbs.getByRole("img", { name: "Thumbnail: lf-lugs.jpg" }).waitFor();
    expect(await thumbs.getByRole("button", { name: "Remove photo lf-lugs.jpg" }).count()).toBe(1);
    await thumbs.getByRole("button", { name: "Open photo lf-lugs.jpg full size" }).click();
    const viewer = page.getByRole("dialog", { name: "Photo of LF lug nuts torqued: lf-lugs.jpg" });
    await viewer.getByTestId("photo-full").waitFor();
    expect(await viewer.getByTestId("photo-full").evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBe(640);
    await shot(page, "work-order-photo-phone");
    await page.keyboard.press("Escape");
    await viewer.waitFor({ state: "detached" });

    // Each signed step replaces its form with the signature, so the first form left is always the next one.
    for (let guard = 0; guard < 40; guard++) {
      const form = page.locator('form[aria-label^="Sign off"]').first();
      if ((await form.count()) === 0) break;
      const [, position, step] = /^Sign off (\S+) (\S+)$/.exec((await form.getAttribute("aria-label"))!)!;
      await fill(form, step!);
      await form.getByRole("button", { name: "Sign off" }).click();
      await page.getByTestId(`${position}-${step}-signed`).waitFor();
      expect(await page.getByTestId(`${position}-${step}-signed`).textContent()).toContain("Signed by Teo Marrow");
    }
    expect(await page.locator('form[aria-label^="Sign off"]').count()).toBe(0);
    // Signed off, the photo stays with the step; staff can no longer remove it (only the owner can).
    await thumbs.getByRole("img", { name: "Thumbnail: lf-lugs.jpg" }).waitFor();
    expect(await thumbs.getByRole("button", { name: "Remove photo lf-lugs.jpg" }).count()).toBe(0);
    await page.getByRole("button", { name: "Mark the work order done" }).click();
    await page.getByText("Done", { exact: true }).waitFor();
    await shot(page, "work-order-done-phone");
    const w = (await (await call("shop_staff", "GET", `/api/shop/work-orders/${id}`)).json()) as { workOrder: { status: string } };
    expect(w.workOrder.status).toBe("done");
  });
});

const CUSTOMER = "ilse@example.test";

/** The work order done, through the API for any step the technician's test above left unsigned. */
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

    const page = await phone.context.newPage();
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

  it("after the clock is moved on, the re-check reminder is in the outbox and the customer books a re-check from its link", async () => {
    // "Days later": the work order's re-check falls due now (the server's database, DATABASE_URL
    // set by scripts/test.sh), and the hourly re-check job is sent at once rather than awaited.
    const db = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await db.connect();
    try {
      const moved = await db.query(
        "update work_orders set recheck_due_at = now() - interval '1 hour' where quote_id = $1 and status = 'done'",
        [PAID_QUOTE],
      );
      expect(moved.rowCount).toBe(1);
    } finally {
      await db.end();
    }
    const boss = new PgBoss({ connectionString: process.env.DATABASE_URL, supervise: false, schedule: false, migrate: false });
    await boss.start();
    try {
      await boss.send("workorders.recheck", {});
    } finally {
      await boss.stop({ graceful: false });
    }
    // The server's workers run it and queue the mail; the mail job sends it.
    const mail = await waitForMail(CUSTOMER, /^Time for your (lug and ring|lug) re-check at /, 60000);
    expect(mail.text).toMatch(/Book a \d+-minute slot in the next 14 days here/);
    const link = /(\S+\/recheck\/[A-Za-z0-9_-]{43})/.exec(mail.text)![1]!;

    const page = await phone.context.newPage();
    await page.goto(link);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Lug and ring re-check");
    const region = page.getByRole("region", { name: "Re-check time" });
    await region.getByRole("radio").first().waitFor({ state: "attached" });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    expect(await seriousViolations(page), "re-check booking page").toEqual([]);
    await shot(page, "recheck-slots-phone");
    const firstSlot = region.locator("label:has(input[type=radio])").first();
    const picked = (await firstSlot.textContent())!.trim();
    await firstSlot.click();
    await region.getByRole("button", { name: /^Book / }).click();
    await region.getByText("Booked. A confirmation with a calendar file is on its way to your e-mail.").waitFor();
    expect(await region.getByTestId("booking-when").textContent()).toContain(picked.split(",")[0]!);
    await shot(page, "recheck-booked-phone");
    const confirmation = await waitForMail(CUSTOMER, /^Booked: your (lug and ring |lug )?re-check at /);
    expect(confirmation.attachments.some((a) => a.filename.endsWith(".ics"))).toBe(true);
  }, 120_000);
});
