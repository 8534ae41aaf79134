import { mkdtempSync, mkdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import AxeBuilder from "@axe-core/playwright";
import { type BrowserContext, type Page, chromium } from "playwright-core";
import { afterAll, beforeAll, expect } from "vitest";
import { CHROMIUM_FLAGS } from "@/scripts/chromium";

export const BASE = process.env.E2E_BASE_URL ?? "http://127.0.0.1:3000";
export const SHOTS = join(process.cwd(), "tests/browser/screenshots");

/** A fresh Chromium profile (Debian's chromium, never a downloaded browser). */
export async function launch(viewport = { width: 1280, height: 900 }): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const dir = mkdtempSync(join(tmpdir(), "hubface-chromium-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    viewport,
    baseURL: BASE,
    args: CHROMIUM_FLAGS,
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Runs `run` on a page of a Chromium of its own at `viewport` (a phone, say), closed whatever happens. */
export async function withBrowserPage(viewport: { width: number; height: number }, run: (page: Page) => Promise<void>): Promise<void> {
  const browser = await launch(viewport);
  try {
    await run(await browser.context.newPage());
  } finally {
    await browser.close();
  }
}

/**
 * One browser page for a whole test file, opened before its tests and closed after them.
 *
 * @example
 * const session = filePage(); // at the top of the file
 * it("…", async () => { const page = session.page(); … });
 */
export function filePage(viewport = { width: 1280, height: 900 }): { page: () => Page; context: () => BrowserContext } {
  let browser: Awaited<ReturnType<typeof launch>> | undefined;
  let page: Page | undefined;
  beforeAll(async () => {
    browser = await launch(viewport);
    page = await browser.context.newPage();
  });
  afterAll(async () => {
    await browser?.close();
  });
  const opened = () => {
    if (!browser || !page) throw new Error("filePage(): the page opens in beforeAll");
    return { page, context: browser.context };
  };
  return { page: () => opened().page, context: () => opened().context };
}

/** The page's full width in CSS pixels: wider than the viewport means it scrolls sideways. */
export const pageWidth = (p: Page) => p.evaluate(() => Math.max(document.documentElement.scrollWidth, document.body.scrollWidth));

export async function shot(page: Page, name: string): Promise<string> {
  mkdirSync(SHOTS, { recursive: true });
  const path = join(SHOTS, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** axe-core on the current page: the serious and critical violations, described. */
export async function seriousViolations(page: Page): Promise<string[]> {
  const result = await new AxeBuilder({ page }).analyze();
  return result.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map(
      (v) =>
        `${v.id} (${v.impact}): ${v.help} — ${v.nodes
          .slice(0, 3)
          .map((n) => n.target.join(" "))
          .join(", ")}`,
    );
}

/** A screenshot of the page under `name`, then no serious or critical axe violation on it. */
export async function expectAxeClean(page: Page, name: string): Promise<void> {
  await shot(page, name);
  expect(await seriousViolations(page), `axe on ${page.url()}`).toEqual([]);
}

/**
 * Pays on the fake payment provider's page with the card it takes (scripts/services/fake-pay.ts) and waits for the
 * public quote page it returns to.
 */
export async function payWithTestCard(page: Page, nameOnCard: string): Promise<void> {
  await page.getByLabel("Card number").fill("4242 4242 4242 4242");
  await page.getByLabel("Expiry (MM/YY)").fill("12/30");
  await page.getByLabel("CVC").fill("123");
  await page.getByLabel("Name on card").fill(nameOnCard);
  await page.getByRole("button", { name: /^Pay / }).click();
  await page.waitForURL(/\/q\/[A-Za-z0-9_-]{43}\?paid=1/);
}

export async function signInAs(page: Page, email: string, password: string): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 20000 });
}

/**
 * Panels below the fold mount when they come near the viewport (MountWhenNear), as the charts do:
 * scroll to each placeholder named in `labels` as a reader does, then wait for the panel in its place.
 */
export async function panelsShown(page: Page, ...labels: string[]): Promise<void> {
  // While the route's loading state is up the placeholders are not in the page yet, and finding
  // none would read as "all mounted": wait for the page itself first.
  await page.getByTestId("page-loading").waitFor({ state: "detached", timeout: 30000 });
  for (const label of labels) {
    const placeholder = page.getByRole("status", { name: label, exact: true });
    const until = Date.now() + 20000;
    // Scroll again while it waits: a panel above that mounts taller than its placeholder can push
    // this one back out of reach after the first scroll, as a reader would then scroll on.
    while (await placeholder.count()) {
      if (Date.now() > until) throw new Error(`panelsShown: "${label}" still a placeholder after 20 s`);
      // The panel may mount between the count and the scroll (it was near already): then there is nothing to scroll to.
      await placeholder.scrollIntoViewIfNeeded({ timeout: 5000 }).catch(() => undefined);
      await placeholder.waitFor({ state: "detached", timeout: 2000 }).catch(() => undefined);
    }
  }
}

/**
 * The comparison charts load when they come near the viewport (LazyComparisonCharts): scroll to
 * their placeholder as a reader does, then wait for them.
 */
export async function chartsShown(page: Page): Promise<void> {
  const placeholder = page.getByRole("status", { name: "Loading charts" });
  if (await placeholder.count()) await placeholder.first().scrollIntoViewIfNeeded();
  await page.getByTestId("charts").first().waitFor({ state: "visible", timeout: 20000 });
}
