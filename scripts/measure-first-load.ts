/**
 * First-load JavaScript of the workspace, as Chromium receives it from a running server:
 *
 *   npm run measure:first-load [-- http://127.0.0.1:3000]
 *
 * Starts nothing itself: point it at a server started with `npm start` (or `next start`).
 * "First-load" = the scripts the initial HTML of /workspace asks for (script tags and script
 * preloads): those must arrive before the page can hydrate and respond. Scripts requested later
 * (the lazily loaded charts) are listed apart and do not count. Sizes are the compressed bytes on
 * the wire when the server sends gzip; for a script sent uncompressed its gzip size is computed.
 */
import { gzipSync } from "node:zlib";
import { chromium, type Response } from "playwright-core";

const base = (process.argv[2] ?? process.env.BASE_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
const path = process.argv[3] ?? "/workspace";

interface Script {
  url: string;
  bytes: number;
  how: "gzip on the wire" | "gzip computed";
}

async function sizeOf(res: Response): Promise<Script> {
  const body = await res.body();
  const enc = (await res.headerValue("content-encoding")) ?? "";
  if (enc.includes("gzip")) {
    const sizes = await res.request().sizes();
    return { url: res.url(), bytes: sizes.responseBodySize, how: "gzip on the wire" };
  }
  return { url: res.url(), bytes: gzipSync(body).length, how: "gzip computed" };
}

function scriptsInHtml(html: string, pageUrl: string): Set<string> {
  const out = new Set<string>();
  for (const m of html.matchAll(/<script\b[^>]*\bsrc="([^"]+)"/g)) if (m[1]) out.add(new URL(m[1].replace(/&amp;/g, "&"), pageUrl).href);
  for (const m of html.matchAll(/<link\b[^>]*>/g)) {
    const tag = m[0];
    if (/\bas="script"/.test(tag) || /rel="modulepreload"/.test(tag)) {
      const href = /\bhref="([^"]+)"/.exec(tag)?.[1];
      if (href) out.add(new URL(href.replace(/&amp;/g, "&"), pageUrl).href);
    }
  }
  return out;
}

async function main() {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run"],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const responses: Response[] = [];
    page.on("response", (r) => {
      if (r.request().resourceType() === "script") responses.push(r);
    });
    const doc = await page.goto(`${base}${path}`, { waitUntil: "load", timeout: 60000 });
    if (!doc || !doc.ok()) throw new Error(`${base}${path} answered ${doc?.status() ?? "nothing"}; is the server running?`);
    const html = await doc.text();
    // Interactive: hydrated (the lazily loaded charts replace their placeholder after hydration).
    await page.waitForSelector('[data-testid="charts"]', { timeout: path === "/workspace" ? 30000 : 1 }).catch(() => undefined);
    await page.waitForLoadState("networkidle");
    const first = scriptsInHtml(html, doc.url());
    const seen = new Map<string, Script>();
    for (const r of responses) if (!seen.has(r.url())) seen.set(r.url(), await sizeOf(r));
    const initial = [...seen.values()].filter((s) => first.has(s.url));
    const later = [...seen.values()].filter((s) => !first.has(s.url));
    const missing = [...first].filter((u) => !seen.has(u));
    const kb = (n: number) => (n / 1024).toFixed(1);
    const total = initial.reduce((a, s) => a + s.bytes, 0);
    for (const s of initial.sort((a, b) => b.bytes - a.bytes))
      console.log(`  ${kb(s.bytes).padStart(7)} kB  ${new URL(s.url).pathname}  (${s.how})`);
    if (missing.length) console.log(`  (${missing.length} script(s) named in the HTML were not fetched: ${missing.join(", ")})`);
    console.log(`  after interactive, not counted: ${later.length} script(s), ${kb(later.reduce((a, s) => a + s.bytes, 0))} kB gzip`);
    console.log(`workspace first-load JS: ${kb(total)} kB gzip`);
  } finally {
    await browser.close();
  }
}

main().catch((e: unknown) => {
  console.error(e instanceof Error ? e.message : e);
  process.exit(1);
});
