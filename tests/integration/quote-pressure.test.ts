import { describe, expect, it, vi } from "vitest";
import { psiToKpa } from "@/lib/fitment";
import { COUNTER_BODY_POINTS } from "@/lib/shop/customers/placardTestUtil";
import { ctx, req } from "./support/requests";
import { depositPaidQuote, firstFreeStart, STAFF_A } from "./support/quoteJourney";
import { SHOP_A, VEHICLE, quoteRequest } from "./support/shopFixture";
import { staffAtCounter } from "./support/staffAtCounter";

// Staff of shop A at the counter; drafts send no mail.
const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
const db = staffAtCounter(session, { bookable: true });
const customers = await import("@/app/api/shop/customers/route");
const quotes = await import("@/app/api/shop/quotes/route");
const quote = await import("@/app/api/shop/quotes/[id]/route");
const pdfRoute = (await import("@/app/api/shop/quotes/[id]/pdf/route")).GET;

/** The counter truck's door placard: 265/70R17 113T at 35 psi front and rear, weighed on a scale (invented). */
const PLACARD = {
  units: "imperial",
  placardTire: "265/70R17 113T",
  placardFrontKpa: psiToKpa(35),
  placardRearKpa: psiToKpa(35),
  frontAxleKg: 1430,
  rearAxleKg: 1200,
};

async function pdfText(id: string): Promise<string> {
  const res = await pdfRoute(req("GET", `/api/shop/quotes/${id}/pdf`), ctx({ id }));
  expect(res.status).toBe(200);
  const { PDFParse } = await import("pdf-parse");
  const parser = new PDFParse({ data: new Uint8Array(Buffer.from(await res.arrayBuffer())) });
  try {
    return (await parser.getText()).text.replace(/\s+/g, " ");
  } finally {
    await parser.destroy();
  }
}

/** The quote as its page reads it. */
const detailOf = async (id: string) => (await quote.GET(req("GET", `/api/shop/quotes/${id}`), ctx({ id }))).json();

let n = 0;
async function makeQuote(vehicle: Record<string, unknown>, extra: Record<string, unknown> = {}) {
  n += 1;
  const cres = await customers.POST(
    req("POST", "/api/shop/customers", { name: `Ida Placard ${n}`, phone: `(555) 010-778${n}`, email: "" }),
    ctx(),
  );
  const c = await cres.json();
  return quotes.POST(req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId: c.customer.id, vehicle, ...extra })), ctx());
}
/** A quote by makeQuote that must be made (201), with its detail. */
async function madeQuote(vehicle: Record<string, unknown>) {
  const made = await makeQuote(vehicle);
  const body = await made.json();
  expect(made.status, JSON.stringify(body)).toBe(201);
  return { id: body.id as string, detail: await detailOf(body.id) };
}

/** A new customer whose first quote saved the counter truck with its placard; their id and the saved vehicle's row. */
async function customerWithSavedTruck(name: string, phone: string) {
  const cres = await customers.POST(req("POST", "/api/shop/customers", { name, phone, email: "" }), ctx());
  const customerId = (await cres.json()).customer.id as string;
  const first = await quotes.POST(
    req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicle: { ...VEHICLE, placard: PLACARD }, saveVehicle: true })),
    ctx(),
  );
  expect(first.status).toBe(201);
  return { customerId, saved: await db("customer_vehicles").where({ customer_id: customerId }).first() };
}

