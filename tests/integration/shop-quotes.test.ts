import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U, VEHICLE, item, quoteRequest, seedShops } from "./support/shopFixture";
import { internalKeys } from "./support/apiKeys";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
const sent = vi.hoisted(() => [] as { to: string; text: string; html: string; attachments?: { filename: string; content: Buffer }[] }[]);
// The mail as it is queued (the queue itself: tests/integration/jobs.test.ts).
vi.mock("@/lib/platform/mail", () => ({
  queueMail: async (m: (typeof sent)[number]) => void sent.push(m),
  appOrigin: () => "http://127.0.0.1:3000",
}));

const db = testDb();
const as = (u: (typeof U)[keyof typeof U]) => void (session.current = sessionOf(u));
beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
});
afterAll(() => closeDatabases(db));

const customers = await import("@/app/api/shop/customers/route");
const customerById = (await import("@/app/api/shop/customers/[id]/route")).GET;
const candidates = (await import("@/app/api/shop/fitment/candidates/route")).POST;
const quotes = await import("@/app/api/shop/quotes/route");
const quoteById = await import("@/app/api/shop/quotes/[id]/route");
const status = (await import("@/app/api/shop/quotes/[id]/status/route")).POST;
const send = (await import("@/app/api/shop/quotes/[id]/send/route")).POST;
const pdfRoute = (await import("@/app/api/shop/quotes/[id]/pdf/route")).GET;
const paymentsRoute = (await import("@/app/api/shop/quotes/[id]/payments/route")).GET;
const staffRoute = (await import("@/app/api/shop/staff/route")).GET;

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
    const res = await customers.POST(
      req("POST", "/api/shop/customers", { name: "Dace Holloway", phone: "(555) 013-2277", email: "dace@example.test" }),
      ctx(),
    );
    expect(res.status).toBe(201);
    const made = await res.json();
    expect(internalKeys(made)).toEqual([]);
    customerId = made.customer.id;
    const byPhone = await (await customers.GET(req("GET", "/api/shop/customers?q=555-013-2277"), ctx())).json();
    expect(internalKeys(byPhone)).toEqual([]);
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
    expect(internalKeys(body)).toEqual([]);
    expect(body.picks[0].wheel).toMatchObject({ boltPattern: expect.stringMatching(/^6x/), centerBoreMm: 108 }); // camelCase on purpose: lib/shop/catalog/api.ts
    // The template has two 6-lug wheels (6x5.5 and 6x139.7, equivalent) and one 17 in tire.
    expect(body.wheelsFitting).toBe(2);
    expect(body.picks).toHaveLength(2);
    // 35x12.50R17LT (889 mm) vs 265/70R17 (802.8 mm): +86.2 mm (ISO 4000-1 / TRA designations).
    expect(body.picks[0].summary.diameterChangeMm).toBeCloseTo(889 - 802.8, 6);
    const five = await (await candidates(req("POST", "/api/shop/fitment/candidates", { ...VEHICLE, boltPattern: "5x5" }), ctx())).json();
    expect(five.picks).toEqual([]);
  });

  it("leave out wheels whose centre bore is smaller than the hub, and ask for rings where it is larger", async () => {
    as(U.staffA);
    // Both 6-lug template wheels have a 108 mm bore: too small for a 110 mm hub, larger than a 106.1 mm one.
    const big = await (await candidates(req("POST", "/api/shop/fitment/candidates", { ...VEHICLE, hubBoreMm: 110 }), ctx())).json();
    expect(big.wheelsFitting).toBe(0);
    expect(big.picks).toEqual([]);
    const small = await (await candidates(req("POST", "/api/shop/fitment/candidates", { ...VEHICLE, hubBoreMm: "106.1" }), ctx())).json();
    expect(small.picks).toHaveLength(2);
    expect(small.picks[0].summary.modifications.join(" ")).toMatch(/hub-centric rings \(108 mm outside, 106\.1 mm inside\)/);
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
    const res = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicle: VEHICLE, saveVehicle: true })),
      ctx(),
    );
    expect(res.status).toBe(201);
    quoteId = (await res.json()).id;
    const d = await (await quoteById.GET(req("GET", `/api/shop/quotes/${quoteId}`), ctx({ id: quoteId }))).json();
    expect(d.lines.map((l: { sku: string; quantity: number }) => `${l.sku}×${l.quantity}`)).toEqual([
      "TR-EXAMPLE-35×4",
      "WH-EXAMPLE-BL×4",
      "SV-MB×4",
      "SV-BL×4",
      "SV-VS×4",
      "SV-AL×1",
      "SV-FT×1",
      "SV-DP×4",
    ]);
    // The 35 in tire on the −12.7 mm beadlock reaches ≈ 59 mm further out than 265/70R17 on +25 mm, past the 25 mm
    // poke rule, so one hour of fender trimming is suggested too.
    expect(d.quote.fitment.outerPokeChangeMm).toBeGreaterThan(25);
    // By hand: parts 4 × 389 + 4 × 465 = 3416.00 taxable; services 120 + 180 + 20 + 129 + 145 + 16 = 610.00 untaxed.
    // Tax 3416.00 × 8.25 % = 281.82; total 4026.00 + 281.82 = 4307.82; deposit 25 % = 1076.955 → 1076.96.
    expect(d.quote).toMatchObject({
      subtotalCents: 402600,
      taxableCents: 341600,
      taxCents: 28182,
      totalCents: 430782,
      depositCents: 107696,
      status: "draft",
    });
    expect(d.events).toEqual([expect.objectContaining({ toStatus: "draft", actor: "Sam Staff", actorUserId: U.staffA.id })]);
    expect(internalKeys(d)).toEqual([]);
    expect(d.quote.createdAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/);
    const saved = await db("customer_vehicles").where({ customer_id: customerId });
    expect(saved).toHaveLength(1);
    const again = await (await customerById(req("GET", `/api/shop/customers/${customerId}`), ctx({ id: customerId }))).json();
    expect(again.vehicles).toHaveLength(1);
    expect(internalKeys(again)).toEqual([]);
  });

  it("edits recompute totals on the server; a negative quantity is refused and nothing changes", async () => {
    as(U.staffA);
    const line = { kind: "custom", sku: "", description: "Labour", quantity: 2, unitPriceCents: 6250, discountCents: 0, taxable: false };
    const ok = await quoteById.PUT(
      req("PUT", `/api/shop/quotes/${quoteId}`, { lines: [line], discountCents: 1000, notes: "" }),
      ctx({ id: quoteId }),
    );
    expect(ok.status).toBe(200);
    const edited = await ok.json();
    expect(internalKeys(edited)).toEqual([]);
    expect(edited.quote).toMatchObject({ subtotalCents: 12500, discountCents: 1000, taxCents: 0, totalCents: 11500 });
    const bad = await quoteById.PUT(
      req("PUT", `/api/shop/quotes/${quoteId}`, { lines: [{ ...line, quantity: -4 }], discountCents: 0, notes: "" }),
      ctx({ id: quoteId }),
    );
    expect(bad.status).toBe(422);
    expect((await bad.json()).fieldErrors["lines.0.quantity"]).toBeDefined();
    const tooMuch = await quoteById.PUT(
      req("PUT", `/api/shop/quotes/${quoteId}`, { lines: [line], discountCents: 99999, notes: "" }),
      ctx({ id: quoteId }),
    );
    expect(tooMuch.status).toBe(422);
    const row = await db("quotes").where({ id: quoteId }).first();
    expect(row).toMatchObject({ total_cents: 11500, discount_cents: 1000 });
    expect(await db("quote_lines").where({ quote_id: quoteId })).toHaveLength(1);
  });

  it("another shop's staff and owner get 404 for the quote; a colleague sees only their own, the owner all", async () => {
    for (const who of [U.staffB, U.ownerB, U.staffA2]) {
      as(who);
      expect((await quoteById.GET(req("GET", `/api/shop/quotes/${quoteId}`), ctx({ id: quoteId }))).status).toBe(404);
      expect(
        (
          await quoteById.PUT(
            req("PUT", `/api/shop/quotes/${quoteId}`, {
              lines: [{ kind: "custom", description: "x", quantity: 1, unitPriceCents: 1 }],
              discountCents: 0,
            }),
            ctx({ id: quoteId }),
          )
        ).status,
      ).toBe(404);
      expect((await (await quotes.GET(req("GET", "/api/shop/quotes"), ctx())).json()).quotes).toEqual([]);
    }
    as(U.ownerA);
    expect((await quoteById.GET(req("GET", `/api/shop/quotes/${quoteId}`), ctx({ id: quoteId }))).status).toBe(200);
    const list = await (await quotes.GET(req("GET", "/api/shop/quotes"), ctx())).json();
    expect(list.quotes).toHaveLength(1);
    expect(internalKeys(list)).toEqual([]);
    expect(list.quotes[0]).toMatchObject({ customerName: "Dace Holloway", createdByName: "Sam Staff", totalCents: 11500 }); // camelCase on purpose: lib/shop/quotes/api.ts
  });

  it("cannot use another shop's catalog items", async () => {
    as(U.staffB);
    const other = await db("customers")
      .insert({ shop_id: "0b000000-0000-4000-8000-00000000000b", name: "B customer", phone: "5550000000", phone_digits: "5550000000" })
      .returning("id");
    // Shop A's tire and wheel, asked for by shop B's staff.
    const res = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId: other[0].id, vehicle: VEHICLE }, "WH-EXAMPLE-17")),
      ctx(),
    );
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
    sentId = (
      await (
        await quotes.POST(req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicle: VEHICLE, quantity: 5 })), ctx())
      ).json()
    ).id;
    sent.length = 0;
    const res = await send(req("POST", `/api/shop/quotes/${sentId}/send`, {}), ctx({ id: sentId }));
    expect(res.status).toBe(200);
    const d = await res.json();
    expect(d.quote.status).toBe("sent");
    expect(internalKeys(d)).toEqual([]); // the link's token hash stays in the database
    expect(d.events.map((e: { toStatus: string; actor: string }) => `${e.toStatus}:${e.actor}`)).toEqual([
      "draft:Sam Staff",
      "sent:Sam Staff",
    ]);
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
    for (const s of [
      `Quote Q-${d.quote.number}`,
      "Shop A",
      "Dace Holloway",
      "TR-EXAMPLE-35",
      money(d.quote.subtotalCents),
      money(d.quote.taxCents),
      money(d.quote.totalCents),
      money(d.quote.depositCents),
      "Bead seating",
      "Cold pressure",
      "Beadlock rings",
      "re-check",
    ]) {
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
    const edit = await quoteById.PUT(
      req("PUT", `/api/shop/quotes/${sentId}`, {
        lines: [{ kind: "custom", description: "x", quantity: 1, unitPriceCents: 1 }],
        discountCents: 0,
      }),
      ctx({ id: sentId }),
    );
    expect(edit.status).toBe(409);
    const back = await status(req("POST", `/api/shop/quotes/${sentId}/status`, { to: "draft" }), ctx({ id: sentId }));
    expect(back.status).toBe(200);
    expect(internalKeys(await back.json())).toEqual([]);
    expect((await db("quotes").where({ id: sentId }).first()).public_token_hash).toBeNull();
  });

  it("refuses to send without a customer e-mail", async () => {
    as(U.staffA);
    const c = (
      await (await customers.POST(req("POST", "/api/shop/customers", { name: "No Mail", phone: "555 777 1212", email: "" }), ctx())).json()
    ).customer;
    const id = (
      await (
        await quotes.POST(
          req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId: c.id, vehicle: VEHICLE }, "WH-EXAMPLE-17")),
          ctx(),
        )
      ).json()
    ).id;
    const res = await send(req("POST", `/api/shop/quotes/${id}/send`, {}), ctx({ id }));
    expect(res.status).toBe(422);
    expect((await db("quotes").where({ id }).first()).status).toBe("draft");
  });
});

