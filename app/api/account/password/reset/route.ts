import { db } from "@/lib/db";
import { hashPassword } from "@/lib/auth/password";
import { clientAddress } from "@/lib/auth/clientAddress";
import { clearAttempts } from "@/lib/auth/throttle";
import { HttpError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { consumeResetToken } from "@/lib/server/passwordResets";
import { findUserById, setPassword } from "@/lib/server/users";
import { resetPasswordSchema } from "@/lib/validation/account";

export const POST = route({ access: "public", body: resetPasswordSchema }, async ({ req, body }) => {
  const hash = await hashPassword(body.password);
  const email = await db.transaction(async (trx) => {
    const userId = await consumeResetToken(db, body.token, trx);
    if (!userId) return null;
    await setPassword(trx, userId, hash);
    return (await findUserById(trx, userId))?.email ?? null;
  });
  if (!email) {
    throw new HttpError(422, "This reset link has expired or was already used. Ask for a new one.", {
      token: ["This reset link has expired or was already used."],
    });
  }
  // A reset proves the mailbox: the wait on this address for this account ends.
  await clearAttempts(db, { email, address: clientAddress(req.headers) });
  return { message: "Your password was changed. Sign in with the new one." };
});
