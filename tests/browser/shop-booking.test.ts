import ical from "node-ical";
import type { Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, payWithTestCard, seriousViolations, shot, signInAs } from "./support/browser";
import { DEMO, DEMO_PASSWORD, call } from "./support/http";
import { attachment, waitForMail } from "./support/outbox";
import { VEHICLE } from "../integration/support/shopFixture";

/*
 * The install booking, end to end against the seeded demo shop (db/seeds/06_demo_bookings.ts:
 * America/Denver, weekdays 7:30–17:30, two lifts and an alignment rack). The calendar file is
 * read back with node-ical (RFC 5545): start, end, place, UID and SEQUENCE.
 */
async function checkA11y(page: Page, what: string) {
  expect(await seriousViolations(page), what).toEqual([]);
}

/** The calendar file of the newest mail to `to` whose subject matches. */
async function calendarOf(to: string, subject: RegExp) {
  const mail = await waitForMail(to, subject);
  const i = mail.attachments.findIndex((a) => a.filename.endsWith(".ics"));
  expect(i, "an .ics attachment").toBeGreaterThanOrEqual(0);
  expect(mail.attachments[i]!.contentType).toMatch(/^text\/calendar/);
  const parsed = ical.sync.parseICS((await attachment(mail.id, mail.attachments[i]!.index)).toString("utf8"));
  const event = Object.values(parsed).find((c) => c?.type === "VEVENT") as ical.VEvent;
  return { mail, event, method: (parsed.vcalendar as unknown as { method?: string }).method };
}

/** In a booking panel's free-time list (a week later first, if asked): picks the first free start and moves there. */
async function moveToFirstFree(panel: Locator, { laterDays }: { laterDays: boolean }) {
  if (laterDays) {
    // The list keeps the shown week until the next one arrives: wait for its first day to change.
    const firstDay = panel.getByTestId("slot-day").first();
    await firstDay.waitFor();
    const shown = await firstDay.textContent();
    await panel.getByRole("button", { name: "Later days" }).click();
    await expect.poll(() => firstDay.textContent(), { timeout: 15000 }).not.toBe(shown);
  }
  const slot = panel.locator("label:has(input[type=radio])").first();
  await slot.waitFor();
  await slot.click();
  await panel.getByRole("button", { name: /^Move to / }).click();
}

let staff: Awaited<ReturnType<typeof launch>>;
let customer: Awaited<ReturnType<typeof launch>>;
beforeAll(async () => {
  [staff, customer] = await Promise.all([launch(), launch({ width: 390, height: 844 })]);
});
afterAll(async () => {
  await Promise.all([staff?.close(), customer?.close()]);
});

