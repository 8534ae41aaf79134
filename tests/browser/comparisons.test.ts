import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE, chartsShown, launch, seriousViolations, shot } from "./support/browser";
import { DEMO, DEMO_PASSWORD } from "./support/http";

/**
 * Saved comparisons and share links as people use them: the demo member builds a comparison,
 * saves it, finds it, reopens and renames it, shares it; a forum reader opens the link in a
 * fresh browser without an account (phone-sized) and sees the same numbers; the owner revokes
 * it and the link is gone.
 */
let owner: Awaited<ReturnType<typeof launch>>;
let page: Page;
const stamp = Date.now().toString(36);
const NAME = `Desert wagon ${stamp}`;
const RENAMED = `Desert wagon, 33s ${stamp}`;
let headline = "";
let shareUrl = "";

beforeAll(async () => {
  owner = await launch();
  page = await owner.context.newPage();
});
afterAll(() => owner.close());

async function axeClean(p: Page, name: string) {
  await shot(p, name);
  expect(await seriousViolations(p), `axe on ${p.url()}`).toEqual([]);
}
const setup = (p: Page, side: "Current setup" | "Planned setup") => p.getByRole("region", { name: side });
const headlineText = (p: Page) => p.locator('section[aria-labelledby="headline-title"]').innerText();
const item = (name: string) => page.getByTestId("saved-comparison").filter({ has: page.getByRole("heading", { name }) });