describe("a quote for a counter vehicle with its door placard gives the cold pressure to set", () => {
  it("per axle in its summary, its cautions and its PDF; 35x12.50R17LT 121Q E sets its road minimum, 37.9 psi", async () => {
    const { id, detail } = await madeQuote({ ...VEHICLE, placard: PLACARD });
    const p = detail.quote.fitment.pressure;
    // TRA light-truck load formula (NHTSA "The Pneumatic Tire", 2006): 65 psi × (1027 kg / 1450 kg)^(1/0.585)
    // = 36.0 psi carries what the placard tire carries at 35 psi; the LRE flotation road minimum
    // 0.5833 × 65 psi = 37.9 psi (FMVSS 138 ratio by proportion, the engine's) is above it and is set.
    expect(p.axles.map((a: { axle: string; decidedBy: string }) => [a.axle, a.decidedBy])).toEqual([
      ["front", "road minimum"],
      ["rear", "road minimum"],
    ]);
    expect(p.axles[0].kpa).toBeCloseTo(psiToKpa(65) * 0.5833, 0);
    const text = await pdfText(id);
    expect(text).toContain("Cold pressure to set: front 37.9 psi (261 kPa), rear 37.9 psi (261 kPa)");
    expect(text).toMatch(/Cold pressure to set for 35x12\.50R17LT 121Q LRE: front 37\.9 psi \(261 kPa\)/);
    expect(text).toContain("Never inflate above the sidewall maximum, 65 psi (448 kPa)");
    expect(text).not.toContain("Cold pressure: set it for the vehicle's axle loads");
  });

  it("without a placard, the quote keeps today's caution and no pressure", async () => {
    const made = await makeQuote(VEHICLE);
    const { id } = await made.json();
    const detail = await detailOf(id);
    expect(detail.quote.fitment.pressure).toBeUndefined();
    const text = await pdfText(id);
    expect(text).toContain("Cold pressure: set it for the vehicle's axle loads from the door placard");
    expect(text).not.toContain("Cold pressure to set");
    expect(text).toContain("Never inflate above the maximum on the sidewall or the wheel.");
  });

  it("refuses a placard pressure the placard tire does not allow, beside its field, and stores nothing", async () => {
    const before = await db("quotes").count<{ count: string }[]>({ count: "*" });
    const res = await makeQuote({ ...VEHICLE, placard: { ...PLACARD, placardFrontKpa: psiToKpa(70) } });
    const body = await res.json();
    expect(res.status).toBe(422);
    expect(Object.keys(body.fieldErrors)).toEqual(["vehicle.placard.placardFrontKpa"]);
    const key = Object.keys(body.fieldErrors).find((k) => k.endsWith("placardFrontKpa"));
    expect(body.fieldErrors[key!][0]).toMatch(/^Placard cold pressure, front \(psi\):/);
    expect(await db("quotes").count<{ count: string }[]>({ count: "*" })).toEqual(before);
  });

  it("the work order's pressure step gives the pressure to set per axle; without a placard, only the tire's limits", async () => {
    const { bookInstall } = await import("@/lib/shop/bookings/queries");
    const { getWorkOrder, openWorkOrder } = await import("@/lib/shop/workOrders/queries");
    const orderOf = async (vehicle: object, name: string) => {
      const q = await depositPaidQuote(db, name, vehicle);
      await bookInstall(db, { by: "staff", scope: { shopId: SHOP_A }, quoteId: q.id }, { start: await firstFreeStart(db, q.id) }, STAFF_A);
      return getWorkOrder(db, SHOP_A, await openWorkOrder(db, SHOP_A, q.id));
    };
    const withPlacard = await orderOf({ ...VEHICLE, placard: PLACARD }, "Ida Bay");
    // As on the quote: the LRE flotation road minimum 0.5833 × 65 psi (the engine's FMVSS 138 proportion).
    expect(withPlacard.pressureLimits?.toSet?.map((a) => [a.axle, Math.round(a.kpa)])).toEqual([
      ["front", 261],
      ["rear", 261],
    ]);
    const without = await orderOf(VEHICLE, "Ida Bay Two");
    expect(without.pressureLimits?.toSet).toBeUndefined();
    expect(without.pressureLimits?.maxKpa).toBeCloseTo(psiToKpa(65), 0);
    expect(without.trailAngles).toBeNull();
    // With the body points the counter measured, the sheet carries the quote's own angle rows and caution.
    const withBody = await orderOf({ ...VEHICLE, bodyPoints: BODY_POINTS }, "Ida Bay Three");
    const quoteOf = await db("quotes").where({ id: withBody.quoteId }).first("fitment");
    const quoted = (quoteOf.fitment.angles.angles as { kind: string; currentDeg: number; plannedDeg: number }[]).map(
      (a) => `${a.currentDeg.toFixed(1)}° → ${a.plannedDeg.toFixed(1)}°`,
    );
    expect(withBody.trailAngles?.rows.map((r) => r.label)).toEqual(["Approach angle", "Departure angle", "Ramp breakover angle"]);
    expect(withBody.trailAngles?.rows.map((r) => r.change)).toEqual(quoted);
    expect(withBody.trailAngles?.caution).toMatch(/^Trail angles: from the body points the shop measured/);
  });

  it("a saved vehicle keeps its placard: a later quote for it gives the same pressure to set", async () => {
    const { customerId, saved } = await customerWithSavedTruck("Ida Saved", "(555) 010-7799");
    expect(saved.load_placard).toMatchObject({ placardTire: "265/70R17 113T", frontAxleKg: 1430, units: "imperial" });
    const again = await quotes.POST(req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicleId: saved.id })), ctx());
    const { id } = await again.json();
    expect(again.status).toBe(201);
    const detail = await detailOf(id);
    expect(detail.quote.fitment.pressure.axles.map((a: { kpa: number }) => Math.round(a.kpa))).toEqual([261, 261]);
  });

  it("a saved vehicle changed at the counter: ticked, the changes are written over it (no second copy); unticked, it stays as stored", async () => {
    const { customerId, saved } = await customerWithSavedTruck("Ida Changed", "(555) 010-7798");
    const changed = { ...VEHICLE, placard: { ...PLACARD, vehicleKind: "passenger-car", placardFrontKpa: psiToKpa(36), rearAxleKg: 1250 } };

    const kept = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicleId: saved.id, vehicle: changed, saveVehicle: false })),
      ctx(),
    );
    expect(kept.status).toBe(201);
    expect((await db("customer_vehicles").where({ id: saved.id }).first()).load_placard).toEqual(saved.load_placard);

    const made = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicleId: saved.id, vehicle: changed, saveVehicle: true })),
      ctx(),
    );
    const { id } = await made.json();
    expect(made.status).toBe(201);
    const rows = await db("customer_vehicles").where({ customer_id: customerId });
    expect(rows).toHaveLength(1);
    expect(rows[0].load_placard).toMatchObject({ vehicleKind: "passenger-car", rearAxleKg: 1250 });
    expect(rows[0].load_placard.placardFrontKpa).toBeCloseTo(psiToKpa(36), 6);
    const detail = await detailOf(id);
    expect(detail.quote.vehicleId).toBe(saved.id);
    expect(detail.quote.fitment.pressure.placardFrontKpa).toBeCloseTo(psiToKpa(36), 6);
  });

  it("a saved vehicle's change refused (a negative axle weight) or for another customer's vehicle: nothing stored, the vehicle as it was", async () => {
    const { customerId, saved } = await customerWithSavedTruck("Ida Refused", "(555) 010-7797");
    const before = await db("quotes").count<{ count: string }[]>({ count: "*" });
    const bad = await quotes.POST(
      req(
        "POST",
        "/api/shop/quotes",
        await quoteRequest(db, {
          customerId,
          vehicleId: saved.id,
          vehicle: { ...VEHICLE, placard: { ...PLACARD, rearAxleKg: -1200 } },
          saveVehicle: true,
        }),
      ),
      ctx(),
    );
    const body = await bad.json();
    expect(bad.status).toBe(422);
    expect(body.fieldErrors["vehicle.placard.rearAxleKg"][0]).toMatch(/^Rear axle weight, scale ticket \(lb\):/);
    const other = await customers.POST(
      req("POST", "/api/shop/customers", { name: "Ida Other", phone: "(555) 010-7796", email: "" }),
      ctx(),
    );
    const otherId = (await other.json()).customer.id as string;
    const notTheirs = await quotes.POST(
      req(
        "POST",
        "/api/shop/quotes",
        await quoteRequest(db, { customerId: otherId, vehicleId: saved.id, vehicle: VEHICLE, saveVehicle: true }),
      ),
      ctx(),
    );
    expect(notTheirs.status).toBe(422);
    expect((await notTheirs.json()).fieldErrors.vehicleId).toEqual(["That vehicle was not found."]);
    expect(await db("quotes").count<{ count: string }[]>({ count: "*" })).toEqual(before);
    expect(await db("customer_vehicles").where({ id: saved.id }).first()).toEqual(saved);
  });
});

