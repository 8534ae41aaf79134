import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { internalKeys } from "./support/apiKeys";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
const sent = vi.hoisted(() => [] as { to: string; subject: string; text: string }[]);
vi.mock("@/lib/platform/mail", () => ({
  sendMail: async (m: { to: string; subject: string; text: string }) => void sent.push(m),
  // The route's mail as it is queued (the queue itself: tests/integration/jobs.test.ts).
  queueMail: async (m: { to: string; subject: string; text: string }) => void sent.push(m),
  appOrigin: () => "http://127.0.0.1:3000",
}));

const db = testDb();
const SHOP_A = "0a000000-0000-4000-8000-00000000000a";
const SHOP_B = "0b000000-0000-4000-8000-00000000000b";
const U = {
  ownerA: { id: "0a000000-0000-4000-8000-000000000001", role: "shop_owner", shop_id: SHOP_A, email: "owner-a@example.test" },
  staffA: { id: "0a000000-0000-4000-8000-000000000002", role: "shop_staff", shop_id: SHOP_A, email: "staff-a@example.test" },
  ownerB: { id: "0b000000-0000-4000-8000-000000000001", role: "shop_owner", shop_id: SHOP_B, email: "owner-b@example.test" },
  member: { id: "0c000000-0000-4000-8000-000000000001", role: "member", shop_id: null, email: "member@example.test" },
};
const as = (u: (typeof U)[keyof typeof U]) => void (session.current = sessionOf(u));

beforeAll(async () => {
  await rebuild(db);
  await db("shops").insert([
    { id: SHOP_A, name: "Shop A" },
    { id: SHOP_B, name: "Shop B" },
  ]);
  const { hashPassword } = await import("@/lib/platform/auth/password");
  const hash = await hashPassword("member password 1");
  await db("users").insert(Object.values(U).map((u) => ({ ...u, name: u.email.split("@")[0], password_hash: hash })));
});
afterAll(() => closeDatabases(db));

const settings = await import("@/app/api/shop/settings/route");
const staff = await import("@/app/api/shop/staff/route");
const removeStaff = (await import("@/app/api/shop/staff/[id]/route")).DELETE;
const revoke = (await import("@/app/api/shop/staff/invites/[id]/route")).DELETE;
const join = (await import("@/app/api/join/route")).POST;

const GOOD = {
  name: "Shop A Tire",
  address: "1 Test Lane",
  phone: "555-0100",
  taxRate: "8.25",
  labourRate: "125",
  fabricationRate: "142.50",
  quoteValidityDays: "10",
  depositPct: "30",
  currency: "USD",
};

describe("shop settings", () => {
  it("owner saves them; money and rates are stored as integers (cents, basis points)", async () => {
    as(U.ownerA);
    const res = await settings.PUT(req("PUT", "/api/shop/settings", GOOD), ctx());
    expect(res.status).toBe(200);
    const saved = await res.json();
    expect(internalKeys(saved)).toEqual([]);
    // camelCase on purpose: the API shape of lib/shop/api.ts.
    expect(saved.shop).toMatchObject({
      name: "Shop A Tire",
      taxRateBp: 825,
      labourRateCents: 12500,
      fabricationRateCents: 14250,
      quoteValidityDays: 10,
      depositPct: 30,
    });
    const row = await db("shops").where({ id: SHOP_A }).first();
    expect(row).toMatchObject({
      name: "Shop A Tire",
      tax_rate_bp: 825,
      labour_rate_cents: 12500,
      fabrication_rate_cents: 14250,
      quote_validity_days: 10,
      deposit_pct: 30,
    });
  });

  it("staff read them but cannot change them (403, nothing written)", async () => {
    as(U.staffA);
    expect((await settings.GET(req("GET", "/api/shop/settings"), ctx())).status).toBe(200);
    const res = await settings.PUT(req("PUT", "/api/shop/settings", { ...GOOD, name: "Hijacked" }), ctx());
    expect(res.status).toBe(403);
    expect((await db("shops").where({ id: SHOP_A }).first()).name).toBe("Shop A Tire");
  });

  it("refuse a bad tax rate, a negative rate and a non-USD currency with field errors", async () => {
    as(U.ownerA);
    const res = await settings.PUT(req("PUT", "/api/shop/settings", { ...GOOD, taxRate: "31", labourRate: "-5", currency: "EUR" }), ctx());
    expect(res.status).toBe(422);
    expect(Object.keys((await res.json()).fieldErrors).sort()).toEqual(["currency", "labourRate", "taxRate"]);
  });

  it("each owner only ever sees their own shop", async () => {
    as(U.ownerB);
    const body = await (await settings.GET(req("GET", "/api/shop/settings"), ctx())).json();
    expect(body.shop.id).toBe(SHOP_B);
    expect(internalKeys(body)).toEqual([]);
  });
});

