import { createServer, type Server } from "node:http";
import { createServer as netServer } from "node:net";
import { Writable } from "node:stream";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { rebuild, testDb } from "./support/db";
import { startTestBoss, stopBoss } from "./support/jobs";
import { ctx, req } from "./support/requests";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const logs = await import("@/lib/platform/log");
const { withRequestLog } = await import("@/lib/platform/log/request");
const { route, errorResponse } = await import("@/lib/platform/http/route");
const { DependencyUnavailableError } = await import("@/lib/platform/http/dependency");
const { db: appDb, isDatabaseUnavailable } = await import("@/lib/platform/db");
const live = (await import("@/app/api/health/live/route")).GET;
const ready = (await import("@/app/api/health/ready/route")).GET;

/** Every line the app logs during a test, parsed. */
const lines: Record<string, unknown>[] = [];
const sink = new Writable({
  write(chunk, _e, done) {
    for (const l of String(chunk).split("\n")) if (l.trim()) lines.push(JSON.parse(l));
    done();
  },
});
const closedPort = async () => {
  const s = netServer();
  await new Promise<void>((r) => s.listen(0, "127.0.0.1", r));
  const port = (s.address() as { port: number }).port;
  await new Promise((r) => s.close(r));
  return port;
};

beforeAll(async () => {
  process.env.LOG_LEVEL = "info";
  logs.setLogger(logs.createLogger(sink));
  await rebuild(db);
  await startTestBoss();
});
afterAll(async () => {
  logs.setLogger(undefined);
  await stopBoss();
  await db.destroy();
  await appDb.destroy();
});

describe("request logs", () => {
  let server: Server;
  let base = "";
  beforeAll(async () => {
    server = createServer(
      withRequestLog(
        (rq, rs) => {
          logs.log().info({ headers: rq.headers, body: { password: "hunter2 long", token: "tok" } }, "handler saw the request");
          rs.statusCode = rq.url?.startsWith("/boom") ? 500 : 200;
          rs.end(JSON.stringify({ ref: logs.currentRequestId() }));
        },
        { userIdOf: async () => "u-42" },
      ),
    );
    await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
    base = `http://127.0.0.1:${(server.address() as { port: number }).port}`;
  });
  afterAll(() => new Promise((r) => server.close(r)));
  const after = (id: string) => new Promise((r) => setTimeout(r, 50)).then(() => lines.filter((l) => l.reqId === id));

  it("one line per request: id, method, route with the token redacted, status, duration, user; the same id on every line and in the answer", async () => {
    const token = "Q".repeat(43);
    const res = await fetch(`${base}/q/${token}?token=abc&page=2`, {
      headers: { cookie: "next-auth.session-token=SECRETCOOKIE", authorization: "Bearer SECRETBEARER" },
    });
    const id = res.headers.get("x-request-id")!;
    expect(id).toMatch(/^[0-9a-f]{16}$/);
    expect(((await res.json()) as { ref: string }).ref).toBe(id);
    const mine = await after(id);
    expect(mine).toHaveLength(2);
    const summary = mine.find((l) => l.msg === "request")!;
    expect(summary).toMatchObject({ reqId: id, method: "GET", route: "/q/[redacted]", status: 200, userId: "u-42", level: 30 });
    expect(typeof summary.durationMs).toBe("number");
    const all = JSON.stringify(mine);
    for (const secret of [token, "SECRETCOOKIE", "SECRETBEARER", "hunter2", '"tok"']) expect(all).not.toContain(secret);
    expect(all).toContain("[redacted]");
  });

  it("a 5xx is logged at error level; a load balancer's id is kept, a hostile one replaced", async () => {
    const res = await fetch(`${base}/boom`, { headers: { "x-request-id": "lb-1234abcd" } });
    expect(res.status).toBe(500);
    expect(res.headers.get("x-request-id")).toBe("lb-1234abcd");
    expect((await after("lb-1234abcd")).find((l) => l.msg === "request")).toMatchObject({ status: 500, level: 50, route: "/boom" });
    // The error page (a client component) reads the id from this cookie; a 2xx answer sets none.
    expect(res.headers.get("set-cookie")).toBe("hubface-error-ref=lb-1234abcd; Path=/; Max-Age=300; SameSite=Lax");
    const odd = await fetch(`${base}/`, { headers: { "x-request-id": "x".repeat(200) } });
    expect(odd.headers.get("x-request-id")).toMatch(/^[0-9a-f]{16}$/);
    expect(odd.headers.get("set-cookie")).toBeNull();
  });

  it("a route handler's 500 body carries the request id as its reference, and the error line has it too", async () => {
    const failing = route({ access: "public" }, async () => {
      throw new Error("kaboom in a handler");
    });
    const res = await logs.requestContext.run({ reqId: "req0000abcd" }, () => failing(req("GET", "/api/x"), ctx()));
    expect(res.status).toBe(500);
    const body = (await res.json()) as { error: string; ref: string };
    expect(body.ref).toBe("req0000abcd");
    expect(body.error).toContain("req0000abcd");
    expect(body.error).not.toContain("kaboom");
    expect(lines.find((l) => l.reqId === "req0000abcd" && l.msg === "unhandled error in route handler")).toMatchObject({
      err: { message: "kaboom in a handler" },
    });
  });

  it("redacts tokens in the URLs that carry them", () => {
    const t = "A".repeat(43);
    expect(logs.redactUrl(`/reset-password?token=${t}`)).toBe("/reset-password?token=[redacted]");
    expect(logs.redactUrl(`/api/q/${t}`)).toBe("/api/q/[redacted]");
    expect(logs.redactUrl(`/join/${t}?x=1`)).toBe("/join/[redacted]?x=1");
    expect(logs.redactUrl(`/s/${t}/_og`)).toBe("/s/[redacted]/_og");
    expect(logs.redactUrl("/shop/quotes?status=sent")).toBe("/shop/quotes?status=sent");
  });
});

