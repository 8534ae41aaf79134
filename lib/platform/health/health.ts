import "server-only";
import type { Knex } from "knex";
import { bindAppDb } from "@/lib/platform/db/bind";

/** One round trip to PostgreSQL; throws when it cannot be reached. */
async function pingDatabase(db: Knex): Promise<void> {
  await db.raw("select 1");
}

export const healthQueries = bindAppDb({ pingDatabase });