/* ---- every figure right: fractional hours, any catalog item, the wheel on the hub, balance, frozen documents ---- */

const { findPublicQuoteView } = await import("@/lib/shop/quotes/send");
const money = (c: number) => "$" + (c / 100).toLocaleString("en-US", { minimumFractionDigits: 2 });
/** Zod's own wording, which must never reach a person. */
const RAW = /Invalid input|expected \w+, received|Too (big|small)|Invalid (UUID|option|string|number)|Required$/;

async function draftFor(vehicle: object = VEHICLE, wheelSku = "WH-EXAMPLE-17") {
  as(U.staffA);
  const res = await quotes.POST(req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicle }, wheelSku)), ctx());
  return { res, id: res.status === 201 ? ((await res.json()).id as string) : "" };
}
/** A 17x9 wheel at 0 mm offset added to shop A's catalog; the row as stored. */
async function addWheel(w: { sku: string; description: string; price_cents: number; bolt_pattern: string; center_bore_mm: number }) {
  const [row] = await db("catalog_items")
    .insert({ shop_id: SHOP_A, kind: "wheel", wheel_diameter_in: 17, wheel_width_in: 9, wheel_offset_mm: 0, ...w })
    .returning("*");
  return row;
}
const put = (id: string, lines: object[], discountCents = 0, extra: object = {}) =>
  quoteById.PUT(req("PUT", `/api/shop/quotes/${id}`, { lines, discountCents, notes: "", ...extra }), ctx({ id }));
