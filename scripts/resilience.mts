/**
 * Load-and-fault suite: `npm run test:resilience` (scripts/resilience.sh sets up PostgreSQL,
 * the demo seed and the fake services, then runs this). Not part of `npm test`.
 *
 *  1. mixed load: 50 connections for 20 s of share views, the workspace page, the member's
 *     comparison list, comparison creates (writes) and readiness, against one server;
 *  2. PostgreSQL stopped for 10 s in the middle of the same load: answers by status class,
 *     time from PostgreSQL back to the first 2xx on a database route, acknowledged writes vs rows;
 *  3. `kill -9` of the server while comparisons and photos are being written: acknowledged
 *     writes vs rows, photo-store objects that no row points to;
 *  4. two servers on one database: revoke on A seen on B, a session from A on B, the sign-up
 *     rate limit counted across both.
 *
 * Prints measured values beside targets. A measurement never fails the run: exit 0 after the
 * table, 1 only when the suite could not run. Loads are bounded and go to 127.0.0.1 only.
 */
import { type ChildProcess, execFileSync, spawn } from "node:child_process";
import { closeSync, openSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { setTimeout as sleep } from "node:timers/promises";
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import autocannon, { type Result } from "autocannon";
import pg from "pg";
import sharp from "sharp";
import { register } from "node:module";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { signInOverHttp } from "./http-session";

const env = (name: string): string => {
  const v = process.env[name];
  if (!v) throw new Error(`${name} is not set: run this through scripts/resilience.sh (npm run test:resilience)`);
  return v;
};
const ROOT = process.cwd();
const PORT_A = Number(env("RS_PORT_A"));
const PORT_B = Number(env("RS_PORT_B"));
const A = `http://127.0.0.1:${PORT_A}`;
/** The public origin both servers are configured with (APP_ORIGIN): what a browser would send. */
const ORIGIN = new URL(env("APP_ORIGIN")).origin;
const LOGS = env("RS_LOGS");
const PGBIN = env("PGBIN");
const PGDATA = env("RS_PGDATA");
const PGPORT = env("RS_PGPORT");
const DATABASE_URL = env("DATABASE_URL");
const STARTED_AT = Number(process.env.RS_STARTED_AT ?? Date.now());
const RUN = Date.now().toString(36);

const CONNECTIONS = 50;
const LOAD_SECONDS = 20;
const OUTAGE_SECONDS = 10;
/** Demo accounts (db/seeds/01_demo_accounts.ts). Reads as the member; writes as another account so the member's list stays the same size. */
const READER = "juno@demo.hubface.test";
const WRITER = "teo@demo.hubface.test";
const DEMO_PASSWORD = "hubface-demo-1";

const ORPHAN_GRACE_LABEL = "31 min";
const TARGETS = { lostWrites: 0, orphans: 0, otherAnswers: 0, recoveryMs: 2000, revokeMs: 1000 };

// ---------------------------------------------------------------- servers and PostgreSQL

interface Server {
  name: string;
  port: number;
  child: ChildProcess;
  log: string;
}

/** `node --import tsx` rather than the tsx CLI: the CLI runs the server in a child process, and `kill -9` must hit the server itself. */
function startServer(name: string, port: number, extraEnv: Record<string, string> = {}): Server {
  const log = join(LOGS, `server-${name}-${Date.now()}.log`);
  const fd = openSync(log, "a");
  const child = spawn(process.execPath, ["--import", "tsx", "scripts/serve.ts", "--hostname", "127.0.0.1", "--port", String(port)], {
    cwd: ROOT,
    env: { ...process.env, NODE_ENV: "production", ...extraEnv },
    stdio: ["ignore", fd, fd],
  });
  closeSync(fd);
  return { name, port, child, log };
}

async function waitReady(server: Server, timeoutMs = 90_000): Promise<void> {
  const since = Date.now();
  while (Date.now() - since < timeoutMs) {
    if (server.child.exitCode !== null) throw new Error(`server ${server.name} exited (${server.child.exitCode}); see ${server.log}`);
    const status = await fetch(`http://127.0.0.1:${server.port}/api/health/ready`).then(
      (r) => r.status,
      () => 0,
    );
    // Readiness alone is not enough on a second server: a NOTIFY sent before its purge listener is in place is not heard.
    if (status === 200 && /share purge listener is listening/.test(readFileSync(server.log, "utf8"))) return;
    await sleep(250);
  }
  throw new Error(`server ${server.name} was not ready within ${timeoutMs / 1000} s; see ${server.log}`);
}

async function stopServer(server: Server): Promise<void> {
  if (server.child.exitCode !== null || server.child.signalCode !== null) return;
  const exited = new Promise((r) => server.child.once("exit", r));
  server.child.kill("SIGTERM");
  await Promise.race([exited, sleep(30_000)]);
  if (server.child.exitCode === null && server.child.signalCode === null) server.child.kill("SIGKILL");
}

/** pg_ctl as the cluster's owner (scripts/lib.sh pg_up made it for the postgres user when run as root). */
function pgCtl(args: string[]): void {
  const cmd = [join(PGBIN, "pg_ctl"), "-D", PGDATA, ...args];
  if (process.getuid?.() === 0) execFileSync("runuser", ["-u", "postgres", "--", ...cmd], { stdio: "ignore" });
  else execFileSync(cmd[0]!, cmd.slice(1), { stdio: "ignore" });
}
const pgStop = () => pgCtl(["-m", "fast", "-w", "stop"]);
const pgStart = () =>
  pgCtl(["-l", join(PGDATA, "server.log"), "-w", "-t", "30", "-o", `-c listen_addresses=127.0.0.1 -p ${PGPORT} -k ''`, "start"]);

async function sql<T extends Record<string, unknown>>(text: string, values: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: DATABASE_URL });
  await client.connect();
  try {
    return (await client.query<T>(text, values)).rows;
  } finally {
    await client.end();
  }
}