describe("health", () => {
  it("live answers 200 without touching anything", async () => {
    const raw = vi.spyOn(appDb, "raw");
    const res = live();
    expect(res.status).toBe(200);
    expect(raw).not.toHaveBeenCalled();
    raw.mockRestore();
  });

  it("ready is 200 when PostgreSQL and the queue answer", async () => {
    const res = await ready();
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ status: "ready", checks: { database: { status: "ok" }, queue: { status: "ok" } } });
  });

  it("ready is 503 naming the database when it is down (the queue still answers)", async () => {
    const down = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:5432"), { code: "ECONNREFUSED" });
    const raw = vi.spyOn(appDb, "raw").mockRejectedValue(down);
    const res = await ready();
    raw.mockRestore();
    expect(res.status).toBe(503);
    const body = (await res.json()) as { failed: string[]; message: string; checks: { queue: { status: string } } };
    expect(body.failed).toEqual(["database"]);
    expect(body.checks.queue.status).toBe("ok");
    expect(body.message).toMatch(/database is not reachable/);
  });

  it("ready is 503 while the server is stopping", async () => {
    (globalThis as { hubfaceStopping?: boolean }).hubfaceStopping = true;
    const res = await ready();
    (globalThis as { hubfaceStopping?: boolean }).hubfaceStopping = false;
    expect(res.status).toBe(503);
    expect(await res.json()).toMatchObject({ stopping: true, failed: [] });
  });
});

describe("outages are named for what is down", () => {
  it("a mail server that refuses the connection is reported as the mail server, not the database", async () => {
    process.env.SMTP_URL = `smtp://127.0.0.1:${await closedPort()}`;
    (globalThis as { hubfaceMail?: unknown }).hubfaceMail = undefined;
    const { sendMail } = await import("@/lib/platform/mail");
    const error = await sendMail({ to: "a@example.test", subject: "s", text: "t" }).then(
      () => null,
      (e: unknown) => e,
    );
    expect(isDatabaseUnavailable(error)).toBe(false);
    const res = errorResponse(error);
    expect(res.status).toBe(503);
    const body = (await res.json()) as { error: string };
    expect(body.error).toMatch(/mail server is not reachable/);
    expect(body.error).not.toMatch(/database/i);
  });

  it("a photo store that does not answer is reported as the photo store", async () => {
    const { s3PhotoStore, s3Settings } = await import("@/lib/garage/photos/s3");
    const store = s3PhotoStore({ ...s3Settings({} as NodeJS.ProcessEnv), endpoint: `http://127.0.0.1:${await closedPort()}` });
    const error = await store.put("k", Buffer.from("x"), "image/jpeg").then(
      () => null,
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(DependencyUnavailableError);
    expect(isDatabaseUnavailable(error)).toBe(false);
    expect(((await errorResponse(error).json()) as { error: string }).error).toMatch(/photo store is not reachable/);
  });

  it("a database that refuses the connection is still the database", async () => {
    const res = errorResponse(Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:5432"), { code: "ECONNREFUSED" }));
    expect(res.status).toBe(503);
    expect(((await res.json()) as { error: string }).error).toMatch(/database is not reachable/);
  });
});