const detailOf = async (id: string) => (await quoteById.GET(req("GET", `/api/shop/quotes/${id}`), ctx({ id }))).json();

describe("labour in fractional hours", () => {
  it("1.5 h of a per-hour service at 145.00 is 217.50 exactly, stored and shown as hours", async () => {
    const { id } = await draftFor();
    const trim = await item(db, SHOP_A, "SV-FT"); // fender trimming, per hour, 145.00
    const res = await put(id, [
      {
        kind: "service",
        catalogItemId: trim.id,
        sku: trim.sku,
        description: trim.description,
        quantity: 1.5,
        unitPriceCents: 14500,
        discountCents: 0,
        taxable: false,
      },
    ]);
    expect(res.status).toBe(200);
    const d = await res.json();
    // Arithmetic: 1.5 × 145.00 = 217.50 (no rounding involved).
    expect(d.lines[0]).toMatchObject({ quantity: 1.5, unit: "hour", lineTotalCents: 21750 });
    expect(d.quote).toMatchObject({ subtotalCents: 21750, taxCents: 0, totalCents: 21750 });
    // Deposit 25 % of 217.50 = 54.375 → 54.38 (half a cent up); balance 217.50 − 54.38 = 163.12.
    expect(d.quote.depositCents).toBe(5438);
    const pdf = await pdfText(Buffer.from(await (await pdfRoute(req("GET", `/api/shop/quotes/${id}/pdf`), ctx({ id }))).arrayBuffer()));
    expect(pdf).toContain("1.5 h");
    expect(pdf).toContain("$217.50");
  });

  it("reads 1 1/2, 1½ and 1:30 as 1.5 h; refuses what is not exact in hundredths, and whole-item lines in fractions", async () => {
    const { id } = await draftFor();
    const trim = await item(db, SHOP_A, "SV-FT");
    const line = (quantity: unknown) => ({
      kind: "service",
      catalogItemId: trim.id,
      sku: trim.sku,
      description: trim.description,
      quantity,
      unitPriceCents: 14500,
      discountCents: 0,
      taxable: false,
    });
    for (const q of ["1 1/2", "1½", "1:30", "1.5 h"]) {
      const res = await put(id, [line(q)]);
      expect(res.status, q).toBe(200);
      expect((await res.json()).lines[0].lineTotalCents, q).toBe(21750);
    }
    // 1:20 is 1.333… h: not exact to the hundredth of an hour, so it is refused rather than rounded.
    const third = await put(id, [line("1:20")]);
    expect(third.status).toBe(422);
    const msg = (await third.json()).fieldErrors["lines.0.quantity"][0] as string;
    expect(msg).toMatch(/1\.33/);
    // A tire is counted in whole tires.
    const tire = await item(db, SHOP_A, "TR-EXAMPLE-35");
    const half = await put(id, [
      {
        kind: "tire",
        catalogItemId: tire.id,
        sku: tire.sku,
        description: tire.description,
        quantity: 1.5,
        unitPriceCents: 38900,
        discountCents: 0,
        taxable: true,
      },
    ]);
    expect(half.status).toBe(422);
    expect((await half.json()).fieldErrors["lines.0.quantity"][0]).toMatch(/whole/);
    // A custom labour line in hours.
    const labour = await put(id, [
      {
        kind: "custom",
        unit: "hour",
        sku: "",
        description: "Labour",
        quantity: 0.25,
        unitPriceCents: 12500,
        discountCents: 0,
        taxable: false,
      },
    ]);
    expect(labour.status).toBe(200);
    // 0.25 × 125.00 = 31.25
    expect((await labour.json()).lines[0]).toMatchObject({ quantity: 0.25, unit: "hour", lineTotalCents: 3125 });
  });
});

