import "server-only";
import { randomUUID } from "node:crypto";
import { NextRequest, NextResponse } from "next/server";
import { z } from "zod";
import { isDatabaseUnavailable } from "@/lib/platform/db";
import { isDependencyUnavailable } from "@/lib/platform/http/dependency";
import { currentRequestId, log, noteUser } from "@/lib/platform/log";
import { type Access, type Caller, currentCaller, requireCaller } from "@/lib/platform/auth/session";
import { FitmentInputError } from "@/lib/fitment";
import {
  ConflictError,
  DomainError,
  GoneError,
  InvalidError,
  NotFoundError,
  SOME_FIELDS,
  UnknownReferenceError,
} from "@/lib/platform/errors";
import { readCappedBytes } from "./body";
import { bodyHash, idempotencyKeyOf, runOnce } from "./idempotency";
import { assertNoNul } from "./nul";
import { assertSameOrigin } from "./origin";
import { HttpError, type IssueLike, fallbackMessage, fieldPlace, withRows } from "./errors";

const DEFAULT_MAX_BYTES = 64 * 1024;

interface Spec<B extends z.ZodType | undefined, Q extends z.ZodType | undefined, P extends z.ZodType | undefined> {
  access: Access;
  body?: B;
  query?: Q;
  params?: P;
  maxBytes?: number;
  /** The 413 message when a body passes maxBytes; the route's own wording (e.g. "That file is larger than 10 MB"). */
  tooLarge?: string;
  /**
   * A create: an `Idempotency-Key` header makes a retry replay the first answer instead of
   * creating again (lib/platform/http/idempotency.ts). The key is checked with the input; the body it
   * is tied to is the raw bytes, so a route that reads `req` itself (multipart) is covered too.
   */
  idempotent?: boolean;
}

type Out<T> = T extends z.ZodType ? z.infer<T> : undefined;

export interface Ctx<B, Q, P, A extends Access> {
  req: NextRequest;
  caller: A extends "public" ? Caller | null : Caller;
  body: B;
  query: Q;
  params: P;
}

/**
 * Field errors in the shape the forms read: `{ field: ["message"] }`. Parse with
 * `{ error: humanIssue }` so issues the schema left without a message get one a person can
 * read (lib/platform/http/errors.ts) instead of the validator's own wording.
 */
export function fieldErrorsOf(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export function json(data: unknown, init?: number | ResponseInit) {
  return NextResponse.json(data, typeof init === "number" ? { status: init } : init);
}

const tooLarge = (maxBytes: number) => `The request body is larger than ${Math.round(maxBytes / 1024)} KB.`;

/** `application/json`, with or without parameters such as `; charset=utf-8`. */
const isJsonType = (contentType: string | null) => (contentType ?? "").split(";")[0]!.trim().toLowerCase() === "application/json";
const NOT_JSON = "Send JSON with Content-Type: application/json.";

/**
 * The JSON body, read through readCappedBytes so a chunked body without Content-Length stops
 * at the cap instead of being buffered whole. A body that says it is something else (a form or
 * text/plain, which a page on another site can send without asking) is refused with 415; an
 * empty body without a Content-Type reads as `{}`.
 */
async function readJson(req: NextRequest, maxBytes: number, tooLargeMessage: string): Promise<{ value: unknown; bytes: Uint8Array }> {
  const contentType = req.headers.get("content-type");
  if (contentType !== null && !isJsonType(contentType)) throw new HttpError(415, NOT_JSON);
  const bytes = await readCappedBytes(req, maxBytes, tooLargeMessage);
  if (bytes.byteLength > 0 && contentType === null) throw new HttpError(415, NOT_JSON);
  return { value: parseJson(bytes), bytes };
}

function parseJson(bytes: Uint8Array): unknown {
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new HttpError(400, "The request body is not UTF-8 text.");
  }
  if (!text.trim()) return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new HttpError(400, "The request body is not valid JSON.");
  }
}

/** The per-parse error map: used by zod only where the schema gave no message of its own. */
export const humanIssue = (issue: unknown) => fallbackMessage(issue as IssueLike);

function parse<T extends z.ZodType>(schema: T, value: unknown, status: number): z.infer<T> {
  const result = schema.safeParse(value, { error: humanIssue });
  if (!result.success) throw new HttpError(status, SOME_FIELDS, fieldErrorsOf(result.error));
  return result.data;
}

/**
 * Every route handler goes through here: a cross-site check on state-changing requests
 * (lib/platform/http/origin.ts), then session and role (anonymous callers learn nothing about the input
 * format), then params/query/body — NUL characters refused with the field named, the JSON body
 * read up to its cap and only as application/json — through zod, then the handler with the
 * caller whose ids scope its queries. Errors become JSON with a status; unexpected ones
 * are logged with a reference and never shown.
 */
export function route<
  A extends Access,
  B extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  P extends z.ZodType | undefined = undefined,