// ---------------------------------------------------------------- HTTP helpers

/** A demo account's session on the server at `base` (scripts/http-session.ts); the Cookie header. */
const sessionCookie = (base: string, email: string) => signInOverHttp(base, email, DEMO_PASSWORD);

async function call(base: string, cookie: string, method: string, path: string, body?: unknown): Promise<Response> {
  return fetch(`${base}${path}`, {
    method,
    redirect: "manual",
    headers: {
      Cookie: cookie,
      ...(method === "GET" ? {} : { Origin: ORIGIN }),
      ...(body === undefined ? {} : { "Content-Type": "application/json" }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

// ---------------------------------------------------------------- the mixed load

interface Stream {
  label: string;
  path: string;
  method?: "GET" | "POST";
  headers?: Record<string, string>;
  body?: string;
  connections: number;
}

/** What clients got, by class. `other` is anything but 2xx, 4xx and 503 (3xx and 5xx other than 503); errors are connection errors and timeouts (no answer at all). */
interface Classes {
  ok: number;
  c4: number;
  c503: number;
  other: number;
  errors: number;
}
const noClasses = (): Classes => ({ ok: 0, c4: 0, c503: 0, other: 0, errors: 0 });
function classify(into: Classes, status: number) {
  if (status >= 200 && status < 300) into.ok++;
  else if (status >= 400 && status < 500) into.c4++;
  else if (status === 503) into.c503++;
  else into.other++;
}

interface StreamResult {
  stream: Stream;
  result: Result;
  classes: Classes;
  /** Answers that arrived inside the window given to runMix (e.g. PostgreSQL away until the first 2xx after). */
  window: Classes;
}

/**
 * One autocannon instance per kind of request, all at once, so each gets its own rate and
 * latencies; their connections add up to the 50. The share page is anonymous, everything else
 * carries the member's (or, for writes, the writer's) session, and writes send Origin as a browser does.
 */
function mixStreams(slug: string, reader: string, writer: string, writeName: string): Stream[] {
  return [
    { label: "GET /s/<slug> (share page)", path: `/s/${slug}`, connections: 15 },
    { label: "GET /workspace (signed in)", path: "/workspace", headers: { Cookie: reader }, connections: 10 },
    { label: "GET /api/comparisons (member)", path: "/api/comparisons", headers: { Cookie: reader }, connections: 10 },
    {
      label: "POST /api/comparisons (write)",
      path: "/api/comparisons",
      method: "POST",
      headers: { Cookie: writer, Origin: ORIGIN, "Content-Type": "application/json" },
      body: JSON.stringify({ name: writeName, input: DEFAULT_INPUT }),
      connections: 10,
    },
    { label: "GET /api/health/ready", path: "/api/health/ready", connections: 5 },
  ];
}

function runStream(base: string, stream: Stream, seconds: number, window: () => [number, number]): Promise<StreamResult> {
  const classes = noClasses();
  const win = noClasses();
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url: `${base}${stream.path}`,
        method: stream.method ?? "GET",
        headers: stream.headers,
        body: stream.body,
        connections: stream.connections,
        duration: seconds,
        timeout: 10,
      },
      (err, result) => (err ? reject(err) : resolve({ stream, result, classes, window: win })),
    );
    const inWindow = () => {
      const [from, to] = window();
      const now = Date.now();
      return now >= from && now <= to;
    };
    instance.on("response", (_client: unknown, status: number) => {
      classify(classes, status);
      if (inWindow()) classify(win, status);
    });
    instance.on("reqError", () => {
      classes.errors++;
      if (inWindow()) win.errors++;
    });
  });
}

const fmt = (n: number, d = 0) => n.toLocaleString("en-US", { minimumFractionDigits: d, maximumFractionDigits: d });
const pad = (s: string, n: number) => (s.length >= n ? s : s + " ".repeat(n - s.length));
const lpad = (s: string, n: number) => (s.length >= n ? s : " ".repeat(n - s.length) + s);
const meets = (ok: boolean) => (ok ? "meets" : "MISSES");
const sum = (list: Classes[]): Classes =>
  list.reduce(
    (t, c) => ({ ok: t.ok + c.ok, c4: t.c4 + c.c4, c503: t.c503 + c.c503, other: t.other + c.other, errors: t.errors + c.errors }),
    noClasses(),
  );

function mixTable(title: string, results: StreamResult[]): string[] {
  const lines = [
    title,
    `  ${pad("request", 32)}${lpad("conns", 6)}${lpad("req/s", 9)}${lpad("p50 ms", 8)}${lpad("p99 ms", 8)}${lpad("2xx", 8)}${lpad("4xx", 6)}${lpad("503", 6)}${lpad("other", 7)}${lpad("no answer", 11)}`,
  ];
  for (const r of results) {
    const c = r.classes;
    lines.push(
      `  ${pad(r.stream.label, 32)}${lpad(String(r.stream.connections), 6)}${lpad(fmt(r.result.requests.average, 1), 9)}${lpad(fmt(r.result.latency.p50), 8)}${lpad(fmt(r.result.latency.p99), 8)}${lpad(String(c.ok), 8)}${lpad(String(c.c4), 6)}${lpad(String(c.c503), 6)}${lpad(String(c.other), 7)}${lpad(String(c.errors), 11)}`,
    );
  }
  const t = sum(results.map((r) => r.classes));
  const rps = results.reduce((s, r) => s + r.result.requests.average, 0);
  lines.push(
    `  ${pad("all", 32)}${lpad(String(CONNECTIONS), 6)}${lpad(fmt(rps, 1), 9)}${lpad("", 16)}${lpad(String(t.ok), 8)}${lpad(String(t.c4), 6)}${lpad(String(t.c503), 6)}${lpad(String(t.other), 7)}${lpad(String(t.errors), 11)}`,
  );
  return lines;
}

const countRows = async (name: string) =>
  Number((await sql<{ n: string }>("select count(*) as n from comparisons where name = $1", [name]))[0]!.n);
const writes = (results: StreamResult[]) => results.find((r) => r.stream.method === "POST")!.classes.ok;

// ---------------------------------------------------------------- phases

async function phaseLoad(base: string, slug: string, reader: string, writer: string) {
  const name = `resilience load ${RUN}`;
  const results = await Promise.all(mixStreams(slug, reader, writer, name).map((s) => runStream(base, s, LOAD_SECONDS, () => [0, 0])));
  const acked = writes(results);
  const rows = await countRows(name);
  return { results, acked, rows };
}

async function phaseOutage(base: string, slug: string, reader: string, writer: string) {
  const name = `resilience outage ${RUN}`;
  const seconds = 34;
  let stoppedAt = Number.POSITIVE_INFINITY;
  let windowEnd = Number.POSITIVE_INFINITY;
  const load = Promise.all(mixStreams(slug, reader, writer, name).map((s) => runStream(base, s, seconds, () => [stoppedAt, windowEnd])));
  await sleep(8_000);
  stoppedAt = Date.now();
  pgStop();
  const stopTook = Date.now() - stoppedAt;
  await sleep(Math.max(0, OUTAGE_SECONDS * 1000 - stopTook));
  pgStart(); // returns once PostgreSQL accepts connections (pg_ctl -w)
  const backAt = Date.now();
  // The first 2xx on a database route (the member's comparison list), polled through the load.
  let recoveryMs: number | null = null;
  while (Date.now() - backAt < 20_000) {
    const status = await fetch(`${base}/api/comparisons`, { headers: { Cookie: reader } }).then(
      async (r) => (await r.arrayBuffer(), r.status),
      () => 0,
    );
    if (status >= 200 && status < 300) {
      recoveryMs = Date.now() - backAt;
      break;
    }
    await sleep(20);
  }
  windowEnd = Date.now();
  const results = await load;
  const acked = writes(results);
  const rows = await countRows(name);
  return { results, acked, rows, recoveryMs, outageMs: backAt - stoppedAt, windowMs: windowEnd - stoppedAt };
}

/** A small photo, different each time (sharp draws it), as a phone would send it. */
async function photoBytes(i: number): Promise<ArrayBuffer> {
  const shade = (i * 37) % 200;
  const bytes = new Uint8Array(
    await sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 40 + shade, g: 90, b: 140 } } })
      .jpeg({ quality: 80 })
      .toBuffer(),
  );
  return bytes.buffer;
}

