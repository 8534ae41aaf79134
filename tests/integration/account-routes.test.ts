import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { settleAfterResponse } from "@/lib/platform/http/afterResponse";
import { internalKeys } from "./support/apiKeys";
import { closeDatabases, rebuild, testDb } from "./support/db";

// Mail goes nowhere here; the browser tests cover the real SMTP path.
const sent = vi.hoisted(() => [] as { to: string; text: string }[]);
vi.mock("@/lib/platform/mail", () => ({
  // 50 ms like an SMTP round trip, so an answer that waits for the mail shows in its timing.
  // Reset mail goes through the job queue (retried there); stored here as the worker would send it.
  queueMail: async (m: { to: string; text: string }) => {
    await new Promise((r) => setTimeout(r, 50));
    sent.push(m);
    return "job-id";
  },
  appOrigin: () => "http://127.0.0.1:3000",
}));
// Sign-up mail is queued in the sign-up's transaction; stored here too.
vi.mock("@/lib/platform/mail/transactional", () => ({
  queueMailIn: async (_trx: unknown, m: { to: string; text: string }) => {
    sent.push(m);
    return "job-id";
  },
}));

const db = testDb();
beforeAll(() => rebuild(db));
afterAll(async () => {
  await settleAfterResponse();
  await closeDatabases(db);
});

const signup = (await import("@/app/api/account/signup/route")).POST;
const forgot = (await import("@/app/api/account/password/forgot/route")).POST;
const reset = (await import("@/app/api/account/password/reset/route")).POST;
const confirm = (await import("@/app/api/account/signup/confirm/route")).POST;
const ctx = { params: Promise.resolve({}) };

function post(path: string, body: string | object, headers: Record<string, string> = {}) {
  return new NextRequest(`http://127.0.0.1:3000${path}`, {
    method: "POST",
    body: typeof body === "string" ? body : JSON.stringify(body),
    headers: { "content-type": "application/json", ...headers },
  });
}