/** The counter truck's body points, measured with its 265/70R17 tires (invented). */
const BODY_POINTS = COUNTER_BODY_POINTS;

describe("a quote for a counter vehicle with its body points gives the trail angles now and with the quoted tires", () => {
  it("in its summary, its PDF and its cautions; a saved vehicle keeps them for a later quote", async () => {
    const { id, detail } = await madeQuote({ ...VEHICLE, bodyPoints: BODY_POINTS });
    expect(detail.quote.fitment.angles.angles.map((a: { kind: string }) => a.kind)).toEqual(["approach", "departure", "breakover"]);
    const text = await pdfText(id);
    // 265/70R17 (802.8 mm) → 35x12.50R17LT (889 mm): the tangent from the corner 900 mm ahead and 750 mm
    // high, 45.7° → 48.6° with the corner raised by the 43.1 mm radius change (SAE J1100 definition;
    // worked in lib/shop/customers/counterBodyPoints.test.ts).
    expect(text).toContain("Approach angle: 45.7° → 48.6°");
    expect(text).toMatch(/Departure angle: \d+\.\d° → \d+\.\d°/);
    expect(text).toMatch(/Ramp breakover angle: \d+\.\d° → \d+\.\d°/);
    expect(text).toContain("Trail angles: from the body points the shop measured with the current tires");
    expect(text).not.toContain("Cold pressure to set");

    const { customerId, saved } = await customerWithSavedTruck("Ida Points", "(555) 010-7795");
    const changed = { ...VEHICLE, placard: PLACARD, bodyPoints: BODY_POINTS };
    const again = await quotes.POST(
      req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicleId: saved.id, vehicle: changed, saveVehicle: true })),
      ctx(),
    );
    expect(again.status).toBe(201);
    expect((await db("customer_vehicles").where({ id: saved.id }).first()).body_points).toEqual(BODY_POINTS);
    const later = await quotes.POST(req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicleId: saved.id })), ctx());
    const { id: laterId } = await later.json();
    const d2 = await detailOf(laterId);
    expect(d2.quote.fitment.angles).toEqual(detail.quote.fitment.angles);
  });

  it("refuses a negative height or a point inside the tire beside its field, as labelled, and stores nothing", async () => {
    const quotesBefore = await db("quotes").count<{ count: string }[]>({ count: "*" });
    const vehiclesBefore = await db("customer_vehicles").count<{ count: string }[]>({ count: "*" });
    const negative = await makeQuote(
      { ...VEHICLE, placard: PLACARD, bodyPoints: { ...BODY_POINTS, units: "imperial", midHeightMm: -420 } },
      { saveVehicle: true },
    );
    const n = await negative.json();
    expect(negative.status).toBe(422);
    expect(Object.keys(n.fieldErrors)).toEqual(["vehicle.bodyPoints.midHeightMm"]);
    expect(n.fieldErrors["vehicle.bodyPoints.midHeightMm"][0]).toMatch(/^Lowest point midway, height \(in\): /);
    const inside = await makeQuote(
      { ...VEHICLE, bodyPoints: { ...BODY_POINTS, frontCornerHeightMm: 200, frontCornerAheadMm: 100 } },
      { saveVehicle: true },
    );
    expect(inside.status).toBe(422);
    expect((await inside.json()).fieldErrors["vehicle.bodyPoints.frontCornerHeightMm"][0]).toMatch(
      /^Front corner height \(mm\): .*measured with the current tire/,
    );
    expect(await db("quotes").count<{ count: string }[]>({ count: "*" })).toEqual(quotesBefore);
    expect(await db("customer_vehicles").count<{ count: string }[]>({ count: "*" })).toEqual(vehiclesBefore);
  });
});
