import "server-only";
import type { Knex } from "knex";
import type { Role } from "@/lib/platform/db/types";
import { bindAppDb } from "@/lib/platform/db/bind";

/**
 * Ending sessions early. A session is a signed token the browser keeps for up to 14 days; the
 * token names its user, a session id (`sid`) and the user's `session_version` when it was made.
 * Every time the server reads a token it asks `sessionState`: a raised version (password change
 * or reset, role change, "sign out everywhere") or a revoked sid (sign-out) ends it at once.
 */
export interface SessionState {
  role: Role;
  shopId: string | null;
  name: string;
  sessionVersion: number;
  revoked: boolean;
}

/** The user's current role, shop and session version, and whether this one session was revoked; undefined for a deleted user. */
export async function sessionState(db: Knex, userId: string, sid: string | undefined): Promise<SessionState | undefined> {
  const row = await db("users")
    .where({ id: userId })
    .first<{ role: Role; shop_id: string | null; name: string; session_version: number; revoked: boolean } | undefined>(
      "role",
      "shop_id",
      "name",
      "session_version",
      sid ? db.raw("exists (select 1 from revoked_sessions r where r.sid = ?) as revoked", [sid]) : db.raw("false as revoked"),
    );
  if (!row) return undefined;
  return { role: row.role, shopId: row.shop_id, name: row.name, sessionVersion: row.session_version, revoked: row.revoked };
}

/** Ends one session (sign-out). `expiresAt` is when the token would have expired; the row is useless after that. */
export async function revokeSession(db: Knex, userId: string, sid: string, expiresAt: Date): Promise<void> {
  await db("revoked_sessions").insert({ sid, user_id: userId, expires_at: expiresAt }).onConflict("sid").ignore();
  await db("revoked_sessions").where("expires_at", "<", db.fn.now()).delete();
}

/** Ends every session of a user. Pass the transaction that changes the password or role, so both happen or neither. */
export async function endAllSessions(db: Knex, userId: string): Promise<void> {
  await db("users").where({ id: userId }).increment("session_version", 1);
}

/** These queries on the app's database handle, for pages and route handlers. */
export const sessionQueries = bindAppDb({ endAllSessions });
