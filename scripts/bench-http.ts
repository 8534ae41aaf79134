/**
 * HTTP benchmark of the share page and a visitor's /workspace against GET /api/health, in the same
 * run: `npm run bench:http`.
 *
 *   BENCH_URL       server to measure (default http://127.0.0.1:3000): `npm start`, or scripts/serve.ts
 *   BENCH_SLUG      share slug to load; unset: signs in as the demo member and takes her live link
 *   BENCH_EMAIL / BENCH_PASSWORD   account for that lookup (default: the demo member)
 *   BENCH_CONNECTIONS (50), BENCH_DURATION seconds per target (20)
 *
 * Prints the throughputs, each page's ratio to the health route (target ≥ 0.5), the share page's
 * p99 latency (target ≤ 100 ms), the visitor's workspace's (no cookie, no query: the prerendered
 * page, proxy.ts; target ≤ 150 ms) and error counts, and whether a repeated share view came from the
 * server's micro-cache (scripts/serve.ts; HUBFACE_MICROCACHE=off on the server turns it off).
 * A benchmark, never a test: it exits 0 whatever the figures are (1 only when it cannot run).
 */
import autocannon, { type Result } from "autocannon";

const BASE = (process.env.BENCH_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const DURATION = Number(process.env.BENCH_DURATION ?? 20);
const RATIO_TARGET = 0.5;
const P99_TARGET_MS = 100;
const WORKSPACE_P99_TARGET_MS = 150;
const WORKSPACE_PATH = "/workspace";

/** Cookies from a response, for next-auth's credential sign-in. */
function cookiesOf(res: Response, jar: Map<string, string>) {
  for (const c of res.headers.getSetCookie()) {
    const pair = c.split(";")[0] ?? "";
    const i = pair.indexOf("=");
    jar.set(pair.slice(0, i), pair.slice(i + 1));
  }
}

async function demoSlug(): Promise<string> {
  const email = process.env.BENCH_EMAIL ?? "juno@demo.hubface.test";
  const password = process.env.BENCH_PASSWORD ?? "hubface-demo-1";
  const jar = new Map<string, string>();
  const header = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrf = await fetch(`${BASE}/api/auth/csrf`);
  cookiesOf(csrf, jar);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const signIn = await fetch(`${BASE}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "Content-Type": "application/x-www-form-urlencoded", Cookie: header() },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  cookiesOf(signIn, jar);
  if (!/session-token=/.test(header())) throw new Error(`signing in as ${email} failed (${signIn.status}); set BENCH_SLUG instead`);
  const list = await fetch(`${BASE}/api/comparisons`, { headers: { Cookie: header() } });
  const { comparisons } = (await list.json()) as { comparisons: { share: { slug: string } | null }[] };
  const slug = comparisons.find((c) => c.share)?.share?.slug;
  if (!slug) throw new Error(`${email} has no live share link; create one on /comparisons or set BENCH_SLUG`);
  return slug;
}

async function run(path: string): Promise<Result> {
  return autocannon({ url: `${BASE}${path}`, connections: CONNECTIONS, duration: DURATION, timeout: 10 });
}

const fmt = (n: number, d = 0) => n.toLocaleString("en-US", { minimumFractionDigits: d, maximumFractionDigits: d });
const failures = (r: Result) => r.errors + r.timeouts + r.non2xx;

async function main() {
  const slug = process.env.BENCH_SLUG ?? (await demoSlug());
  const sharePath = `/s/${slug}`;
  let servedBy = "";
  for (const p of ["/api/health", sharePath, sharePath, WORKSPACE_PATH]) {
    const res = await fetch(`${BASE}${p}`);
    if (res.status !== 200) throw new Error(`GET ${p} answered ${res.status} before the run`);
    await res.arrayBuffer();
    if (p === sharePath)
      servedBy = res.headers.get("x-hubface-cache") === "hit" ? "the server's micro-cache (scripts/serve.ts)" : "Next (no micro-cache hit)";
  }
  console.log(
    `bench:http ${BASE} — ${CONNECTIONS} connections, ${DURATION} s per target; a repeated share view is answered by ${servedBy}`,
  );
  const health = await run("/api/health");
  const share = await run(sharePath);
  const workspace = await run(WORKSPACE_PATH);
  const ratio = share.requests.average / health.requests.average;
  const workspaceRatio = workspace.requests.average / health.requests.average;
  const mark = (ok: boolean) => (ok ? "meets" : "MISSES");
  console.log(
    `GET /api/health    ${fmt(health.requests.average, 1)} req/s  p99 ${fmt(health.latency.p99)} ms  errors ${failures(health)} (${health.errors} errors, ${health.timeouts} timeouts, ${health.non2xx} non-2xx)`,
  );
  console.log(
    `GET /s/<slug>      ${fmt(share.requests.average, 1)} req/s  p99 ${fmt(share.latency.p99)} ms  errors ${failures(share)} (${share.errors} errors, ${share.timeouts} timeouts, ${share.non2xx} non-2xx)`,
  );
  console.log(`ratio share/health ${fmt(ratio, 2)}  (target ≥ ${RATIO_TARGET}: ${mark(ratio >= RATIO_TARGET)})`);
  console.log(
    `share p99          ${fmt(share.latency.p99)} ms  (target ≤ ${P99_TARGET_MS} ms: ${mark(share.latency.p99 <= P99_TARGET_MS)})`,
  );
  console.log(`share errors       ${failures(share)}  (target 0: ${mark(failures(share) === 0)})`);
  console.log(
    `GET /workspace     ${fmt(workspace.requests.average, 1)} req/s  p99 ${fmt(workspace.latency.p99)} ms  errors ${failures(workspace)} (${workspace.errors} errors, ${workspace.timeouts} timeouts, ${workspace.non2xx} non-2xx)`,
  );
  console.log(`ratio workspace/health ${fmt(workspaceRatio, 2)}  (target ≥ ${RATIO_TARGET}: ${mark(workspaceRatio >= RATIO_TARGET)})`);
  console.log(
    `workspace p99      ${fmt(workspace.latency.p99)} ms  (target ≤ ${WORKSPACE_P99_TARGET_MS} ms: ${mark(workspace.latency.p99 <= WORKSPACE_P99_TARGET_MS)})`,
  );
  console.log(`workspace errors   ${failures(workspace)}  (target 0: ${mark(failures(workspace) === 0)})`);
}

main().catch((e: unknown) => {
  console.error(`bench:http could not run: ${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
});
