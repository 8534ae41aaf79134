import "server-only";
import type { Knex } from "knex";
import type { PendingSignUpRow, PublicUser } from "@/lib/platform/db/types";
import { verifyPassword } from "@/lib/platform/auth/password";
import { bindAppDb } from "@/lib/platform/db/bind";
import { ConflictError, InvalidError, SOME_FIELDS } from "@/lib/platform/errors";
import { appOrigin } from "@/lib/platform/mail";
import { queueMailIn } from "@/lib/platform/mail/transactional";
import { hashToken, randomToken } from "@/lib/platform/tokens";
import { DuplicateEmailError, createUser, findUserByEmail } from "./queries";
import { SIGN_UP_TTL_HOURS, signUpAttemptMail, signUpConfirmMail } from "./signUpMails";

/** The words for a confirmation link that cannot be used (unknown, used, expired or replaced). */
export const SIGN_UP_LINK_GONE = "This sign-up link has expired, was already used or was replaced by a newer one.";

/**
 * A sign-up: for a new address, stores it as pending (replacing an earlier pending sign-up of
 * the address, whose link then stops working) and queues the confirmation mail; for an address
 * with an account, changes nothing and queues a mail telling its owner. The mail job is written
 * in the same transaction as the row, so there is never a pending row without its mail or a
 * mail whose link is not stored. Both paths read the users table and write one job; the caller
 * hashes the password on both, so the answer takes about as long either way.
 */
export async function startSignUp(db: Knex, input: { email: string; name: string; passwordHash: string }): Promise<void> {
  const email = input.email.trim();
  await db.transaction(async (trx) => {
    // Expired sign-ups are of no use to anyone and hold a password hash: cleared on every sign-up.
    await trx("pending_sign_ups").where("expires_at", "<=", trx.fn.now()).del();
    const user = await findUserByEmail(trx, email);
    if (user) {
      const origin = appOrigin();
      await queueMailIn(
        trx,
        signUpAttemptMail({ to: user.email, name: user.name, signInLink: `${origin}/sign-in`, resetLink: `${origin}/forgot-password` }),
      );
      return;
    }
    const token = randomToken();
    // One pending sign-up per address (unique on lower(email)): a second one takes the place of the first.
    await trx.raw(
      `insert into pending_sign_ups (email, name, password_hash, token_hash, expires_at)
       values (?, ?, ?, ?, now() + make_interval(hours => ?))
       on conflict ((lower(email))) do update set
         email = excluded.email, name = excluded.name, password_hash = excluded.password_hash,
         token_hash = excluded.token_hash, created_at = now(), expires_at = excluded.expires_at`,
      [email, input.name.trim(), input.passwordHash, hashToken(token), SIGN_UP_TTL_HOURS],
    );
    await queueMailIn(
      trx,
      signUpConfirmMail({ to: email, name: input.name.trim(), link: `${appOrigin()}/sign-up/confirm?token=${token}` }),
    );
  });
}

/** The pending sign-up a link names, while it can still be used; reading it uses nothing up. */
export async function findPendingSignUp(db: Knex, token: string): Promise<Pick<PendingSignUpRow, "email" | "name"> | undefined> {
  return db<PendingSignUpRow>("pending_sign_ups")
    .select("email", "name")
    .where({ token_hash: hashToken(token) })
    .andWhere("expires_at", ">", db.fn.now())
    .first();
}

const linkGone = () => new InvalidError(SIGN_UP_LINK_GONE, { token: [SIGN_UP_LINK_GONE] });

/**
 * Creates the account a confirmation link stands for, once. `password` must be the one chosen
 * at sign-up: whoever holds the link also proves they chose it, so a stranger who signed up
 * with someone else's address cannot have the owner confirm an account the stranger can open.
 *
 * The pending row is deleted and the user inserted in one transaction; the delete is the
 * check, so of two confirms at once only one finds the row. An account made for the address
 * meanwhile (a staff invitation, an admin) wins: the pending row goes, no second account is
 * made, and the answer is a ConflictError saying so. An unknown, used, replaced or expired
 * link is an InvalidError on `token`; a wrong password one on `password` (nothing changes).
 */
export async function confirmSignUp(db: Knex, token: string, password: string): Promise<PublicUser> {
  const tokenHash = hashToken(token);
  const pending = await db<PendingSignUpRow>("pending_sign_ups")
    .where({ token_hash: tokenHash })
    .andWhere("expires_at", ">", db.fn.now())
    .first();
  if (!pending) throw linkGone();
  if (!(await verifyPassword(password, pending.password_hash)))
    throw new InvalidError(SOME_FIELDS, { password: ["That is not the password you chose when signing up."] });

  const outcome = await db.transaction(async (trx) => {
    const [row] = (await trx("pending_sign_ups")
      .where({ token_hash: tokenHash })
      .andWhere("expires_at", ">", trx.fn.now())
      .del()
      .returning(["email", "name", "password_hash"])) as Pick<PendingSignUpRow, "email" | "name" | "password_hash">[];
    if (!row) return "gone" as const;
    try {
      // A savepoint: a duplicate address undoes only the insert, and the pending row's delete still commits.
      return await trx.transaction((sp) => createUser(sp, { email: row.email, name: row.name, passwordHash: row.password_hash }));
    } catch (e) {
      if (e instanceof DuplicateEmailError) return "taken" as const;
      throw e;
    }
  });
  if (outcome === "gone") throw linkGone();
  if (outcome === "taken")
    throw new ConflictError("This address already has a Hubface account, so no second one was made. Sign in, or reset its password.");
  return outcome;
}

/** These queries on the app's database handle, for pages and route handlers. */
export const signUpQueries = bindAppDb({ startSignUp, findPendingSignUp, confirmSignUp });
