import type { NextRequest } from "next/server";
import { hasSessionCookie } from "@/lib/platform/auth/sessionCookie";
import { HttpError } from "./errors";

/** Methods that change state; only these are checked (GET and HEAD must stay side-effect free). */
const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

function originOf(url: string | undefined): string | null {
  if (!url) return null;
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
}

/** The origins the app is served from: APP_ORIGIN and NEXTAUTH_URL (either may be unset). */
export function configuredOrigins(): string[] {
  return [process.env.APP_ORIGIN, process.env.NEXTAUTH_URL].map(originOf).filter((o): o is string => o !== null);
}

/**
 * Cross-site request check for state-changing requests (OWASP CSRF cheat sheet, "verifying
 * origin with standard headers"). Browsers send `Origin` on every cross-origin request and on
 * same-origin POST/PUT/PATCH/DELETE; a page elsewhere cannot forge or remove it.
 *
 * - `Origin` present: it must be APP_ORIGIN, NEXTAUTH_URL, or the request's own host (a server
 *   reached by another name than the configured one, e.g. 127.0.0.1 vs localhost in
 *   development). `Origin: null` (sandboxed frames, opaque redirects) is foreign.
 * - `Origin` missing: a browser also says where the request came from in `Sec-Fetch-Site`;
 *   anything but same-origin or a typed address ("none") is refused. Without either header the
 *   caller is not a current browser (curl, the payment provider's webhook, a script): allowed
 *   only when it carries no session cookie, so it acts with no ambient authority — whatever it
 *   may do, it could do from its own machine anyway. A request with a session cookie and no
 *   Origin is refused: an old browser that omits the header must be updated to act signed in.
 *
 * Throws HttpError 403; returns nothing when the request may go on.
 */
export function assertSameOrigin(req: NextRequest): void {
  if (!STATE_CHANGING.has(req.method)) return;
  const origin = req.headers.get("origin");
  if (origin !== null) {
    const allowed = new Set(configuredOrigins());
    const host = req.headers.get("host");
    const parsed = originOf(origin);
    if (parsed && allowed.has(parsed)) return;
    if (parsed && host && new URL(parsed).host === host.toLowerCase()) return;
    throw new HttpError(403, "This request came from another site and was refused. Open Hubface directly and try again.");
  }
  const fetchSite = req.headers.get("sec-fetch-site");
  if (fetchSite !== null && fetchSite !== "same-origin" && fetchSite !== "none") {
    throw new HttpError(403, "This request came from another site and was refused. Open Hubface directly and try again.");
  }
  if (hasSessionCookie(req.headers.get("cookie")) && fetchSite === null) {
    throw new HttpError(403, "Your browser did not say which site sent this request, so it was refused. Update the browser and try again.");
  }
}
