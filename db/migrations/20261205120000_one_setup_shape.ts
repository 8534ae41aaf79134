import type { Knex } from "knex";

/**
 * One shape for a vehicle's setup and one spelling for the backspacing reference.
 *
 * - The shop counter's vehicles and the vehicle as quoted keep the setup as lib/setup describes
 *   it (tire, wheel diameter and width, position, spacer), in `current_setup` as the garage does,
 *   instead of a tire and an offset in four columns: a backspacing with its reference and flange
 *   allowance is kept as it was entered. Rows written before read as an offset and no spacer.
 * - `catalog_items.wheel_backspacing_ref` is spelled out as `wheel_backspacing_reference`, the
 *   name of the catalog CSV column; staged imports are renamed with it.
 */

/** The setup of a row's four old columns: the offset it was stored with, no spacer. */
const SETUP_OF = (tire: string, diameter: string, width: string, offset: string) =>
  `jsonb_build_object('tire', ${tire}, 'wheelDiameterIn', ${diameter}, 'wheelWidthIn', ${width}, 'position', jsonb_build_object('mode', 'offset', 'offsetMm', ${offset}), 'spacerMm', 0)`;

/**
 * The offset (mm) a stored setup stands for (lib/fitment/offset.ts: to the bead seat it is the
 * backspacing less half the width, to the flange edge less the flange allowance too; 1 in =
 * 25.4 mm). A spacer cannot be put back into the old columns: it moves the wheel outboard, so
 * it is taken off the offset.
 */
const OFFSET_OF = (
  col: string,
) => `(case when ${col}->'position'->>'mode' = 'offset' then (${col}->'position'->>'offsetMm')::double precision
  else ((${col}->'position'->>'backspacingIn')::double precision
        - case when ${col}->'position'->>'reference' = 'flange' then (${col}->'position'->>'flangeIn')::double precision else 0 end
        - (${col}->>'wheelWidthIn')::double precision / 2) * 25.4 end
  - coalesce((${col}->>'spacerMm')::double precision, 0))`;

/** Renames one key in every row of the staged catalog imports. */
const renameStagedKey = (knex: Knex, from: string, to: string) =>
  knex.raw(
    `update catalog_imports set rows = (
       select coalesce(jsonb_agg(case when e -> ?::text is not null then (e - ?::text) || jsonb_build_object(?::text, e -> ?::text) else e end order by n), '[]'::jsonb)
       from jsonb_array_elements(rows) with ordinality as r(e, n))
     where jsonb_typeof(rows) = 'array'`,
    [from, from, to, from],
  );

type SetupColumns = [tire: string, diameter: string, width: string, offset: string];

/** Moves a table's four setup columns into `current_setup`. */
async function packColumns(knex: Knex, table: string, [tire, diameter, width, offset]: SetupColumns) {
  await knex.schema.alterTable(table, (t) => t.jsonb("current_setup").nullable());
  await knex.raw(`update ${table} set current_setup = ${SETUP_OF(tire, diameter, width, offset)}`);
  await knex.raw(`alter table ${table} alter column current_setup set not null`);
  await knex.schema.alterTable(table, (t) => t.dropColumns(tire, diameter, width, offset));
}

export async function up(knex: Knex): Promise<void> {
  await knex.raw("alter table catalog_items rename column wheel_backspacing_ref to wheel_backspacing_reference");
  await knex.raw("alter table catalog_items rename constraint catalog_backspacing_ref_known to catalog_backspacing_reference_known");
  await renameStagedKey(knex, "wheel_backspacing_ref", "wheel_backspacing_reference");

  await packColumns(knex, "customer_vehicles", ["tire_size", "wheel_diameter_in", "wheel_width_in", "wheel_offset_mm"]);
  await packColumns(knex, "quotes", ["current_tire", "current_wheel_diameter_in", "current_wheel_width_in", "current_wheel_offset_mm"]);
}

/** Puts the four columns of a setup back, filled from `current_setup`, and drops it. */
async function restoreColumns(knex: Knex, table: string, [tire, diameter, width, offset]: SetupColumns) {
  await knex.schema.alterTable(table, (t) => {
    t.text(tire).nullable();
    t.double(diameter).nullable();
    t.double(width).nullable();
    t.double(offset).nullable();
  });
  await knex.raw(
    `update ${table} set ${tire} = current_setup->>'tire', ${diameter} = (current_setup->>'wheelDiameterIn')::double precision,
       ${width} = (current_setup->>'wheelWidthIn')::double precision, ${offset} = ${OFFSET_OF("current_setup")}`,
  );
  for (const c of [tire, diameter, width, offset]) await knex.raw(`alter table ${table} alter column ${c} set not null`);
  await knex.schema.alterTable(table, (t) => t.dropColumn("current_setup"));
}

export async function down(knex: Knex): Promise<void> {
  await restoreColumns(knex, "quotes", ["current_tire", "current_wheel_diameter_in", "current_wheel_width_in", "current_wheel_offset_mm"]);
  await restoreColumns(knex, "customer_vehicles", ["tire_size", "wheel_diameter_in", "wheel_width_in", "wheel_offset_mm"]);
  await renameStagedKey(knex, "wheel_backspacing_reference", "wheel_backspacing_ref");
  await knex.raw("alter table catalog_items rename constraint catalog_backspacing_reference_known to catalog_backspacing_ref_known");
  await knex.raw("alter table catalog_items rename column wheel_backspacing_reference to wheel_backspacing_ref");
}
