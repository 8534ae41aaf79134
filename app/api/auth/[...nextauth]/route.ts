import NextAuth from "next-auth";
import { type NextRequest, NextResponse } from "next/server";
import { authOptions } from "@/lib/platform/auth/options";

const handler = NextAuth(authOptions);

type Ctx = { params: Promise<{ nextauth: string[] }> };

/**
 * next-auth answers a GET of the credentials callback (which only takes the sign-in form's POST)
 * with an unhandled 500; a person or a crawler following such a link gets a plain 405 instead.
 */
export async function GET(req: NextRequest, ctx: Ctx) {
  const { nextauth } = await ctx.params;
  if (nextauth[0] === "callback" && nextauth[1] === "credentials") {
    return NextResponse.json({ error: "Sign in through the sign-in form." }, { status: 405, headers: { Allow: "POST" } });
  }
  return handler(req, ctx);
}

export { handler as POST };
