import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U, VEHICLE, quoteRequest, seedShops } from "./support/shopFixture";
import { internalKeys } from "./support/apiKeys";
import { CSV_TEMPLATE, parseCatalogCsv } from "@/lib/shop/catalog/csv";

/**
 * The shop counter's vehicle is a lib/setup setup: a backspacing with its reference is kept as
 * entered, and vehicles and quotes written before (a tire and an offset in four columns) read
 * as the same setup with that offset.
 */
const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
vi.mock("@/lib/platform/mail", () => ({ queueMail: async () => {}, appOrigin: () => "http://127.0.0.1:3000" }));

const db = testDb();
const MIGRATION = "20261205120000_one_setup_shape.ts";
afterAll(() => closeDatabases(db));

const candidates = (await import("@/app/api/shop/fitment/candidates/route")).POST;
const quotes = await import("@/app/api/shop/quotes/route");
const quoteById = await import("@/app/api/shop/quotes/[id]/route");
const customers = await import("@/app/api/shop/customers/route");
const customerById = (await import("@/app/api/shop/customers/[id]/route")).GET;

/** Runs the migrations up to (not including) this change. */
async function migrateToBefore(name: string) {
  await db.migrate.rollback(undefined, true);
  for (;;) {
    const [, pending] = (await db.migrate.list()) as [unknown[], { file: string }[]];
    if (!pending.length || pending[0]!.file === name) return;
    await db.migrate.up();
  }
}

const SETUP_25 = { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 };

