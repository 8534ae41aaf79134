import type { Knex } from "knex";

/**
 * Column helpers the migrations share. They live outside db/migrations because knex loads every
 * .ts file there as a migration. Each helper writes exactly the column the migrations wrote by
 * hand before, so a fresh database gets the same schema.
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
