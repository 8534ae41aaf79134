import { createHash, randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U, VEHICLE, item, quoteRequest } from "./support/shopFixture";
import { counterQuote } from "./support/bookedInstall";
import { bodyFor } from "./support/workOrderSteps";
import { workOrderRoutes } from "./support/workOrderRoutes";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const as = (u: (typeof U)[keyof typeof U] | null) => void (session.current = u ? sessionOf(u) : null);

const act = (await import("@/app/api/q/[token]/route")).POST;
const quotes = await import("@/app/api/shop/quotes/route");
const status = (await import("@/app/api/shop/quotes/[id]/status/route")).POST;
const catalog = await import("@/app/api/shop/catalog/route");
const one = await import("@/app/api/shop/catalog/[id]/route");
const archive = (await import("@/app/api/shop/catalog/[id]/archived/route")).PUT;
const { open: openWorkOrder, read: readWorkOrder, sign, move: moveWorkOrder } = await workOrderRoutes();
const { bookInstall, slotsForQuote } = await import("@/lib/shop/bookings/queries");
const { requiredSteps } = await import("@/lib/shop/workOrders/api");
const { expireDue } = await import("@/lib/shop/quotes/queries");
const { countLowStock } = await import("@/lib/shop/catalog/itemQueries");
const { commitImport, stageImport } = await import("@/lib/shop/catalog/queries");
const { CSV_COLUMNS, parseCatalogCsv } = await import("@/lib/shop/catalog/csv");

const TIRE = "TR-EXAMPLE-35";
const WHEEL = "WH-EXAMPLE-BL";
const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");

/** Sets what is left to hold of an item (on hand = held + n); null makes it untracked. */
async function setAvailable(sku: string, n: number | null) {
  await db("catalog_items")
    .where({ shop_id: SHOP_A, sku })
    .update({ qty_on_hand: n === null ? null : db.raw("qty_reserved + ?", [n]) });
}
const counts = async (sku: string) => {
  const r = await item(db, SHOP_A, sku);
  return { onHand: r.qty_on_hand as number | null, reserved: r.qty_reserved as number };
};

/** A quote of shop A for four tires and four wheels, sent, valid 30 days, and its link token. */
async function sentQuote() {
  as(U.staffA);
  const { quoteId: id } = await counterQuote(db, "Stock Customer", WHEEL);
  const token = randomBytes(32).toString("base64url");
  await db("quotes")
    .where({ id })
    .update({ status: "sent", public_token_hash: sha256(token), valid_until: db.raw("now() + interval '30 days'") });
  session.current = null;
  return { id, token };
}
/** Ten of the tire and ten of the wheel left to hold, then a sent quote for four of each. */
async function sentQuoteWithTenLeft() {
  await setAvailable(TIRE, 10);
  await setAvailable(WHEEL, 10);
  return sentQuote();
}
const accept = (token: string) => act(req("POST", `/api/q/${token}`, { action: "accept" }), ctx({ token }));
const reservations = (quoteId: string) => db("stock_reservations").where({ quote_id: quoteId }).orderBy("catalog_item_id");

beforeAll(() => setUpBookableShops(db));
afterAll(() => tearDownBookableShops(db));

