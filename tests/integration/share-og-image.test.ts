import sharp from "sharp";
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { rebuild, testDb } from "./support/db";

/**
 * The share page's Open Graph image for names in any script. The image renderer reaches for
 * the network (a font service, an emoji CDN) for every character its fonts lack: an emoji
 * made the whole image fail with an empty body, CJK drew as boxes. The image must draw from
 * the fonts shipped with the app, so a name never sends a request anywhere.
 */
const db = testDb();
const OWNER = "c3000000-0000-4000-8000-000000000001";

const { createComparison, createShare } = await import("@/lib/comparisons/queries");
const image = (await import("@/app/(share)/s/[slug]/opengraph-image")).default;

let slug = "";
let id = "";
beforeAll(async () => {
  await rebuild(db);
  await db("users").insert({ id: OWNER, email: "og@example.test", name: "Mireille Ostrava", password_hash: "x", role: "member" });
  const c = await createComparison(db, OWNER, { name: "start", input: DEFAULT_INPUT });
  id = c.id;
  slug = (await createShare(db, OWNER, id))!.slug;
});
afterAll(async () => {
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
});
afterEach(() => vi.restoreAllMocks());

/** Renders the image for a comparison renamed to `name`; fails the test on any network request. */
async function render(name: string): Promise<{ res: Response; png: Buffer }> {
  await db("comparisons").where({ id }).update({ name });
  const fetchSpy = vi.spyOn(globalThis, "fetch");
  const res = await image({ params: Promise.resolve({ slug }) });
  const png = Buffer.from(await res.arrayBuffer());
  // The renderer loads its own WebAssembly from a data: URL; anything else is the network.
  const requests = fetchSpy.mock.calls.map((c) => String(c[0] instanceof Request ? c[0].url : c[0])).filter((u) => !u.startsWith("data:"));
  expect(requests).toEqual([]);
  return { res, png };
}

async function expectValidPng(res: Response, png: Buffer) {
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toBe("image/png");
  // PNG signature (ISO/IEC 15948 §5.2) and an image that decodes at the Open Graph size.
  expect(png.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  const meta = await sharp(png).metadata();
  expect([meta.width, meta.height]).toEqual([1200, 630]);
}

// The database caps a name at 120 characters (comparisons_name_length), so the longest
// unbroken name a share can carry is 120 characters: wide letters and wide CJK both tried.
const NAMES: [string, string][] = [
  ["emoji", "Trail rig 🚙🛞 build 👍🏽"],
  ["Chinese", "越野车 轮胎升级 对比"],
  ["Japanese", "林道仕様 トレイル タイヤ比較"],
  ["Polish", "Łódź – Kraków, zażółć gęślą jaźń"],
  ["Hebrew (RTL)", "שלום עולם 4x4"],
  ["Arabic (RTL)", "سيارة الدفع الرباعي"],
  ["Korean", "오프로드 타이어"],
  ["a flag and a joined emoji", "🇵🇱 crew 👨‍👩‍👧"],
  ["the longest unbroken name (120 W)", "W".repeat(120)],
  ["the longest unbroken CJK name", "轮".repeat(120)],
  ["a name with control and bidi characters", "Rig\u0007 \u202eevil\u202c name\u200b"],
];

describe("share Open Graph image", () => {
  it.each(NAMES)("is a valid PNG, drawn without the network, for a name in %s", async (_label, name) => {
    const { res, png } = await render(name);
    await expectValidPng(res, png);
  });

  it("answers 404 for a slug that is not live", async () => {
    const res = await image({ params: Promise.resolve({ slug: "A".repeat(24) }) });
    expect(res.status).toBe(404);
  });
});
