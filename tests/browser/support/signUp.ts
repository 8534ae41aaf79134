import type { Page } from "playwright-core";
import { call } from "./http";
import { waitForMail } from "./outbox";

/** The confirmation link in the newest sign-up mail to `email` (from the fake SMTP server's outbox). */
export async function confirmLink(email: string): Promise<string> {
  const mail = await waitForMail(email, /Confirm your Hubface account/);
  const link = /(http\S+\/sign-up\/confirm\?token=[A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
  if (!link) throw new Error(`no confirmation link in the mail to ${email}`);
  return link;
}

/** Makes an account over HTTP as the two forms do: sign-up, then the mailed link's confirmation. Answers the confirmation. */
export async function createAccount(name: string, email: string, password: string): Promise<Response> {
  const started = await call("anonymous", "POST", "/api/account/signup", { name, email, password });
  if (started.status !== 202) throw new Error(`sign-up of ${email} answered ${started.status}`);
  const token = new URL(await confirmLink(email)).searchParams.get("token");
  return call("anonymous", "POST", "/api/account/signup/confirm", { token, password });
}

/** After the sign-up form said "check your e-mail": opens the mailed link, confirms with the password, lands on the account page. */
export async function confirmFromMail(page: Page, email: string, password: string): Promise<void> {
  await page.goto(await confirmLink(email));
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Confirm and sign in" }).click();
  await page.waitForURL(/\/account/);
}

/** Creates a member account through the sign-up form and the mailed link, and waits for their account page. */
export async function signUpAs(page: Page, name: string, email: string, password: string): Promise<void> {
  await page.goto("/sign-up");
  await page.getByLabel("Name").fill(name);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Create account" }).click();
  await confirmFromMail(page, email, password);
}
