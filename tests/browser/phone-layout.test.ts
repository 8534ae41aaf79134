import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { launch, pageWidth, seriousViolations, shot, signInAs } from "./support/browser";
import { DEMO, DEMO_PASSWORD, call } from "./support/http";
import { createAccount } from "./support/signUp";

/**
 * Phone width (390 px): the admin users table and the saved-comparisons list stay inside the
 * screen, also with a name that is one long word (nothing to break it at but anywhere).
 */
const WIDTH = 390;
let phone: Awaited<ReturnType<typeof launch>>;
let page: Page;
const stamp = Date.now().toString(36);
const LONG = `Quarryroadbuildwithbeadlocksandthirtysevens${stamp}`.padEnd(100, "x");

beforeAll(async () => {
  phone = await launch({ width: WIDTH, height: 844 });
  page = await phone.context.newPage();
});
afterAll(() => phone.close());

/** How wide the page really is: wider than the screen means sideways scrolling or clipped controls. */

async function allInside(p: Page, selector: string): Promise<string[]> {
  return p.locator(selector).evaluateAll(
    (els, width) =>
      els.flatMap((el) => {
        const r = el.getBoundingClientRect();
        return r.left < 0 || r.right > width
          ? [`${el.getAttribute("aria-label") ?? el.textContent}: ${Math.round(r.left)}–${Math.round(r.right)} px`]
          : [];
      }),
    WIDTH,
  );
}

describe("phone-width layouts in Chromium", () => {
  it("admin users: every row's role, shop and Save are on the screen, a one-word name included", async () => {
    const signup = await createAccount(LONG, `longname.${stamp}@example.test`, "a long enough password");
    expect(signup.status).toBe(201);
    await signInAs(page, DEMO.admin, DEMO_PASSWORD);
    await page.goto("/admin/users");
    await page.getByRole("heading", { level: 1, name: "Users and roles" }).waitFor();
    expect(await pageWidth(page)).toBeLessThanOrEqual(WIDTH);
    expect(await allInside(page, "main select, main button")).toEqual([]);
    await page.getByLabel("Search by name or e-mail").fill(stamp);
    await expect.poll(() => page.getByText(LONG).count()).toBe(1);
    expect(await pageWidth(page)).toBeLessThanOrEqual(WIDTH);
    expect(await allInside(page, "main select, main button")).toEqual([]);
    await shot(page, "phone-admin-users");
    expect(await seriousViolations(page)).toEqual([]);
    await phone.context.clearCookies(); // the next test signs in as the member
  });

  it("saved comparisons: a one-word name wraps instead of widening the page", async () => {
    const made = await call("member", "POST", "/api/comparisons", { name: LONG, input: DEFAULT_INPUT });
    expect(made.status).toBe(201);
    const { comparison } = (await made.json()) as { comparison: { id: string } };
    try {
      await signInAs(page, DEMO.member, DEMO_PASSWORD);
      await page.goto("/comparisons");
      await page.getByRole("heading", { name: LONG }).waitFor();
      expect(await pageWidth(page)).toBeLessThanOrEqual(WIDTH);
      expect(await allInside(page, "main a, main button")).toEqual([]);
      // The rename form and the status line repeat the name.
      await page.getByRole("button", { name: `Duplicate ${LONG}` }).click();
      await page.getByText(`Copied as “${LONG} (copy)”.`).waitFor();
      expect(await pageWidth(page)).toBeLessThanOrEqual(WIDTH);
      await shot(page, "phone-comparisons-long-name");
    } finally {
      const list = (await (await call("member", "GET", `/api/comparisons?q=${encodeURIComponent(stamp)}`)).json()) as {
        comparisons: { id: string }[];
      };
      for (const c of [comparison, ...list.comparisons]) await call("member", "DELETE", `/api/comparisons/${c.id}`);
    }
  });
});
