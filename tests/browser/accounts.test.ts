import type { Page } from "playwright-core";
import { beforeAll, describe, expect, it } from "vitest";
import { BASE, expectAxeClean, filePage, signInAs } from "./support/browser";
import { DEMO, DEMO_PASSWORD, sessionCookie } from "./support/http";
import { waitForMail } from "./support/outbox";
import { confirmFromMail, createAccount, signUpAs } from "./support/signUp";

// The file's one page: filePage opens it before the tests and closes it after them.
const browser = filePage();
let page: Page;
beforeAll(() => {
  page = browser.page();
});
const stamp = Date.now().toString(36);

const axeClean = (name: string) => expectAxeClean(page, name);

async function signOut() {
  await page.getByRole("button", { name: "Sign out", exact: true }).click();
  await page.waitForURL((u) => u.pathname === "/");
  await expect.poll(() => page.getByRole("link", { name: "Sign in" }).first().isVisible()).toBe(true);
}

describe("accounts in Chromium", () => {
  it("shows the start page to a visitor", async () => {
    await page.goto("/");
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toMatch(/bigger tires/);
    await axeClean("start-page");
  });

  it("refuses a malformed sign-up with field messages, then creates the account", async () => {
    await page.goto("/sign-up");
    await page.getByLabel("Name").fill("Pell Ravensworth");
    await page.getByLabel("E-mail").fill("not-an-address");
    await page.getByLabel("Password").fill("short");
    await page.getByRole("button", { name: "Create account" }).click();
    await expect.poll(() => page.locator("#f-email-error").textContent()).toMatch(/e-mail address like/);
    await expect.poll(() => page.locator("#f-password-error").textContent()).toMatch(/10 characters/);
    await axeClean("sign-up-errors");

    await page.getByLabel("E-mail").fill(DEMO.member);
    await page.getByLabel("Password").fill("a long enough password");
    await page.getByRole("button", { name: "Create account" }).click();
    // An address with an account is answered as any other (its owner gets a mail instead).
    await page.getByText("Check your e-mail to finish signing up").waitFor();
    await page.getByRole("button", { name: "Sign up with another address" }).click();

    await page.getByLabel("E-mail").fill(`pell.${stamp}@example.test`);
    await page.getByRole("button", { name: "Create account" }).click();
    await confirmFromMail(page, `pell.${stamp}@example.test`, "a long enough password");
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Hello, Pell Ravensworth");
    await axeClean("account-new-member");
    await signOut();
  });

  const roles = [
    // Everyone signed in keeps a garage of their own, shop staff and owners too (lib/garage/access.ts).
    { role: "member", email: DEMO.member, sees: ["Garage"], not: ["Users", "Shop"] },
    { role: "shop_staff", email: DEMO.shop_staff, sees: ["Shop", "Garage"], not: ["Users"] },
    { role: "shop_owner", email: DEMO.shop_owner, sees: ["Shop", "Garage"], not: ["Users"] },
    { role: "admin", email: DEMO.admin, sees: ["Users", "Outbox", "Garage"], not: ["Shop"] },
  ] as const;

  for (const r of roles) {
    it(`signs in as the demo ${r.role} and sees what the role allows`, async () => {
      await signInAs(page, r.email, DEMO_PASSWORD);
      const nav = page.getByRole("navigation", { name: "Main" });
      for (const link of r.sees) expect(await nav.getByRole("link", { name: link }).count(), link).toBe(1);
      for (const link of r.not) expect(await nav.getByRole("link", { name: link }).count(), link).toBe(0);
      await axeClean(`account-${r.role}`);
      await page.goto("/admin/users");
      if (r.role === "admin") {
        await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Users and roles");
      } else {
        await page.waitForURL(/\/forbidden/);
      }
      await axeClean(`admin-users-as-${r.role}`);
      await signOut();
    });
  }

  it("resets a password through the link in the e-mail the fake SMTP server received", async () => {
    const email = `reset.${stamp}@example.test`;
    await signUpAs(page, "Ilse Carrow", email, "the first password");
    await signOut();

    await page.goto("/forgot-password");
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("button", { name: "Send the reset link" }).click();
    await expect.poll(() => page.getByRole("status").first().textContent()).toMatch(/on its way/);
    await axeClean("forgot-password-sent");

    const mail = await waitForMail(email, /Reset your Hubface password/);
    const link = /(http\S+reset-password\?token=[A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
    expect(link).toBeDefined();
    await page.goto(link!);
    await page.getByLabel("New password", { exact: true }).fill("the second password");
    await page.getByLabel("Repeat the new password").fill("the second password");
    await axeClean("reset-password");
    await page.getByRole("button", { name: "Change password" }).click();
    await page.waitForURL(/\/sign-in\?reset=1/);

    await signInAs(page, email, "the second password");
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Hello, Ilse Carrow");
    await signOut();

    // The link is single-use.
    await page.goto(link!);
    await page.getByLabel("New password", { exact: true }).fill("the third password");
    await page.getByLabel("Repeat the new password").fill("the third password");
    await page.getByRole("button", { name: "Change password" }).click();
    await expect.poll(() => page.locator("main [role=alert]").first().textContent()).toMatch(/expired or was already used/);
  });

  it("makes this address wait after repeated wrong passwords, with a clear message", async () => {
    const email = `lock.${stamp}@example.test`;
    await signUpAs(page, "Odo Fenwick", email, "the right password");
    await signOut();

    await page.goto("/sign-in");
    for (let i = 0; i < 5; i++) {
      await page.getByLabel("E-mail").fill(email);
      await page.getByLabel("Password").fill(`wrong password ${i}`);
      await page.getByRole("button", { name: "Sign in" }).click();
      await expect
        .poll(() => page.locator("main [role=alert]").first().textContent())
        .toMatch(i < 4 ? /do not match/ : /Wait 1 minute before trying again/);
    }
    // Even the right password is refused from this address while it waits (other addresses are not held up).
    await page.getByLabel("Password").fill("the right password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect
      .poll(() => page.locator("main [role=alert]").first().textContent())
      .toMatch(/Wait \d+ (second|minute)s? before trying again, or reset your password/);
    await axeClean("sign-in-locked");
  });

  it("ends a copied session cookie at sign-out and everywhere at once from the account page", async () => {
    const email = `sessions.${stamp}@example.test`;
    const password = "sessions password one";
    const created = await createAccount("Wren Aldous", email, password);
    expect(created.status).toBe(201);
    const me = (cookie: string) => fetch(`${BASE}/api/me`, { headers: { Cookie: cookie } }).then((r) => r.status);

    // Two sessions (a laptop and a phone); the laptop signs out the way the header's button does.
    const laptop = await sessionCookie(email, password);
    const phone = await sessionCookie(email, password);
    const { csrfToken } = (await (await fetch(`${BASE}/api/auth/csrf`, { headers: { Cookie: laptop } })).json()) as { csrfToken: string };
    const out = await fetch(`${BASE}/api/auth/signout`, {
      method: "POST",
      redirect: "manual",
      headers: { "Content-Type": "application/x-www-form-urlencoded", Cookie: laptop },
      body: new URLSearchParams({ csrfToken, json: "true" }),
    });
    expect(out.status).toBeLessThan(400);
    expect(await me(laptop)).toBe(401); // a copy of the signed-out cookie no longer works
    expect(await me(phone)).toBe(200);

    // In Chromium: the account page's "Sign out everywhere" ends the phone's session too.
    await signInAs(page, email, password);
    await page.goto("/account");
    await expect.poll(() => page.getByRole("heading", { name: "Sessions" }).isVisible()).toBe(true);
    await page.setViewportSize({ width: 390, height: 844 });
    await axeClean("account-sessions-390");
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.setViewportSize({ width: 1280, height: 900 });
    page.once("dialog", (d) => void d.accept());
    await page.getByRole("button", { name: "Sign out everywhere" }).click();
    await page.waitForURL(/\/sign-in\?ended=1/);
    await expect.poll(() => page.getByText("You were signed out on every device.").isVisible()).toBe(true);
    await axeClean("signed-out-everywhere");
    expect(await me(phone)).toBe(401);
    // Signing in again works as before.
    expect(await me(await sessionCookie(email, password))).toBe(200);
  });
});