async function phaseKill(server: Server, reader: string, writer: string) {
  const base = `http://127.0.0.1:${server.port}`;
  const name = `resilience kill ${RUN}`;
  const vehicles = (await (await call(base, reader, "GET", "/api/vehicles")).json()) as { vehicles: { id: string }[] };
  const vehicleId = vehicles.vehicles[0]?.id;
  if (!vehicleId) throw new Error(`${READER} has no vehicle to upload photos to`);
  const writeStream: Stream = {
    label: "POST /api/comparisons (write)",
    method: "POST",
    path: "/api/comparisons",
    headers: { Cookie: writer, Origin: ORIGIN, "Content-Type": "application/json" },
    body: JSON.stringify({ name, input: DEFAULT_INPUT }),
    connections: 20,
  };
  const load = runStream(base, writeStream, 9, () => [0, 0]);
  // Photo uploads from 4 clients at once until the server is gone.
  let killed = false;
  const ackedPhotos: string[] = [];
  let uploadsTried = 0;
  const uploader = async (w: number) => {
    for (let i = 0; !killed; i++) {
      uploadsTried++;
      const form = new FormData();
      form.set("file", new Blob([await photoBytes(w * 1000 + i)], { type: "image/jpeg" }), `rs-${RUN}-${w}-${i}.jpg`);
      try {
        const res = await fetch(`${base}/api/vehicles/${vehicleId}/photos`, {
          method: "POST",
          headers: { Cookie: reader, Origin: ORIGIN },
          body: form,
        });
        if (res.status === 201) ackedPhotos.push(((await res.json()) as { photo: { id: string } }).photo.id);
        else await res.arrayBuffer();
      } catch {
        // the server went away mid-request: not acknowledged
      }
    }
  };
  const uploaders = Promise.all([0, 1, 2, 3].map(uploader));
  await sleep(5_000);
  server.child.kill("SIGKILL");
  const killedAt = Date.now();
  killed = true;
  await new Promise((r) => (server.child.exitCode !== null || server.child.signalCode !== null ? r(null) : server.child.once("exit", r)));
  const [writeResult] = await Promise.all([load, uploaders]);
  const rows = await countRows(name);
  const photoRows = await sql<{ id: string }>("select id from vehicle_photos where id = any($1::uuid[])", [ackedPhotos]);
  const lostPhotos = ackedPhotos.length - photoRows.length;
  const orphans = await orphanObjects();
  const swept = await runScheduledSweep(killedAt);
  const orphansAfterSweep = await orphanObjects();
  return {
    writeResult,
    acked: writeResult.classes.ok,
    rows,
    ackedPhotos: ackedPhotos.length,
    uploadsTried,
    lostPhotos,
    orphans,
    swept,
    orphansAfterSweep,
    killedAt,
  };
}

