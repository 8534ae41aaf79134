import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { CSV_COLUMNS, CSV_TEMPLATE, parseCatalogCsv } from "@/lib/shop/catalog/csv";
import { internalKeys } from "./support/apiKeys";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const SHOP_A = "0a000000-0000-4000-8000-00000000000a";
const SHOP_B = "0b000000-0000-4000-8000-00000000000b";
const ownerA = { id: "0a000000-0000-4000-8000-000000000001", role: "shop_owner", shop_id: SHOP_A };
const staffA = { id: "0a000000-0000-4000-8000-000000000002", role: "shop_staff", shop_id: SHOP_A };
const ownerB = { id: "0b000000-0000-4000-8000-000000000001", role: "shop_owner", shop_id: SHOP_B };
const as = (u: typeof ownerA) => void (session.current = sessionOf(u));

beforeAll(async () => {
  await rebuild(db);
  await db("shops").insert([
    { id: SHOP_A, name: "Shop A" },
    { id: SHOP_B, name: "Shop B" },
  ]);
  await db("users").insert(
    [ownerA, staffA, ownerB].map((u, i) => ({ ...u, email: `u${i}@example.test`, name: `U${i}`, password_hash: "x" })),
  );
});
afterAll(() => closeDatabases(db));

const preview = (await import("@/app/api/shop/catalog/import/route")).POST;
const commit = (await import("@/app/api/shop/catalog/import/[id]/route")).POST;
const list = (await import("@/app/api/shop/catalog/route")).GET;
const exportCsv = (await import("@/app/api/shop/catalog/export/route")).GET;

const upload = (body: string | Buffer, headers: Record<string, string> = {}) =>
  preview(req("POST", "/api/shop/catalog/import?filename=c.csv", body, { "content-type": "text/csv", ...headers }), ctx());

async function confirm(id: string) {
  const res = await commit(req("POST", `/api/shop/catalog/import/${id}`), ctx({ id }));
  const lines =
    res.status === 200
      ? (await res.text())
          .trim()
          .split("\n")
          .map((l) => JSON.parse(l))
      : [await res.json()];
  return { status: res.status, lines, last: lines[lines.length - 1] };
}
const count = async (shop = SHOP_A) =>
  Number((await db("catalog_items").where({ shop_id: shop }).count<{ c: string }[]>({ c: "*" }))[0]!.c);

function bigCsv(n: number, priceOf = (i: number) => `${100 + (i % 300)}.${String(i % 100).padStart(2, "0")}`) {
  const lines = [CSV_COLUMNS.join(",")];
  const sizes = ["LT285/70R17", "35x12.50R17LT", "LT315/70R17", "37x12.50R17LT", "265/70R17"];
  for (let i = 0; i < n; i++) {
    if (i % 2 === 0) lines.push(`tire,BULK-T${i},Bulk tire ${i},${priceOf(i)},${i % 40},${sizes[i % sizes.length]},,,,,,,,,,`);
    else
      lines.push(
        `wheel,BULK-W${i},Bulk wheel ${i},${priceOf(i)},${i % 12},,17,${8 + (i % 3) * 0.5},${-24 + (i % 7) * 6},,,6x5.5,108,${i % 5 === 0 ? "yes" : "no"},,`,
      );
  }
  return lines.join("\n");
}