describe("accepting a quote reserves its tires and wheels", () => {
  it("holds four of each, never the services; the catalog shows on hand, held and available", async () => {
    await setAvailable(TIRE, 10);
    await setAvailable(WHEEL, 10);
    const before = { tire: await counts(TIRE), wheel: await counts(WHEEL) };
    const q = await sentQuote();
    expect((await accept(q.token)).status).toBe(200);
    const held = await reservations(q.id);
    expect(held.map((h) => [h.quantity, h.status])).toEqual([
      [4, "reserved"],
      [4, "reserved"],
    ]);
    expect(await counts(TIRE)).toEqual({ onHand: before.tire.onHand, reserved: before.tire.reserved + 4 });
    as(U.staffA);
    const page = await (await catalog.GET(req("GET", `/api/shop/catalog?q=${TIRE}`), ctx())).json();
    expect(page.items[0]).toMatchObject({ sku: TIRE, qtyReserved: before.tire.reserved + 4, qtyAvailable: 6, lowStock: false });
  });

  it("two customers accepting the last units at the same moment: exactly one wins, the other hears which item and how many are left", async () => {
    await setAvailable(TIRE, 6);
    await setAvailable(WHEEL, 50);
    const [a, b] = [await sentQuote(), await sentQuote()];
    const tire = await item(db, SHOP_A, TIRE);
    // Hold the tire's row on a third connection so both acceptances are inside their transactions,
    // each on its own connection, waiting on the same lock; then let them run together.
    const blocker = await db.transaction();
    await blocker("catalog_items").where({ id: tire.id }).forUpdate().first();
    const racing = [accept(a.token), accept(b.token)];
    const waitingOnLocks = async () =>
      Number(
        (
          await db("pg_stat_activity")
            .where({ wait_event_type: "Lock" })
            .whereRaw("datname = current_database()")
            .count<{ n: string }[]>({ n: "*" })
        )[0]!.n,
      );
    for (let i = 0; i < 100 && (await waitingOnLocks()) < 2; i++) await new Promise((r) => setTimeout(r, 50));
    const waiting = await waitingOnLocks();
    // Let them go before any assertion, so a failure here never leaves the row locked for the tests after it.
    await blocker.commit();
    expect(waiting).toBe(2);
    const answers = await Promise.all(racing);
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409]);
    const loser = answers.find((r) => r.status === 409)!;
    expect((await loser.json()).error).toBe(
      `Not enough stock of ${TIRE} (${tire.description}): this quote needs 4 and only 2 are left to hold.`,
    );
    const after = await counts(TIRE);
    expect(after.onHand! - after.reserved).toBe(2);
    // The loser's quote is as it was: still sent, nothing held, no event written.
    const lost = answers[0]!.status === 409 ? a : b;
    expect((await db("quotes").where({ id: lost.id }).first()).status).toBe("sent");
    expect(await reservations(lost.id)).toEqual([]);
    expect(await db("quote_events").where({ quote_id: lost.id, to_status: "accepted" })).toEqual([]);
  });

  it("a short second item refuses the whole acceptance: the first item is not held either", async () => {
    await setAvailable(TIRE, 8);
    await setAvailable(WHEEL, 3);
    const before = await counts(TIRE);
    const q = await sentQuote();
    const r = await accept(q.token);
    expect(r.status).toBe(409);
    const body = await r.json();
    expect(body.error).toMatch(new RegExp(`^Not enough stock of ${WHEEL} .*: this quote needs 4 and only 3 are left to hold\\.$`));
    expect(body).toMatchObject({ sku: WHEEL, available: 3, needed: 4 });
    expect(await counts(TIRE)).toEqual(before);
    expect(await reservations(q.id)).toEqual([]);
  });

  it("PostgreSQL itself refuses holding more than is on hand", async () => {
    const tire = await item(db, SHOP_A, TIRE);
    await expect(
      db("catalog_items")
        .where({ id: tire.id })
        .update({ qty_reserved: tire.qty_on_hand + 1 }),
    ).rejects.toMatchObject({ code: "23514", constraint: "catalog_stock_never_below_zero" });
  });

  it("untracked items (no count on hand) are never limited nor held", async () => {
    await setAvailable(TIRE, null);
    await setAvailable(WHEEL, 10);
    const q = await sentQuote();
    expect((await accept(q.token)).status).toBe(200);
    expect((await reservations(q.id)).length).toBe(1);
    await setAvailable(TIRE, 10);
  });
});

