import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U, VEHICLE, item, seedShops } from "./support/shopFixture";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
const sent = vi.hoisted(() => [] as { to: string; text: string; attachments?: { filename: string; content: Buffer }[] }[]);
vi.mock("@/lib/mail", () => ({ sendMail: async (m: (typeof sent)[number]) => void sent.push(m), appOrigin: () => "http://127.0.0.1:3000" }));

const db = testDb();
const as = (u: (typeof U)[keyof typeof U]) => void (session.current = sessionOf(u));
beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
});
afterAll(async () => {
  await db.destroy();
  const { db: appDb } = await import("@/lib/db");
  await appDb.destroy();
});

const customers = await import("@/app/api/shop/customers/route");
const customerById = (await import("@/app/api/shop/customers/[id]/route")).GET;
const candidates = (await import("@/app/api/shop/fitment/candidates/route")).POST;
const quotes = await import("@/app/api/shop/quotes/route");
const quoteById = await import("@/app/api/shop/quotes/[id]/route");
const status = (await import("@/app/api/shop/quotes/[id]/status/route")).POST;
const send = (await import("@/app/api/shop/quotes/[id]/send/route")).POST;
const pdfRoute = (await import("@/app/api/shop/quotes/[id]/pdf/route")).GET;

async function pdfText(buf: Buffer): Promise<string> {
  const { PDFParse } = await import("pdf-parse");
  const parser = new PDFParse({ data: new Uint8Array(buf) });
  try {
    return (await parser.getText()).text;
  } finally {
    await parser.destroy();
  }
}

let customerId = "";
let quoteId = "";

describe("customers", () => {
  it("are created once and found again by phone digits or e-mail", async () => {
    as(U.staffA);
    const res = await customers.POST(req("POST", "/api/shop/customers", { name: "Dace Holloway", phone: "(555) 013-2277", email: "dace@example.test" }), ctx());
    expect(res.status).toBe(201);
    customerId = (await res.json()).customer.id;
    const byPhone = await (await customers.GET(req("GET", "/api/shop/customers?q=555-013-2277"), ctx())).json();
    expect(byPhone.customers.map((c: { id: string }) => c.id)).toEqual([customerId]);
    const byMail = await (await customers.GET(req("GET", "/api/shop/customers?q=DACE@example.test"), ctx())).json();
    expect(byMail.customers).toHaveLength(1);
    const dup = await customers.POST(req("POST", "/api/shop/customers", { name: "Dace H", phone: "555 013 2277", email: "" }), ctx());
    expect(dup.status).toBe(409);
  });

  it("of one shop are invisible to another (search empty, direct id 404)", async () => {
    as(U.staffB);
    expect((await (await customers.GET(req("GET", "/api/shop/customers?q=5550132277"), ctx())).json()).customers).toEqual([]);
    expect((await customerById(req("GET", `/api/shop/customers/${customerId}`), ctx({ id: customerId }))).status).toBe(404);
  });
});

describe("fitment candidates", () => {
  it("offer only wheels of the vehicle's bolt pattern, ranked by the engine's comparison", async () => {
    as(U.staffA);
    const body = await (await candidates(req("POST", "/api/shop/fitment/candidates", VEHICLE), ctx())).json();
    // The template has two 6-lug wheels (6x5.5 and 6x139.7, equivalent) and one 17 in tire.
    expect(body.wheelsFitting).toBe(2);
    expect(body.picks).toHaveLength(2);
    // 35x12.50R17LT (889 mm) vs 265/70R17 (802.8 mm): +86.2 mm (ISO 4000-1 / TRA designations).
    expect(body.picks[0].summary.diameterChangeMm).toBeCloseTo(889 - 802.8, 6);
    const five = await (await candidates(req("POST", "/api/shop/fitment/candidates", { ...VEHICLE, boltPattern: "5x5" }), ctx())).json();
    expect(five.picks).toEqual([]);
  });

  it("refuse an unreadable size with the engine's message on the field", async () => {
    as(U.staffA);
    const res = await candidates(req("POST", "/api/shop/fitment/candidates", { ...VEHICLE, tireSize: "big ones" }), ctx());
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors.tireSize[0]).toMatch(/big ones/);
  });
});

