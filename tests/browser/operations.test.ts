import { describe, expect, it } from "vitest";
import { BASE } from "./support/browser";
import { DEMO, sessionCookie } from "./support/http";
import { waitForMail } from "./support/outbox";

/** HTTP checks of what runs the app in production (scripts/serve.ts): request ids, health, the job queue. */
describe("operations", () => {
  it("every answer carries a request id; a load balancer's own id is kept", async () => {
    const res = await fetch(`${BASE}/api/health/live`, { headers: { "x-request-id": "lb-trace-0001" } });
    expect(res.status).toBe(200);
    expect(res.headers.get("x-request-id")).toBe("lb-trace-0001");
    expect((await fetch(`${BASE}/`)).headers.get("x-request-id")).toMatch(/^[0-9a-f]{16}$/);
  });

  it("readiness reports the database and the queue started by the server", async () => {
    const res = await fetch(`${BASE}/api/health/ready`);
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ status: "ready", checks: { database: { status: "ok" }, queue: { status: "ok" } } });
  });

  it("a staff invitation is queued and reaches the mail server within seconds; the admin's jobs page lists no failure for it", async () => {
    const owner = await sessionCookie(DEMO.shop_owner);
    const email = `queued-${Date.now()}@example.test`;
    const res = await fetch(`${BASE}/api/shop/staff`, {
      method: "POST",
      headers: { Cookie: owner, Origin: BASE, "Content-Type": "application/json" },
      body: JSON.stringify({ email }),
    });
    expect(res.status).toBe(201);
    const started = Date.now();
    await waitForMail(email, /invites you/, 10000);
    console.info(`queued invitation reached the mail server after ${Date.now() - started} ms`);
    const admin = await sessionCookie(DEMO.admin);
    const jobs = await fetch(`${BASE}/api/admin/jobs`, { headers: { Cookie: admin } });
    expect(jobs.status).toBe(200);
    expect(JSON.stringify(await jobs.json())).not.toContain(email);
  });
});
