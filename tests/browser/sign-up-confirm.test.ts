import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";
import { BASE, launch, seriousViolations, shot } from "./support/browser";
import { DEMO } from "./support/http";
import { waitForMail } from "./support/outbox";
import { confirmLink } from "./support/signUp";

/**
 * Sign-up by e-mail confirmation (security review, issue 12 item 9): the form answers the same
 * screen for a new address and one that has an account; the account is made from the mailed
 * link, by a button, never by opening the link.
 */
const stamp = Date.now().toString(36);
const PASSWORD = "a long enough password";
const session = await launch();
const page: Page = await session.context.newPage();
afterAll(() => session.close());

/** A screenshot for the record, then axe: no serious or critical violations on the screen as it is. */
async function axeClean(name: string) {
  await shot(page, name);
  const violations = await seriousViolations(page);
  expect(violations, `axe on ${page.url()}`).toEqual([]);
}

/** Fills and sends the sign-up form; answers the screen's "check your e-mail" text. */
async function signUp(name: string, email: string): Promise<string> {
  await page.goto("/sign-up");
  await page.getByLabel("Name").fill(name);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Create account" }).click();
  const status = page.getByRole("status").filter({ hasText: "Check your e-mail to finish signing up" });
  await status.waitFor();
  return (await status.textContent()) ?? "";
}

describe("sign-up by e-mail confirmation in Chromium", () => {
  it("shows the same screen for a new address and one with an account, naming the address typed", async () => {
    const fresh = `nia.${stamp}@example.test`;
    const newScreen = await signUp("Nia Brooke", fresh);
    expect(newScreen).toContain(fresh);
    await axeClean("sign-up-check-your-email");
    const takenScreen = await signUp("Not Teo", DEMO.shop_staff);
    expect(takenScreen).toContain(DEMO.shop_staff);
    expect(takenScreen.replace(DEMO.shop_staff, "@")).toBe(newScreen.replace(fresh, "@"));

    // The owner of the existing account is told, with a way to sign in and to reset the password.
    const notice = await waitForMail(DEMO.shop_staff, /Someone tried to sign up with your address/);
    expect(notice.text).toMatch(/\/sign-in\b/);
    expect(notice.text).toMatch(/\/forgot-password\b/);
  });

  it("creates the account from the mailed link only when the button is pressed, then signs in", async () => {
    const email = `nia.${stamp}@example.test`; // signed up in the test above
    const link = await confirmLink(email);
    // A mail scanner's prefetch (a GET) does not use the link up.
    expect((await fetch(link)).status).toBe(200);
    await page.goto(link);
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Confirm your account");
    expect(await page.locator("main").textContent()).toContain(email);
    await axeClean("sign-up-confirm");

    await page.getByLabel("Password").fill("not the chosen one");
    await page.getByRole("button", { name: "Confirm and sign in" }).click();
    await expect.poll(() => page.locator("#f-password-error").textContent()).toMatch(/not the password you chose/);

    await page.getByLabel("Password").fill(PASSWORD);
    await page.getByRole("button", { name: "Confirm and sign in" }).click();
    await page.waitForURL(/\/account/);
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Hello, Nia Brooke");
    await page.getByRole("button", { name: "Sign out", exact: true }).click();
    await page.waitForURL((u) => u.pathname === "/");

    // Used once: the link now says so and offers a new sign-up.
    await page.goto(link);
    await expect.poll(() => page.locator("main [role=alert]").first().textContent()).toMatch(/expired, was already used/);
    expect(await page.getByRole("link", { name: "Sign up again" }).getAttribute("href")).toBe("/sign-up");
    await axeClean("sign-up-confirm-used");
  });

  it("says a link without a token or with an unknown one cannot be used", async () => {
    for (const path of ["/sign-up/confirm", `/sign-up/confirm?token=${"A".repeat(43)}`]) {
      const res = await fetch(`${BASE}${path}`);
      expect(res.status, path).toBe(200);
      await page.goto(path);
      await expect.poll(() => page.locator("main [role=alert]").first().textContent()).toMatch(/link/);
      expect(await page.getByRole("link", { name: "Sign up again" }).count()).toBe(1);
    }
  });
});
