import { mkdtempSync, mkdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import AxeBuilder from "@axe-core/playwright";
import { type BrowserContext, type Page, chromium } from "playwright-core";

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
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

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

export async function signInAs(page: Page, email: string, password: string): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 20000 });
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