describe("install booking", () => {
  it("the customer pays the deposit and books a slot; the mail's calendar file reads back; staff see it in the calendar and move it", async () => {
    const run = Date.now().toString(36);
    const email = `booker-${run}@example.test`;
    // A quote for a new customer, written over the API as the counter does, then sent.
    const c = await call("shop_staff", "POST", "/api/shop/customers", { name: `Wren Booker ${run}`, phone: "", email });
    expect(c.status).toBe(201);
    const customerId = ((await c.json()) as { customer: { id: string } }).customer.id;
    const find = async (sku: string) =>
      (
        (await (await call("shop_staff", "GET", `/api/shop/catalog?q=${sku}`)).json()) as { items: { id: string; sku: string }[] }
      ).items.find((i) => i.sku === sku)!.id;
    // The integration tests' counter vehicle (6x5.5, 265/70R17 on 17x8 +25), under its own name.
    const vehicle = { ...VEHICLE, description: "Half-ton pickup" };
    const q = await call("shop_staff", "POST", "/api/shop/quotes", {
      customerId,
      vehicle,
      tireItemId: await find("SC-MT-35125017"),
      wheelItemId: await find("TB-1790-6550"),
      quantity: 4,
    });
    expect(q.status).toBe(201);
    const quoteId = ((await q.json()) as { id: string }).id;
    expect((await call("shop_staff", "POST", `/api/shop/quotes/${quoteId}/send`, {})).status).toBe(200);
    const link = /(http:\/\/\S+\/q\/[A-Za-z0-9_-]{43})/.exec((await waitForMail(email, /^Your quote Q-/)).text)![1]!;

    // The customer, on a phone: accept, pay the deposit on the provider's page, come back.
    const page = await customer.context.newPage();
    await page.goto(link);
    await page.getByRole("button", { name: "Accept the quote" }).click();
    await page.getByRole("button", { name: /Pay the .* deposit/ }).click();
    await page.waitForURL(/\/pay\/cs_test_/);
    await payWithTestCard(page, "Wren Booker");
    expect(await page.getByTestId("public-status").textContent()).toBe("Deposit paid");

    // The free starts of the week, on the shop's clock; pick the first and book it.
    const region = page.getByRole("region", { name: "Install time" });
    await region.getByRole("radio").first().waitFor({ state: "attached" });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await checkA11y(page, "public quote page, install times");
    await shot(page, "booking-public-slots");
    const firstSlot = region.locator("label:has(input[type=radio])").first();
    const picked = (await firstSlot.textContent())!.trim(); // e.g. "7:30 AM, Monday, December 7, 2026"
    await firstSlot.click();
    await region.getByRole("button", { name: /^Book / }).click();
    await region.getByText("Booked. A confirmation with a calendar file is on its way to your e-mail.").waitFor();
    const when = (await region.getByTestId("booking-when").textContent())!;
    expect(when).toContain(picked.split(",")[0]!); // the time picked
    await checkA11y(page, "public quote page, booked");
    await shot(page, "booking-public-booked");

    // The confirmation's calendar file, read by a real parser.
    const booked = await calendarOf(email, /^Booked: your install at Quarry Flats Tire & Fab/);
    expect(booked.method).toBe("REQUEST");
    expect(booked.event.location).toBe("Quarry Flats Tire & Fab, 1180 Slate Wash Road, Quarry Flats");
    expect(booked.event.uid).toMatch(/^booking-[0-9a-f-]{36}@/);
    expect(Number(booked.event.sequence)).toBe(0);
    const start = booked.event.start;
    const end = booked.event.end!;
    expect(start.toLocaleTimeString("en-US", { timeZone: "America/Denver", hour: "numeric", minute: "2-digit" })).toBe(
      picked.split(",")[0],
    );
    expect(end.getTime()).toBeGreaterThan(start.getTime());

    // Staff see it on the calendar's day (react-big-calendar), in a bay's column, named with the quote, customer and vehicle.
    const s = await staff.context.newPage();
    await signInAs(s, DEMO.shop_staff, DEMO_PASSWORD);
    const day = start.toLocaleDateString("en-CA", { timeZone: "America/Denver" });
    await s.goto(`/shop/calendar?from=${day}&days=1`);
    const block = s.getByRole("button", { name: new RegExp(`Wren Booker ${run}`) });
    await block.first().waitFor();
    expect(await block.first().textContent()).toContain("Half-ton pickup");
    expect(await block.first().textContent()).toContain(picked.split(",")[0]!); // its start on the shop's clock
    await checkA11y(s, "/shop/calendar (day)");
    await shot(s, "booking-calendar-day");

    // The week: a column per bay and day, Sunday first. (Dragging a booking is covered by BayCalendar.test.tsx:
    // the drop handler, the server's refusal and the snap back. A mouse drag driven from here did not reach the
    // calendar's drag-and-drop layer, so it is not checked in Chromium.)
    await s.goto(`/shop/calendar?from=${day}&days=7`);
    await block.first().waitFor();
    await checkA11y(s, "/shop/calendar (week)");
    await shot(s, "booking-calendar-week");

    // From the keyboard: the booking is picked with Enter; the panel links to its quote and offers Move… with the free starts.
    await block.first().focus();
    await s.keyboard.press("Enter");
    const picked2 = s.getByRole("region", { name: "Selected booking" });
    expect(await picked2.getByRole("link", { name: /^Open quote Q-/ }).getAttribute("href")).toBe(`/shop/quotes/${quoteId}`);
    await picked2.getByRole("button", { name: "Move…" }).click();
    await moveToFirstFree(picked2, { laterDays: true });
    await s.getByText("Moved; the customer is e-mailed the updated calendar entry.").waitFor();
    await checkA11y(s, "/shop/calendar, booking moved");
    await shot(s, "booking-calendar-moved");
    // The customer gets the same calendar entry, SEQUENCE 1.
    const moved = await calendarOf(email, /^Moved: your install/);
    expect(moved.event.uid).toBe(booked.event.uid);
    expect(Number(moved.event.sequence)).toBe(1);
    expect(moved.event.start.getTime()).toBeGreaterThan(start.getTime());

    // On a phone the calendar opens on one day, its bays scrolling sideways inside their own region, not the page.
    const phone = await launch({ width: 390, height: 844 });
    try {
      const p = await phone.context.newPage();
      await signInAs(p, DEMO.shop_staff, DEMO_PASSWORD);
      await p.goto("/shop/calendar");
      await p.getByRole("button", { name: "Show the week" }).waitFor();
      expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
      expect(await p.getByRole("region", { name: "Bookings by bay" }).getAttribute("tabindex")).toBe("0");
      await checkA11y(p, "/shop/calendar at 390 px");
      await shot(p, "booking-calendar-phone");
    } finally {
      await phone.close();
    }

    // The quote page's own move form still works: SEQUENCE 2.
    await s.goto(`/shop/quotes/${quoteId}`);
    const panel = s.getByRole("region", { name: "Install booking" });
    await panel.getByRole("button", { name: "Move to another time" }).click();
    await moveToFirstFree(panel, { laterDays: false });
    await panel.getByText("Moved; the customer is e-mailed the updated calendar entry.").waitFor();
    await checkA11y(s, "quote page, booking moved");
    await shot(s, "booking-counter-moved");
    // The newest "Moved" mail is read until the second one has been sent by the job queue.
    await expect.poll(async () => Number((await calendarOf(email, /^Moved: your install/)).event.sequence), { timeout: 20000 }).toBe(2);
  }, 180_000); // the whole journey, customer and counter: longer than one step's 90 s

  it("the owner's Bays and hours page passes the accessibility check; staff are sent away from it", async () => {
    const page = await staff.context.newPage();
    await page.goto("/shop/bays");
    await page.waitForURL(/\/forbidden/);
    const owner = await launch();
    try {
      const o = await owner.context.newPage();
      await signInAs(o, DEMO.shop_owner, DEMO_PASSWORD);
      await o.goto("/shop/bays");
      await o.getByRole("heading", { name: "Bays and hours" }).waitFor();
      // The form fills its fields when it hydrates (react-hook-form sets them on mount).
      await expect.poll(() => o.getByLabel("Bay 1 name").inputValue(), { timeout: 20000 }).toBe("Lift 1");
      await checkA11y(o, "/shop/bays");
      await shot(o, "booking-bays-and-hours");
      // A closing time before the opening time is refused beside the field, before anything is sent.
      await o.getByLabel("Monday closes").fill("07:00");
      await o.getByRole("button", { name: "Save bays and hours" }).click();
      await o.getByText("Monday closes before it opens: enter a closing time after 07:30.").waitFor();
    } finally {
      await owner.close();
    }
  });
});
