import type { Knex } from "knex";

/**
 * Column helpers the migrations share. They live outside db/migrations because knex loads every
 * .ts file there as a migration. Each helper writes exactly the column the migrations wrote by
 * hand before, so a fresh database gets the same schema. Past migrations call them: a helper
 * never changes what it writes; a new shape is a new helper.
 */

type OnDelete = "CASCADE" | "SET NULL" | "RESTRICT";

/** The surrogate key every entity table has: `id uuid primary key default gen_random_uuid()`. */
export function uuidId(t: Knex.TableBuilder, knex: Knex): void {
  t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
}

/** A required reference to `table.id`; deleting the parent cascades unless told otherwise. */
export function requiredRef(t: Knex.TableBuilder, column: string, table: string, onDelete: OnDelete = "CASCADE"): void {
  t.uuid(column).notNullable().references("id").inTable(table).onDelete(onDelete);
}

/** An optional reference to `table.id`; deleting the parent clears it unless told otherwise. */
export function optionalRef(t: Knex.TableBuilder, column: string, table: string, onDelete: OnDelete = "SET NULL"): void {
  t.uuid(column).nullable().references("id").inTable(table).onDelete(onDelete);
}

/** A point in time with its zone (`timestamptz`); the caller says whether it may be null. */
export function instant(t: Knex.TableBuilder, column: string): Knex.ColumnBuilder {
  return t.timestamp(column, { useTz: true });
}

/** `created_at timestamptz not null default now()`: when the row was written. */
export function createdAt(t: Knex.TableBuilder, knex: Knex): void {
  instant(t, "created_at").notNullable().defaultTo(knex.fn.now());
}

/** `created_at` and `updated_at`, both `timestamptz not null default now()`, in that order. */
export function timestamps(t: Knex.TableBuilder, knex: Knex): void {
  createdAt(t, knex);
  instant(t, "updated_at").notNullable().defaultTo(knex.fn.now());
}

/**
 * An image in the photo store and its thumbnail, named by object key (keys are built from ids
 * only, never from a file name), with what the upload check read off the file.
 */
export function storedPhotoColumns(t: Knex.TableBuilder): void {
  t.text("object_key").notNullable().unique();
  t.text("thumb_key").notNullable().unique();
  t.text("content_type").notNullable();
  t.integer("width").notNullable();
  t.integer("height").notNullable();
  t.integer("bytes").notNullable();
  t.text("original_name").notNullable();
}

/** The CHECK that `status` takes one of `values`, named `<table>_status_known` as every table names it. */
export function statusCheck(t: Knex.TableBuilder, table: string, values: readonly string[]): void {
  t.check(`status in (${values.map((v) => `'${v}'`).join(",")})`, [], `${table}_status_known`);
}

/** `status text not null default <initial>`, held to `values` by `statusCheck`. */
export function statusColumn(t: Knex.TableBuilder, table: string, values: readonly string[], initial: string): void {
  t.text("status").notNullable().defaultTo(initial);
  statusCheck(t, table, values);
}

/** Adds an optional JSONB column that holds an object or null, checked by `<table>_<column>_object`. */
export async function addJsonObjectColumn(knex: Knex, table: string, column: string): Promise<void> {
  await knex.schema.alterTable(table, (t) => {
    t.jsonb(column).nullable();
    t.check(`${column} is null or jsonb_typeof(${column}) = 'object'`, [], `${table}_${column}_object`);
  });
}

/** Takes back `addJsonObjectColumn`: its check, then the column. */
export async function dropJsonObjectColumn(knex: Knex, table: string, column: string): Promise<void> {
  await knex.schema.alterTable(table, (t) => {
    t.dropChecks([`${table}_${column}_object`]);
    t.dropColumn(column);
  });
}