describe("catalog import", () => {
  it("previews a valid file, then upserts it on confirmation with progress lines", async () => {
    as(ownerA);
    const res = await upload(CSV_TEMPLATE);
    expect(res.status).toBe(200);
    const p = await res.json();
    expect(p).toMatchObject({ total: 4, valid: 4, newItems: 4, updatedItems: 0, skippedRows: 0, problemCount: 0 });
    expect(internalKeys(p)).toEqual([]);
    expect(await count()).toBe(0); // nothing until confirmed
    const c = await confirm(p.importId);
    expect(c.lines[0]).toEqual({ done: 0, total: 4 });
    expect(c.last).toEqual({ imported: 4 });
    expect(await count()).toBe(4);
    // Confirming twice does nothing more.
    expect((await confirm(p.importId)).status).toBe(409);
  });

  it("updates by SKU on a second import", async () => {
    as(ownerA);
    const before = new Map(
      (await db("catalog_items").where({ shop_id: SHOP_A }).select("sku", "updated_at")).map((r) => [r.sku, r.updated_at.getTime()]),
    );
    // Only the first tire's price differs from what the shop has; the other three rows are the same items.
    const p = await (await upload(CSV_TEMPLATE.replace("389.00", "399.00"))).json();
    expect(p).toMatchObject({ newItems: 0, updatedItems: 1, unchangedItems: 3 });
    await confirm(p.importId);
    expect((await db("catalog_items").where({ shop_id: SHOP_A, sku: "TR-EXAMPLE-35" }).first()).price_cents).toBe(39900);
    expect(await count()).toBe(4);
    // What the preview called unchanged is left untouched (its updated_at too); the changed item is updated.
    const after = await db("catalog_items").where({ shop_id: SHOP_A }).select("sku", "updated_at");
    expect(after.filter((r) => r.updated_at.getTime() !== before.get(r.sku)).map((r) => r.sku)).toEqual(["TR-EXAMPLE-35"]);
    const same = await (await upload(CSV_TEMPLATE.replace("389.00", "399.00"))).json();
    expect(same).toMatchObject({ newItems: 0, updatedItems: 0, unchangedItems: 4 });
  });

  it("a mixed file: row errors reported, only the valid rows are staged", async () => {
    as(ownerA);
    const text = [
      CSV_COLUMNS.join(","),
      "tire,MX-1,Good,100,4,LT285/70R17,,,,,,,,,,",
      "tire,MX-2,Bad size,100,4,not-a-size,,,,,,,,,,",
      "tire,MX-1,Dup,100,4,LT285/70R17,,,,,,,,,,",
    ].join("\n");
    const p = await (await upload(text)).json();
    expect(p).toMatchObject({ total: 3, valid: 1, skippedRows: 2, problemCount: 2 });
    expect(p.errors).toEqual([
      { row: 3, column: "tire_size", message: expect.stringMatching(/not-a-size/) },
      { row: 4, column: "sku", message: expect.stringMatching(/also on row 2/) },
    ]);
    await confirm(p.importId);
    expect(await db("catalog_items").where({ shop_id: SHOP_A }).whereLike("sku", "MX-%").pluck("sku")).toEqual(["MX-1"]);
  });

  it("numbers rows as the spreadsheet does and counts skipped rows, not messages", async () => {
    as(ownerA);
    const text = [
      CSV_COLUMNS.join(","), // row 1
      "tire,RN-1,Good,100,4,LT285/70R17,,,,,,,,,,", // 2
      "", // 3: blank, keeps its number
      "tire,RN-2,Two problems,ten,4,not-a-size,,,,,,,,,,", // 4: price and size
      "tire,RN-3,Bad size,100,4,not-a-size,,,,,,,,,,", // 5
    ].join("\r\n");
    const p = await (await upload(text)).json();
    expect(p).toMatchObject({ total: 3, valid: 1, skippedRows: 2, problemCount: 3 });
    expect(p.errors.map((e: { row: number; column: string }) => [e.row, e.column])).toEqual([
      [4, "price"],
      [4, "tire_size"],
      [5, "tire_size"],
    ]);
    expect((await db("catalog_imports").where({ id: p.importId }).first()).error_count).toBe(2);
  });

  it("imports a 10,000-row file in one transaction, in seconds", async () => {
    as(ownerA);
    const text = bigCsv(10_000);
    const t0 = performance.now();
    const p = await (await upload(text)).json();
    const t1 = performance.now();
    const c = await confirm(p.importId);
    const t2 = performance.now();
    console.log(
      `10,000-row catalog CSV (${(text.length / 1024 / 1024).toFixed(2)} MB): preview ${(t1 - t0).toFixed(0)} ms, confirm ${(t2 - t1).toFixed(0)} ms, total ${(t2 - t0).toFixed(0)} ms`,
    );
    expect(p).toMatchObject({ total: 10_000, valid: 10_000, skippedRows: 0, problemCount: 0 });
    expect(c.last).toEqual({ imported: 10_000 });
    expect(c.lines.filter((l) => "done" in l)).toHaveLength(1 + 10_000 / 500);
    expect(await db("catalog_items").where({ shop_id: SHOP_A }).whereLike("sku", "BULK-%").count<{ c: string }[]>({ c: "*" })).toEqual([
      { c: "10000" },
    ]);
  });

  it("a failure part-way rolls the whole import back", async () => {
    as(ownerA);
    const p = await (await upload(bigCsv(2_000, () => "5.00"))).json();
    // Corrupt one staged row deep in the file so the database refuses it in a late batch.
    await db.raw(`update catalog_imports set rows = jsonb_set(rows, '{1800,price_cents}', '-1') where id = ?`, [p.importId]);
    const errors = vi.spyOn(console, "error").mockImplementation(() => {});
    const c = await confirm(p.importId);
    errors.mockRestore();
    expect(c.last.error).toMatch(/nothing was changed/);
    expect(await db("catalog_items").where({ shop_id: SHOP_A, price_cents: 500 }).count<{ c: string }[]>({ c: "*" })).toEqual([{ c: "0" }]);
    expect((await db("catalog_imports").where({ id: p.importId }).first()).status).toBe("staged");
  });

  it("refuses wrong headers, bad encodings, and 50 MB of junk early", async () => {
    as(ownerA);
    const staged = async () => (await db("catalog_imports").where({ shop_id: SHOP_A }).count<{ c: string }[]>({ c: "*" }))[0]!.c;
    const stagedBefore = await staged();
    const wrong = await upload("name,cost\nA,1\n");
    expect(wrong.status).toBe(422);
    expect((await wrong.json()).error).toMatch(/Unknown columns/);
    const latin1 = Buffer.concat([Buffer.from("kind,sku,description,price\ntire,X,Pneu d"), Buffer.from([0xe9]), Buffer.from("t\n")]);
    const enc = await upload(latin1);
    expect(enc.status).toBe(422);
    expect((await enc.json()).error).toMatch(/not UTF-8/);
    const junk = Buffer.alloc(50 * 1024 * 1024, 0x41);
    const t0 = performance.now();
    const big = await upload(junk, { "content-length": String(junk.byteLength) });
    expect(big.status).toBe(413);
    expect((await big.json()).error).toMatch(/larger than 5 MB/);
    // Without a declared length the stream is cut at the cap.
    const streamed = new ReadableStream({
      pull(c) {
        c.enqueue(new Uint8Array(1024 * 1024).fill(0x42));
      },
    });
    const { NextRequest } = await import("next/server");
    const res = await preview(
      new NextRequest("http://127.0.0.1:3000/api/shop/catalog/import", {
        method: "POST",
        body: streamed,
        duplex: "half",
      } as unknown as ConstructorParameters<typeof NextRequest>[1]),
      ctx(),
    );
    expect(res.status).toBe(413);
    console.log(`50 MB upload refused in ${(performance.now() - t0).toFixed(0)} ms`);
    // None of the refused files was staged.
    expect(await staged()).toBe(stagedBefore);
  });
});

