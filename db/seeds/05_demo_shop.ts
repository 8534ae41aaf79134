import type { Knex } from "knex";
import { parseCatalogCsv } from "../../lib/shop/catalog/csv";
import { buildQuoteDocument } from "../../lib/shop/quotes/document";
import { summarize } from "../../lib/shop/quotes/fitment";
import { counterVehicleForEngine } from "../../lib/shop/customers/schema";
import { type CounterBodyPoints, quoteAngles } from "../../lib/shop/customers/counterBodyPoints";
import { type CounterPlacard, quotePressure } from "../../lib/shop/customers/counterPlacard";
import { lbToKg, psiToKpa } from "../../lib/fitment";
import type { Setup } from "../../lib/setup/model";
import { catalogLine } from "../../lib/shop/quotes/catalogLine";
import { computeTotals } from "../../lib/shop/quotes/totals";
import { hashToken, randomToken } from "../../lib/platform/tokens";
import { DEMO_SHOP, DEMO_USERS } from "./01_demo_accounts";

/**
 * The demo shop's counter: settings, an invented catalog (no real brands — the product lines
 * are made up), a few customers and quotes in different states. Idempotent: only adds what is
 * missing, and leaves an owner's later changes alone.
 */
const TEO = DEMO_USERS[1];
const MARA = DEMO_USERS[2];

/** One change of a quote's status: the status, the staff user's id ("" for none) and the actor in words. */
type Step = [status: string, userId: string, actor: string];
/** The steps a staff member took on a quote, in order. */
const by = (user: { id: string; name: string }, ...statuses: string[]): Step[] => statuses.map((s) => [s, user.id, user.name]);
/** A step nobody on the staff took: the customer's, the payment provider's or the system's. */
const outside = (status: string, actor: string): Step => [status, "", actor];

/** A demo quote: catalog SKUs of its tire and wheel, its age and its history (the first step's author made it). */
interface QuotePlan {
  id: string;
  number: number;
  customer: number;
  tire: string;
  wheel: string;
  daysAgo: number;
  history: Step[];
}

export const DEMO_CUSTOMERS = [
  { id: "c0000000-0000-4000-8000-000000000001", name: "Ilse Varga-Pond", phone: "555-0160", email: "ilse@example.test" },
  { id: "c0000000-0000-4000-8000-000000000002", name: "Rook Tamsin", phone: "555-0171", email: "rook@example.test" },
  { id: "c0000000-0000-4000-8000-000000000003", name: "Hollis Pardee", phone: "555-0188", email: "" },
] as const;

export const DEMO_QUOTES = {
  draft: "d0000000-0000-4000-8000-000000000001",
  sent: "d0000000-0000-4000-8000-000000000002",
  paid: "d0000000-0000-4000-8000-000000000003",
  declined: "d0000000-0000-4000-8000-000000000004",
  expired: "d0000000-0000-4000-8000-000000000005",
} as const;

const H =
  "kind,sku,description,price,qty_on_hand,tire_size,wheel_diameter_in,wheel_width_in,wheel_offset_mm,wheel_backspacing_in,wheel_backspacing_reference,bolt_pattern,center_bore_mm,beadlock,service_type,service_unit";
