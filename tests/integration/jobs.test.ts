import { createHash } from "node:crypto";
import { SMTPServer } from "smtp-server";
import { simpleParser, type ParsedMail } from "mailparser";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { drainQueue, startTestBoss, stopBoss } from "./support/jobs";
import { freePort } from "./support/ports";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U, seedShops } from "./support/shopFixture";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const ADMIN = { id: "ad000000-0000-4000-8000-000000000001", role: "admin", shop_id: null, email: "admin@example.test", name: "Ada Admin" };
const MEMBER = {
  id: "ad000000-0000-4000-8000-000000000002",
  role: "member",
  shop_id: null,
  email: "member@example.test",
  name: "Mo Member",
};

const received: ParsedMail[] = [];
let smtp: SMTPServer | null = null;
let smtpPort = 0;
async function mailServerUp() {
  smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    onData(stream, _s, done) {
      simpleParser(stream).then((m) => {
        received.push(m);
        done();
      }, done);
    },
  });
  await new Promise<void>((r) => smtp!.listen(smtpPort, "127.0.0.1", r));
}
async function mailServerDown() {
  await new Promise<void>((r) => (smtp ? smtp.close(() => r()) : r()));
  smtp = null;
}

const mail = await import("@/lib/platform/mail");
const { QUEUES, getBoss } = await import("@/lib/platform/jobs/boss");
const { getQuoteDetail, listQuotes, findByToken } = await import("@/lib/shop/quotes/queries");
const listRoute = (await import("@/app/api/admin/jobs/route")).GET;
const retryRoute = (await import("@/app/api/admin/jobs/[id]/retry/route")).POST;

beforeAll(async () => {
  await rebuild(db);
  // Nothing listens there yet: the mail server is "down" until a test starts one on this port.
  smtpPort = await freePort();
  process.env.SMTP_URL = `smtp://127.0.0.1:${smtpPort}`;
  await db("users").insert([ADMIN, MEMBER].map((u) => ({ ...u, password_hash: "x" })));
  await startTestBoss();
});
afterAll(async () => {
  await mailServerDown();
  await stopBoss();
  await closeDatabases(db);
});

const jobRow = (id: string) => db.withSchema("pgboss").from("job").where({ id }).first();
const secondsFromNow = (d: Date) => (new Date(d).getTime() - Date.now()) / 1000;

describe("queued mail", () => {
  it("a mail queued while the mail server is down is retried with a growing pause, then delivered with its attachment intact", async () => {
    const pdf = Buffer.from("%PDF-1.4 quote body \u0000\u00ff binary bytes");
    const id = await mail.queueMail({
      to: "dana@example.test",
      subject: "Your quote Q-1001",
      text: "Secret link /q/abc",
      attachments: [{ filename: "quote-Q-1001.pdf", content: pdf, contentType: "application/pdf" }],
    });

    const first = await drainQueue(QUEUES.mail.name);
    expect(first.failed.map((f) => f.id)).toEqual([id]);
    // The outage is the mail server's, in those words (not "the database is not reachable").
    expect(first.failed[0]!.message).toMatch(/^mail server unavailable/);
    let row = await jobRow(id);
    expect(row.state).toBe("retry");
    // Exponential backoff from 30 s with jitter: first pause 30-60 s (pg-boss: delay * 2^n / 2 * (1 + random)).
    const pause1 = secondsFromNow(row.start_after);
    expect(pause1).toBeGreaterThan(25);
    expect(pause1).toBeLessThan(65);

    // Not due yet: a normal drain leaves it waiting.
    expect(await drainQueue(QUEUES.mail.name)).toEqual({ completed: [], failed: [] });

    const second = await drainQueue(QUEUES.mail.name, { ignoreStartAfter: true });
    expect(second.failed).toHaveLength(1);
    row = await jobRow(id);
    const pause2 = secondsFromNow(row.start_after);
    expect(pause2).toBeGreaterThan(55);
    expect(pause2).toBeLessThan(125);
    expect(row.retry_count).toBe(1);

    await mailServerUp();
    const third = await drainQueue(QUEUES.mail.name, { ignoreStartAfter: true });
    expect(third.completed).toEqual([id]);
    expect((await jobRow(id)).state).toBe("completed");
    const got = received.find((m) => m.subject === "Your quote Q-1001")!;
    expect(got.to && !Array.isArray(got.to) ? got.to.text : "").toBe("dana@example.test");
    expect(got.attachments[0]!.filename).toBe("quote-Q-1001.pdf");
    expect(Buffer.compare(got.attachments[0]!.content, pdf)).toBe(0);
    await mailServerDown();
  });

  it("refuses attachments above the stated cap instead of storing a huge job", async () => {
    const big = Buffer.alloc(mail.MAX_QUEUED_ATTACHMENT_BYTES + 1);
    await expect(
      mail.queueMail({
        to: "x@example.test",
        subject: "big",
        text: "",
        attachments: [{ filename: "a.bin", content: big, contentType: "application/octet-stream" }],
      }),
    ).rejects.toThrow(/exceed the 2 MB/);
  });
});

