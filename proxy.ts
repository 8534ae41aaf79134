import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";

/**
 * Coarse path gating only: sends anonymous visitors of signed-in areas to sign-in early.
 * Every page, route handler and server action checks session and role again on the server.
 */
const SIGNED_IN_PREFIXES = ["/account", "/shop", "/admin"];

export async function proxy(req: NextRequest) {
  const { pathname, search } = req.nextUrl;
  if (!SIGNED_IN_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`))) return NextResponse.next();
  const token = await getToken({ req, secret: process.env.NEXTAUTH_SECRET }).catch(() => null);
  if (token?.uid) return NextResponse.next();
  const url = req.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?callbackUrl=${encodeURIComponent(pathname + search)}`;
  return NextResponse.redirect(url);
}

export const config = { matcher: ["/account/:path*", "/shop/:path*", "/admin/:path*"] };