describe("any catalog item on a quote", () => {
  it("takes a TPMS service and the catalog's own kind and unit, whatever the request says", async () => {
    const [tpms] = await db("catalog_items")
      .insert({
        shop_id: SHOP_A,
        kind: "service",
        sku: "SV-TPMS-T",
        description: "TPMS sensor service",
        price_cents: 1800,
        service_type: "tpms",
        service_unit: "per_wheel",
      })
      .returning("*");
    const { id } = await draftFor();
    const d0 = await detailOf(id);
    const keep = d0.lines.map((l: Record<string, unknown>) => ({
      kind: l.kind,
      unit: l.unit,
      catalogItemId: l.catalogItemId,
      sku: l.sku,
      description: l.description,
      quantity: l.quantity,
      unitPriceCents: l.unitPriceCents,
      discountCents: l.discountCents,
      taxable: l.taxable,
    }));
    const res = await put(id, [
      ...keep,
      {
        kind: "custom",
        catalogItemId: tpms.id,
        sku: "",
        description: "TPMS sensor service",
        quantity: 4,
        unitPriceCents: 1800,
        discountCents: 0,
        taxable: false,
      },
    ]);
    expect(res.status).toBe(200);
    const last = (await res.json()).lines.at(-1);
    expect(last).toMatchObject({ kind: "service", sku: "SV-TPMS-T", quantity: 4, lineTotalCents: 7200 });
  });
});