describe("the migration to one setup shape", () => {
  const CUSTOMER = "0a000000-0000-4000-8000-0000000000c1";
  const VEHICLE_ID = "0a000000-0000-4000-8000-0000000000d1";
  const QUOTE = "0a000000-0000-4000-8000-0000000000e1";

  beforeAll(async () => {
    await migrateToBefore(MIGRATION);
    await db("shops").insert({ id: SHOP_A, name: "Shop A", tax_rate_bp: 825, deposit_pct: 25, quote_validity_days: 14 });
    await db("catalog_items").insert({
      shop_id: SHOP_A,
      kind: "wheel",
      sku: "W-BS",
      description: "Old wheel",
      price_cents: 100,
      qty_on_hand: 1,
      wheel_diameter_in: 17,
      wheel_width_in: 9,
      wheel_offset_mm: -12.7,
      wheel_backspacing_in: 4.5,
      wheel_backspacing_ref: "flange",
      bolt_pattern: "6x5.5",
    });
    await db("customers").insert({
      id: CUSTOMER,
      shop_id: SHOP_A,
      name: "Wren Abernathy",
      phone: "555 014 9911",
      phone_digits: "5550149911",
    });
    await db("customer_vehicles").insert({
      id: VEHICLE_ID,
      shop_id: SHOP_A,
      customer_id: CUSTOMER,
      description: "Old counter pickup",
      bolt_pattern: "6x5.5",
      tire_size: "265/70R17",
      wheel_diameter_in: 17,
      wheel_width_in: 8,
      wheel_offset_mm: 25,
      axle_ratio: 3.73,
      hub_bore_mm: 106.1,
    });
    await db("quotes").insert({
      id: QUOTE,
      shop_id: SHOP_A,
      number: 900,
      customer_id: CUSTOMER,
      vehicle_id: VEHICLE_ID,
      status: "draft",
      vehicle_description: "Old counter pickup",
      bolt_pattern: "6x5.5",
      current_tire: "265/70R17",
      current_wheel_diameter_in: 17,
      current_wheel_width_in: 8,
      current_wheel_offset_mm: 25,
      wheel_qty: 4,
      fitment: JSON.stringify({}),
      tax_rate_bp: 825,
      deposit_pct: 25,
    });
    await db("catalog_imports").insert({
      shop_id: SHOP_A,
      rows: JSON.stringify([{ sku: "W-OLD", wheel_backspacing_in: 4.5, wheel_backspacing_ref: "flange" }, { sku: "T-OLD" }]),
      row_count: 2,
      error_count: 0,
    });
    // That migration, then the ones after it: the app's queries below read today's columns.
    await db.migrate.latest();
    // The rest of the shop (people and the template catalog), in today's columns.
    await db("users").insert(
      Object.values(U)
        .filter((u) => u.shop_id === SHOP_A)
        .map((u) => ({ ...u, password_hash: "x" })),
    );
    await db("catalog_items").insert(parseCatalogCsv(CSV_TEMPLATE).items.map(({ row: _r, ...i }) => ({ ...i, shop_id: SHOP_A })));
  });

  it("keeps what was stored readable: the old offset as the setup's position, no spacer", async () => {
    const v = await db("customer_vehicles").where({ id: VEHICLE_ID }).first();
    expect(v.current_setup).toEqual(SETUP_25);
    expect(v).not.toHaveProperty("wheel_offset_mm");
    expect((await db("quotes").where({ id: QUOTE }).first()).current_setup).toEqual(SETUP_25);
    // The catalog's column and the staged imports' rows take the one spelling.
    const cols = (
      await db.raw(
        "select column_name from information_schema.columns where table_name = 'catalog_items' and column_name like 'wheel_backspacing%' order by 1",
      )
    ).rows.map((r: { column_name: string }) => r.column_name);
    expect(cols).toEqual(["wheel_backspacing_in", "wheel_backspacing_reference"]);
    expect(await db("catalog_items").where({ sku: "W-BS" }).first()).toMatchObject({
      wheel_backspacing_in: 4.5,
      wheel_backspacing_reference: "flange",
    });
    expect((await db("catalog_imports").first()).rows).toEqual([
      { sku: "W-OLD", wheel_backspacing_in: 4.5, wheel_backspacing_reference: "flange" },
      { sku: "T-OLD" },
    ]);
  });

  it("serves the migrated vehicle in the setup's shape, and quotes from it", async () => {
    session.current = sessionOf(U.staffA);
    const res = await (await customerById(req("GET", `/api/shop/customers/${CUSTOMER}`), ctx({ id: CUSTOMER }))).json();
    expect(res.vehicles).toEqual([
      expect.objectContaining({
        id: VEHICLE_ID,
        description: "Old counter pickup",
        boltPattern: "6x5.5",
        hubBoreMm: 106.1,
        axleRatio: 3.73,
        currentSetup: SETUP_25,
      }),
    ]);
    expect(internalKeys(res)).toEqual([]);
    const made = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId: CUSTOMER, vehicleId: VEHICLE_ID }, "WH-EXAMPLE-17")),
      ctx(),
    );
    expect(made.status).toBe(201);
    const id = (await made.json()).id as string;
    const d = await (await quoteById.GET(req("GET", `/api/shop/quotes/${id}`), ctx({ id }))).json();
    expect(d.quote.currentSetup).toEqual(SETUP_25);
    // 35x12.50R17LT (889 mm) against 265/70R17 (802.8 mm): +86.2 mm (ISO 4000-1 / TRA designations).
    expect(d.quote.fitment.diameterChangeMm).toBeCloseTo(889 - 802.8, 6);
  });

  it("rolls back to the four columns, a backspacing turned into its offset (and up again)", async () => {
    // 4.5 in to the flange edge of a 9 in wheel, 0.5 in allowance: (4.5 − 0.5 − 4.5) × 25.4 = −12.7 mm
    // (BS = W/2 + offset at the bead seat; lib/fitment README, common practice, no source; 1 in = 25.4 mm, NIST SP 811).
    const bs = {
      tire: "35x12.50R17LT",
      wheelDiameterIn: 17,
      wheelWidthIn: 9,
      position: { mode: "backspacing", backspacingIn: 4.5, reference: "flange", flangeIn: 0.5 },
      spacerMm: 0,
    };
    await db("customer_vehicles")
      .where({ id: VEHICLE_ID })
      .update({ current_setup: JSON.stringify(bs) });
    await db.migrate.down({ name: MIGRATION });
    const v = await db("customer_vehicles").where({ id: VEHICLE_ID }).first();
    expect(v).toMatchObject({ tire_size: "35x12.50R17LT", wheel_diameter_in: 17, wheel_width_in: 9 });
    expect(v.wheel_offset_mm).toBeCloseTo(-12.7, 9);
    expect((await db("quotes").where({ id: QUOTE }).first()).current_wheel_offset_mm).toBe(25);
    expect((await db("catalog_imports").first()).rows[0]).toEqual({
      sku: "W-OLD",
      wheel_backspacing_in: 4.5,
      wheel_backspacing_ref: "flange",
    });
    await db.migrate.latest();
  });
});

