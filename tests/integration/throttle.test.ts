import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import {
  CLIENT_ADDRESS_HEADER,
  clientAddress,
  resolveClientAddress,
  trustClientAddressHeader,
  trustedProxies,
} from "@/lib/platform/auth/clientAddress";
import { hashPassword } from "@/lib/platform/auth/password";
import { THROTTLE, backoffSec } from "@/lib/platform/auth/throttle";
import { settleAfterResponse } from "@/lib/platform/http/afterResponse";
import { rebuild, testDb } from "./support/db";
import { ctx, req } from "./support/requests";

/**
 * Security review: the per-address limit keyed on X-Forwarded-For (anyone can rotate it), and
 * five wrong passwords from anywhere locked the account for everyone for 15 minutes.
 */
vi.mock("@/lib/platform/mail", () => ({
  sendMail: async () => {},
  queueMail: async () => "job-id",
  appOrigin: () => "http://127.0.0.1:3000",
}));
vi.mock("@/lib/platform/mail/transactional", () => ({ queueMailIn: async () => "job-id" }));

const db = testDb();
const { authOptions } = await import("@/lib/platform/auth/options");
const signup = (await import("@/app/api/account/signup/route")).POST;
const forgot = (await import("@/app/api/account/password/forgot/route")).POST;

const EMAIL = "victim@example.test";
const PASSWORD = "the right password";
beforeAll(async () => {
  await rebuild(db);
  await db("users").insert({ email: EMAIL, name: "Vic Tim", password_hash: await hashPassword(PASSWORD), role: "member" });
});
afterAll(async () => {
  await settleAfterResponse();
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
});

type Authorize = (c: Record<string, string>, r: { headers: Record<string, string> }) => Promise<unknown>;
const authorize = (authOptions.providers[0] as unknown as { options: { authorize: Authorize } }).options.authorize;
/** A sign-in as scripts/serve.ts hands it on: its own client-address header, plus whatever the client claimed. */
const signIn = (password: string, address: string, forwardedFor?: string) =>
  authorize(
    { email: EMAIL, password },
    { headers: { [CLIENT_ADDRESS_HEADER]: address, ...(forwardedFor ? { "x-forwarded-for": forwardedFor } : {}) } },
  ).then(
    () => "ok",
    (e: Error) => e.message,
  );

describe("the client address is never the client's own claim", () => {
  it("ignores X-Forwarded-For unless the peer is a configured proxy (TRUSTED_PROXIES)", () => {
    const none = trustedProxies("");
    expect(resolveClientAddress("203.0.113.9", "1.2.3.4", none)).toBe("203.0.113.9");
    expect(resolveClientAddress("::ffff:203.0.113.9", undefined, none)).toBe("203.0.113.9");
    const lb = trustedProxies("10.0.0.0/8, 2001:db8::/32");
    // The load balancer appended the real peer; the client's own entries to its left are not believed.
    expect(resolveClientAddress("10.0.0.5", "1.2.3.4, 198.51.100.7", lb)).toBe("198.51.100.7");
    expect(resolveClientAddress("10.0.0.5", "198.51.100.7, 10.0.0.9", lb)).toBe("198.51.100.7");
    expect(resolveClientAddress("2001:db8::1", "not-an-ip", lb)).toBe("2001:db8::1");
    expect(() => trustedProxies("10.0.0.0/eight")).toThrow(/TRUSTED_PROXIES/);
  });

  it("reads only the header our own server sets, and only once that server marked the process", () => {
    const h = new Headers({ [CLIENT_ADDRESS_HEADER]: "198.51.100.7", "x-forwarded-for": "1.2.3.4" });
    expect(clientAddress(h)).toBe("unknown"); // next dev / bare next start: no socket address to trust
    trustClientAddressHeader();
    expect(clientAddress(h)).toBe("198.51.100.7");
    expect(clientAddress(new Headers({ "x-forwarded-for": "1.2.3.4" }))).toBe("unknown");
  });
});

describe("sign-in backoff: per (address, account), never a lock on the account", () => {
  it("rotating X-Forwarded-For does not reset the count for an address", async () => {
    trustClientAddressHeader();
    for (let i = 0; i < THROTTLE.freePerPair - 1; i++)
      expect(await signIn(`wrong ${i}`, "203.0.113.10", `10.9.9.${i}`)).toMatch(/do not match/);
    expect(await signIn("wrong last", "203.0.113.10", "10.9.9.250")).toMatch(/Wait 1 minute before trying again/);
    expect(await signIn(PASSWORD, "203.0.113.10", "10.9.9.251")).toMatch(/Wait 1 minute/);
  });

  it("the owner signs in from another address while the attacker's address waits", async () => {
    expect(await signIn(PASSWORD, "198.51.100.20")).toBe("ok");
  });

  it("waits double with each further failure (1, 2, 4 … minutes, at most an hour)", async () => {
    expect([1, 2, 3, 7, 20].map(backoffSec)).toEqual([60, 120, 240, 3600, 3600]);
    await db("rate_limits")
      .where("key", "like", "signin_pair_wait:%")
      .update({ expire: Date.now() - 1 });
    expect(await signIn("wrong again", "203.0.113.10")).toMatch(/Wait 2 minutes/);
  });

  it("slows, never locks, an account past the distributed-attack cap", async () => {
    await db("rate_limits")
      .where("key", "like", "signin_acct:%")
      .update({ points: THROTTLE.accountSlowAfter, expire: Date.now() + 3_600_000 });
    const t0 = performance.now();
    expect(await signIn(PASSWORD, "198.51.100.21")).toBe("ok");
    expect(performance.now() - t0).toBeGreaterThanOrEqual(THROTTLE.accountDelayMs - 50);
  });
});

describe("rate limits answer 429 with Retry-After, keyed on the trusted address", () => {
  it("sign-up: 20 an hour per address, whatever X-Forwarded-For says", async () => {
    trustClientAddressHeader();
    const statuses: number[] = [];
    for (let i = 0; i < 21; i++) {
      const res = await signup(
        req(
          "POST",
          "/api/account/signup",
          { name: "Many Accounts", email: `many${i}@example.test`, password: "a long enough password" },
          { [CLIENT_ADDRESS_HEADER]: "192.0.2.50", "x-forwarded-for": `10.0.${i}.1` },
        ),
        ctx(),
      );
      statuses.push(res.status);
      if (res.status === 429) {
        expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
        expect((await res.json()).error).toMatch(/^Too many sign-ups from your network\. Try again in \d+ minutes?\.$/);
      }
    }
    expect(statuses).toEqual([...Array(20).fill(202), 429]);
    expect(await db("pending_sign_ups").where("email", "like", "many%")).toHaveLength(20);
    // Another address is not affected.
    const other = await signup(
      req(
        "POST",
        "/api/account/signup",
        { name: "Other", email: "other@example.test", password: "a long enough password" },
        { [CLIENT_ADDRESS_HEADER]: "192.0.2.51" },
      ),
      ctx(),
    );
    expect(other.status).toBe(202);
  });

  it("forgot-password: 20 an hour per address", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 21; i++)
      statuses.push(
        (
          await forgot(
            req("POST", "/api/account/password/forgot", { email: `x${i}@example.test` }, { [CLIENT_ADDRESS_HEADER]: "192.0.2.60" }),
            ctx(),
          )
        ).status,
      );
    expect(statuses).toEqual([...Array(20).fill(200), 429]);
  });
});