describe("the wheel on the vehicle's hub", () => {
  /** Invented 17x9 wheels (addWheel): centre bores either side of the vehicle's 108 mm hub, and one of another bolt pattern. */
  const WHEELS = {
    bore1061: {
      sku: "WH-T-1061",
      description: "Test 17x9 106.1 mm bore",
      price_cents: 28900,
      bolt_pattern: "6x139.7",
      center_bore_mm: 106.1,
    },
    bore1101: { sku: "WH-T-110", description: "Test 17x9 110 mm bore", price_cents: 25900, bolt_pattern: "6x5.5", center_bore_mm: 110.1 },
    eightLug: { sku: "WH-T-8L", description: "Test 8-lug", price_cents: 30000, bolt_pattern: "8x6.5", center_bore_mm: 125 },
  };

  it("refuses a wheel whose centre bore is smaller than the hub (106.1 mm bore on a 108 mm hub)", async () => {
    await addWheel(WHEELS.bore1061);
    const { res } = await draftFor({ ...VEHICLE, hubBoreMm: 108 }, WHEELS.bore1061.sku);
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.fieldErrors.wheelItemId[0]).toMatch(/106\.1 mm.*108 mm/);
    expect(JSON.stringify(body)).not.toMatch(RAW);
  });

  it("takes a larger bore but says hub-centric rings are needed, with their sizes", async () => {
    await addWheel(WHEELS.bore1101);
    const { res, id } = await draftFor({ ...VEHICLE, hubBoreMm: 108 }, WHEELS.bore1101.sku);
    expect(res.status).toBe(201);
    const d = await detailOf(id);
    expect(d.quote.hubBoreMm).toBe(108);
    const rings = d.hubChecks
      .flatMap((c: { findings: { code: string; message: string }[] }) => c.findings)
      .find((f: { code: string }) => f.code === "needs-rings");
    expect(rings.message).toMatch(/hub-centric rings/i);
    expect(rings.message).toMatch(/110\.1 mm.*108 mm/);
    const pdf = await pdfText(Buffer.from(await (await pdfRoute(req("GET", `/api/shop/quotes/${id}/pdf`), ctx({ id }))).arrayBuffer()));
    expect(pdf).toMatch(/hub-centric rings/i);
  });

  it("refuses a wheel line of another bolt pattern, and takes 6x139.7 on a 6x5.5 vehicle (6 × 5.5 in × 25.4 = 139.7 mm, NIST SP 811)", async () => {
    const eight = await addWheel(WHEELS.eightLug);
    const metric = await item(db, SHOP_A, "WH-EXAMPLE-BL"); // 6x139.7, 108 mm
    const { id } = await draftFor({ ...VEHICLE, hubBoreMm: 108 });
    const wheelLine = (w: { id: string; sku: string; description: string; price_cents: number }) => ({
      kind: "wheel",
      catalogItemId: w.id,
      sku: w.sku,
      description: w.description,
      quantity: 4,
      unitPriceCents: w.price_cents,
      discountCents: 0,
      taxable: true,
    });
    const labour = { kind: "custom", sku: "", description: "Labour", quantity: 1, unitPriceCents: 100, discountCents: 0, taxable: false };
    const bad = await put(id, [labour, labour, wheelLine(eight)]);
    expect(bad.status).toBe(422);
    const fe = (await bad.json()).fieldErrors;
    expect(fe["lines.2.catalogItemId"][0]).toMatch(/8x6\.5.*6x5\.5/);
    const ok = await put(id, [wheelLine(metric)]);
    expect(ok.status).toBe(200);
    const checks = (await ok.json()).hubChecks;
    expect(checks[0].findings.map((f: { level: string }) => f.level)).not.toContain("refuse");
  });
});