describe("admin: failed jobs", () => {
  let failedId = "";
  beforeAll(async () => {
    const boss = await getBoss();
    // One attempt only, so it fails for good at once.
    failedId = (await boss.send(
      QUEUES.mail.name,
      mail.toQueued({ to: "erin@example.test", subject: "Join Shop A", text: "invite token http://x/join/TOPSECRET" }) as object,
      { retryLimit: 0 },
    ))!;
    const r = await drainQueue(QUEUES.mail.name);
    expect(r.failed.map((f) => f.id)).toContain(failedId);
    expect((await jobRow(failedId)).state).toBe("failed");
  });

  it("lists it for admins only: queue, last error, attempts, times; never the mail itself", async () => {
    session.current = sessionOf(MEMBER);
    expect((await listRoute(req("GET", "/api/admin/jobs"), ctx())).status).toBe(403);
    session.current = null;
    expect((await listRoute(req("GET", "/api/admin/jobs"), ctx())).status).toBe(401);

    session.current = sessionOf(ADMIN);
    const res = await listRoute(req("GET", "/api/admin/jobs"), ctx());
    expect(res.status).toBe(200);
    const text = await res.text();
    expect(text).not.toMatch(/erin@example\.test|Join Shop A|TOPSECRET|invite token/);
    const job = (
      JSON.parse(text) as {
        jobs: {
          id: string;
          queue: string;
          state: string;
          lastError: string;
          attempts: number;
          maxAttempts: number;
          createdAt: string;
          lastAttemptAt: string;
        }[];
      }
    ).jobs.find((j) => j.id === failedId)!;
    expect(job).toMatchObject({ queue: "mail.send", state: "failed", attempts: 1, maxAttempts: 1 });
    expect(job.lastError).toMatch(/mail server unavailable/);
    expect(Date.parse(job.createdAt)).toBeLessThanOrEqual(Date.parse(job.lastAttemptAt));
  });

  it("Retry runs it again now, and it is delivered once the mail server is back", async () => {
    session.current = sessionOf(MEMBER);
    expect((await retryRoute(req("POST", `/api/admin/jobs/${failedId}/retry`, {}), ctx({ id: failedId }))).status).toBe(403);
    session.current = sessionOf(ADMIN);
    const unknown = "00000000-0000-4000-8000-000000000000";
    expect((await retryRoute(req("POST", `/api/admin/jobs/${unknown}/retry`, {}), ctx({ id: unknown }))).status).toBe(404);

    const res = await retryRoute(req("POST", `/api/admin/jobs/${failedId}/retry`, {}), ctx({ id: failedId }));
    expect(res.status).toBe(200);
    const row = await jobRow(failedId);
    expect(row.state).toBe("retry");
    expect(secondsFromNow(row.start_after)).toBeLessThanOrEqual(1);

    await mailServerUp();
    expect((await drainQueue(QUEUES.mail.name)).completed).toContain(failedId);
    expect(received.some((m) => m.subject === "Join Shop A")).toBe(true);
    await mailServerDown();
    // Delivered: it leaves the list; retrying it again is a 404.
    expect(
      ((await (await listRoute(req("GET", "/api/admin/jobs"), ctx())).json()) as { jobs: { id: string }[] }).jobs.map((j) => j.id),
    ).not.toContain(failedId);
    expect((await retryRoute(req("POST", `/api/admin/jobs/${failedId}/retry`, {}), ctx({ id: failedId }))).status).toBe(404);
  });
});