describe("catalog access", () => {
  it("staff read the catalog but cannot import (403)", async () => {
    as(staffA);
    expect((await list(req("GET", "/api/shop/catalog"), ctx())).status).toBe(200);
    expect((await upload(CSV_TEMPLATE)).status).toBe(403);
  });

  it("another shop sees none of it, and cannot confirm our staged import (404)", async () => {
    as(ownerA);
    const p = await (await upload(CSV_TEMPLATE)).json();
    as(ownerB);
    const body = await (await list(req("GET", "/api/shop/catalog"), ctx())).json();
    expect(body.total).toBe(0);
    expect((await confirm(p.importId)).status).toBe(404);
    expect((await (await exportCsv(req("GET", "/api/shop/catalog/export"), ctx())).text()).trim()).toBe(CSV_COLUMNS.join(","));
  });

  it("pages, sorts and filters on the server", async () => {
    as(staffA);
    const page = await (
      await list(req("GET", "/api/shop/catalog?kind=wheel&sort=price_cents&dir=desc&page=2&pageSize=10&q=BULK"), ctx())
    ).json();
    expect(page.total).toBe(5000);
    expect(page.items).toHaveLength(10);
    const prices = page.items.map((i: { priceCents: number }) => i.priceCents); // camelCase on purpose: the API shape, lib/shop/catalog/api.ts
    expect([...prices].sort((a, b) => b - a)).toEqual(prices);
    expect(page.items.every((i: { kind: string }) => i.kind === "wheel")).toBe(true);
    expect(internalKeys(page)).toEqual([]); // the stored search key and the row's column names stay in the database
    expect(page.items[0].updatedAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/);
    expect((await list(req("GET", "/api/shop/catalog?sort=password_hash"), ctx())).status).toBe(400);
  });

  it("answers a bad search or filter with a message naming the control as the table labels it", async () => {
    as(staffA);
    const bad = async (query: string) => {
      const res = await list(req("GET", `/api/shop/catalog?${query}`), ctx());
      expect(res.status, query).toBe(400);
      return (await res.json()).error as string;
    };
    expect(await bad(`q=${"a".repeat(101)}`)).toBe("Search SKU, description, size or bolt pattern: use at most 100 characters.");
    expect(await bad("kind=gizmo")).toBe("Kind: pick tires, wheels or services.");
    expect(await bad("pageSize=500")).toBe("Rows per page: use 1 to 200 rows per page.");
    expect(await bad("sort=password_hash")).toMatch(/^Sort: /);
  });

  it("takes a long file name without refusing the upload (the record keeps its first 200 characters)", async () => {
    as(ownerA);
    const name = `${"catalog-".repeat(40)}.csv`;
    const res = await preview(
      req("POST", `/api/shop/catalog/import?filename=${encodeURIComponent(name)}`, CSV_TEMPLATE, { "content-type": "text/csv" }),
      ctx(),
    );
    expect(res.status).toBe(200);
    const { importId } = await res.json();
    expect((await db("catalog_imports").where({ id: importId }).first()).filename).toBe(name.slice(0, 200));
    await db("catalog_imports").where({ id: importId }).del();
  });

  it("exports what was imported in the documented format", async () => {
    as(staffA);
    const bytes = Buffer.from(await (await exportCsv(req("GET", "/api/shop/catalog/export"), ctx())).arrayBuffer());
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // a UTF-8 BOM, so spreadsheets read it as UTF-8
    const csv = bytes.subarray(3).toString("utf8");
    expect(csv.split("\r\n")[0]).toBe(CSV_COLUMNS.join(","));
    expect(csv).toContain("tire,TR-EXAMPLE-35,");
    expect(csv.split("\r\n")).toHaveLength(1 + 4 + 1 + 10_000);
  });
});