describe("balance due after the deposit", () => {
  it("is on the PDF, the e-mail and the customer's page: total − deposit", async () => {
    const { id } = await draftFor();
    sent.length = 0;
    const d = await (await send(req("POST", `/api/shop/quotes/${id}/send`, {}), ctx({ id }))).json();
    const balance = d.quote.totalCents - d.quote.depositCents;
    expect(balance).toBeGreaterThan(0);
    expect(sent[0]!.text).toMatch(new RegExp(`balance.*\\${money(balance)}`, "i"));
    const pdf = await pdfText(sent[0]!.attachments![0]!.content);
    expect(pdf).toMatch(new RegExp(`Balance due after the deposit\\s*\\${money(balance)}`));
    const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)![1]!;
    const view = await findPublicQuoteView(db, token);
    expect(view!.document.totals.balanceCents).toBe(balance);
  });
});

describe("a sent quote is a frozen document", () => {
  it("keeps the shop's name, address, phone and its lines as sent, though the shop renames itself later", async () => {
    const { id } = await draftFor();
    sent.length = 0;
    await send(req("POST", `/api/shop/quotes/${id}/send`, {}), ctx({ id }));
    const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)![1]!;
    await db("shops").where({ id: SHOP_A }).update({ name: "Renamed Rims", address: "9 New Road", phone: "555-0999" });
    try {
      const pdf = await pdfText(Buffer.from(await (await pdfRoute(req("GET", `/api/shop/quotes/${id}/pdf`), ctx({ id }))).arrayBuffer()));
      expect(pdf).toContain("Shop A");
      expect(pdf).toContain("1 Test Lane");
      expect(pdf).not.toContain("Renamed Rims");
      const view = await findPublicQuoteView(db, token);
      expect(view!.document.shop).toEqual({ name: "Shop A", address: "1 Test Lane", phone: "555-0100" });
      // A catalog price change does not reach the sent lines either.
      await db("catalog_items").where({ shop_id: SHOP_A, sku: "TR-EXAMPLE-35" }).update({ description: "Renamed tire" });
      expect((await findPublicQuoteView(db, token))!.document.lines[0]!.description).not.toBe("Renamed tire");
      // Back to draft the live shop is shown again; sending again freezes the new one.
      await status(req("POST", `/api/shop/quotes/${id}/status`, { to: "draft" }), ctx({ id }));
      sent.length = 0;
      await send(req("POST", `/api/shop/quotes/${id}/send`, {}), ctx({ id }));
      expect(await pdfText(sent[0]!.attachments![0]!.content)).toContain("Renamed Rims");
      expect(await db("quote_documents").where({ quote_id: id })).toHaveLength(2);
    } finally {
      await db("shops").where({ id: SHOP_A }).update({ name: "Shop A", address: "1 Test Lane", phone: "555-0100" });
      await db("catalog_items")
        .where({ shop_id: SHOP_A, sku: "TR-EXAMPLE-35" })
        .update({ description: "Example all-terrain 35x12.50R17LT load range E" });
    }
  });
});

describe("sending what the screen shows", () => {
  it("refuses to send when the quote changed after the version the sender saw (409, nothing sent)", async () => {
    const { id } = await draftFor();
    const seen = (await detailOf(id)).quote.updatedAt;
    await put(id, [
      {
        kind: "custom",
        sku: "",
        description: "Changed in another tab",
        quantity: 1,
        unitPriceCents: 100,
        discountCents: 0,
        taxable: false,
      },
    ]);
    sent.length = 0;
    const res = await send(req("POST", `/api/shop/quotes/${id}/send`, { seenUpdatedAt: seen }), ctx({ id }));
    expect(res.status).toBe(409);
    expect((await res.json()).error).toMatch(/changed/i);
    expect(sent).toHaveLength(0);
    expect((await db("quotes").where({ id }).first()).status).toBe("draft");
    const now = (await detailOf(id)).quote.updatedAt;
    expect((await send(req("POST", `/api/shop/quotes/${id}/send`, { seenUpdatedAt: now }), ctx({ id }))).status).toBe(200);
  });
});

