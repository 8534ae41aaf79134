import type { Knex } from "knex";
import { closeDatabases, rebuild } from "./db";
import { startTestBoss, stopBoss } from "./jobs";
import { SHOP_A, seedShops } from "./shopFixture";

/**
 * Shop A open every day 07:00–19:00 (America/Denver) with one lift bay and one alignment rack,
 * every service taking 5 minutes: a quote books at the first free start of the next two weeks.
 * Saved through the bookings' own schema and query, as the owner's bays form saves it.
 */
export async function openShopEveryDay(db: Knex): Promise<void> {
  const { getSetup, saveSetup } = await import("@/lib/shop/bookings/queries");
  const { baysSetupSchema } = await import("@/lib/shop/bookings/schema");
  const setup = await getSetup(db, SHOP_A);
  await saveSetup(
    db,
    SHOP_A,
    baysSetupSchema.parse({
      ...setup,
      timeZone: "America/Denver",
      weekdays: [1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ weekday, open: true, opens: "07:00", closes: "19:00" })),
      bays: [
        { name: "Lift 1", kind: "lift_bay" },
        { name: "Rack", kind: "alignment_rack" },
      ],
      serviceTimes: setup.serviceTimes.map((s) => ({ catalogItemId: s.catalogItemId, minutes: "5", bayKind: s.bayKind })),
    }),
  );
}

/**
 * A fresh database with the two test shops, the job queue (no background workers) and shop A open
 * every day: by `open`, 07:00–19:00 unless told (quoteJourney's openAllDay opens it all day).
 */
export async function setUpBookableShops(db: Knex, open: (db: Knex) => Promise<unknown> = openShopEveryDay): Promise<void> {
  await rebuild(db);
  await seedShops(db);
  await startTestBoss();
  await open(db);
}

/** Stops the queue and closes both database pools: call last in afterAll. */
export async function tearDownBookableShops(db: Knex): Promise<void> {
  await stopBoss();
  await closeDatabases(db);
}
