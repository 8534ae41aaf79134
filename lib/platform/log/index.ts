/**
 * Structured logs: one JSON object per line on stdout (pino), for whatever collects the
 * process's output. Every line written while a request is handled carries that request's id
 * (and the user's id once known) through an AsyncLocalStorage, so one request's lines can be
 * found together and matched with the `ref` a person reads on an error.
 *
 * Plain Node (no "server-only"): the server (scripts/serve.ts) loads it outside Next's bundle
 * and the app's copy inside; both reach the same context store and logger through `globalThis`.
 */
import { AsyncLocalStorage } from "node:async_hooks";
import { randomUUID } from "node:crypto";
import path from "node:path";
import pino, { type Logger } from "pino";

export interface RequestContext {
  reqId: string;
  userId?: string;
}

const g = globalThis as unknown as { hubfaceLogContext?: AsyncLocalStorage<RequestContext>; hubfaceLogger?: Logger };

export const requestContext: AsyncLocalStorage<RequestContext> = (g.hubfaceLogContext ??= new AsyncLocalStorage<RequestContext>());

/** The id of the request being handled, if any. */
export const currentRequestId = (): string | undefined => requestContext.getStore()?.reqId;

/** Records who is calling, for the request's summary line (set where the session was read). */
export function noteUser(userId: string | null | undefined): void {
  const store = requestContext.getStore();
  if (store && userId) store.userId = userId;
}

/** A request id: the load balancer's when it sent a sane one, else a new one (16 hex digits). */
export function requestIdFrom(header: string | string[] | undefined): string {
  const given = Array.isArray(header) ? header[0] : header;
  if (given && /^[A-Za-z0-9._:-]{8,64}$/.test(given)) return given;
  return randomUUID().replace(/-/g, "").slice(0, 16);
}

/**
 * Field paths never written out. Tokens also hide in URLs: see {@link redactUrl}.
 * The wildcard paths cover a logged object's own fields and one level below.
 */
export const REDACT_PATHS = [
  "headers.cookie",
  "headers.authorization",
  'headers["set-cookie"]',
  "*.headers.cookie",
  "*.headers.authorization",
  '*.headers["set-cookie"]',
  "password",
  "*.password",
  "newPassword",
  "*.newPassword",
  "currentPassword",
  "*.currentPassword",
  "confirm",
  "*.confirm",
  "token",
  "*.token",
  "secret",
  "*.secret",
  "attachments",
  "*.attachments",
  "html",
  "*.html",
];

/** Path segments after these prefixes are bearer tokens (a quote link, an invitation, a share slug). */
const TOKEN_PATHS = /^(\/(?:api\/)?(?:q|join|s)\/)[^/?#]+/;
/** Query parameters that carry secrets (reset links, provider callbacks). */
const SECRET_PARAMS = /^(token|code|secret|password|key|signature|session_id|state|callbackurl)$/i;

/** A URL as it may be logged: token path segments and secret query values replaced. */
export function redactUrl(url: string): string {
  const q = url.indexOf("?");
  const pathPart = (q < 0 ? url : url.slice(0, q)).replace(TOKEN_PATHS, "$1[redacted]");
  if (q < 0) return pathPart;
  const params = url
    .slice(q + 1)
    .split("&")
    .map((pair) => {
      const eq = pair.indexOf("=");
      const name = decodeURIComponentSafe(eq < 0 ? pair : pair.slice(0, eq));
      return SECRET_PARAMS.test(name) ? `${pair.slice(0, eq < 0 ? pair.length : eq)}=[redacted]` : pair;
    });
  return `${pathPart}?${params.join("&")}`;
}

function decodeURIComponentSafe(s: string): string {
  try {
    return decodeURIComponent(s);
  } catch {
    return s;
  }
}

/**
 * pino-pretty (a development dependency) when asked for with LOG_FORMAT=pretty or by default
 * in development on a terminal; plain JSON otherwise, and whenever it is not installed.
 * Loaded through a runtime require so no bundler tries to include it in production.
 */
function prettyStream(): NodeJS.WritableStream | undefined {
  const format = process.env.LOG_FORMAT;
  const wanted = format === "pretty" || (format !== "json" && process.env.NODE_ENV === "development" && process.stdout.isTTY);
  if (!wanted) return undefined;
  try {
    const { createRequire } = process.getBuiltinModule("node:module");
    const load = createRequire(path.join(process.cwd(), "package.json"));
    const pretty = load("pino-pretty") as (o: object) => NodeJS.WritableStream;
    return pretty({ colorize: true, translateTime: "HH:MM:ss.l", ignore: "pid,hostname" });
  } catch {
    return undefined;
  }
}

/** Builds a logger writing to `destination` (tests pass a stream to read the lines back). */
export function createLogger(destination?: NodeJS.WritableStream): Logger {
  const options: pino.LoggerOptions = {
    level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === "test" ? "warn" : "info"),
    base: { service: "hubface" },
    timestamp: pino.stdTimeFunctions.isoTime,
    redact: { paths: REDACT_PATHS, censor: "[redacted]" },
    serializers: { err: pino.stdSerializers.err },
    mixin() {
      const c = requestContext.getStore();
      return c ? (c.userId ? { reqId: c.reqId, userId: c.userId } : { reqId: c.reqId }) : {};
    },
  };
  const stream = destination ?? prettyStream();
  return stream ? pino(options, stream) : pino(options);
}

/** The process's logger. */
export function log(): Logger {
  return (g.hubfaceLogger ??= createLogger());
}

/** Replaces the process's logger (tests capture lines this way). */
export function setLogger(logger: Logger | undefined): void {
  g.hubfaceLogger = logger;
}
