import type { Role } from "@/lib/platform/db/types";
import "next-auth";
import "next-auth/jwt";

declare module "next-auth" {
  interface Session {
    user?: { id: string; role: Role; shopId: string | null; name?: string | null; email?: string | null };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid?: string;
    role?: Role;
    shopId?: string | null;
    /** This session's id: sign-out revokes it (lib/accounts/sessionQueries.ts). */
    sid?: string;
    /** The user's session_version when the session was made: a raised version ends it. */
    sv?: number;
  }
}
