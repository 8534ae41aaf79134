import { execFileSync } from "node:child_process";
import { afterAll, describe, expect, it } from "vitest";
import { BASE, launch, shot } from "./support/browser";

// Stops the test cluster under the running app and starts it again (paths from scripts/test.sh).
const PGBIN = process.env.PGBIN ?? "";
const DATA = process.env.PG_TEST_DATA_DIR ?? "";
const asPostgres = (args: string[]) =>
  process.getuid?.() === 0
    ? execFileSync("runuser", ["-u", "postgres", "--", ...args], { stdio: "ignore" })
    : execFileSync(args[0]!, args.slice(1), { stdio: "ignore" });
const pgCtl = (...args: string[]) => asPostgres([`${PGBIN}/pg_ctl`, "-D", DATA, "-w", "-t", "30", ...args]);
const port = new URL(process.env.E2E_DATABASE_URL ?? "postgres://x@127.0.0.1:55433/x").port;

function startPg() {
  pgCtl("-l", `${DATA}/server.log`, "-o", `-c listen_addresses=127.0.0.1 -p ${port} -k '' -c fsync=off`, "start");
}

afterAll(() => {
  try {
    startPg();
  } catch {
    /* already running */
  }
});

describe.skipIf(!PGBIN || !DATA)("when PostgreSQL goes away and comes back", () => {
  it("answers 503 and friendly pages, then recovers without a restart", async () => {
    expect((await fetch(`${BASE}/api/health`)).status).toBe(200);
    const { context, close } = await launch();
    try {
      const page = await context.newPage();
      // Sign in first so the account page needs the database.
      await page.goto("/sign-in");
      await page.getByLabel("E-mail").fill("juno@demo.hubface.test");
      await page.getByLabel("Password").fill("hubface-demo-1");
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.waitForURL(/\/account/);

      pgCtl("-m", "fast", "stop");
      const down = await fetch(`${BASE}/api/health`);
      expect(down.status).toBe(503);
      expect((await down.json()).message).toMatch(/not reachable/);
      // A load balancer takes the server out (readiness names the database) but does not restart it (liveness).
      const notReady = await fetch(`${BASE}/api/health/ready`);
      expect(notReady.status).toBe(503);
      expect((await notReady.json()).failed).toContain("database");
      expect((await fetch(`${BASE}/api/health/live`)).status).toBe(200);

      await page.goto("/account");
      await expect
        .poll(() => page.getByRole("heading", { level: 1 }).textContent(), { timeout: 20000 })
        .toMatch(/can't reach its database/);
      await shot(page, "database-down");
      expect(await page.content()).not.toMatch(/at .*\.js:\d+|ECONNREFUSED|knex/i);

      startPg();
      await expect.poll(async () => (await fetch(`${BASE}/api/health`)).status, { timeout: 20000 }).toBe(200);
      // The job queue's pool reconnects too.
      await expect.poll(async () => (await fetch(`${BASE}/api/health/ready`)).status, { timeout: 20000 }).toBe(200);
      // The error page notices by itself and shows the account again.
      await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent(), { timeout: 20000 }).toMatch(/^Hello, /);
      await shot(page, "database-back");
    } finally {
      await close();
    }
  });
});
