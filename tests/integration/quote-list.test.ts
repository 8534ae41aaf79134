import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U, VEHICLE, item, seedShops } from "./support/shopFixture";
import { canOpenQuote, quoteScopeOf } from "@/lib/shop/quotes/queries";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const customers = await import("@/app/api/shop/customers/route");
const quotes = await import("@/app/api/shop/quotes/route");
const exportRoute = (await import("@/app/api/shop/quotes/export/route")).GET;

/** Who the counter quoted, and for which vehicle; the last one is written by the owner, not by the staff member. */
const PEOPLE = [
  { name: "Łukasz Żmuda", phone: "(555) 010-4411", email: "lz@example.test", vehicle: "2019 Kestrel pickup" },
  { name: "Ines Ferreira", phone: "555 010 7720", email: "ines@example.test", vehicle: "Marlin two-door 4x4" },
  { name: '=HYPERLINK("http://x")', phone: "+1 555 010 9999", email: "", vehicle: "@SUM(1+1) trailer" },
  { name: "Owner's Walk-in", phone: "555-010-1234", email: "walkin@example.test", vehicle: "Heron wagon" },
];

const numbers: Record<string, number> = {};
beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
  const tire = await item(db, SHOP_A, "TR-EXAMPLE-35");
  const wheel = await item(db, SHOP_A, "WH-EXAMPLE-BL");
  for (const [i, p] of PEOPLE.entries()) {
    session.current = sessionOf(i === PEOPLE.length - 1 ? U.ownerA : U.staffA);
    const c = await (
      await customers.POST(req("POST", "/api/shop/customers", { name: p.name, phone: p.phone, email: p.email }), ctx())
    ).json();
    const body = {
      customerId: c.customer.id,
      vehicle: { ...VEHICLE, description: p.vehicle },
      tireItemId: tire.id,
      wheelItemId: wheel.id,
      quantity: 4,
    };
    const { id } = await (await quotes.POST(req("POST", "/api/shop/quotes", body), ctx())).json();
    numbers[p.name] = (await db("quotes").where({ id }).first()).number;
  }
  // Thirty more of the staff member's, to page through (names unlike any above).
  session.current = sessionOf(U.staffA);
  const c = await (
    await customers.POST(req("POST", "/api/shop/customers", { name: "Fleet Account", phone: "555 020 0000", email: "" }), ctx())
  ).json();
  for (let i = 0; i < 30; i++) {
    await quotes.POST(
      req("POST", "/api/shop/quotes", {
        customerId: c.customer.id,
        vehicle: { ...VEHICLE, description: `Fleet van ${i}` },
        tireItemId: tire.id,
        wheelItemId: wheel.id,
        quantity: 4,
      }),
      ctx(),
    );
  }
  await db("quotes")
    .where({ number: numbers["Ines Ferreira"] })
    .update({ status: "sent", valid_until: db.raw("now() + interval '7 days'") });
});
afterAll(() => closeDatabases(db));

/** The list as the owner (every quote of the shop) or the staff member (their own) reads it. */
async function list(search: string, who: typeof U.ownerA | typeof U.staffA = U.ownerA) {
  session.current = sessionOf(who);
  const res = await quotes.GET(req("GET", `/api/shop/quotes${search}`), ctx());
  return { status: res.status, body: await res.json() };
}
const namesOf = (body: { quotes: { customerName: string }[] }) => body.quotes.map((q) => q.customerName);

