import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { SESSION_COOKIE_NAME } from "@/lib/platform/auth/sessionCookie";

/**
 * Coarse path gating only: sends anonymous visitors of signed-in areas to sign-in early.
 * Every page, route handler and server action checks session and role again on the server.
 * And one shortcut: a visitor's bare /workspace is the prerendered page (see {@link visitorWorkspace}).
 */
const SIGNED_IN_PREFIXES = ["/account", "/shop", "/admin"];

/** The prerendered workspace of a visitor (app/(tools)/workspace/visitor). */
export const VISITOR_WORKSPACE = "/workspace/visitor";

/**
 * A visitor's bare /workspace (no session cookie, nothing in the query) is the same page for
 * everyone: it is served prerendered instead of rendered for each request. The address bar keeps
 * /workspace. A session cookie, even a stale one, or any query (a comparison in the link, a
 * saved comparison, a vehicle) goes to the page rendered for the request, which reads them.
 */
export function visitorWorkspace(req: NextRequest): URL | null {
  if (req.nextUrl.pathname !== "/workspace" || req.nextUrl.search !== "") return null;
  if (req.cookies.getAll().some((c) => SESSION_COOKIE_NAME.test(c.name))) return null;
  const url = req.nextUrl.clone();
  url.pathname = VISITOR_WORKSPACE;
  return url;
}

export async function proxy(req: NextRequest) {
  const visitor = visitorWorkspace(req);
  if (visitor) return NextResponse.rewrite(visitor);
  const { pathname, search } = req.nextUrl;
  if (!SIGNED_IN_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`))) return NextResponse.next();
  const token = await getToken({ req, secret: process.env.NEXTAUTH_SECRET }).catch(() => null);
  if (token?.uid) return NextResponse.next();
  const url = req.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?callbackUrl=${encodeURIComponent(pathname + search)}`;
  return NextResponse.redirect(url);
}

export const config = { matcher: ["/account/:path*", "/shop/:path*", "/admin/:path*", "/workspace"] };