describe("a vehicle entered at the counter", () => {
  let customerId = "";
  const BACKSPACING = {
    description: "Counter pickup on backspacing",
    boltPattern: "6x5.5",
    // 4.5 in to the flange edge of a 9 in wheel: −12.7 mm, as above.
    currentSetup: {
      tire: "35x12.50R17LT",
      wheelDiameterIn: "17",
      wheelWidthIn: "9",
      position: { mode: "backspacing", backspacingIn: "4-1/2", reference: "flange", flangeIn: "1/2" },
      spacerMm: "",
    },
  };

  beforeAll(async () => {
    await rebuild(db);
    await seedShops(db);
    session.current = sessionOf(U.staffA);
    customerId = (
      await (
        await customers.POST(req("POST", "/api/shop/customers", { name: "Odile Fenwright", phone: "555 014 7788", email: "" }), ctx())
      ).json()
    ).customer.id;
  });

  it("is saved as entered: the backspacing, what it was measured to and the flange allowance", async () => {
    const res = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicle: BACKSPACING, saveVehicle: true }, "WH-EXAMPLE-17")),
      ctx(),
    );
    expect(res.status).toBe(201);
    const stored = await db("customer_vehicles").where({ customer_id: customerId }).first();
    expect(stored.current_setup).toEqual({
      tire: "35x12.50R17LT",
      wheelDiameterIn: 17,
      wheelWidthIn: 9,
      position: { mode: "backspacing", backspacingIn: 4.5, reference: "flange", flangeIn: 0.5 },
      spacerMm: 0,
    });
    const listed = await (await customerById(req("GET", `/api/shop/customers/${customerId}`), ctx({ id: customerId }))).json();
    expect(listed.vehicles[0].currentSetup.position).toEqual({
      mode: "backspacing",
      backspacingIn: 4.5,
      reference: "flange",
      flangeIn: 0.5,
    });
  });

  it("compares as the offset it stands for", async () => {
    const asOffset = { ...BACKSPACING, currentSetup: { ...BACKSPACING.currentSetup, position: { mode: "offset", offsetMm: "-12.7" } } };
    const a = await (await candidates(req("POST", "/api/shop/fitment/candidates", BACKSPACING), ctx())).json();
    const b = await (await candidates(req("POST", "/api/shop/fitment/candidates", asOffset), ctx())).json();
    expect(a.vehicle.wheel.offsetMm).toBeCloseTo(-12.7, 9);
    expect(a.picks.map((p: { summary: { outerPokeChangeMm: number } }) => p.summary.outerPokeChangeMm)).toEqual(
      b.picks.map((p: { summary: { outerPokeChangeMm: number } }) => p.summary.outerPokeChangeMm),
    );
  });

  it("names the setup's fields as the form labels them, and refuses a spacer the counter's figures would leave out", async () => {
    const bad = await candidates(
      req("POST", "/api/shop/fitment/candidates", {
        ...BACKSPACING,
        currentSetup: { ...BACKSPACING.currentSetup, wheelDiameterIn: "18", spacerMm: "25" },
      }),
      ctx(),
    );
    expect(bad.status).toBe(422);
    const { fieldErrors } = await bad.json();
    expect(fieldErrors["currentSetup.wheelDiameterIn"][0]).toBe(
      "Wheel diameter (in): a 17 in tire needs a 17 in wheel; this wheel is 18 in.",
    );
    const spacer = await (
      await candidates(
        req("POST", "/api/shop/fitment/candidates", { ...BACKSPACING, currentSetup: { ...BACKSPACING.currentSetup, spacerMm: "25" } }),
        ctx(),
      )
    ).json();
    expect(spacer.fieldErrors["currentSetup.spacerMm"][0]).toMatch(
      /^Spacer \(mm, optional\): the counter compares wheels without a spacer/,
    );
  });

  it("still reads the flat vehicle of older clients, with its problems under its own names", async () => {
    const ok = await candidates(req("POST", "/api/shop/fitment/candidates", VEHICLE), ctx());
    expect(ok.status).toBe(200);
    const bs = await candidates(
      req("POST", "/api/shop/fitment/candidates", { ...VEHICLE, offsetMode: "backspacing", backspacingIn: 4.5 }),
      ctx(),
    );
    expect(bs.status).toBe(422);
    expect(Object.keys((await bs.json()).fieldErrors)).toEqual(["backspacingFrom"]);
  });
});