describe("saved comparisons and share links in Chromium", () => {
  it("keeps an anonymous visitor's comparison in the URL through sign-in", async () => {
    await page.goto("/workspace");
    const current = setup(page, "Current setup");
    await current.getByRole("textbox", { name: "Tire size" }).fill("245/75R16 111S");
    await current.getByRole("textbox", { name: "Wheel width (in)" }).fill("7");
    await current.getByRole("textbox", { name: "Offset (mm)" }).fill("31");
    const planned = setup(page, "Planned setup");
    await planned.getByRole("textbox", { name: "Tire size" }).fill("285/75R16LT 126/123Q LRE");
    await planned.getByRole("textbox", { name: "Wheel width (in)" }).fill("8");
    await planned.getByRole("textbox", { name: "Offset (mm)" }).fill("0");
    await planned.getByRole("textbox", { name: "Offset (mm)" }).blur();
    await expect.poll(() => page.url()).toContain("pt=285/75R16LT");
    // 245/75R16 = 406.4 + 2 × 245 × 0.75 = 773.9 mm; LT285/75R16 = 406.4 + 2 × 285 × 0.75 = 833.9 mm:
    // +60 mm = +2.36 in (ISO 4000-1 / P-metric and LT-metric designations).
    await expect.poll(() => page.getByTestId("change-diameter").innerText()).toMatch(/\+2\.36 in/);
    await expect.poll(() => page.getByTestId("cross-section").isVisible()).toBe(true);
    const prompt = page.getByRole("link", { name: "Sign in to save" });
    await expect.poll(async () => decodeURIComponent((await prompt.getAttribute("href")) ?? "")).toContain("pt=285/75R16LT");
    await axeClean(page, "comparisons-workspace-anonymous");

    await prompt.click();
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel("E-mail").fill(DEMO.member);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => u.pathname === "/workspace", { timeout: 20000 });
    await expect
      .poll(() => setup(page, "Planned setup").getByRole("textbox", { name: "Tire size" }).inputValue())
      .toBe("285/75R16LT 126/123Q LRE");
    await expect.poll(() => page.getByTestId("change-diameter").innerText()).toMatch(/\+2\.36 in/);
  });

  it("saves the comparison from the workspace, with field errors for a bad name", async () => {
    headline = await headlineText(page);
    await page.getByRole("button", { name: "Save comparison…" }).click();
    const name = page.getByLabel("Name of the comparison");
    await expect.poll(() => name.inputValue()).toBe("245/75R16 → 285/75R16LT");
    await name.fill("   ");
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await expect.poll(() => page.locator('[id$="-error"]').filter({ hasText: "Give the comparison a name" }).count()).toBe(1);
    await name.fill(NAME);
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await expect.poll(() => page.getByTestId("save-status").innerText()).toContain(`Saved as “${NAME}”`);
    await expect.poll(() => page.getByRole("button", { name: "Save changes" }).isVisible()).toBe(true);
    await axeClean(page, "comparisons-workspace-saved");
  });

  it("finds it in the list by search, reopens it with the same numbers, and renames it", async () => {
    await page.goto("/comparisons");
    await page.getByLabel("Search by name or tire size").fill(stamp);
    await expect.poll(() => page.getByTestId("list-status").innerText()).toBe(`1 saved comparison matching “${stamp}”.`);
    await expect.poll(() => page.getByTestId("comparison-name").allInnerTexts()).toEqual([NAME]);
    // Figures stored with it were computed on the server: +60 mm = +2.36 in, as the workspace showed.
    await expect.poll(() => item(NAME).innerText()).toContain("+2.36 in");
    await axeClean(page, "comparisons-list-search");

    await item(NAME)
      .getByRole("link", { name: `Open ${NAME} in the workspace` })
      .click();
    await page.waitForURL(/\/workspace\?.*saved=/);
    await expect.poll(() => headlineText(page)).toBe(headline);
    await expect.poll(() => page.getByTestId("save-control").innerText()).toContain(NAME);
    await axeClean(page, "comparisons-reopened");

    await page.goto("/comparisons");
    await page.getByLabel("Search by name or tire size").fill(stamp);
    await item(NAME)
      .getByRole("button", { name: `Rename ${NAME}` })
      .click();
    await page.getByLabel("New name").fill(RENAMED);
    await page.getByRole("button", { name: "Save name" }).click();
    await expect.poll(() => page.getByTestId("comparison-name").allInnerTexts()).toEqual([RENAMED]);
    await page.reload();
    await page.getByLabel("Search by name or tire size").fill(stamp);
    await expect.poll(() => page.getByTestId("comparison-name").allInnerTexts()).toEqual([RENAMED]);
    await axeClean(page, "comparisons-renamed");
  });

  it("creates a share link that a forum reader opens without an account and sees the same numbers", async () => {
    await item(RENAMED).getByRole("button", { name: "Create share link" }).click();
    const url = item(RENAMED).getByTestId("share-url");
    await expect.poll(() => url.inputValue()).toMatch(/\/s\/[A-Za-z0-9_-]{24}$/);
    shareUrl = await url.inputValue();
    expect(new URL(shareUrl).origin).toBe(new URL(BASE).origin);
    await axeClean(page, "comparisons-shared");

    const reader = await launch({ width: 375, height: 812 });
    try {
      const r = await reader.context.newPage();
      const res = await r.goto(shareUrl);
      expect(res?.status()).toBe(200);
      await expect.poll(() => r.getByRole("heading", { level: 1 }).innerText()).toBe(RENAMED);
      await expect.poll(() => headlineText(r)).toBe(headline);
      await expect.poll(() => r.getByTestId("cross-section").isVisible()).toBe(true);
      await chartsShown(r);
      expect(await r.getByRole("link", { name: "Sign in" }).count()).toBeGreaterThan(0); // no account here
      // Open Graph: title and an image that is a PNG.
      expect(await r.locator('meta[property="og:title"]').getAttribute("content")).toBe(`${RENAMED} — shared comparison`);
      const og = await r.locator('meta[property="og:image"]').getAttribute("content");
      const img = await fetch(og!);
      expect(img.status).toBe(200);
      expect(img.headers.get("content-type")).toBe("image/png");
      await axeClean(r, "comparisons-share-reader-phone");

      // Copy as forum post: the text box (the clipboard's fallback) holds a Markdown table with the link.
      await r.getByRole("button", { name: "Show text" }).click();
      const post = await r.getByTestId("forum-text").inputValue();
      expect(post).toContain(`**${RENAMED}**`);
      expect(post).toContain("| Overall diameter | 30.47 in | 32.83 in | +2.36 in |");
      expect(post).toContain(shareUrl);
      await axeClean(r, "comparisons-share-forum-text");

      // Repeated views come from the server's micro-cache in front of Next (scripts/serve.ts)…
      await (await fetch(shareUrl)).text();
      const again = await fetch(shareUrl);
      expect(again.status).toBe(200);
      expect(again.headers.get("x-hubface-cache")).toBe("hit");
      expect(await again.text()).toContain(RENAMED);
      // A reader's reload gets the cached copy, and it is the same working page.
      const reloaded = await r.reload();
      expect(reloaded?.headers()["x-hubface-cache"]).toBe("hit");
      await expect.poll(() => headlineText(r)).toBe(headline);
      await chartsShown(r);
      await axeClean(r, "comparisons-share-from-microcache");

      // …and still, when the owner revokes, the link is gone at once.
      await item(RENAMED).getByRole("button", { name: "Revoke link" }).click();
      await expect.poll(() => item(RENAMED).getByRole("button", { name: "Create share link" }).isVisible()).toBe(true);
      const gone = await r.goto(shareUrl);
      expect(gone?.status()).toBe(404);
      expect((await fetch(shareUrl)).headers.get("x-hubface-cache")).toBeNull();
      await expect.poll(() => r.getByRole("heading", { level: 1 }).innerText()).toBe("This shared comparison is not available");
      expect(await r.getByText("70.2").count()).toBe(0);
      expect((await fetch(og!)).status).toBe(404);
      await axeClean(r, "comparisons-share-revoked");
    } finally {
      await reader.close();
    }
  });

  it("duplicates and deletes", async () => {
    await item(RENAMED)
      .getByRole("button", { name: `Duplicate ${RENAMED}` })
      .click();
    await expect
      .poll(() => page.getByTestId("comparison-name").allInnerTexts())
      .toEqual(expect.arrayContaining([RENAMED, `${RENAMED} (copy)`]));
    const copy = item(`${RENAMED} (copy)`);
    await copy.getByRole("button", { name: `Delete ${RENAMED} (copy)` }).click();
    await copy.getByRole("button", { name: "Delete", exact: true }).click();
    await expect.poll(() => page.getByTestId("comparison-name").allInnerTexts()).toEqual([RENAMED]);
    await axeClean(page, "comparisons-after-delete");
  });
});
