/**
 * The per-request log line and request id around a plain Node handler (scripts/serve.ts wraps
 * Next's handler in it). Plain Node, no Next imports.
 */
import type { IncomingMessage, ServerResponse } from "node:http";
import { ERROR_REF_COOKIE } from "./errorRef";
import { type RequestContext, log, redactUrl, requestContext, requestIdFrom } from "./index";

/** Adds the request id cookie to an answer whose status is 5xx, whatever sets the status (writeHead, or the implicit head of the first write). */
function stampErrorRef(res: ServerResponse, reqId: string) {
  const writeHead = res.writeHead.bind(res) as (...args: unknown[]) => ServerResponse;
  res.writeHead = ((...args: unknown[]) => {
    const status = typeof args[0] === "number" ? args[0] : res.statusCode;
    if (status >= 500 && !res.headersSent) {
      const existing = res.getHeader("set-cookie");
      const list = existing === undefined ? [] : Array.isArray(existing) ? existing : [String(existing)];
      res.setHeader("set-cookie", [...list, `${ERROR_REF_COOKIE}=${reqId}; Path=/; Max-Age=300; SameSite=Lax`]);
    }
    return writeHead(...args);
  }) as ServerResponse["writeHead"];
}

export interface RequestLogOptions {
  /** Finds the signed-in user when the handler did not note one (e.g. from the session cookie). Called after the answer left. */
  userIdOf?: (req: IncomingMessage) => Promise<string | undefined>;
}

/**
 * Gives the request an id (the load balancer's `x-request-id` when sane, else a new one), puts it
 * on the request and the response headers and in the AsyncLocalStorage every log line reads, and
 * writes one line when the response ends: reqId, method, route (path with tokens redacted, no
 * query), status, durationMs, userId where known. 5xx lines are at error level.
 */
export function withRequestLog(
  handler: (req: IncomingMessage, res: ServerResponse, ctx: RequestContext) => void,
  opts: RequestLogOptions = {},
) {
  return (req: IncomingMessage, res: ServerResponse) => {
    const started = process.hrtime.bigint();
    const ctx: RequestContext = { reqId: requestIdFrom(req.headers["x-request-id"]) };
    // Next and the route handlers read it from the request too (onRequestError gets headers, not our context).
    req.headers["x-request-id"] = ctx.reqId;
    res.setHeader("x-request-id", ctx.reqId);
    stampErrorRef(res, ctx.reqId);
    res.once("close", () => {
      const durationMs = Math.round(Number(process.hrtime.bigint() - started) / 1e4) / 100;
      const route = redactUrl(req.url ?? "/").split("?")[0] ?? "/";
      const line = {
        reqId: ctx.reqId,
        method: req.method,
        route,
        status: res.statusCode,
        durationMs,
        ...(res.writableFinished ? {} : { aborted: true }),
      };
      const write = (userId?: string) =>
        log()[res.statusCode >= 500 ? "error" : "info"]({ ...line, ...(userId ? { userId } : {}) }, "request");
      if (ctx.userId || !opts.userIdOf || route.startsWith("/_next/")) write(ctx.userId);
      else void opts.userIdOf(req).then(write, () => write());
    });
    requestContext.run(ctx, () => handler(req, res, ctx));
  };
}