describe("saving what the screen shows", () => {
  const line = (description: string, unitPriceCents: number) => ({
    kind: "custom",
    sku: "",
    description,
    quantity: 1,
    unitPriceCents,
    discountCents: 0,
    taxable: false,
  });

  it("refuses a save from a window opened before another window's save (409), keeping the other's lines", async () => {
    const { id } = await draftFor();
    const seen = (await detailOf(id)).quote.updatedAt;
    // Window A saves a new price; window B, still showing the version before, saves a new description.
    expect((await put(id, [line("Mount and balance", 25000)], 0, { seenUpdatedAt: seen })).status).toBe(200);
    const stale = await put(id, [line("Mount, balance and valve stems", 123450)], 0, { seenUpdatedAt: seen });
    expect(stale.status).toBe(409);
    expect((await stale.json()).error).toMatch(/^Not saved: this quote was saved from another window or by a colleague/);
    const lines = await db("quote_lines").where({ quote_id: id }).orderBy("position");
    expect(lines.map((l) => [l.description, l.unit_price_cents])).toEqual([["Mount and balance", 25000]]);
    // Reloaded (the newer version on screen), the same edit saves.
    const now = (await detailOf(id)).quote.updatedAt;
    expect((await put(id, [line("Mount, balance and valve stems", 25000)], 0, { seenUpdatedAt: now })).status).toBe(200);
  });
});

describe("messages a person reads", () => {
  it("never carry zod's raw wording, and name totals problems by the line's own field", async () => {
    const { id } = await draftFor();
    const good = { kind: "custom", sku: "", description: "Labour", quantity: 1, unitPriceCents: 1000, discountCents: 0, taxable: false };
    const bodies: object[] = [
      { lines: [{ ...good, catalogItemId: 42 }], discountCents: 0, notes: "" },
      { lines: [{ ...good, catalogItemId: "not-a-uuid" }], discountCents: 0, notes: "" },
      { lines: [{ ...good, taxable: "yes" }], discountCents: 0, notes: "" },
      { lines: [{ ...good, kind: "gadget" }], discountCents: 0, notes: "" },
      { lines: [{ ...good, unitPriceCents: "12.50" }], discountCents: "x", notes: 5 },
      { lines: [{ ...good, discountCents: null }], discountCents: 0 },
      { lines: "none", discountCents: 0 },
      { lines: [] },
    ];
    for (const b of bodies) {
      const res = await quoteById.PUT(req("PUT", `/api/shop/quotes/${id}`, b), ctx({ id }));
      expect(res.status, JSON.stringify(b)).toBe(422);
      const out = await res.json();
      for (const [k, v] of Object.entries(out.fieldErrors as Record<string, string[]>))
        expect(v.join(" "), `${k} of ${JSON.stringify(b)}`).not.toMatch(RAW);
    }
    // An empty catalog pick ("", as a cleared select sends it) is no catalog item, not a type error.
    expect((await put(id, [{ ...good, catalogItemId: "" }])).status).toBe(200);
    const over = await put(id, [{ ...good, discountCents: 5000 }]);
    expect(over.status).toBe(422);
    expect(Object.keys((await over.json()).fieldErrors)).toEqual(["lines.0.discountCents"]);
    for (const b of [{ to: "gone" }, {}]) {
      const res = await status(req("POST", `/api/shop/quotes/${id}/status`, b), ctx({ id }));
      expect(JSON.stringify(await res.json())).not.toMatch(RAW);
    }
    const create = await quotes.POST(
      req("POST", "/api/shop/quotes", { customerId, vehicleId: "x", saveVehicle: "yes", tireItemId: "", wheelItemId: 3, quantity: 4 }),
      ctx(),
    );
    expect(create.status).toBe(422);
    expect(JSON.stringify(await create.json())).not.toMatch(RAW);
  });
});

