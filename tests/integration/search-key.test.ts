import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FOLDED_LETTERS, searchKey } from "@/lib/platform/search/normalize";
import { rebuild, testDb } from "./support/db";

/**
 * The search key is computed twice, for the query in JavaScript (lib/platform/search/normalize.ts) and for
 * the stored rows in PostgreSQL (hubface_search_key, from the migrations): a difference would
 * hide rows. Both are run here over the same texts.
 */
const db = testDb();
beforeAll(() => rebuild(db));
afterAll(() => db.destroy());

async function sqlKeys(texts: string[]): Promise<string[]> {
  const rows = await db.raw<{ rows: { key: string }[] }>(
    "select hubface_search_key(t.v) as key from unnest(?::text[]) with ordinality as t(v, n) order by t.n",
    [texts],
  );
  return rows.rows.map((r) => r.key);
}

const FIXED = [
  "37×12.50R17LT",
  "37 X 12.50 r17",
  "35x12.5R20 121Q LRE",
  "6x139.70",
  "1 x 2 x 3",
  "12.50 17.0 0.500 1.05 100 2.0.0 .50",
  "Łukasz Nowak",
  "ØYVIND ÆRØ",
  "Straße ẞ",
  "Đorđe Þór Œuvre ĸ ı Ŀ ŀ Ŧ ŧ Ħ ħ Ð ð",
  "Émile Zoë Núñez Åsa Çelik Dvořák İzmir",
  "ΟΔΟΣ οδος",
  "  Mount \t and\u00a0\u2007 balance\u3000",
  "50%_off\\ back\\slash",
  "",
];

/** Texts drawn from a pool of the characters the key treats specially (a fixed seed: the same every run). */
function drawn(n: number): string[] {
  const pool = [..."0123456789.xX× \u00a0\tabcLTRé", ...Object.keys(FOLDED_LETTERS), "e\u0301", "0", "0", "."];
  let seed = 20261202;
  const next = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
  return Array.from({ length: n }, () =>
    Array.from({ length: 1 + Math.floor(next() * 14) }, () => pool[Math.floor(next() * pool.length)]).join(""),
  );
}

describe("search key in JavaScript and in PostgreSQL", () => {
  it("agree on the cases the key is for", async () => {
    expect(await sqlKeys(FIXED)).toEqual(FIXED.map(searchKey));
  });

  it("agree on 2,000 drawn texts", async () => {
    const texts = drawn(2000);
    const sql = await sqlKeys(texts);
    const differ = texts.map((t, i) => ({ t, js: searchKey(t), sql: sql[i] })).filter((d) => d.js !== d.sql);
    expect(differ).toEqual([]);
  });
});
