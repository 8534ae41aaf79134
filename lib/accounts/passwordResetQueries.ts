import "server-only";
import type { Knex } from "knex";
import type { PasswordResetRow } from "@/lib/platform/db/types";
import { findUserById, setPassword } from "./queries";
import { bindAppDb } from "@/lib/platform/db/bind";
import { InvalidError } from "@/lib/platform/errors";
import { hashToken, randomToken } from "@/lib/platform/tokens";

export const RESET_TTL_MINUTES = 30;

/** A new single-use token (256 bits, URL-safe). Earlier unused tokens of the user are voided. */
export async function issueResetToken(db: Knex, userId: string): Promise<string> {
  const token = randomToken();
  await db.transaction(async (trx) => {
    await trx("password_resets").where({ user_id: userId }).whereNull("used_at").update({ used_at: trx.fn.now() });
    await trx("password_resets").insert({
      user_id: userId,
      token_hash: hashToken(token),
      expires_at: trx.raw("now() + make_interval(mins => ?)", [RESET_TTL_MINUTES]),
    });
  });
  return token;
}

/**
 * Marks the token used and returns its user id, or null when the token is unknown, used or
 * expired. The update is the check, so two simultaneous uses cannot both succeed.
 */
export async function consumeResetToken(db: Knex, token: string, trx?: Knex.Transaction): Promise<string | null> {
  const [row] = (await (trx ?? db)("password_resets")
    .where({ token_hash: hashToken(token) })
    .whereNull("used_at")
    .andWhere("expires_at", ">", db.fn.now())
    .update({ used_at: db.fn.now() })
    .returning(["user_id"])) as Pick<PasswordResetRow, "user_id">[];
  return row?.user_id ?? null;
}

/**
 * Uses a reset token and sets the new password hash in one transaction. Returns the account's
 * e-mail address; an unknown, used or expired token is an InvalidError on `token` (nothing is
 * changed then).
 */
export async function resetPassword(db: Knex, token: string, passwordHash: string): Promise<string> {
  const email = await db.transaction(async (trx) => {
    const userId = await consumeResetToken(db, token, trx);
    if (!userId) return null;
    await setPassword(trx, userId, passwordHash);
    return (await findUserById(trx, userId))?.email ?? null;
  });
  if (!email)
    throw new InvalidError("This reset link has expired or was already used. Ask for a new one.", {
      token: ["This reset link has expired or was already used."],
    });
  return email;
}

/** These queries on the app's database handle, for pages and route handlers. */
export const passwordResetQueries = bindAppDb({ issueResetToken, resetPassword });
