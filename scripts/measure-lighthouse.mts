/**
 * Lighthouse (12.2.3, the mobile preset with simulated throttling) against a running server with
 * the demo data, for the pages a phone user opens first:
 *
 *   npm run measure:lighthouse [-- http://127.0.0.1:3000] [--only=workspace-comparison,vehicle]
 *
 * Starts no server and downloads nothing: it drives Debian's Chromium (CHROME_PATH, default
 * /usr/bin/chromium) through chrome-launcher, which ships with Lighthouse. It signs in as the demo
 * member to find a live share link and a garage vehicle, and measures the vehicle page with that
 * session. Prints each page's scores and the four figures the targets name; a timing never decides
 * a test, so nothing here is asserted (the browser suite runs it once and prints the table).
 */
import * as chromeLauncher from "chrome-launcher";
import lighthouse from "lighthouse";
import { CHROMIUM_FLAGS } from "./chromium";
import { signInOverHttp } from "./http-session";

const args = process.argv.slice(2);
const base = (args.find((a) => !a.startsWith("--")) ?? process.env.BASE_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
/** `--only=name,name`: measure just those pages (the browser suite measures two, to keep its time). */
const only = args
  .find((a) => a.startsWith("--only="))
  ?.slice("--only=".length)
  .split(",")
  .filter(Boolean);
const MEMBER = { email: "juno@demo.hubface.test", password: "hubface-demo-1" };
/** A comparison in the URL, as a shared workspace link carries it (the codec reads these names). */
const WITH_COMPARISON = "/workspace?ct=285%2F75R16&cd=16&cw=8&co=0&pt=35x12.50R17LT&pd=17&pw=9&po=-12";

async function signIn(): Promise<string> {
  try {
    return await signInOverHttp(base, MEMBER.email, MEMBER.password, { Origin: base });
  } catch (e) {
    throw new Error(`${(e as Error).message}; is the demo data loaded?`);
  }
}

async function demoPaths(cookie: string): Promise<{ share?: string; vehicle?: string }> {
  const get = async (path: string) =>
    (await fetch(`${base}${path}`, { headers: { Cookie: cookie } })).json() as Promise<Record<string, unknown>>;
  const comparisons = ((await get("/api/comparisons")).comparisons ?? []) as { share: { slug: string } | null }[];
  const vehicles = ((await get("/api/vehicles")).vehicles ?? []) as { id: string }[];
  const slug = comparisons.find((c) => c.share)?.share?.slug;
  return { share: slug ? `/s/${slug}` : undefined, vehicle: vehicles[0] ? `/garage/${vehicles[0].id}` : undefined };
}

interface Row {
  page: string;
  performance: number;
  accessibility: number;
  tbtMs: number;
  cls: number;
  lcpMs: number;
  fcpMs: number;
}

async function measure(port: number, path: string, cookie?: string): Promise<Row> {
  const result = await lighthouse(
    `${base}${path}`,
    {
      port,
      output: "json",
      logLevel: "error",
      onlyCategories: ["performance", "accessibility"],
      extraHeaders: cookie ? { Cookie: cookie } : undefined,
    },
    undefined,
  );
  if (!result) throw new Error(`Lighthouse returned nothing for ${path}`);
  const { categories, audits } = result.lhr;
  const num = (id: string) => Number(audits[id]?.numericValue ?? NaN);
  return {
    page: path.length > 48 ? `${path.slice(0, 45)}…` : path,
    performance: Math.round((categories.performance?.score ?? 0) * 100),
    accessibility: Math.round((categories.accessibility?.score ?? 0) * 100),
    tbtMs: num("total-blocking-time"),
    cls: num("cumulative-layout-shift"),
    lcpMs: num("largest-contentful-paint"),
    fcpMs: num("first-contentful-paint"),
  };
}

async function main() {
  const cookie = await signIn();
  const found = await demoPaths(cookie);
  const all: { name: string; path: string; signedIn?: boolean }[] = [
    { name: "home", path: "/" },
    { name: "workspace", path: "/workspace" },
    { name: "workspace-comparison", path: WITH_COMPARISON },
    ...(found.share ? [{ name: "share", path: found.share }] : []),
    { name: "convert", path: "/convert" },
    { name: "beadlock", path: "/beadlock" },
    ...(found.vehicle ? [{ name: "vehicle", path: found.vehicle, signedIn: true }] : []),
  ];
  const unknown = only?.filter((n) => !all.some((p) => p.name === n)) ?? [];
  if (unknown.length) throw new Error(`--only names no page: ${unknown.join(", ")} (pages: ${all.map((p) => p.name).join(", ")})`);
  const pages = only ? all.filter((p) => only.includes(p.name)) : all;
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROME_PATH ?? "/usr/bin/chromium",
    chromeFlags: ["--headless=new", ...CHROMIUM_FLAGS],
  });
  const rows: Row[] = [];
  try {
    for (const p of pages) rows.push(await measure(chrome.port, p.path, p.signedIn ? cookie : undefined));
  } finally {
    await chrome.kill();
  }
  console.log(
    "Lighthouse 12.2.3, mobile preset, simulated throttling — targets: performance ≥ 95, TBT ≤ 150 ms, CLS ≤ 0.05, LCP ≤ 2.0 s, accessibility 100",
  );
  console.log("page".padEnd(50) + "perf  a11y   TBT ms   CLS     LCP ms   FCP ms");
  for (const r of rows) {
    console.log(
      r.page.padEnd(50) +
        String(r.performance).padStart(4) +
        String(r.accessibility).padStart(6) +
        String(Math.round(r.tbtMs)).padStart(9) +
        r.cls.toFixed(3).padStart(8) +
        String(Math.round(r.lcpMs)).padStart(10) +
        String(Math.round(r.fcpMs)).padStart(9),
    );
  }
  if (!found.share) console.log("(no live share link in the demo data: share page not measured)");
}

await main();
