import "server-only";
import { createHash } from "node:crypto";
import type { NextRequest } from "next/server";
import { log } from "@/lib/platform/log";
import { type KeyScope, idempotencyQueries } from "@/lib/platform/http/idempotencyQueries";
import { HttpError } from "./errors";

export const IDEMPOTENCY_HEADER = "Idempotency-Key";
/** Printable ASCII (space to tilde), 1–200 characters: a UUID fits, and so does any sane client's key. */
const KEY_FORMAT = /^[\x20-\x7e]{1,200}$/;

/** The request's Idempotency-Key, or null when it sent none; a malformed one is refused with 400. */
export function idempotencyKeyOf(req: NextRequest): string | null {
  const raw = req.headers.get(IDEMPOTENCY_HEADER);
  if (raw === null) return null;
  if (!KEY_FORMAT.test(raw)) {
    throw new HttpError(400, `The ${IDEMPOTENCY_HEADER} header must be 1 to 200 printable ASCII characters (a UUID works).`);
  }
  return raw;
}

export const bodyHash = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/**
 * Runs a create at most once per key: the key is reserved (or the stored answer replayed, or the
 * request refused) before `create` runs, and the answer stored after. Only a success (2xx) is
 * stored: a refused or failed request created nothing, so its key is freed for the retry.
 *
 * What a crash between the create's commit and the storing of its answer leaves: a reservation
 * that stays pending; a retry within a minute gets 409, after that it runs the create again. The
 * window is the time of one UPDATE, against the whole request before this existed.
 */
export async function runOnce(scope: KeyScope, hash: string, create: () => Promise<Response>): Promise<Response> {
  const claim = await idempotencyQueries.claimKey(scope, hash);
  if (claim.kind === "mismatch") throw new HttpError(422, `This ${IDEMPOTENCY_HEADER} was used for a different request.`);
  if (claim.kind === "busy")
    throw new HttpError(409, `A request with this ${IDEMPOTENCY_HEADER} is still in progress. Try again in a moment.`);
  if (claim.kind === "replay") {
    return new Response(claim.body, { status: claim.status, headers: { "Content-Type": claim.type, "Idempotent-Replayed": "true" } });
  }
  let response: Response;
  try {
    response = await create();
  } catch (error) {
    await idempotencyQueries.releaseKey(scope, claim.attempt).catch(() => undefined);
    throw error;
  }
  try {
    if (response.status >= 200 && response.status < 300) {
      const body = await response.clone().text();
      await idempotencyQueries.completeKey(scope, claim.attempt, {
        status: response.status,
        type: response.headers.get("content-type") ?? "application/json",
        body,
      });
    } else {
      await idempotencyQueries.releaseKey(scope, claim.attempt);
    }
  } catch (error) {
    // The create happened: its answer still goes out. The reservation stays pending until taken over.
    log().error({ err: { message: (error as Error).message }, route: scope.route }, "idempotency record not completed");
  }
  return response;
}