describe("sign-up route", () => {
  it("creates an account (201) from the mailed link, with a hashed password", async () => {
    sent.length = 0;
    await signup(
      post("/api/account/signup", { name: "Wren Ostrander", email: "wren@example.test", password: "correct horse battery" }),
      ctx,
    );
    const token = /token=([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)?.[1];
    const res = await confirm(post("/api/account/signup/confirm", { token, password: "correct horse battery" }), ctx);
    expect(res.status).toBe(201);
    const row = await db("users").where({ email: "wren@example.test" }).first();
    expect(row.password_hash).toMatch(/^\$2[aby]\$/);
    expect(row.role).toBe("member");
  });

  it("answers the new account in API shape: no hash, no snake_case, ISO dates", async () => {
    sent.length = 0;
    await signup(post("/api/account/signup", { name: "Ines Marlow", email: "ines@example.test", password: "correct horse battery" }), ctx);
    const token = /token=([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)?.[1];
    const res = await confirm(post("/api/account/signup/confirm", { token, password: "correct horse battery" }), ctx);
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(internalKeys(body)).toEqual([]);
    const row = await db("users").where({ email: "ines@example.test" }).first();
    // The keys the answer had before keep their values.
    expect(body).toMatchObject({ id: row.id, email: "ines@example.test", name: "Ines Marlow" });
    expect(body).toEqual({
      id: row.id,
      email: "ines@example.test",
      name: "Ines Marlow",
      role: "member",
      shopId: null,
      createdAt: new Date(row.created_at).toISOString(),
      updatedAt: new Date(row.updated_at).toISOString(),
    });
  });

  it("gives field errors for a bad e-mail and a short password, and writes nothing", async () => {
    const before = await db("users").count<{ count: string }[]>();
    const res = await signup(post("/api/account/signup", { name: "", email: "not-an-email", password: "short" }), ctx);
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(Object.keys(body.fieldErrors).sort()).toEqual(["email", "name", "password"]);
    expect(body.fieldErrors.password[0]).toMatch(/10 characters/);
    expect(await db("users").count()).toEqual(before);
  });

  it("answers a taken e-mail as a new one and leaves the account as it was", async () => {
    const before = await db("users").where({ email: "wren@example.test" }).first();
    const res = await signup(
      post("/api/account/signup", { name: "Again", email: "WREN@example.test", password: "another long password" }),
      ctx,
    );
    expect(res.status).toBe(202);
    expect((await res.json()).title).toBe("Check your e-mail to finish signing up");
    expect(await db("users").where({ email: "wren@example.test" }).first()).toEqual(before);
  });

  it("answers 400 to malformed JSON and 413 to an oversized body — never 500", async () => {
    expect((await signup(post("/api/account/signup", "{not json"), ctx)).status).toBe(400);
    const huge = JSON.stringify({ name: "x".repeat(70 * 1024), email: "a@b.test", password: "long enough password" });
    expect((await signup(post("/api/account/signup", huge), ctx)).status).toBe(413);
  });
});

describe("password reset routes", () => {
  it("mail a single-use link that changes the password", async () => {
    sent.length = 0;
    const res = await forgot(post("/api/account/password/forgot", { email: "wren@example.test" }), ctx);
    expect(res.status).toBe(200);
    await settleAfterResponse(); // the mail goes out after the answer
    expect(sent).toHaveLength(1);
    const token = /token=([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)?.[1];
    expect(token).toBeDefined();
    const before = (await db("users").where({ email: "wren@example.test" }).first()).password_hash;

    const ok = await reset(
      post("/api/account/password/reset", { token, password: "a brand new secret", confirm: "a brand new secret" }),
      ctx,
    );
    expect(ok.status).toBe(200);
    expect((await db("users").where({ email: "wren@example.test" }).first()).password_hash).not.toBe(before);

    const again = await reset(
      post("/api/account/password/reset", { token, password: "a third secret!!", confirm: "a third secret!!" }),
      ctx,
    );
    expect(again.status).toBe(422);
  });

  it("answer the same whether or not the address has an account", async () => {
    sent.length = 0;
    await db("rate_limits").del(); // the test above mailed wren less than 2 minutes ago
    const a = await (await forgot(post("/api/account/password/forgot", { email: "nobody@example.test" }), ctx)).json();
    const b = await (await forgot(post("/api/account/password/forgot", { email: "wren@example.test" }), ctx)).json();
    expect(a).toEqual(b);
    await settleAfterResponse();
    expect(sent.map((m) => m.to)).toEqual(["wren@example.test"]);
  });

  it("mail an account at most once every 2 minutes and 5 times a day, answering the same each time", async () => {
    await db("rate_limits").del();
    sent.length = 0;
    const answers = new Set<string>();
    for (let i = 0; i < 20; i++) {
      const res = await forgot(
        post("/api/account/password/forgot", { email: "Wren@Example.test" }, { "x-forwarded-for": `10.1.${i}.1` }),
        ctx,
      );
      expect(res.status).toBe(200);
      answers.add(JSON.stringify(await res.json()));
    }
    await settleAfterResponse();
    expect(answers.size).toBe(1);
    expect(sent).toHaveLength(1);
    // Two minutes later (the spacing window moved on) the next mail goes out; after five a day, none.
    for (let i = 0; i < 6; i++) {
      // (and the per-address budget refilled: these tests all come from one address)
      await db("rate_limits").where("key", "like", "forgot_acct_2min:%").orWhere("key", "like", "forgot_addr:%").del();
      await forgot(post("/api/account/password/forgot", { email: "wren@example.test" }), ctx);
      await settleAfterResponse();
    }
    expect(sent).toHaveLength(5);
  });

  it("answer before looking the address up, so the answer cannot tell whether the account exists", async () => {
    await db("rate_limits").del();
    // Hold the users table so no lookup can finish: both answers must come anyway, and be the same.
    // (Before: 159 ms for an existing account against 8 ms for a missing one — the answer waited for the lookup.)
    const holder = await db.transaction();
    try {
      await holder.raw("lock table users in access exclusive mode");
      const within = <T>(p: Promise<T>) =>
        Promise.race([p, new Promise<never>((_, no) => setTimeout(() => no(new Error("the answer waited for the lookup")), 5000))]);
      const a = await within(forgot(post("/api/account/password/forgot", { email: "wren@example.test" }), ctx));
      const b = await within(forgot(post("/api/account/password/forgot", { email: "nobody-here@example.test" }), ctx));
      expect([a.status, b.status]).toEqual([200, 200]);
      expect(await a.json()).toEqual(await b.json());
    } finally {
      await holder.rollback();
    }
    await settleAfterResponse();
  });

  it("refuse mismatched passwords with a field error", async () => {
    const res = await reset(
      post("/api/account/password/reset", { token: "a".repeat(43), password: "one long password", confirm: "two long password" }),
      ctx,
    );
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors.confirm).toBeDefined();
  });
});
