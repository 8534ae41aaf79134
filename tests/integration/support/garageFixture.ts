import type { Knex } from "knex";

/** One stock setup for the garage route tests: 265/70R17 on 17x8 at +25 mm offset, no spacer. */
export const SETUP = { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 };

/** A saved vehicle as the garage form sends it (invented pickup), still on its stock setup. */
export const VEHICLE = {
  name: "Gravel hauler",
  year: 2009,
  make: "Generic",
  model: "Full-size pickup",
  trim: null,
  frontSuspension: "independent",
  boltPattern: "6 on 5.5",
  hubBoreMm: "106.1",
  stockSetup: SETUP,
  currentSetup: SETUP,
  liftHeightMm: "2-1/2",
  kingpinInclinationDeg: 8,
  axleRatio: 3.73,
  transmissionRatio: "0.69",
  notes: "",
};

/**
 * Inserts the least vehicle row the schema takes (5x114.3, empty setups) straight into the table,
 * for tests that need a vehicle to exist and do not go through the garage route.
 */
export async function insertVehicleRow(db: Knex, row: { id: string; user_id: string; name: string }): Promise<void> {
  await db("vehicles").insert({
    bolt_pattern: "5x114.3",
    bolt_pcd_mm: 114.3,
    bolt_count: 5,
    front_suspension: "independent",
    stock_setup: "{}",
    current_setup: "{}",
    ...row,
  });
}
