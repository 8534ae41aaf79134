import sharp from "sharp";
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
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

  it("draws the share page's cross-section, wheels and all, in the left panel (left in test-results/ to look at)", async () => {
    const { png } = await render("Trail build");
    mkdirSync(join(process.cwd(), "test-results", "share-og"), { recursive: true });
    writeFileSync(join(process.cwd(), "test-results", "share-og", "image.png"), png);
    // The panel: x 56–616, y about 190–590 at 1200 × 630.
    const { data, info } = await sharp(png)
      .extract({ left: 56, top: 190, width: 560, height: 400 })
      .raw()
      .toBuffer({ resolveWithObject: true });
    const near = (rgb: [number, number, number], tol: number) => {
      let n = 0;
      for (let i = 0; i < data.length; i += info.channels)
        if (Math.abs(data[i]! - rgb[0]) <= tol && Math.abs(data[i + 1]! - rgb[1]) <= tol && Math.abs(data[i + 2]! - rgb[2]) <= tol) n++;
      return n;
    };
    // Both setups' strokes (steel #245a88, ember #bd460f) and the wheel's grey fill
    // (rgb 163 172 184 at 35 % over white = 223 226 230): the wheel is drawn, not only the tires.
    expect(near([0x24, 0x5a, 0x88], 30)).toBeGreaterThan(200);
    expect(near([0xbd, 0x46, 0x0f], 30)).toBeGreaterThan(200);
    expect(near([223, 226, 230], 4)).toBeGreaterThan(200);
  });

  it("answers 404 for a slug that is not live", async () => {
    const res = await image({ params: Promise.resolve({ slug: "A".repeat(24) }) });
    expect(res.status).toBe(404);
  });
});