describe("release and consumption", () => {
  it("a declined quote gives its units back", async () => {
    const q = await sentQuoteWithTenLeft();
    const before = await counts(TIRE);
    expect((await accept(q.token)).status).toBe(200);
    expect((await counts(TIRE)).reserved).toBe(before.reserved + 4);
    as(U.staffA);
    const r = await status(req("POST", `/api/shop/quotes/${q.id}/status`, { to: "declined" }), ctx({ id: q.id }));
    expect(r.status).toBe(200);
    expect(await counts(TIRE)).toEqual(before);
    expect((await reservations(q.id)).map((h) => h.status)).toEqual(["released", "released"]);
  });

  it("the scheduled expiry gives an accepted quote's units back", async () => {
    const q = await sentQuoteWithTenLeft();
    const before = await counts(WHEEL);
    expect((await accept(q.token)).status).toBe(200);
    await db("quotes")
      .where({ id: q.id })
      .update({ valid_until: db.raw("now() - interval '1 minute'") });
    expect(await expireDue(db, SHOP_A)).toBeGreaterThanOrEqual(1);
    expect((await db("quotes").where({ id: q.id }).first()).status).toBe("expired");
    expect(await counts(WHEEL)).toEqual(before);
    expect((await reservations(q.id)).every((h) => h.status === "released" && h.closed_at)).toBe(true);
  });

  it("the work order marked done takes the units off the shelf", async () => {
    const q = await sentQuoteWithTenLeft();
    expect((await accept(q.token)).status).toBe(200);
    const before = await counts(TIRE);
    await db("quotes").where({ id: q.id }).update({ status: "deposit_paid" });
    const quote = await db("quotes").where({ id: q.id }).first();
    const start = (await slotsForQuote(db, quote, { days: 14 })).days.flatMap((d) => d.slots)[0]!.start;
    await bookInstall(
      db,
      { by: "staff", scope: { shopId: SHOP_A }, quoteId: q.id },
      { start },
      { userId: U.staffA.id, label: "Sam Staff" },
    );
    as(U.staffA);
    const { id } = await (await openWorkOrder(req("POST", "/api/shop/work-orders", { quoteId: q.id }), ctx())).json();
    const move = (to: string) => moveWorkOrder(req("POST", `/api/shop/work-orders/${id}/status`, { to }), ctx({ id }));
    expect((await move("in_bay")).status).toBe(200);
    const w = (await (await readWorkOrder(req("GET", `/api/shop/work-orders/${id}`), ctx({ id }))).json()).workOrder;
    for (const s of requiredSteps(w)) {
      const r = await sign(req("PUT", `/api/shop/work-orders/${id}/steps`, bodyFor(s.position, s.step)), ctx({ id }));
      expect(r.status, `${s.position} ${s.step}`).toBe(200);
    }
    expect((await move("done")).status).toBe(200);
    expect(await counts(TIRE)).toEqual({ onHand: before.onHand! - 4, reserved: before.reserved - 4 });
    expect((await reservations(q.id)).map((h) => h.status)).toEqual(["consumed", "consumed"]);
  });
});

/** A valid editor body: a tire as the form sends it (every field as text). */
const tireBody = (fields: Record<string, string> = {}) => ({
  kind: "tire",
  sku: "TR-NEW-37",
  description: "Invented mud-terrain 37x12.50R17LT",
  price: "412.50",
  qtyOnHand: "6",
  tireSize: "37x12.50R17LT",
  lowStockAt: "4",
  ...fields,
});
const itemCount = async () => Number((await db("catalog_items").where({ shop_id: SHOP_A }).count({ n: "*" }))[0]!.n);

