import "server-only";
import { randomUUID } from "node:crypto";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { db } from "@/lib/platform/db";
import type { Role } from "@/lib/platform/db/types";
import { signInSchema } from "@/lib/accounts/schema";
import { revokeSession, sessionState } from "@/lib/accounts/sessionQueries";
import { findUserByEmail } from "@/lib/accounts/queries";
import { verifyPassword } from "./password";
import { checkAttempt, clearAttempts, recordFailure, waitMessage } from "./throttle";
import { clientAddress } from "./clientAddress";

/** How long a session lasts without signing in again (seconds). */
const SESSION_MAX_AGE = 60 * 60 * 24 * 14;

export const authOptions: NextAuthOptions = {
  secret: process.env.NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  useSecureCookies: process.env.NODE_ENV === "production" && (process.env.NEXTAUTH_URL ?? "").startsWith("https://"),
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { type: "email" }, password: { type: "password" } },
      async authorize(raw, req) {
        const parsed = signInSchema.safeParse(raw);
        if (!parsed.success) throw new Error("Enter your e-mail address and password.");
        const { email, password } = parsed.data;
        const attempt = { email, address: clientAddress(req?.headers) };

        // Backoff per (address, account), never a lock anyone could put on the account (lib/platform/auth/throttle.ts).
        const gate = await checkAttempt(db, attempt);
        if (gate.waitMs > 0) throw new Error(waitMessage(gate.waitMs));
        if (gate.delayMs > 0) await new Promise((r) => setTimeout(r, gate.delayMs));

        const user = await findUserByEmail(db, email);
        const ok = await verifyPassword(password, user?.password_hash);
        if (!ok || !user) {
          const waitMs = await recordFailure(db, attempt);
          if (waitMs > 0) throw new Error(waitMessage(waitMs));
          throw new Error("That e-mail address and password do not match an account.");
        }
        await clearAttempts(db, attempt);
        return {
          id: user.id,
          email: user.email,
          name: user.name,
          role: user.role,
          shopId: user.shop_id,
          sessionVersion: user.session_version,
        };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        const u = user as unknown as { id: string; role: Role; shopId: string | null; sessionVersion: number };
        return { ...token, uid: u.id, role: u.role, shopId: u.shopId, sid: randomUUID(), sv: u.sessionVersion };
      }
      if (!token.uid) return token;
      // Every read of a session asks PostgreSQL (one primary-key lookup): a role change reaches
      // the next request, and a sign-out, password change or reset, or "sign out everywhere"
      // ends the session at once, even where someone kept a copy of the cookie.
      let state;
      try {
        state = await sessionState(db, token.uid, token.sid);
      } catch {
        return token; // database briefly unavailable: keep the last known role (the request itself will get a 503)
      }
      if (!state || state.revoked || state.sessionVersion !== (token.sv ?? 0)) {
        return { ...token, uid: undefined, role: undefined, shopId: null, sid: undefined, sv: undefined };
      }
      return { ...token, role: state.role, shopId: state.shopId, name: state.name };
    },
    async session({ session, token }) {
      if (!token.uid) return { ...session, user: undefined } as unknown as typeof session;
      session.user = {
        ...session.user,
        id: token.uid,
        role: token.role!,
        shopId: token.shopId ?? null,
      };
      return session;
    },
  },
  events: {
    // Signing out deletes the cookie in this browser; revoking the session id also ends any copy of it.
    async signOut({ token }) {
      if (!token?.uid || !token.sid) return;
      const exp = typeof token.exp === "number" ? new Date(token.exp * 1000) : new Date(Date.now() + SESSION_MAX_AGE * 1000);
      await revokeSession(db, token.uid, token.sid, exp).catch((e: unknown) =>
        console.error("could not revoke a session at sign-out:", (e as Error).message),
      );
    },
  },
};
