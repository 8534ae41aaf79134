import { NextRequest } from "next/server";
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx, sessionOf } from "./support/requests";
import { U, seedShops } from "./support/shopFixture";

/**
 * Security review: what route() refuses before any handler runs — requests from other sites
 * (Origin), bodies that are not declared JSON (a cross-site form can send text/plain without
 * asking), and NUL characters, which PostgreSQL cannot store and which used to answer 500.
 */
const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
vi.mock("@/lib/platform/mail", () => ({ sendMail: async () => {}, appOrigin: () => "https://hubface.example" }));
vi.mock("@/lib/platform/mail/transactional", () => ({ queueMailIn: async () => "job" }));

const db = testDb();
beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
  process.env.APP_ORIGIN = "https://hubface.example";
});
afterEach(() => void (session.current = null));
afterAll(async () => {
  delete process.env.APP_ORIGIN;
  await closeDatabases(db);
});

const signup = (await import("@/app/api/account/signup/route")).POST;
const comparisons = await import("@/app/api/comparisons/route");
const customers = (await import("@/app/api/shop/customers/route")).POST;
const vehicles = (await import("@/app/api/vehicles/route")).POST;
const quoteAction = (await import("@/app/api/q/[token]/route")).POST;
const webhook = (await import("@/app/api/payments/webhook/route")).POST;

const SESSION_COOKIE = "next-auth.session-token=eyJhbGciOiJkaXIifQ..x.y.z";
const fresh = (() => {
  let n = 0;
  return () => `guard${++n}@example.test`;
})();
function post(path: string, body: string, headers: Record<string, string>) {
  return new NextRequest(`http://127.0.0.1:3000${path}`, { method: "POST", body, headers });
}
const account = () => JSON.stringify({ name: "Ada Guard", email: fresh(), password: "a long enough password" });
const comparison = JSON.stringify({ name: "Guarded", vehicle: null, stock: null, planned: null });

describe("requests from other sites (Origin)", () => {
  it("refuses a state-changing request whose Origin is another site with 403, and writes nothing", async () => {
    const before = await db("pending_sign_ups").count<{ count: string }[]>();
    for (const origin of ["https://evil.example", "null", "http://127.0.0.1:3000.evil.example", "https://hubface.example.evil.example"]) {
      const res = await signup(post("/api/account/signup", account(), { "content-type": "application/json", origin }), ctx());
      expect(res.status, origin).toBe(403);
      expect((await res.json()).error).toMatch(/another site/);
    }
    session.current = sessionOf(U.ownerA);
    const res = await customers(
      post("/api/shop/customers", JSON.stringify({ name: "Cross Site" }), {
        "content-type": "application/json",
        origin: "https://evil.example",
        cookie: SESSION_COOKIE,
      }),
      ctx(),
    );
    expect(res.status).toBe(403);
    expect(await db("pending_sign_ups").count()).toEqual(before);
    expect(await db("customers").where({ name: "Cross Site" })).toHaveLength(0);
  });

  it("takes APP_ORIGIN and the request's own host as same-site", async () => {
    expect(
      (
        await signup(
          post("/api/account/signup", account(), { "content-type": "application/json", origin: "https://hubface.example" }),
          ctx(),
        )
      ).status,
    ).toBe(202);
    expect(
      (
        await signup(
          post("/api/account/signup", account(), {
            "content-type": "application/json",
            origin: "http://127.0.0.1:3000",
            host: "127.0.0.1:3000",
          }),
          ctx(),
        )
      ).status,
    ).toBe(202);
  });

  it("without Origin: a caller with no session cookie (curl, a script) may go on; with a session cookie it is refused", async () => {
    expect((await signup(post("/api/account/signup", account(), { "content-type": "application/json" }), ctx())).status).toBe(202);
    session.current = sessionOf(U.ownerA);
    const refused = await customers(
      post("/api/shop/customers", JSON.stringify({ name: "No Origin" }), { "content-type": "application/json", cookie: SESSION_COOKIE }),
      ctx(),
    );
    expect(refused.status).toBe(403);
    // A browser that leaves Origin out still says where the request came from.
    const crossSite = await customers(
      post("/api/shop/customers", JSON.stringify({ name: "No Origin" }), {
        "content-type": "application/json",
        cookie: SESSION_COOKIE,
        "sec-fetch-site": "cross-site",
      }),
      ctx(),
    );
    expect(crossSite.status).toBe(403);
    expect(await db("customers").where({ name: "No Origin" })).toHaveLength(0);
  });

  it("leaves reads alone and keeps the payment webhook (no Origin, no cookie) reachable", async () => {
    session.current = sessionOf(U.ownerA);
    const list = await comparisons.GET(
      new NextRequest("http://127.0.0.1:3000/api/comparisons", { headers: { origin: "https://evil.example", cookie: SESSION_COOKIE } }),
      ctx(),
    );
    expect(list.status).toBe(200);
    session.current = null;
    // Unsigned: refused by the signature check (400), not by the Origin check (403).
    const hook = await webhook(post("/api/payments/webhook", "{}", { "stripe-signature": "t=1,v1=00" }), ctx());
    expect(hook.status).toBe(400);
  });
});