describe("the single-item editor", () => {
  it("staff are refused (403 with a message) and nothing is written", async () => {
    const before = await itemCount();
    const tire = await item(db, SHOP_A, TIRE);
    as(U.staffA);
    const add = await catalog.POST(req("POST", "/api/shop/catalog", tireBody()), ctx());
    expect(add.status).toBe(403);
    expect((await add.json()).error).toBe("Your account's role does not allow this.");
    const edit = await one.PUT(req("PUT", `/api/shop/catalog/${tire.id}`, tireBody({ sku: TIRE })), ctx({ id: tire.id }));
    expect(edit.status).toBe(403);
    expect((await archive(req("PUT", `/api/shop/catalog/${tire.id}/archived`, { archived: true }), ctx({ id: tire.id }))).status).toBe(403);
    expect(await itemCount()).toBe(before);
    expect(await item(db, SHOP_A, TIRE)).toEqual(tire);
  });

  it("another shop's item is a 404 for its owner, and is left alone", async () => {
    const tire = await item(db, SHOP_A, TIRE);
    as(U.ownerB);
    for (const r of [
      await one.GET(req("GET", `/api/shop/catalog/${tire.id}`), ctx({ id: tire.id })),
      await one.PUT(req("PUT", `/api/shop/catalog/${tire.id}`, tireBody({ sku: TIRE })), ctx({ id: tire.id })),
      await archive(req("PUT", `/api/shop/catalog/${tire.id}/archived`, { archived: true }), ctx({ id: tire.id })),
    ]) {
      expect(r.status).toBe(404);
      expect((await r.json()).error).toBe("That catalog item was not found.");
    }
    expect(await item(db, SHOP_A, TIRE)).toEqual(tire);
  });

  it("bad input gets the CSV's messages on the form's fields; nothing is written", async () => {
    as(U.ownerA);
    const before = await itemCount();
    const r = await catalog.POST(
      req("POST", "/api/shop/catalog", tireBody({ price: "12,50", tireSize: "", qtyOnHand: "-2", lowStockAt: "few", sku: "" })),
      ctx(),
    );
    expect(r.status).toBe(422);
    const { fieldErrors } = await r.json();
    expect(fieldErrors).toEqual({
      sku: ["Enter a SKU."],
      price: ["Price must be dollars like 249.99 (0 to 1,000,000), got “12,50”."],
      qtyOnHand: ["Quantity on hand must be a whole number 0 or more, got “-2”."],
      tireSize: ["Enter the tire size, e.g. 35x12.50R17LT or LT285/70R17."],
      lowStockAt: ["Low stock at must be a whole number 0 or more, or blank for never."],
    });
    const wheel = await catalog.POST(
      req("POST", "/api/shop/catalog", {
        kind: "wheel",
        sku: "WH-NEW",
        description: "Invented wheel",
        price: "200",
        wheelDiameterIn: "17",
        wheelWidthIn: "9",
        wheelBackspacingIn: "4.5",
        boltPattern: "6x5.5",
      }),
      ctx(),
    );
    expect(wheel.status).toBe(422);
    expect((await wheel.json()).fieldErrors).toEqual({
      wheelBackspacingReference: ["Say where the backspacing was measured to: flange or bead-seat."],
    });
    expect(await itemCount()).toBe(before);
  });

  it("the owner adds, edits and archives one item; a duplicate SKU and on hand under what is held are refused on their fields", async () => {
    as(U.ownerA);
    const added = await catalog.POST(req("POST", "/api/shop/catalog", tireBody()), ctx());
    expect(added.status).toBe(201);
    const created = (await added.json()).item;
    expect(created).toMatchObject({ sku: "TR-NEW-37", priceCents: 41250, qtyOnHand: 6, qtyReserved: 0, qtyAvailable: 6, lowStockAt: 4 });
    // A flotation size names its overall diameter in inches (TRA flotation sizing): 37 in × 25.4 mm/in (NIST SP 811) = 939.8 mm.
    expect(created.tireDiameterMm).toBeCloseTo(939.8, 0);
    const again = await catalog.POST(req("POST", "/api/shop/catalog", tireBody()), ctx());
    expect(again.status).toBe(422);
    expect((await again.json()).fieldErrors).toEqual({ sku: ["SKU TR-NEW-37 is already in the catalog. Edit that item instead."] });

    const id = created.id as string;
    const edited = await one.PUT(req("PUT", `/api/shop/catalog/${id}`, tireBody({ price: "399", qtyOnHand: "3" })), ctx({ id }));
    expect(edited.status).toBe(200);
    expect((await edited.json()).item).toMatchObject({ priceCents: 39900, qtyOnHand: 3, lowStock: true });

    const tire = await item(db, SHOP_A, TIRE);
    expect(tire.qty_reserved).toBeGreaterThan(0);
    const under = await one.PUT(
      req("PUT", `/api/shop/catalog/${tire.id}`, {
        ...tireBody({ sku: TIRE, description: tire.description, tireSize: tire.tire_size }),
        qtyOnHand: "0",
      }),
      ctx({ id: tire.id }),
    );
    expect(under.status).toBe(422);
    expect((await under.json()).fieldErrors.qtyOnHand[0]).toBe(
      `Accepted quotes hold ${tire.qty_reserved} of this item: on hand cannot be less than ${tire.qty_reserved} until their work is done or they lapse.`,
    );
    expect(await item(db, SHOP_A, TIRE)).toEqual(tire);

    const gone = await archive(req("PUT", `/api/shop/catalog/${id}/archived`, { archived: true }), ctx({ id }));
    expect(gone.status).toBe(200);
    expect((await gone.json()).item.archivedAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    const list = await (await catalog.GET(req("GET", "/api/shop/catalog?q=TR-NEW-37"), ctx())).json();
    expect(list.total).toBe(0);
    expect((await one.GET(req("GET", `/api/shop/catalog/${id}`), ctx({ id }))).status).toBe(200);
    // The owner finds it among the archived items only, and brings it back into the lists.
    const archivedOnly = await (await catalog.GET(req("GET", "/api/shop/catalog?q=TR-NEW-37&archived=1"), ctx())).json();
    expect(archivedOnly.items.map((i: { id: string }) => i.id)).toEqual([id]);
    const all = await (await catalog.GET(req("GET", "/api/shop/catalog?archived=1&pageSize=200"), ctx())).json();
    expect(all.items.every((i: { archivedAt: string | null }) => i.archivedAt !== null)).toBe(true);
    const badFlag = await catalog.GET(req("GET", "/api/shop/catalog?archived=yes"), ctx());
    expect(badFlag.status).toBe(400);
    expect((await badFlag.json()).error).toMatch(/^Archived items only: /);
    expect((await archive(req("PUT", `/api/shop/catalog/${id}/archived`, { archived: false }), ctx({ id }))).status).toBe(200);
    expect((await (await catalog.GET(req("GET", "/api/shop/catalog?q=TR-NEW-37"), ctx())).json()).total).toBe(1);
    expect((await (await catalog.GET(req("GET", "/api/shop/catalog?q=TR-NEW-37&archived=1"), ctx())).json()).total).toBe(0);
  });

  it("an archived item stays on the quotes that have it but is not offered to new ones", async () => {
    const q = await sentQuoteWithTenLeft();
    const wheel = await item(db, SHOP_A, WHEEL);
    as(U.ownerA);
    expect((await archive(req("PUT", `/api/shop/catalog/${wheel.id}/archived`, { archived: true }), ctx({ id: wheel.id }))).status).toBe(
      200,
    );
    expect(await db("quote_lines").where({ quote_id: q.id, catalog_item_id: wheel.id }).first()).toMatchObject({ sku: WHEEL });
    const c = (await db("customers").where({ shop_id: SHOP_A }).first()) as { id: string };
    const r = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId: c.id, vehicle: VEHICLE }, WHEEL)),
      ctx(),
    );
    expect(r.status).toBe(422);
    expect((await r.json()).fieldErrors.wheelItemId).toEqual(["That wheel is not in your catalog."]);
    await archive(req("PUT", `/api/shop/catalog/${wheel.id}/archived`, { archived: false }), ctx({ id: wheel.id }));
  });
});

