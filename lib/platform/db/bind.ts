import "server-only";
import type { Knex } from "knex";

/** A query function: the database (or a transaction) first, then its own arguments. */
type Query = (db: Knex, ...args: never) => Promise<unknown>;

/** The same functions without their first parameter: the app's handle is put in for them. */
export type BoundQueries<T extends Record<string, Query>> = {
  [K in keyof T]: T[K] extends (db: Knex, ...args: infer A) => infer R ? (...args: A) => R : never;
};

/**
 * Binds query functions to the app's database handle, so pages and route handlers call the
 * feature's queries without ever holding the handle (the `app/` lint rule forbids importing
 * `@/lib/db`): a raw `db("table")` is then not one keystroke away from a page. The unbound
 * functions stay exported for transactions and for tests that pass their own handle.
 *
 * The handle is imported on first call, not at import time, so modules that only use the pure
 * helpers of a query module load without DATABASE_URL (unit tests, type-only imports).
 *
 * @example
 * export const garageQueries = bindAppDb({ listVehicles, findVehicle });
 * await garageQueries.listVehicles(caller.userId); // = listVehicles(db, caller.userId)
 */
export function bindAppDb<T extends Record<string, Query>>(queries: T): BoundQueries<T> {
  const bound: Record<string, (...args: unknown[]) => Promise<unknown>> = {};
  for (const [name, query] of Object.entries(queries)) {
    const run = query as unknown as (db: Knex, ...args: unknown[]) => Promise<unknown>;
    bound[name] = async (...args) => run(await appDb(), ...args);
  }
  return bound as BoundQueries<T>;
}

async function appDb(): Promise<Knex> {
  return (await import("./index")).db;
}