describe("quotes", () => {
  it("a draft gets tire, wheel and the suggested services, totals computed on the server", async () => {
    as(U.staffA);
    const tire = await item(db, SHOP_A, "TR-EXAMPLE-35");
    const wheel = await item(db, SHOP_A, "WH-EXAMPLE-BL");
    const res = await quotes.POST(req("POST", "/api/shop/quotes", { customerId, vehicle: VEHICLE, saveVehicle: true, tireItemId: tire.id, wheelItemId: wheel.id, quantity: 4 }), ctx());
    expect(res.status).toBe(201);
    quoteId = (await res.json()).id;
    const d = await (await quoteById.GET(req("GET", `/api/shop/quotes/${quoteId}`), ctx({ id: quoteId }))).json();
    expect(d.lines.map((l: { sku: string; quantity: number }) => `${l.sku}×${l.quantity}`)).toEqual([
      "TR-EXAMPLE-35×4", "WH-EXAMPLE-BL×4", "SV-MB×4", "SV-BL×4", "SV-VS×4", "SV-AL×1", "SV-FT×1", "SV-DP×4",
    ]);
    // The 35 in tire on the −12.7 mm beadlock reaches ≈ 59 mm further out than 265/70R17 on +25 mm, past the 25 mm
    // poke rule, so one hour of fender trimming is suggested too.
    expect(d.quote.fitment.outerPokeChangeMm).toBeGreaterThan(25);
    // By hand: parts 4 × 389 + 4 × 465 = 3416.00 taxable; services 120 + 180 + 20 + 129 + 145 + 16 = 610.00 untaxed.
    // Tax 3416.00 × 8.25 % = 281.82; total 4026.00 + 281.82 = 4307.82; deposit 25 % = 1076.955 → 1076.96.
    expect(d.quote).toMatchObject({ subtotal_cents: 402600, taxable_cents: 341600, tax_cents: 28182, total_cents: 430782, deposit_cents: 107696, status: "draft" });
    expect(d.events).toEqual([expect.objectContaining({ to_status: "draft", actor: "Sam Staff", actor_user_id: U.staffA.id })]);
    const saved = await db("customer_vehicles").where({ customer_id: customerId });
    expect(saved).toHaveLength(1);
  });

  it("edits recompute totals on the server; a negative quantity is refused and nothing changes", async () => {
    as(U.staffA);
    const line = { kind: "custom", sku: "", description: "Labour", quantity: 2, unitPriceCents: 6250, discountCents: 0, taxable: false };
    const ok = await quoteById.PUT(req("PUT", `/api/shop/quotes/${quoteId}`, { lines: [line], discountCents: 1000, notes: "" }), ctx({ id: quoteId }));
    expect(ok.status).toBe(200);
    expect((await ok.json()).quote).toMatchObject({ subtotal_cents: 12500, discount_cents: 1000, tax_cents: 0, total_cents: 11500 });
    const bad = await quoteById.PUT(req("PUT", `/api/shop/quotes/${quoteId}`, { lines: [{ ...line, quantity: -4 }], discountCents: 0, notes: "" }), ctx({ id: quoteId }));
    expect(bad.status).toBe(422);
    expect((await bad.json()).fieldErrors["lines.0.quantity"]).toBeDefined();
    const tooMuch = await quoteById.PUT(req("PUT", `/api/shop/quotes/${quoteId}`, { lines: [line], discountCents: 99999, notes: "" }), ctx({ id: quoteId }));
    expect(tooMuch.status).toBe(422);
    const row = await db("quotes").where({ id: quoteId }).first();
    expect(row).toMatchObject({ total_cents: 11500, discount_cents: 1000 });
    expect(await db("quote_lines").where({ quote_id: quoteId })).toHaveLength(1);
  });

  it("another shop's staff and owner get 404 for the quote; a colleague sees only their own, the owner all", async () => {
    for (const who of [U.staffB, U.ownerB, U.staffA2]) {
      as(who);
      expect((await quoteById.GET(req("GET", `/api/shop/quotes/${quoteId}`), ctx({ id: quoteId }))).status).toBe(404);
      expect((await quoteById.PUT(req("PUT", `/api/shop/quotes/${quoteId}`, { lines: [{ kind: "custom", description: "x", quantity: 1, unitPriceCents: 1 }], discountCents: 0 }), ctx({ id: quoteId }))).status).toBe(404);
      expect((await (await quotes.GET(req("GET", "/api/shop/quotes"), ctx())).json()).quotes).toEqual([]);
    }
    as(U.ownerA);
    expect((await quoteById.GET(req("GET", `/api/shop/quotes/${quoteId}`), ctx({ id: quoteId }))).status).toBe(200);
    expect((await (await quotes.GET(req("GET", "/api/shop/quotes"), ctx())).json()).quotes).toHaveLength(1);
  });

  it("cannot use another shop's catalog items", async () => {
    as(U.staffB);
    const mine = await item(db, SHOP_A, "TR-EXAMPLE-35");
    const wheel = await item(db, SHOP_A, "WH-EXAMPLE-17");
    const other = await db("customers").insert({ shop_id: "0b000000-0000-4000-8000-00000000000b", name: "B customer", phone: "5550000000", phone_digits: "5550000000" }).returning("id");
    const res = await quotes.POST(req("POST", "/api/shop/quotes", { customerId: other[0].id, vehicle: VEHICLE, tireItemId: mine.id, wheelItemId: wheel.id, quantity: 4 }), ctx());
    expect(res.status).toBe(422);
    expect(await db("quotes").where({ shop_id: "0b000000-0000-4000-8000-00000000000b" })).toEqual([]);
  });

  it("refuses moves the status flow does not allow, and records who made each allowed one", async () => {
    as(U.staffA);
    expect((await status(req("POST", `/api/shop/quotes/${quoteId}/status`, { to: "installed" }), ctx({ id: quoteId }))).status).toBe(409);
    expect((await status(req("POST", `/api/shop/quotes/${quoteId}/status`, { to: "declined" }), ctx({ id: quoteId }))).status).toBe(409);
  });
});

