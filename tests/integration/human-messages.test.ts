import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { U, VEHICLE, seedShops } from "./support/shopFixture";

/**
 * Wrong-typed values sent straight to the API (a stale form, a script, a hand-edited request):
 * every message that comes back is one a person can read. No validator wording ("Invalid
 * input: expected null, received string", "Too small: expected number to be >=1"), no raw
 * paths ("lines.8.discountCents") or field identifiers ("wheelWidthIn"), and rows are counted
 * from 1 the way a person counts them.
 */
const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
vi.mock("next/cache", () => ({ revalidatePath: () => {} }));
vi.mock("@/lib/platform/mail", () => ({
  sendMail: async () => {},
  queueMail: async () => "job",
  appOrigin: () => "http://127.0.0.1:3000",
}));

const db = testDb();
const MEMBER = {
  id: "d4000000-0000-4000-8000-000000000001",
  role: "member",
  shop_id: null,
  email: "human@example.test",
  name: "Ines Varro",
};
beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
  await db("users").insert({ ...MEMBER, password_hash: "x" });
});
afterAll(() => closeDatabases(db));

const signup = (await import("@/app/api/account/signup/route")).POST;
const forgot = (await import("@/app/api/account/password/forgot/route")).POST;
const reset = (await import("@/app/api/account/password/reset/route")).POST;
const join = (await import("@/app/api/join/route")).POST;
const comparisons = (await import("@/app/api/comparisons/route")).POST;
const vehicles = (await import("@/app/api/vehicles/route")).POST;
const customers = (await import("@/app/api/shop/customers/route")).POST;
const quotes = await import("@/app/api/shop/quotes/route");
const quoteById = await import("@/app/api/shop/quotes/[id]/route");

/** What a validator says by itself (zod 4's English messages), and raw paths or identifiers. */
const VALIDATOR_WORDING =
  /Invalid input|expected \w+, received|Too (small|big)|Invalid (option|UUID|string|email|format|element|key)|Unrecognized key|>=|<=/;
const RAW_PATH = /\b[A-Za-z]\w*\.\d+(\.\w+)?\b|\b[a-z]+[A-Z]\w*\b/;

async function messagesOf(res: Response): Promise<{ status: number; error: string; fieldErrors: Record<string, string[]> }> {
  const body = await res.json();
  return { status: res.status, error: body.error, fieldErrors: body.fieldErrors ?? {} };
}

function expectHuman({ error, fieldErrors }: { error: string; fieldErrors: Record<string, string[]> }) {
  const all = [error, ...Object.values(fieldErrors).flat()];
  for (const m of all) {
    expect(m, m).not.toMatch(VALIDATOR_WORDING);
    expect(m, m).not.toMatch(RAW_PATH);
    expect(m.trim().length, "empty message").toBeGreaterThan(3);
  }
  // A message about a row names it counted from 1 (key lines.8.x → "Line 9").
  for (const [key, messages] of Object.entries(fieldErrors)) {
    const index = key.split(".").find((s) => /^\d+$/.test(s));
    if (index !== undefined)
      for (const m of messages) expect(m, `${key}: ${m}`).toMatch(new RegExp(`\\b[A-Za-z]+ ${Number(index) + 1}\\b`));
  }
}