/**
 * The app's own orphan sweep (the `photos.sweep` job, every 10 min, objects older than its grace)
 * run once with its clock set past the grace after the kill: the same code the job worker runs,
 * not a copy. The suite cannot wait 30 minutes; the clock stands in for the wait.
 */
async function runScheduledSweep(killedAt: number): Promise<number> {
  register("./hooks/server-only.mjs", import.meta.url);
  const { sweepOrphanPhotos, ORPHAN_GRACE_MINUTES } = await import("@/lib/garage/photos/sweep");
  const { photoStore } = await import("@/lib/garage/photos/s3");
  const { db } = await import("@/lib/platform/db");
  const { deleted } = await sweepOrphanPhotos(db, photoStore(), { now: new Date(killedAt + (ORPHAN_GRACE_MINUTES + 1) * 60_000) });
  return deleted.length;
}

/** Objects in the photo store that no vehicle_photos row points to (object or thumbnail). */
async function orphanObjects(): Promise<string[]> {
  const s3 = new S3Client({
    endpoint: env("S3_ENDPOINT"),
    region: process.env.S3_REGION ?? "us-east-1",
    forcePathStyle: true,
    credentials: { accessKeyId: env("S3_ACCESS_KEY_ID"), secretAccessKey: env("S3_SECRET_ACCESS_KEY") },
  });
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await s3.send(new ListObjectsV2Command({ Bucket: env("S3_BUCKET"), ContinuationToken: token }));
    for (const o of page.Contents ?? []) if (o.Key) keys.push(o.Key);
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  s3.destroy();
  const rows = await sql<{ k: string }>("select object_key as k from vehicle_photos union select thumb_key from vehicle_photos");
  const known = new Set(rows.map((r) => r.k));
  return keys.filter((k) => !known.has(k));
}