describe("sending", () => {
  let sentId = "";
  it("mails the customer a PDF with the quote's numbers and an unguessable link; the quote becomes sent", async () => {
    as(U.staffA);
    const tire = await item(db, SHOP_A, "TR-EXAMPLE-35");
    const wheel = await item(db, SHOP_A, "WH-EXAMPLE-BL");
    sentId = (await (await quotes.POST(req("POST", "/api/shop/quotes", { customerId, vehicle: VEHICLE, tireItemId: tire.id, wheelItemId: wheel.id, quantity: 5 }), ctx())).json()).id;
    sent.length = 0;
    const res = await send(req("POST", `/api/shop/quotes/${sentId}/send`, {}), ctx({ id: sentId }));
    expect(res.status).toBe(200);
    const d = await res.json();
    expect(d.quote.status).toBe("sent");
    expect(d.events.map((e: { to_status: string; actor: string }) => `${e.to_status}:${e.actor}`)).toEqual(["draft:Sam Staff", "sent:Sam Staff"]);
    expect(sent).toHaveLength(1);
    expect(sent[0]!.to).toBe("dace@example.test");
    const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)?.[1];
    expect(token).toHaveLength(43); // 32 random bytes = 256 bits
    const row = await db("quotes").where({ id: sentId }).first();
    expect(row.public_token_hash).not.toContain(token);
    expect(new Date(row.valid_until).getTime() - Date.now()).toBeGreaterThan(13.9 * 86400e3); // shop A: 14 days

    const att = sent[0]!.attachments![0]!;
    expect(att.filename).toBe(`quote-Q-${d.quote.number}.pdf`);
    const text = await pdfText(att.content);
    const money = (c: number) => "$" + (c / 100).toLocaleString("en-US", { minimumFractionDigits: 2 });
    for (const s of [`Quote Q-${d.quote.number}`, "Shop A", "Dace Holloway", "TR-EXAMPLE-35", money(d.quote.subtotal_cents), money(d.quote.tax_cents), money(d.quote.total_cents), money(d.quote.deposit_cents), "Bead seating", "Beadlock rings", "re-check"]) {
      expect(text).toContain(s);
    }
    // 5 tires at 389.00 = 1,945.00 appears as a line amount.
    expect(text).toContain("$1,945.00");
  });

  it("serves the PDF to the shop only (another shop: 404)", async () => {
    as(U.ownerA);
    const res = await pdfRoute(req("GET", `/api/shop/quotes/${sentId}/pdf`), ctx({ id: sentId }));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect((await pdfText(Buffer.from(await res.arrayBuffer()))).length).toBeGreaterThan(500);
    as(U.staffB);
    expect((await pdfRoute(req("GET", `/api/shop/quotes/${sentId}/pdf`), ctx({ id: sentId }))).status).toBe(404);
    expect((await send(req("POST", `/api/shop/quotes/${sentId}/send`, {}), ctx({ id: sentId }))).status).toBe(404);
  });

  it("a sent quote cannot be edited until taken back to draft, which voids the link", async () => {
    as(U.staffA);
    const edit = await quoteById.PUT(req("PUT", `/api/shop/quotes/${sentId}`, { lines: [{ kind: "custom", description: "x", quantity: 1, unitPriceCents: 1 }], discountCents: 0 }), ctx({ id: sentId }));
    expect(edit.status).toBe(409);
    const back = await status(req("POST", `/api/shop/quotes/${sentId}/status`, { to: "draft" }), ctx({ id: sentId }));
    expect(back.status).toBe(200);
    expect((await db("quotes").where({ id: sentId }).first()).public_token_hash).toBeNull();
  });

  it("refuses to send without a customer e-mail", async () => {
    as(U.staffA);
    const c = (await (await customers.POST(req("POST", "/api/shop/customers", { name: "No Mail", phone: "555 777 1212", email: "" }), ctx())).json()).customer;
    const tire = await item(db, SHOP_A, "TR-EXAMPLE-35");
    const wheel = await item(db, SHOP_A, "WH-EXAMPLE-17");
    const id = (await (await quotes.POST(req("POST", "/api/shop/quotes", { customerId: c.id, vehicle: VEHICLE, tireItemId: tire.id, wheelItemId: wheel.id, quantity: 4 }), ctx())).json()).id;
    const res = await send(req("POST", `/api/shop/quotes/${id}/send`, {}), ctx({ id }));
    expect(res.status).toBe(422);
    expect((await db("quotes").where({ id }).first()).status).toBe("draft");
  });
});
