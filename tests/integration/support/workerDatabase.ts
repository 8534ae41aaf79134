import pg from "pg";

/**
 * Vitest setup file for the integration project: every worker gets a database of its own
 * (`<name>_w<worker id>` beside the one in DATABASE_URL), so test files that rebuild the schema
 * can run side by side. Created on first use; the test cluster is thrown away after the run.
 */
const base = process.env.HUBFACE_BASE_DATABASE_URL ?? process.env.DATABASE_URL;
const worker = process.env.VITEST_POOL_ID;
if (base && worker) {
  process.env.HUBFACE_BASE_DATABASE_URL = base;
  const url = new URL(base);
  const name = `${decodeURIComponent(url.pathname.slice(1))}_w${worker}`;
  const admin = new pg.Client({ connectionString: base });
  await admin.connect();
  try {
    const found = await admin.query("select 1 from pg_database where datname = $1", [name]);
    if (!found.rowCount) await admin.query(`create database "${name.replaceAll('"', '""')}"`);
  } finally {
    await admin.end();
  }
  url.pathname = `/${encodeURIComponent(name)}`;
  process.env.DATABASE_URL = url.toString();
  process.env.TEST_DATABASE_URL = url.toString();
}