describe("catalog search: what people type finds what is stored", () => {
  const SHOP_C = "0c000000-0000-4000-8000-00000000000c";
  const staffC = { id: "0c000000-0000-4000-8000-000000000002", role: "shop_staff", shop_id: SHOP_C };
  beforeAll(async () => {
    await db("shops").insert({ id: SHOP_C, name: "Shop C" });
    await db("users").insert({ ...staffC, email: "c@example.test", name: "C", password_hash: "x" });
    const csv = [
      CSV_COLUMNS.join(","),
      "tire,T-3712,Mud terrain 37 x 12.50 R17,450,4,37x12.50R17LT,,,,,,,,,,",
      "tire,T-3512,All terrain,400,4,35x12.50R17LT,,,,,,,,,,",
      "tire,T-28570,Highway,300,4,LT285/70R17,,,,,,,,,,",
      "wheel,W-IN,Steel wheel,200,4,,17,9,-12,,,6x5.5,108,no,,",
      "wheel,W-MM,Alloy wheel,220,4,,17,9,0,,,6x139.7,106,no,,",
      "wheel,W-5,Five lug,180,4,,17,8,0,,,5x139.7,108,no,,",
      "wheel,W-135,Six lug,180,4,,17,8,0,,,6x135,87,no,,",
      "service,S-CAF,Équilibrage café 50%_off,30,,,,,,,,,,,other,",
    ].join("\n");
    const r = parseCatalogCsv(csv);
    expect(r.errors).toEqual([]);
    await db("catalog_items").insert(r.items.map(({ row: _r, ...i }) => ({ ...i, shop_id: SHOP_C })));
  });
  const skus = async (q: string) => {
    as(staffC as typeof ownerA);
    const res = await list(req("GET", `/api/shop/catalog?q=${encodeURIComponent(q)}&pageSize=50`), ctx());
    expect(res.status).toBe(200);
    return ((await res.json()).items as { sku: string }[]).map((i) => i.sku).sort();
  };

  it("finds a tire size however the × and the decimals are typed", async () => {
    // The engine stores flotation sizes with two decimals: 37x12.50R17LT.
    for (const q of ["37×12.50", "37x12.5", "37X12.50", "37 x 12.50", "37 × 12.5", "37x12.50R17", "37×12.5r17lt"]) {
      expect(await skus(q), q).toEqual(["T-3712"]);
    }
    expect(await skus("12.50")).toEqual(["T-3512", "T-3712"]);
    expect(await skus("285/70")).toEqual(["T-28570"]);
  });

  it("finds a bolt pattern by either spelling (6x5.5 = 6x139.7: 5.5 in × 25.4 mm/in, NIST SP 811)", async () => {
    for (const q of ["6x139.7", "6x5.5", "6 × 5.5", "6 on 5.5", "6X139.70"]) expect(await skus(q), q).toEqual(["W-IN", "W-MM"]);
    expect(await skus("5x139.7")).toEqual(["W-5"]);
    expect(await skus("6x135")).toEqual(["W-135"]);
  });

  it("folds accents and takes % and _ as themselves", async () => {
    for (const q of ["cafe", "EQUILIBRAGE", "50%_", "%", "_"]) expect(await skus(q), q).toEqual(["S-CAF"]);
  });
});