describe("a CSV import", () => {
  it("cannot put fewer on hand than accepted quotes hold: refused naming the SKU, nothing imported", async () => {
    const tire = await item(db, SHOP_A, TIRE);
    expect(tire.qty_reserved).toBeGreaterThan(0);
    const csv = [CSV_COLUMNS.slice(0, 6).join(","), `tire,${TIRE},${tire.description},389.00,1,35x12.50R17LT`].join("\n");
    const staged = await stageImport(db, SHOP_A, U.ownerA.id, "short.csv", parseCatalogCsv(csv));
    await expect(commitImport(db, SHOP_A, staged.id)).rejects.toThrow(
      `Accepted quotes hold more than the file puts on hand: ${TIRE} (${tire.qty_reserved} held, file says 1). Nothing was imported.`,
    );
    expect(await item(db, SHOP_A, TIRE)).toEqual(tire);
    expect((await db("catalog_imports").where({ id: staged.id }).first()).status).toBe("staged");
  });
});

describe("low stock at the counter", () => {
  it("counts the shop's listed, counted items at or under their mark", async () => {
    await db("catalog_items").where({ shop_id: SHOP_A }).update({ low_stock_at: null });
    expect(await countLowStock(db, SHOP_A)).toBe(0);
    await setAvailable(TIRE, 4);
    await db("catalog_items").where({ shop_id: SHOP_A, sku: TIRE }).update({ low_stock_at: 4 });
    // Services carry a mark too but are never counted, so never low.
    await db("catalog_items").where({ shop_id: SHOP_A, kind: "service" }).update({ low_stock_at: 100 });
    expect(await countLowStock(db, SHOP_A)).toBe(1);
    await setAvailable(TIRE, 5);
    expect(await countLowStock(db, SHOP_A)).toBe(0);
  });
});