describe("staff invitations", () => {
  let token = "";
  it("owner invites by e-mail; the mail carries a single-use link", async () => {
    as(U.ownerA);
    sent.length = 0;
    const res = await staff.POST(req("POST", "/api/shop/staff", { email: "new-hire@example.test" }), ctx());
    expect(res.status).toBe(201);
    const made = await res.json();
    expect(internalKeys(made)).toEqual([]); // the invitation's token hash stays in the database
    expect(made.invite).toMatchObject({ email: "new-hire@example.test", expiresAt: expect.stringMatching(/Z$/) });
    expect(sent).toHaveLength(1);
    token = /\/join\/([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)?.[1] ?? "";
    expect(token).toHaveLength(43);
    const row = await db("staff_invites").where({ email: "new-hire@example.test" }).first();
    expect(row.token_hash).not.toContain(token); // only a hash is stored
  });

  it("staff cannot invite (403)", async () => {
    as(U.staffA);
    expect((await staff.POST(req("POST", "/api/shop/staff", { email: "x@example.test" }), ctx())).status).toBe(403);
  });

  it("accepting creates a shop_staff account in the inviting shop; the link then stops working", async () => {
    session.current = null;
    const res = await join(req("POST", "/api/join", { token, name: "New Hire", password: "a long enough pass" }), ctx());
    expect(res.status).toBe(200);
    expect(internalKeys(await res.json())).toEqual([]);
    const user = await db("users").where({ email: "new-hire@example.test" }).first();
    expect(user).toMatchObject({ role: "shop_staff", shop_id: SHOP_A, name: "New Hire" });
    const again = await join(req("POST", "/api/join", { token, name: "Someone", password: "a long enough pass" }), ctx());
    expect(again.status).toBe(410);
  });

  it("an expired invitation is refused and creates nothing", async () => {
    as(U.ownerA);
    sent.length = 0;
    await staff.POST(req("POST", "/api/shop/staff", { email: "late@example.test" }), ctx());
    const t = /\/join\/([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)![1];
    await db("staff_invites")
      .where({ email: "late@example.test" })
      .update({ expires_at: db.raw("now() - interval '1 minute'") });
    session.current = null;
    expect((await join(req("POST", "/api/join", { token: t, name: "Late", password: "a long enough pass" }), ctx())).status).toBe(410);
    expect(await db("users").where({ email: "late@example.test" }).first()).toBeUndefined();
  });

  it("an existing member joins only with the account's password", async () => {
    as(U.ownerB);
    sent.length = 0;
    await staff.POST(req("POST", "/api/shop/staff", { email: U.member.email }), ctx());
    const t = /\/join\/([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)![1];
    session.current = null;
    const wrong = await join(req("POST", "/api/join", { token: t, password: "not the password" }), ctx());
    expect(wrong.status).toBe(422);
    expect((await db("users").where({ id: U.member.id }).first()).role).toBe("member");
    const ok = await join(req("POST", "/api/join", { token: t, password: "member password 1" }), ctx());
    expect(ok.status).toBe(200);
    expect(await db("users").where({ id: U.member.id }).first()).toMatchObject({ role: "shop_staff", shop_id: SHOP_B });
  });

  it("another shop's owner cannot remove my staff or withdraw my invitations (404)", async () => {
    as(U.ownerA);
    sent.length = 0;
    const inv = await (await staff.POST(req("POST", "/api/shop/staff", { email: "pending@example.test" }), ctx())).json();
    as(U.ownerB);
    expect((await removeStaff(req("DELETE", `/api/shop/staff/${U.staffA.id}`), ctx({ id: U.staffA.id }))).status).toBe(404);
    expect((await revoke(req("DELETE", `/api/shop/staff/invites/${inv.invite.id}`), ctx({ id: inv.invite.id }))).status).toBe(404);
    expect((await db("users").where({ id: U.staffA.id }).first()).shop_id).toBe(SHOP_A);
    const list = await (await staff.GET(req("GET", "/api/shop/staff"), ctx())).json();
    expect(list.invites.map((i: { email: string }) => i.email)).not.toContain("pending@example.test");
    expect(list.team.length).toBeGreaterThan(0);
    expect(internalKeys(list)).toEqual([]);
  });

  it("the owner removes a staff member: the account stays, as a member", async () => {
    as(U.ownerA);
    expect((await removeStaff(req("DELETE", `/api/shop/staff/${U.staffA.id}`), ctx({ id: U.staffA.id }))).status).toBe(200);
    expect(await db("users").where({ id: U.staffA.id }).first()).toMatchObject({ role: "member", shop_id: null });
  });
});