describe("bodies that are not declared JSON", () => {
  it("refuses text/plain, form and missing Content-Type with 415, and writes nothing", async () => {
    for (const type of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", null]) {
      const res = await signup(post("/api/account/signup", account(), type ? { "content-type": type } : {}), ctx());
      expect(res.status, String(type)).toBe(415);
      expect((await res.json()).error).toBe("Send JSON with Content-Type: application/json.");
    }
    session.current = sessionOf(U.ownerA);
    expect(
      (await comparisons.POST(post("/api/comparisons", comparison, { "content-type": "text/plain;charset=UTF-8" }), ctx())).status,
    ).toBe(415);
    expect(await db("pending_sign_ups").where("email", "like", "guard%").count<{ count: string }[]>()).toEqual([{ count: "3" }]);
  });

  it("takes application/json with a charset", async () => {
    const res = await signup(post("/api/account/signup", account(), { "content-type": "application/json; charset=utf-8" }), ctx());
    expect(res.status).toBe(202);
  });
});

describe("NUL characters", () => {
  const json = { "content-type": "application/json" };
  it("in a body field: 422 naming the field, on several routes, never 500", async () => {
    const res = await signup(
      post("/api/account/signup", JSON.stringify({ name: "Nul\u0000Name", email: fresh(), password: "a long enough password" }), json),
      ctx(),
    );
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors).toEqual({
      name: ["The name contains a NUL character (\\0), which Hubface cannot store. Remove it and try again."],
    });

    session.current = sessionOf(U.ownerA);
    const cust = await customers(post("/api/shop/customers", JSON.stringify({ name: "Ok", notes: "a\u0000b" }), json), ctx());
    expect(cust.status).toBe(422);
    expect(Object.keys((await cust.json()).fieldErrors)).toEqual(["notes"]);

    const veh = await vehicles(
      post("/api/vehicles", JSON.stringify({ name: "Truck\u0000", frontSuspension: "independent", boltPattern: "6x139.7" }), json),
      ctx(),
    );
    expect(veh.status).toBe(422);
    expect((await veh.json()).fieldErrors.name[0]).toMatch(/The name contains a NUL/);

    const cmp = await comparisons.POST(post("/api/comparisons", JSON.stringify({ name: "x\u0000" }), json), ctx());
    expect(cmp.status).toBe(422);
  });

  it("in a query parameter: 400 naming the parameter", async () => {
    session.current = sessionOf(U.ownerA);
    const res = await comparisons.GET(new NextRequest("http://127.0.0.1:3000/api/comparisons?q=wheel%00s"), ctx());
    expect(res.status).toBe(400);
    expect((await res.json()).fieldErrors.q[0]).toMatch(/The q contains a NUL/);
  });

  it("in a path part: 400 naming it", async () => {
    const res = await quoteAction(
      post(`/api/q/x`, JSON.stringify({ action: "accept" }), json),
      ctx({ token: `${"A".repeat(21)}\u0000${"A".repeat(21)}` }),
    );
    expect(res.status).toBe(400);
    expect((await res.json()).fieldErrors.token[0]).toMatch(/The token contains a NUL/);
  });
});