async function phaseTwoServers(a: Server, b: Server) {
  const baseA = `http://127.0.0.1:${a.port}`;
  const baseB = `http://127.0.0.1:${b.port}`;
  // A session made on A, used on B.
  const cookie = await sessionCookie(baseA, READER);
  const sessionOnB = (await fetch(`${baseB}/api/me`, { headers: { Cookie: cookie } })).status;
  const anonymousOnB = (await fetch(`${baseB}/api/me`)).status;

  // Revoke on A, poll B until 404 (after B has the page in its micro-cache).
  const made = await call(baseA, cookie, "POST", "/api/comparisons", { name: `resilience revoke ${RUN}`, input: DEFAULT_INPUT });
  if (made.status !== 201) throw new Error(`creating a comparison on A answered ${made.status}`);
  const { comparison } = (await made.json()) as { comparison: { id: string } };
  const shared = await call(baseA, cookie, "POST", `/api/comparisons/${comparison.id}/share`);
  if (shared.status !== 201) throw new Error(`making a share link on A answered ${shared.status}`);
  const { share } = (await shared.json()) as { share: { path: string } };
  const onB = `${baseB}${share.path}`;
  let cachedOnB = "";
  for (let i = 0; i < 2; i++) {
    const res = await fetch(onB);
    await res.arrayBuffer();
    if (res.status !== 200) throw new Error(`the new share page answered ${res.status} on B`);
    cachedOnB = res.headers.get("x-hubface-cache") ?? "";
  }
  const revoked = await call(baseA, cookie, "DELETE", `/api/comparisons/${comparison.id}/share`);
  if (revoked.status !== 200) throw new Error(`revoking on A answered ${revoked.status}`);
  const since = performance.now();
  let revokeMs: number | null = null;
  while (performance.now() - since < 10_000) {
    const res = await fetch(onB);
    await res.arrayBuffer();
    if (res.status === 404) {
      revokeMs = Math.round(performance.now() - since);
      break;
    }
    await sleep(10);
  }

  // Sign-ups from one address, alternating A and B: the limit is 20 an hour per address (lib/platform/limits/limits.ts).
  const signUps: { server: "A" | "B"; status: number }[] = [];
  for (let i = 0; i < 24; i++) {
    const server = i % 2 === 0 ? "A" : "B";
    const res = await fetch(`${server === "A" ? baseA : baseB}/api/account/signup`, {
      method: "POST",
      headers: { Origin: ORIGIN, "Content-Type": "application/json" },
      body: JSON.stringify({ name: `Load Tester ${i}`, email: `rs-${RUN}-${i}@example.test`, password: "a long resilience password 1" }),
    });
    await res.arrayBuffer();
    signUps.push({ server, status: res.status });
  }
  return { sessionOnB, anonymousOnB, cachedOnB, revokeMs, signUps };
}