const CATALOG = [
  H,
  "tire,HB-AT-2857017,Hogback AT all-terrain LT285/70R17 load range E,312.00,16,LT285/70R17 121/118Q E,,,,,,,,,,",
  "tire,HB-AT-3157017,Hogback AT all-terrain LT315/70R17 load range D,368.00,12,LT315/70R17 113/110Q D,,,,,,,,,,",
  "tire,SC-MT-35125017,Scree Claw MT mud-terrain 35x12.50R17LT load range E,405.00,10,35x12.50R17LT 121Q E,,,,,,,,,,",
  "tire,SC-MT-37125017,Scree Claw MT mud-terrain 37x12.50R17LT load range D,462.00,8,37x12.50R17LT 124Q D,,,,,,,,,,",
  "tire,DL-HT-2657017,Dustline HT highway 265/70R17,214.00,20,265/70R17 115T,,,,,,,,,,",
  "tire,SC-MT-35125020,Scree Claw MT mud-terrain 35x12.50R20LT load range E,448.00,6,35x12.50R20LT 121Q E,,,,,,,,,,",
  "wheel,BS-1790-6550,Basin Steel 17x9 black steel -12 mm,139.00,24,,17,9,-12,,,6x5.5,108,no,,",
  "wheel,BS-1780-6550,Basin Steel 17x8 black steel +10 mm,129.00,16,,17,8,10,,,6x5.5,108,no,,",
  "wheel,CF-1790-6550,Cairn Forged 17x9 bronze 0 mm,289.00,8,,17,9,0,,,6x139.7,106.1,no,,",
  "wheel,TB-1790-6550,Talus Beadlock 17x9 4.5 in backspacing,495.00,8,,17,9,,4.5,flange,6x5.5,108,yes,,",
  "wheel,TB-1785-8650,Talus Beadlock 17x8.5 for 8-lug 0 mm,515.00,4,,17,8.5,0,,,8x6.5,125,yes,,",
  "wheel,CF-2090-6550,Cairn Forged 20x9 bronze +18 mm,329.00,8,,20,9,18,,,6x5.5,106.1,no,,",
  "wheel,BS-1780-5450,Basin Steel 17x8 for 5-lug +0 mm,119.00,8,,17,8,0,,,5x4.5,71.5,no,,",
  "service,SV-MB,Mount and balance (per wheel),32.00,,,,,,,,,,,mount_balance,per_wheel",
  "service,SV-BLA,Beadlock ring assembly and torque (per wheel),55.00,,,,,,,,,,,beadlock_assembly,per_wheel",
  "service,SV-VS,Rubber valve stem (per wheel),6.00,,,,,,,,,,,valve_stem,per_wheel",
  "service,SV-TPMS,TPMS sensor service (per wheel),18.00,,,,,,,,,,,tpms,per_wheel",
  "service,SV-ALN,Four-wheel alignment,139.00,,,,,,,,,,,alignment,per_vehicle",
  "service,SV-TRIM,Fender trimming labour (per hour),145.00,,,,,,,,,,,fender_trim,per_hour",
  "service,SV-DISP,Tire disposal (per tire),5.00,,,,,,,,,,,disposal,per_wheel",
].join("\n");

// The hub bore is invented for the demo: the 106.1 mm wheels sit on it hub-centric, the 108 mm ones need rings.
const CURRENT_SETUP: Setup = {
  tire: "265/70R17 115T",
  wheelDiameterIn: 17,
  wheelWidthIn: 8,
  position: { mode: "offset", offsetMm: 25 },
  spacerMm: 0,
};
/**
 * Ilse's pickup's body points, measured at the counter with its 265/70R17 tires (802.8 mm across):
 * invented figures, so her quotes and the work order show the trail angles the tires change.
 */
const BODY_POINTS: CounterBodyPoints = {
  units: "imperial",
  frontCornerHeightMm: 762,
  frontCornerAheadMm: 914.4,
  rearCornerHeightMm: 812.8,
  rearCornerBehindMm: 1143,
  midHeightMm: 431.8,
  wheelbaseMm: 3683,
};
/**
 * Its door placard as the counter took it (invented): P265/70R17 113S at 35 psi front and rear,
 * axle ratings 3,700 lb front and 3,900 lb rear, no scale ticket — so her quotes and the work
 * order give the cold pressure to set for the quoted tire.
 */
const PLACARD: CounterPlacard = {
  units: "imperial",
  vehicleKind: "light-truck",
  placardTire: "P265/70R17 113S",
  placardFrontKpa: psiToKpa(35),
  placardRearKpa: psiToKpa(35),
  frontGawrKg: lbToKg(3700),
  rearGawrKg: lbToKg(3900),
  frontAxleKg: null,
  rearAxleKg: null,
};
const VEHICLE = counterVehicleForEngine({
  description: "Half-ton pickup, stock height",
  boltPattern: "6x5.5",
  hubBoreMm: 106.1,
  currentSetup: CURRENT_SETUP,
  axleRatio: 3.73,
});