describe("quote expiry", () => {
  const ids = { due: "", dueAccepted: "", current: "", draftOld: "" };
  const TOKEN = "T".repeat(43);

  beforeAll(async () => {
    await seedShops(db);
    const [cust] = await db("customers").insert({ shop_id: SHOP_A, name: "Cass Customer", email: "cass@example.test" }).returning("id");
    const base = {
      shop_id: SHOP_A,
      customer_id: cust.id,
      created_by: U.ownerA.id,
      vehicle_description: "Test pickup",
      bolt_pattern: "6x5.5",
      current_setup: JSON.stringify({
        tire: "265/70R17",
        wheelDiameterIn: 17,
        wheelWidthIn: 8,
        position: { mode: "offset", offsetMm: 25 },
        spacerMm: 0,
      }),
      wheel_qty: 4,
      fitment: JSON.stringify({}),
      tax_rate_bp: 825,
      deposit_pct: 25,
    };
    const day = 24 * 3600 * 1000;
    const rows = await db("quotes")
      .insert([
        {
          ...base,
          number: 1,
          status: "sent",
          valid_until: new Date(Date.now() - day),
          public_token_hash: createHash("sha256").update(TOKEN).digest("hex"),
        },
        { ...base, number: 2, status: "accepted", valid_until: new Date(Date.now() - 60_000) },
        { ...base, number: 3, status: "sent", valid_until: new Date(Date.now() + day) },
        { ...base, number: 4, status: "draft", valid_until: new Date(Date.now() - day) },
      ])
      .returning("id");
    [ids.due, ids.dueAccepted, ids.current, ids.draftOld] = rows.map((r: { id: string }) => r.id) as [string, string, string, string];
  });

  const stored = async () => Object.fromEntries((await db("quotes").select("id", "status")).map((r) => [r.id, r.status]));

  it("reads show a quote past its date as expired before the job ran, without writing anything", async () => {
    const scope = { shopId: SHOP_A };
    expect((await getQuoteDetail(db, scope, ids.due)).quote.status).toBe("expired");
    expect((await findByToken(db, TOKEN))!.status).toBe("expired");
    const list = await listQuotes(db, scope);
    expect(Object.fromEntries(list.map((q: { id: string; status: string }) => [q.id, q.status]))).toEqual({
      [ids.due]: "expired",
      [ids.dueAccepted]: "expired",
      [ids.current]: "sent",
      [ids.draftOld]: "draft",
    });
    expect((await listQuotes(db, scope, { status: "expired" })).map((q: { id: string }) => q.id).sort()).toEqual(
      [ids.due, ids.dueAccepted].sort(),
    );
    expect((await listQuotes(db, scope, { status: "sent" })).map((q: { id: string }) => q.id)).toEqual([ids.current]);
    // Nothing written by the reads.
    expect(await stored()).toEqual({ [ids.due]: "sent", [ids.dueAccepted]: "accepted", [ids.current]: "sent", [ids.draftOld]: "draft" });
    expect(await db("quote_events").count<{ c: string }[]>({ c: "*" })).toEqual([{ c: "0" }]);
  });

  it("the scheduled job expires the due quotes, records it as the system, and leaves the others", async () => {
    const boss = await getBoss();
    await boss.send(QUEUES.quoteExpiry.name, {});
    const r = await drainQueue(QUEUES.quoteExpiry.name);
    expect(r.completed).toHaveLength(1);
    expect(await stored()).toEqual({ [ids.due]: "expired", [ids.dueAccepted]: "expired", [ids.current]: "sent", [ids.draftOld]: "draft" });
    const events = await db("quote_events as e")
      .join("quotes as q", "q.id", "e.quote_id")
      .orderBy("q.number")
      .select("e.quote_id", "e.from_status", "e.to_status", "e.actor");
    expect(events).toEqual([
      { quote_id: ids.due, from_status: "sent", to_status: "expired", actor: "system" },
      { quote_id: ids.dueAccepted, from_status: "accepted", to_status: "expired", actor: "system" },
    ]);
    // Run again: nothing more to do.
    await boss.send(QUEUES.quoteExpiry.name, {});
    await drainQueue(QUEUES.quoteExpiry.name);
    expect(await db("quote_events").count<{ c: string }[]>({ c: "*" })).toEqual([{ c: "2" }]);
  });
});

describe("the workers", () => {
  it("schedule the expiry every 15 minutes and deliver queued mail within a couple of seconds", async () => {
    const { startWorkers } = await import("@/lib/platform/jobs/workers");
    const boss = await startWorkers({ pollingIntervalSeconds: 0.5 });
    const schedules = await boss.getSchedules();
    expect(schedules.find((s) => s.name === "quotes.expire")?.cron).toBe("*/15 * * * *");
    await mailServerUp();
    const queuedAt = Date.now();
    await mail.queueMail({ to: "fast@example.test", subject: "Prompt", text: "hello" });
    while (!received.some((m) => m.subject === "Prompt") && Date.now() - queuedAt < 10_000) await new Promise((r) => setTimeout(r, 100));
    expect(received.some((m) => m.subject === "Prompt")).toBe(true);
    console.info(`queued mail delivered after ${Date.now() - queuedAt} ms`);
    await stopBoss(2000);
  });
});