describe("the quote PDF prints every name", () => {
  it("prints Latin Extended letters (Łódź, Żółć) from an embedded font instead of question marks", async () => {
    as(U.staffA);
    const cust = await (
      await customers.POST(req("POST", "/api/shop/customers", { name: "Łukasz Żółć", phone: "555 010 7788", email: "" }), ctx())
    ).json();
    const id = (
      await (
        await quotes.POST(
          req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId: cust.customer.id, vehicle: VEHICLE })),
          ctx(),
        )
      ).json()
    ).id as string;
    const before = (await db("shops").where({ id: SHOP_A }).first()).name as string;
    await db("shops").where({ id: SHOP_A }).update({ name: "Terenówki Łódź", address: "ul. Piotrkowska 1, Łódź" });
    try {
      as(U.ownerA);
      const res = await pdfRoute(req("GET", `/api/shop/quotes/${id}/pdf`), ctx({ id }));
      expect(res.status).toBe(200);
      const text = await pdfText(Buffer.from(await res.arrayBuffer()));
      for (const s of ["Terenówki Łódź", "ul. Piotrkowska 1, Łódź", "Łukasz Żółć"]) expect(text).toContain(s);
      expect(text).not.toMatch(/\?ód\?|\?ukasz/);
    } finally {
      await db("shops").where({ id: SHOP_A }).update({ name: before, address: "1 Test Lane" });
    }
  });
});

/** The calendar day of an instant in a zone, written out by the platform's Intl (not the app's helper). */
const dayIn = (instant: Date, timeZone: string) =>
  instant.toLocaleDateString("en-US", { timeZone, weekday: "long", year: "numeric", month: "long", day: "numeric" });

describe("a quote's days on the shop's clock", () => {
  /*
   * The e-mail and the PDF are made, and the customer's page rendered, on a UTC server; the editor,
   * the payments card and the staff page format from the zone the API gives them. The zone is
   * picked from the hour the test runs, so that the quote's last valid day in the shop differs
   * from the UTC one: UTC+14 (Pacific/Kiritimati) is a day ahead from 10:00 UTC, UTC−11
   * (Pacific/Pago_Pago) a day behind until 11:00 UTC (IANA tz database; neither keeps daylight time).
   */
  it("the e-mail, the PDF and the customer's page say the shop's last valid day; the API carries the shop's zone", async () => {
    // Close to midnight UTC the zone picked could be on the wrong side by the time the quote is sent: wait it out.
    const toMidnight = 86_400_000 - (Date.now() % 86_400_000);
    if (toMidnight < 30_000) await new Promise((r) => setTimeout(r, toMidnight + 1000));
    const timeZone = new Date().getUTCHours() >= 10 ? "Pacific/Kiritimati" : "Pacific/Pago_Pago";
    await db("shop_schedules").insert({ shop_id: SHOP_A, time_zone: timeZone });
    try {
      const { id } = await draftFor();
      sent.length = 0;
      expect((await send(req("POST", `/api/shop/quotes/${id}/send`, {}), ctx({ id }))).status).toBe(200);
      const row = await db("quotes").where({ id }).first();
      const shopDay = dayIn(row.valid_until, timeZone);
      // The test tells the two clocks apart, or it proves nothing.
      expect(shopDay).not.toBe(dayIn(row.valid_until, "UTC"));

      expect(sent).toHaveLength(1);
      expect(sent[0]!.text).toContain(`(valid until ${shopDay})`);
      expect(sent[0]!.html).toContain(`(valid until ${shopDay})`);
      const oneLine = (t: string) => t.replace(/\s+/g, " ");
      expect(oneLine(await pdfText(sent[0]!.attachments![0]!.content))).toContain(`valid until ${shopDay}`);
      const pdf = await pdfRoute(req("GET", `/api/shop/quotes/${id}/pdf`), ctx({ id }));
      expect(oneLine(await pdfText(Buffer.from(await pdf.arrayBuffer())))).toContain(`valid until ${shopDay}`);
      const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)![1]!;
      expect((await findPublicQuoteView(db, token))!.validUntilDay).toBe(shopDay);

      // What the browser formats from: the editor's validity and history, the payments card, the staff page.
      expect((await detailOf(id)).timeZone).toBe(timeZone);
      expect((await (await paymentsRoute(req("GET", `/api/shop/quotes/${id}/payments`), ctx({ id }))).json()).payments.timeZone).toBe(
        timeZone,
      );
      as(U.ownerA);
      expect((await (await staffRoute(req("GET", "/api/shop/staff"), ctx())).json()).timeZone).toBe(timeZone);
      // A shop that never saved its calendar is on the default zone (lib/shop/bookings/vocabulary.ts).
      as(U.ownerB);
      expect((await (await staffRoute(req("GET", "/api/shop/staff"), ctx())).json()).timeZone).toBe("America/Denver");
    } finally {
      await db("shop_schedules").where({ shop_id: SHOP_A }).delete();
    }
  });
});
