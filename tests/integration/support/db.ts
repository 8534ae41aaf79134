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
