import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { db } from "@/lib/db";
import type { Role } from "@/lib/db/types";
import { signInSchema } from "@/lib/validation/account";
import { findUserByEmail, findUserById } from "@/lib/server/users";
import { verifyPassword } from "./password";
import { THROTTLE, accountKey, addressKey, clearKey, lockState, recordFailure } from "./throttle";
import { clientAddress } from "./clientAddress";

/** How often a session's role and shop are re-read from PostgreSQL (seconds). */
const ROLE_REFRESH_SECONDS = 60;

const lockedMessage = (minutes: number) =>
  `Too many failed sign-ins. This account is locked for ${minutes} more minute${minutes === 1 ? "" : "s"}; ` +
  "try again later or reset your password.";

export const authOptions: NextAuthOptions = {
  secret: process.env.NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: 60 * 60 * 24 * 14 },
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
        const keys = [accountKey(email), addressKey(clientAddress(req?.headers))];

        const lock = await lockState(db, keys);
        if (lock.locked) throw new Error(lockedMessage(lock.minutesLeft));

        const user = await findUserByEmail(db, email);
        const ok = await verifyPassword(password, user?.password_hash);
        if (!ok || !user) {
          const [acct, addr] = await Promise.all([
            recordFailure(db, keys[0]!, THROTTLE.accountLimit),
            recordFailure(db, keys[1]!, THROTTLE.addressLimit),
          ]);
          if (acct.locked_until || addr.locked_until) throw new Error(lockedMessage(THROTTLE.lockMinutes));
          throw new Error("That e-mail address and password do not match an account.");
        }
        await clearKey(db, keys[0]!);
        return { id: user.id, email: user.email, name: user.name, role: user.role, shopId: user.shop_id };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      const now = Math.floor(Date.now() / 1000);
      if (user) {
        const u = user as unknown as { id: string; role: Role; shopId: string | null };
        return { ...token, uid: u.id, role: u.role, shopId: u.shopId, checkedAt: now };
      }
      // Re-read role and shop now and then, so an admin's change reaches live sessions.
      if (token.uid && (!token.checkedAt || now - token.checkedAt > ROLE_REFRESH_SECONDS)) {
        try {
          const fresh = await findUserById(db, token.uid);
          if (!fresh) return { ...token, uid: undefined, role: undefined, shopId: null, checkedAt: now };
          return { ...token, role: fresh.role, shopId: fresh.shop_id, name: fresh.name, checkedAt: now };
        } catch {
          return token; // database briefly unavailable: keep the last known role
        }
      }
      return token;
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
};