describe("messages from the API are for people", () => {
  it("account forms: sign-up, forgot and reset password, join", async () => {
    session.current = null;
    const up = await messagesOf(await signup(req("POST", "/api/account/signup", { name: 5, email: 7, password: true }), ctx()));
    expect(up.status).toBe(422);
    expect(Object.keys(up.fieldErrors).sort()).toEqual(["email", "name", "password"]);
    expectHuman(up);

    const fp = await messagesOf(await forgot(req("POST", "/api/account/password/forgot", { email: ["a"] }), ctx()));
    expect(fp.status).toBe(422);
    expectHuman(fp);

    const rp = await messagesOf(
      await reset(req("POST", "/api/account/password/reset", { token: 12, password: null, confirm: false }), ctx()),
    );
    expect(rp.status).toBe(422);
    expect(Object.keys(rp.fieldErrors).sort()).toEqual(["confirm", "password", "token"]);
    expectHuman(rp);

    const jn = await messagesOf(await join(req("POST", "/api/join", { token: 5, name: 9, password: {} }), ctx()));
    expect(jn.status).toBe(422);
    expect(Object.keys(jn.fieldErrors).sort()).toEqual(["name", "password", "token"]);
    expectHuman(jn);
  });

  it("a saved comparison with wrong-typed and missing values", async () => {
    session.current = sessionOf(MEMBER);
    const input = {
      ...DEFAULT_INPUT,
      current: { ...DEFAULT_INPUT.current, wheelWidthIn: "8" },
      vehicle: { ...DEFAULT_INPUT.vehicle, cruiseSpeedsMph: [55, "sixty"] },
    };
    const res = await messagesOf(await comparisons(req("POST", "/api/comparisons", { name: 12, input, vehicleId: 3 }), ctx()));
    expect(res.status).toBe(422);
    expect(Object.keys(res.fieldErrors).length).toBeGreaterThan(1);
    expectHuman(res);

    const empty = await messagesOf(await comparisons(req("POST", "/api/comparisons", { input: null }), ctx()));
    expect(empty.status).toBe(422);
    expectHuman(empty);
  });

  it("a garage vehicle with wrong-typed values", async () => {
    session.current = sessionOf(MEMBER);
    const res = await messagesOf(
      await vehicles(req("POST", "/api/vehicles", { name: 4, year: "last year", frontSuspension: 2, currentSetup: "big" }), ctx()),
    );
    expect(res.status).toBe(422);
    expectHuman(res);
  });

  it("a quote whose ninth line is wrong-typed says “Line 9”", async () => {
    session.current = sessionOf(U.staffA);
    const customer = await (
      await customers(req("POST", "/api/shop/customers", { name: "Rhea Calloway", phone: "555 010 4477", email: "" }), ctx())
    ).json();
    const created = await quotes.POST(
      req("POST", "/api/shop/quotes", {
        customerId: customer.customer.id,
        vehicle: VEHICLE,
        tireItemId: (await db("catalog_items").where({ shop_id: U.staffA.shop_id, kind: "tire" }).first()).id,
        wheelItemId: (await db("catalog_items").where({ shop_id: U.staffA.shop_id, kind: "wheel" }).first()).id,
        quantity: 4,
      }),
      ctx(),
    );
    expect(created.status).toBe(201);
    const id = (await created.json()).id as string;
    const line = { kind: "custom", sku: "", description: "Labour", quantity: 1, unitPriceCents: 1000, discountCents: 0, taxable: false };
    const lines = Array.from({ length: 9 }, () => ({ ...line }));
    lines[8] = { ...line, quantity: "two", unitPriceCents: "ten", discountCents: -5, taxable: "yes" } as never;
    const res = await messagesOf(
      await quoteById.PUT(req("PUT", `/api/shop/quotes/${id}`, { lines, discountCents: "none", notes: 3 }), ctx({ id })),
    );
    expect(res.status).toBe(422);
    expect(Object.keys(res.fieldErrors)).toEqual(
      expect.arrayContaining(["lines.8.quantity", "lines.8.unitPriceCents", "lines.8.discountCents", "lines.8.taxable", "discountCents"]),
    );
    expectHuman(res);
    expect(res.fieldErrors["lines.8.unitPriceCents"]![0]).toMatch(/^Line 9: .*unit price/);

    // Totals the engine refuses after the schema passed: the discount of line 9 is more than its amount.
    lines[8] = { ...line, discountCents: 5000 };
    const over = await messagesOf(
      await quoteById.PUT(req("PUT", `/api/shop/quotes/${id}`, { lines, discountCents: 0, notes: "" }), ctx({ id })),
    );
    expect(over.status).toBe(422);
    expectHuman(over);
  });
});