>(spec: Spec<B, Q, P> & { access: A }, handler: (ctx: Ctx<Out<B>, Out<Q>, Out<P>, A>) => Promise<Response | unknown>) {
  return async (req: NextRequest, context: { params: Promise<Record<string, string | string[]>> }) => {
    try {
      assertSameOrigin(req);
      const caller = spec.access === "public" ? await currentCaller().catch(() => null) : await requireCaller(spec.access);
      noteUser(caller?.userId);
      // Creates here are all signed-in; a key is scoped to its caller, so without one it is ignored.
      const idemKey = spec.idempotent && caller ? idempotencyKeyOf(req) : null;
      const rawParams = context?.params ? await context.params : {};
      assertNoNul(rawParams, 400);
      const params = spec.params ? parse(spec.params, rawParams, 404) : undefined;
      const rawQuery = Object.fromEntries(req.nextUrl.searchParams);
      assertNoNul(rawQuery, 400);
      const query = spec.query ? parse(spec.query, rawQuery, 400) : undefined;
      const hasBody = !["GET", "HEAD", "DELETE"].includes(req.method);
      const maxBytes = spec.maxBytes ?? DEFAULT_MAX_BYTES;
      const tooLargeMessage = spec.tooLarge ?? tooLarge(maxBytes);
      const read = spec.body && hasBody ? await readJson(req, maxBytes, tooLargeMessage) : undefined;
      const rawBody = read?.value;
      assertNoNul(rawBody, 422);
      const body = spec.body && hasBody ? parse(spec.body, rawBody, 422) : undefined;
      let handlerReq = req;
      let bytes = read?.bytes;
      if (idemKey !== null && bytes === undefined) {
        // The handler reads the body itself (multipart): read it here under the same cap to hash
        // it, and hand the handler a request that carries the same bytes.
        bytes = hasBody ? await readCappedBytes(req, maxBytes, tooLargeMessage) : new Uint8Array();
        handlerReq = new NextRequest(req.url, {
          method: req.method,
          headers: req.headers,
          body: hasBody ? (bytes as BodyInit) : undefined,
        });
      }
      const run = async () => {
        const result = await handler({ req: handlerReq, caller, body, query, params } as Ctx<Out<B>, Out<Q>, Out<P>, A>);
        return result instanceof Response ? result : json(result ?? { ok: true });
      };
      if (idemKey === null) return await run();
      const scope = { userId: caller!.userId, route: `${req.method} ${req.nextUrl.pathname}`, key: idemKey };
      return await runOnce(scope, bodyHash(bytes ?? new Uint8Array()), run);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

/**
 * The status of each domain error (lib/platform/errors.ts): this and pageGuard are the only
 * places a domain error becomes HTTP. A kind missing here is a mistake, answered as a 500.
 */
function domainStatus(error: DomainError): number | null {
  if (error instanceof NotFoundError) return 404;
  if (error instanceof ConflictError) return 409;
  if (error instanceof InvalidError) return 422;
  if (error instanceof GoneError) return 410;
  if (error instanceof UnknownReferenceError) return 400;
  return null;
}

/** `{ error, fieldErrors? }`: messages about a row say which row, counted from 1. */
const errorBody = (message: string, fieldErrors?: Record<string, string[]>) => ({
  error: message,
  ...(fieldErrors ? { fieldErrors: withRows(fieldErrors) } : {}),
});

export function errorResponse(error: unknown): Response {
  if (error instanceof HttpError) {
    return json(errorBody(error.message, error.fieldErrors), { status: error.status, headers: error.headers });
  }
  const status = error instanceof DomainError ? domainStatus(error) : null;
  if (error instanceof DomainError && status !== null) {
    const fieldErrors = error instanceof InvalidError || error instanceof ConflictError ? error.fieldErrors : undefined;
    return json({ ...error.details, ...errorBody(error.message, fieldErrors) }, status);
  }
  if (error instanceof FitmentInputError) {
    // The engine refused a value the schemas let through: a 422 on that field, in words, not a 500.
    const { row, field } = fieldPlace(error.field.split("."));
    const message = `${row ? `${row}: c` : "C"}heck the ${field || "values entered"}: Hubface cannot work with it.`;
    return json({ error: SOME_FIELDS, fieldErrors: { [error.field]: [message] } }, 422);
  }
  // The request's id (scripts/serve.ts), so the reference a person reads finds every log line of the request.
  const ref = currentRequestId() ?? randomUUID().slice(0, 8);
  if (isDependencyUnavailable(error)) {
    log().warn({ ref, dependency: error.dependency, err: { message: error.message } }, `${error.dependency} unavailable`);
    return json({ error: error.publicMessage, ref }, 503);
  }
  if (isDatabaseUnavailable(error)) {
    log().error({ ref, err: { message: (error as Error).message } }, "database unavailable");
    return json({ error: "The database is not reachable right now. Try again in a moment.", ref }, 503);
  }
  log().error({ ref, err: error }, "unhandled error in route handler");
  return json({ error: `Something went wrong on our side. Reference ${ref}.`, ref }, 500);
}