// ---------------------------------------------------------------- main

async function main() {
  const servers: Server[] = [];
  const out: string[] = [];
  try {
    let a = startServer("A", PORT_A);
    servers.push(a);
    await waitReady(a);
    const reader = await sessionCookie(A, READER);
    const writer = await sessionCookie(A, WRITER);
    const list = (await (await call(A, reader, "GET", "/api/comparisons")).json()) as { comparisons: { share: { slug: string } | null }[] };
    const slug = list.comparisons.find((c) => c.share)?.share?.slug;
    if (!slug) throw new Error(`${READER} has no live share link in the demo seed`);
    // One request per kind first, so the first measured seconds are not Next compiling its caches.
    for (const path of [`/s/${slug}`, "/workspace", "/api/comparisons", "/api/health/ready"])
      await (await fetch(`${A}${path}`, { headers: { Cookie: reader } })).arrayBuffer();
    console.log(`resilience: server A ${A}, PostgreSQL on ${PGPORT}; ${CONNECTIONS} connections × ${LOAD_SECONDS} s mixed load first`);

    const load = await phaseLoad(A, slug, reader, writer);
    console.log("resilience: mixed load done; stopping PostgreSQL for 10 s under the same load");
    const outage = await phaseOutage(A, slug, reader, writer);
    console.log("resilience: outage done; kill -9 of the server while writing comparisons and photos");
    const kill = await phaseKill(a, reader, writer);
    servers.splice(servers.indexOf(a), 1);
    a = startServer("A", PORT_A);
    servers.push(a);
    const b = startServer("B", PORT_B, { HUBFACE_JOBS: "off" }); // job workers stay with A (README "Beyond one machine")
    servers.push(b);
    await Promise.all([waitReady(a), waitReady(b)]);
    console.log("resilience: A restarted, B started on the same database; revoke, session and rate limit across both");
    const two = await phaseTwoServers(a, b);

    // ------------------------------------------------------------ the table
    const outageTotal = sum(outage.results.map((r) => r.classes));
    const outageWin = sum(outage.results.map((r) => r.window));
    const otherAnswers = (c: Classes) => c.other + c.errors;
    const lost = (acked: number, rows: number) => Math.max(0, acked - rows);
    // A sign-up is accepted (202, "check your e-mail"); the account is made later from the mailed link.
    const created = two.signUps.filter((s) => s.status === 202);
    const refused = two.signUps.filter((s) => s.status === 429);
    const byServer = (list: typeof two.signUps, s: "A" | "B") => list.filter((x) => x.server === s).length;
    const limitHolds = created.length === 20 && refused.length === two.signUps.length - 20;

    out.push(
      "",
      `Resilience — ${new Date().toISOString().slice(0, 16)}Z, production build, PostgreSQL 127.0.0.1:${PGPORT} (fsync on), ${CONNECTIONS} connections`,
    );
    out.push(...mixTable(`1. Mixed load, ${LOAD_SECONDS} s`, load.results));
    out.push(
      `  writes: ${load.acked} acknowledged (201), ${load.rows} rows → lost ${lost(load.acked, load.rows)}  (target ${TARGETS.lostWrites}: ${meets(lost(load.acked, load.rows) === 0)}); ${Math.max(0, load.rows - load.acked)} committed without an answer counted (in flight when the run ended)`,
    );
    out.push(
      `  answers other than 2xx/4xx/503 or none: ${otherAnswers(sum(load.results.map((r) => r.classes)))}  (target ${TARGETS.otherAnswers}: ${meets(otherAnswers(sum(load.results.map((r) => r.classes))) === 0)})`,
    );
    out.push("");
    out.push(...mixTable(`2. PostgreSQL stopped ${fmt(outage.outageMs / 1000, 1)} s in a 34 s run of the same load`, outage.results));
    out.push(
      `  from the stop to the first 2xx after (${fmt(outage.windowMs / 1000, 1)} s): 2xx ${outageWin.ok}, 4xx ${outageWin.c4}, 503 ${outageWin.c503}, other ${outageWin.other}, no answer ${outageWin.errors}`,
    );
    out.push(
      `  answers other than 2xx/4xx/503 or none (whole run): ${otherAnswers(outageTotal)}  (target ${TARGETS.otherAnswers}: ${meets(otherAnswers(outageTotal) === 0)})`,
    );
    out.push(
      `  recovery, PostgreSQL accepting connections → first 2xx on GET /api/comparisons, no restart: ${outage.recoveryMs === null ? "none within 20 s" : `${fmt(outage.recoveryMs)} ms`}  (target < ${TARGETS.recoveryMs} ms: ${meets(outage.recoveryMs !== null && outage.recoveryMs < TARGETS.recoveryMs)})`,
    );
    out.push(
      `  writes: ${outage.acked} acknowledged, ${outage.rows} rows → lost ${lost(outage.acked, outage.rows)}  (target ${TARGETS.lostWrites}: ${meets(lost(outage.acked, outage.rows) === 0)}); ${Math.max(0, outage.rows - outage.acked)} committed without an answer counted (in flight when the run ended or PostgreSQL stopped)`,
    );
    out.push("");
    out.push(`3. kill -9 of the server 5 s into writes (20 connections of comparison creates, 4 clients uploading photos)`);
    out.push(
      `  comparison writes: ${kill.acked} acknowledged, ${kill.rows} rows → lost ${lost(kill.acked, kill.rows)}  (target ${TARGETS.lostWrites}: ${meets(lost(kill.acked, kill.rows) === 0)}); ${Math.max(0, kill.rows - kill.acked)} committed without an answer (in flight at the kill)`,
    );
    out.push(
      `  photo uploads: ${kill.uploadsTried} sent, ${kill.ackedPhotos} acknowledged, acknowledged without a row: ${kill.lostPhotos}  (target ${TARGETS.lostWrites}: ${meets(kill.lostPhotos === 0)})`,
    );
    out.push(
      `  photo-store objects without a row right after the kill: ${kill.orphans.length}${kill.orphans.length ? ` (${kill.orphans.slice(0, 4).join(", ")}${kill.orphans.length > 4 ? ", …" : ""})` : ""}`,
    );
    out.push(
      `  after the scheduled sweep (photos.sweep, clock set ${ORPHAN_GRACE_LABEL} past the kill): ${kill.swept} deleted, ${kill.orphansAfterSweep.length} left  (target ${TARGETS.orphans}: ${meets(kill.orphansAfterSweep.length === 0)})`,
    );
    out.push("");
    out.push("4. Two servers on one database (A restarted after the kill, B started beside it)");
    out.push(
      `  session from A on B: GET /api/me ${two.sessionOnB} (without the cookie ${two.anonymousOnB})  (target 200 / 401: ${meets(two.sessionOnB === 200 && two.anonymousOnB === 401)})`,
    );
    out.push(
      `  revoke on A → 404 on B (page was in B's micro-cache: ${two.cachedOnB === "hit" ? "yes" : "no"}): ${two.revokeMs === null ? "still served after 10 s" : `${fmt(two.revokeMs)} ms`}  (target < ${TARGETS.revokeMs} ms: ${meets(two.revokeMs !== null && two.revokeMs < TARGETS.revokeMs)})`,
    );
    out.push(
      `  sign-ups from one address alternating A/B: ${created.length} accepted (A ${byServer(created, "A")}, B ${byServer(created, "B")}), ${refused.length} refused 429, other ${two.signUps.length - created.length - refused.length}  (target 20 accepted then 429 on both: ${meets(limitHolds)})`,
    );
    out.push("", `run time ${fmt((Date.now() - STARTED_AT) / 1000)} s (setup, seed and servers included; the build not)`);
    console.log(out.join("\n"));
  } finally {
    await Promise.all(servers.map(stopServer));
  }
}

main().then(
  () => process.exit(0),
  (e: unknown) => {
    console.error(`resilience suite could not run: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
    process.exit(1);
  },
);
