import knexFactory, { type Knex } from "knex";
import config from "@/knexfile";

/** A Knex on the test database (DATABASE_URL, set by scripts/test.sh). */
export function testDb(): Knex {
  return knexFactory(config);
}

/** Drops every table through the migrations and builds them again. */
export async function rebuild(db: Knex): Promise<void> {
  await db.migrate.rollback(undefined, true);
  await db.migrate.latest();
}

/**
 * Closes the test's Knex and the app's own pool (lib/platform/db, opened by the routes a test
 * calls), so the test file can end. Call last in afterAll.
 */
export async function closeDatabases(db: Knex): Promise<void> {
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
}
