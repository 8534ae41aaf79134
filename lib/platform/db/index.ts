import "server-only";
import knexFactory, { type Knex } from "knex";
import { isDependencyUnavailable } from "@/lib/platform/http/dependency";
import { databaseUrl } from "./config";

// One Knex instance per server process. Kept on globalThis so dev-mode reloads do not open a
// new pool on every edit.
const globalForDb = globalThis as unknown as { hubfaceDb?: Knex };

function create(): Knex {
  return knexFactory({
    client: "pg",
    connection: {
      connectionString: databaseUrl(),
      // Fail fast when PostgreSQL is down so pages and /api/health answer instead of hanging.
      connectionTimeoutMillis: 2500,
      statement_timeout: 15000,
    },
    // min 0: no idle connection is kept that could go stale while the database restarts.
    pool: { min: 0, max: Number(process.env.DB_POOL_MAX ?? 10), idleTimeoutMillis: 10000 },
    acquireConnectionTimeout: 4000,
  });
}

export const db: Knex = globalForDb.hubfaceDb ?? (globalForDb.hubfaceDb = create());

/** True when an error means the database could not be reached (rather than a bad query). */
export function isDatabaseUnavailable(error: unknown): boolean {
  const e = error as { code?: string; message?: string; name?: string } | null;
  if (!e) return false;
  // The mail server or the photo store refused the connection: that is not the database.
  if (isDependencyUnavailable(error)) return false;
  if (e.name === "KnexTimeoutError") return true;
  if (e.code && ["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "57P01", "57P03", "08006", "08001", "08003"].includes(e.code)) return true;
  return /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect/i.test(e.message ?? "");
}