export async function seed(knex: Knex): Promise<void> {
  await knex("shops").where({ id: DEMO_SHOP.id, address: "" }).update({
    address: "1180 Slate Wash Road, Quarry Flats",
    phone: "555-0142",
    tax_rate_bp: 825,
    labour_rate_cents: 12500,
    fabrication_rate_cents: 14500,
    quote_validity_days: 14,
    deposit_pct: 25,
    currency: "USD",
  });

  const report = parseCatalogCsv(CATALOG);
  if (report.errors.length) throw new Error(`demo catalog: ${JSON.stringify(report.errors)}`);
  await knex("catalog_items")
    .insert(report.items.map(({ row: _row, ...i }) => ({ ...i, shop_id: DEMO_SHOP.id })))
    .onConflict(["shop_id", "sku"])
    .ignore();

  for (const c of DEMO_CUSTOMERS) {
    await knex("customers")
      .insert({ ...c, shop_id: DEMO_SHOP.id, phone_digits: c.phone.replace(/\D/g, "") })
      .onConflict("id")
      .ignore();
  }
  const vehicleId = "e0000000-0000-4000-8000-000000000001";
  await knex("customer_vehicles")
    .insert({
      id: vehicleId,
      shop_id: DEMO_SHOP.id,
      customer_id: DEMO_CUSTOMERS[0].id,
      description: VEHICLE.description,
      bolt_pattern: VEHICLE.boltPattern,
      current_setup: JSON.stringify(CURRENT_SETUP),
      axle_ratio: VEHICLE.axleRatio,
      hub_bore_mm: VEHICLE.hubBoreMm,
      load_placard: JSON.stringify(PLACARD),
      body_points: JSON.stringify(BODY_POINTS),
    })
    .onConflict("id")
    .ignore();

  const bySku = async (sku: string) => knex("catalog_items").where({ shop_id: DEMO_SHOP.id, sku }).first();
  const shop = await knex("shops").where({ id: DEMO_SHOP.id }).first();
  const plans: QuotePlan[] = [
    {
      id: DEMO_QUOTES.draft,
      number: 1001,
      customer: 0,
      tire: "SC-MT-35125017",
      wheel: "BS-1790-6550",
      daysAgo: 0,
      history: by(TEO, "draft"),
    },
    {
      id: DEMO_QUOTES.sent,
      number: 1002,
      customer: 1,
      tire: "HB-AT-3157017",
      wheel: "CF-1790-6550",
      daysAgo: 2,
      history: by(TEO, "draft", "sent"),
    },
    {
      id: DEMO_QUOTES.paid,
      number: 1003,
      customer: 0,
      tire: "SC-MT-37125017",
      wheel: "TB-1790-6550",
      daysAgo: 5,
      history: [...by(MARA, "draft", "sent"), outside("accepted", "customer"), outside("deposit_paid", "payment provider")],
    },
    {
      id: DEMO_QUOTES.declined,
      number: 1004,
      customer: 2,
      tire: "HB-AT-2857017",
      wheel: "BS-1780-6550",
      daysAgo: 9,
      history: by(TEO, "draft", "sent", "declined"),
    },
    {
      id: DEMO_QUOTES.expired,
      number: 1005,
      customer: 1,
      tire: "HB-AT-2857017",
      wheel: "BS-1790-6550",
      daysAgo: 30,
      history: [...by(MARA, "draft", "sent"), outside("expired", "system")],
    },
  ];
  for (const p of plans) {
    if (await knex("quotes").where({ id: p.id }).first("id")) continue;
    const tire = await bySku(p.tire);
    const wheel = await bySku(p.wheel);
    const fit = summarize(VEHICLE, tire.tire_size, {
      diameterIn: wheel.wheel_diameter_in,
      widthIn: wheel.wheel_width_in,
      offsetMm: wheel.wheel_offset_mm,
      beadlock: wheel.beadlock,
    });
    // As the counter does for a saved vehicle with body points (lib/shop/quotes/queries.ts).
    if (p.customer === 0) {
      fit.pressure = quotePressure(PLACARD, CURRENT_SETUP, fit.setups.planned);
      fit.angles = quoteAngles(BODY_POINTS, CURRENT_SETUP, fit.setups.planned);
    }
    const svc = async (sku: string, qty: number) => {
      const s = await bySku(sku);
      return catalogLine(s, qty, false);
    };
    const lines = [
      catalogLine(tire, 4, true),
      catalogLine(wheel, 4, true),
      await svc("SV-MB", 4),
      ...(wheel.beadlock ? [await svc("SV-BLA", 4)] : []),
      await svc("SV-VS", 4),
      ...(fit.alignmentSuggested ? [await svc("SV-ALN", 1)] : []),
      ...(fit.findings.some((f) => f.kind === "outer-reach") ? [await svc("SV-TRIM", 1)] : []),
      await svc("SV-DISP", 4),
    ];
    const t = computeTotals({
      lines: lines.map((l) => ({
        quantity: l.quantity,
        unitPriceCents: l.unit_price_cents,
        discountCents: l.discount_cents,
        taxable: l.taxable,
      })),
      discountCents: 0,
      taxRateBp: shop.tax_rate_bp,
      depositPct: shop.deposit_pct,
    });
    const status = p.history[p.history.length - 1]![0];
    const authorId = p.history[0]![1];
    const created = knex.raw("now() - make_interval(days => ?)", [p.daysAgo]);
    const sent = p.history.some((h) => h[0] === "sent");
    await knex.transaction(async (trx) => {
      await trx("quotes").insert({
        id: p.id,
        shop_id: DEMO_SHOP.id,
        number: p.number,
        customer_id: DEMO_CUSTOMERS[p.customer]!.id,
        vehicle_id: p.customer === 0 ? vehicleId : null,
        created_by: authorId,
        status,
        vehicle_description: VEHICLE.description,
        bolt_pattern: VEHICLE.boltPattern,
        current_setup: JSON.stringify(CURRENT_SETUP),
        axle_ratio: VEHICLE.axleRatio,
        hub_bore_mm: VEHICLE.hubBoreMm,
        tire_item_id: tire.id,
        wheel_item_id: wheel.id,
        wheel_qty: 4,
        fitment: JSON.stringify(fit),
        tax_rate_bp: shop.tax_rate_bp,
        deposit_pct: shop.deposit_pct,
        subtotal_cents: t.subtotalCents,
        taxable_cents: t.taxableCents,
        tax_cents: t.taxCents,
        total_cents: t.totalCents,
        deposit_cents: t.depositCents,
        // A link nobody knows: staff "send again" to get one into the outbox.
        public_token_hash: sent ? hashToken(randomToken()) : null,
        valid_until: sent
          ? knex.raw("now() - make_interval(days => ?) + make_interval(days => ?)", [p.daysAgo, shop.quote_validity_days])
          : null,
        created_at: created,
        updated_at: created,
      });
      await trx("quote_lines").insert(
        lines.map((l, i) => ({ ...l, quote_id: p.id, position: i + 1, line_total_cents: t.lines[i]!.netCents })),
      );
      let from: string | null = null;
      for (const [to, uid, label] of p.history) {
        await trx("quote_events").insert({
          quote_id: p.id,
          from_status: from,
          to_status: to,
          actor_user_id: uid || null,
          actor: label,
          at: created,
        });
        from = to;
      }
      if (sent) {
        // What the customer received, as the app stores it when a quote is sent.
        const row = await trx("quotes").where({ id: p.id }).first();
        const stored = await trx("quote_lines").where({ quote_id: p.id }).orderBy("position");
        const author = DEMO_USERS.find((u) => u.id === authorId);
        const document = buildQuoteDocument({
          shop,
          quote: row,
          customer: DEMO_CUSTOMERS[p.customer]!,
          lines: stored,
          preparedBy: author?.name ?? null,
          sentAt: row.created_at,
        });
        await trx("quote_documents").insert({ quote_id: p.id, sent_by: authorId, sent_at: created, document: JSON.stringify(document) });
      }
      if (status === "deposit_paid") {
        await trx("payments").insert({
          shop_id: DEMO_SHOP.id,
          quote_id: p.id,
          provider_session_id: `cs_demo_${p.number}`,
          amount_cents: t.depositCents,
          currency: "usd",
          status: "paid",
          paid_at: created,
        });
      }
    });
  }
}
