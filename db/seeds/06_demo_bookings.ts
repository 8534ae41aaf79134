import type { Knex } from "knex";
import { DEFAULT_TIME_ZONE, defaultServiceTime } from "../../lib/shop/bookings/vocabulary";
import { workloadOf } from "../../lib/shop/bookings/workload";
import { addDays, wallTime, weekdayOf, zonedInstant } from "../../lib/shop/bookings/zoned";
import { DEMO_SHOP } from "./01_demo_accounts";
import { DEMO_QUOTES } from "./05_demo_shop";

/**
 * The demo shop's bookings setup: its clock, an invented week, two lift bays and an alignment
 * rack; and the paid demo quote booked two weekdays ahead so the calendar shows something.
 * Idempotent: a shop that already has a schedule (the owner's own) is left alone.
 */
const BAYS = [
  { id: "b4000000-0000-4000-8000-000000000001", name: "Lift 1", kind: "lift_bay", position: 0 },
  { id: "b4000000-0000-4000-8000-000000000002", name: "Lift 2", kind: "lift_bay", position: 1 },
  { id: "b4000000-0000-4000-8000-000000000003", name: "Alignment rack", kind: "alignment_rack", position: 2 },
] as const;

/** Weekdays 7:30–17:30, Saturday mornings 8:00–12:00, Sunday closed (invented). */
const week = {
  timeZone: DEFAULT_TIME_ZONE,
  hours: [1, 2, 3, 4, 5]
    .map((weekday) => ({ weekday, opens: 7 * 60 + 30, closes: 17 * 60 + 30 }))
    .concat([{ weekday: 6, opens: 8 * 60, closes: 12 * 60 }]),
};

export async function seed(knex: Knex): Promise<void> {
  if (await knex("shop_schedules").where({ shop_id: DEMO_SHOP.id }).first("shop_id")) return;
  await knex.transaction(async (trx) => {
    await trx("shop_schedules").insert({ shop_id: DEMO_SHOP.id, time_zone: week.timeZone, slot_step_minutes: 30 });
    await trx("shop_opening_hours").insert(
      week.hours.map((h) => ({ shop_id: DEMO_SHOP.id, weekday: h.weekday, opens_minute: h.opens, closes_minute: h.closes })),
    );
    await trx("bays")
      .insert(BAYS.map((b) => ({ ...b, shop_id: DEMO_SHOP.id })))
      .onConflict("id")
      .ignore();

    // The paid demo quote, booked at 9:00 on the second weekday from today, for as long as its services take by default.
    const quote = await trx("quotes").where({ id: DEMO_QUOTES.paid, status: "deposit_paid" }).first("id", "shop_id");
    if (!quote || (await trx("bookings").where({ quote_id: quote.id }).first("id"))) return;
    const lines = await trx("quote_lines as l")
      .leftJoin("catalog_items as c", "c.id", "l.catalog_item_id")
      .where("l.quote_id", quote.id)
      .select("l.kind", "l.unit", "l.quantity", "l.description", "c.kind as item_kind", "c.service_type", "c.service_unit");
    const work = workloadOf(
      lines.map((l) => {
        const d = l.item_kind === "service" ? defaultServiceTime(l.service_type, l.service_unit) : null;
        return {
          kind: l.kind,
          unit: l.unit,
          quantity: Number(l.quantity),
          description: l.description,
          time: d ? { minutesPerUnit: d.minutes, bayKind: d.bayKind } : null,
        };
      }),
    );
    let day = addDays(wallTime(new Date(), week.timeZone).date, 2);
    while (weekdayOf(day) > 5) day = addDays(day, 1);
    let t = zonedInstant(day, 9 * 60, week.timeZone).getTime();
    const start = new Date(t);
    const [booking] = await trx("bookings")
      .insert({
        shop_id: DEMO_SHOP.id,
        quote_id: quote.id,
        status: "booked",
        starts_at: start,
        ends_at: new Date(t + work.minutes * 60_000),
        booked_by: "Mara Velkin",
      })
      .returning(["id"]);
    for (const seg of work.segments) {
      const bay = BAYS.find((b) => b.kind === seg.bayKind);
      if (!bay) continue;
      const end = t + seg.minutes * 60_000;
      await trx("bay_reservations").insert({
        booking_id: booking.id,
        shop_id: DEMO_SHOP.id,
        bay_id: bay.id,
        during: trx.raw("tstzrange(?, ?)", [new Date(t).toISOString(), new Date(end).toISOString()]),
      });
      t = end;
    }
  });
}
