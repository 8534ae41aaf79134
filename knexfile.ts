import type { Knex } from "knex";
import { databaseUrl } from "./lib/platform/db/config";

// The knex CLI loads this through tsx (see package.json db:* scripts).
const config: Knex.Config = {
  client: "pg",
  connection: databaseUrl(),
  migrations: {
    directory: "./db/migrations",
    extension: "ts",
    loadExtensions: [".ts"],
    tableName: "knex_migrations",
  },
  seeds: { directory: "./db/seeds", extension: "ts", loadExtensions: [".ts"] },
  pool: { min: 0, max: 4 },
};

export default config;