describe("the quotes list (search, status, order, pages)", () => {
  it("finds a quote by its number, with or without the Q- a printed quote shows", async () => {
    const n = numbers["Ines Ferreira"]!;
    for (const q of [String(n), `Q-${n}`, `q${n}`])
      expect(namesOf((await list(`?q=${encodeURIComponent(q)}`)).body), q).toContain("Ines Ferreira");
  });

  it("finds the customer by name with accents folded, by phone digits however typed, by e-mail, and by the vehicle", async () => {
    expect(namesOf((await list("?q=lukasz%20zmuda")).body)).toEqual(["Łukasz Żmuda"]);
    expect(namesOf((await list("?q=010-7720")).body)).toEqual(["Ines Ferreira"]);
    expect(namesOf((await list("?q=5550107720")).body)).toEqual(["Ines Ferreira"]);
    expect(namesOf((await list("?q=INES%40example.test")).body)).toEqual(["Ines Ferreira"]);
    expect(namesOf((await list("?q=marlin")).body)).toEqual(["Ines Ferreira"]);
  });

  it("finds nothing for a search with nothing to look for, rather than everything", async () => {
    const { body } = await list(`?q=${encodeURIComponent("´ ¨")}`);
    expect(body.total).toBe(0);
  });

  it("treats LIKE wildcards as the characters typed", async () => {
    expect((await list("?q=%25")).body.total).toBe(0);
    expect((await list("?q=_")).body.total).toBe(0);
  });

  it("filters by status as the list shows it", async () => {
    const { body } = await list("?status=sent");
    expect(namesOf(body)).toEqual(["Ines Ferreira"]);
    expect((await list("?status=draft")).body.total).toBe(33);
  });

  it("pages on the server in a stable order, with the number of matches", async () => {
    const first = (await list("?pageSize=25")).body;
    const second = (await list("?pageSize=25&page=2")).body;
    expect([first.total, first.quotes.length, second.quotes.length]).toEqual([34, 25, 9]);
    const ids = [...first.quotes, ...second.quotes].map((q: { id: string }) => q.id);
    expect(new Set(ids).size).toBe(34);
    const byNumber = (await list("?sort=number&pageSize=200")).body.quotes.map((q: { number: number }) => q.number);
    expect(byNumber).toEqual([...byNumber].sort((a, b) => b - a));
    expect(namesOf((await list("?sort=customer&pageSize=3")).body)[0]).toBe('=HYPERLINK("http://x")');
  });

  it("shows staff only the quotes they wrote", async () => {
    const { body } = await list("?q=heron", U.staffA);
    expect(body.total).toBe(0);
    expect((await list("?q=heron", U.ownerA)).body.total).toBe(1);
  });

  it("says which quotes a caller may open, by the same rule, for the links to them (calendar, work order)", async () => {
    const heron = (await list("?q=heron", U.ownerA)).body.quotes[0].id as string;
    const scope = (u: { role: string; id: string }) => quoteScopeOf({ shopId: SHOP_A, role: u.role, userId: u.id });
    expect(await canOpenQuote(db, scope(U.ownerA), heron)).toBe(true);
    expect(await canOpenQuote(db, scope(U.staffA), heron)).toBe(false);
    const { id: authorId } = await db("quotes").where({ id: heron }).first("created_by as id");
    expect(await canOpenQuote(db, { shopId: SHOP_A, createdBy: authorId }, heron)).toBe(true);
  });

  it("refuses a query the form could not send, naming the control", async () => {
    const tooLong = await list(`?q=${"x".repeat(101)}`);
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error).toMatch(/^Search: use at most 100 characters/);
    const badStatus = await list("?status=paid");
    expect([badStatus.status, badStatus.body.error]).toEqual([400, expect.stringMatching(/^Status: pick one of the statuses/)]);
    const badPage = await list("?page=0");
    expect(badPage.body.error).toMatch(/^Page: pages start at 1/);
  });
});

describe("the quotes list's CSV export", () => {
  async function exported(search: string) {
    session.current = sessionOf(U.ownerA);
    const res = await exportRoute(req("GET", `/api/shop/quotes/export${search}`), ctx());
    const text = await res.text();
    return { res, rows: Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true }).data };
  }

  it("exports every page of the same search, as a download", async () => {
    const { res, rows } = await exported("?status=draft");
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="quotes\.csv"/);
    expect(rows).toHaveLength(33);
    const ines = (await exported("?q=marlin")).rows;
    expect(ines).toHaveLength(1);
    expect(ines[0]).toMatchObject({
      quote: `Q-${numbers["Ines Ferreira"]}`,
      customer: "Ines Ferreira",
      status: "Sent",
      vehicle: "Marlin two-door 4x4",
    });
    expect(ines[0]!.total).toMatch(/^\d+\.\d{2}$/);
  });

  // OWASP "CSV Injection": a text cell starting with = + - @ is prefixed with a single quote.
  it("neutralizes cells a spreadsheet would run as formulas", async () => {
    const [row] = (await exported(`?q=${encodeURIComponent("HYPERLINK")}`)).rows;
    expect(row).toMatchObject({ customer: '\'=HYPERLINK("http://x")', phone: "'+1 555 010 9999", vehicle: "'@SUM(1+1) trailer" });
  });
});
