import type { Knex } from "knex";

/**
 * What a garage vehicle keeps for load, pressure and trail angles: its door placard (the size
 * printed there, the cold pressures front and rear, the axle ratings), the axle weights from a
 * scale ticket and the body points measured on the vehicle with its current tires. One row per
 * vehicle, gone with it. Every figure in SI (kPa, kg, mm); `units` is only the unit system it
 * was entered in, so field messages can name the fields as that screen labelled them.
 *
 * Checks here are the outer bounds of a light vehicle (the schema in lib/garage/loadProfile.ts
 * says why a figure is refused; these only keep a stray write from storing nonsense).
 */
const PRESSURES = ["placard_front_kpa", "placard_rear_kpa"];
const LOADS = ["front_gawr_kg", "rear_gawr_kg", "front_axle_kg", "rear_axle_kg"];
const LENGTHS = [
  "front_corner_height_mm",
  "front_corner_ahead_mm",
  "rear_corner_height_mm",
  "rear_corner_behind_mm",
  "mid_height_mm",
  "wheelbase_mm",
];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("vehicle_load_profiles", (t) => {
    t.uuid("vehicle_id").primary().references("id").inTable("vehicles").onDelete("CASCADE");
    t.text("units").notNullable().defaultTo("imperial");
    t.text("vehicle_kind").notNullable().defaultTo("light-truck");
    t.text("placard_tire").nullable();
    for (const c of [...PRESSURES, ...LOADS, ...LENGTHS]) t.double(c).nullable();
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("units in ('imperial','metric')", [], "vehicle_load_profiles_units_known");
    t.check("vehicle_kind in ('light-truck','passenger-car')", [], "vehicle_load_profiles_kind_known");
    // Outer bounds, one check per figure: pressures 100–1500 kPa, axle figures 100–20000 kg,
    // lengths above zero (a wheelbase 1–10 m).
    for (const c of PRESSURES) t.check(`${c} is null or ${c} between 100 and 1500`, [], `vehicle_load_profiles_${c}_range`);
    for (const c of LOADS) t.check(`${c} is null or ${c} between 100 and 20000`, [], `vehicle_load_profiles_${c}_range`);
    for (const c of LENGTHS) t.check(`${c} is null or ${c} > 0`, [], `vehicle_load_profiles_${c}_positive`);
    t.check("wheelbase_mm is null or wheelbase_mm between 1000 and 10000", [], "vehicle_load_profiles_wheelbase_range");
    // The placard is stored whole or not at all: a size without its pressures sets nothing.
    t.check(
      "(placard_tire is null) = (placard_front_kpa is null) and (placard_tire is null) = (placard_rear_kpa is null)",
      [],
      "vehicle_load_profiles_placard_whole",
    );
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("vehicle_load_profiles");
}
