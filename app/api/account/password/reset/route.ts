import { hashPassword } from "@/lib/auth/password";
import { accountKey } from "@/lib/auth/throttle";
import { throttleQueries } from "@/lib/auth/throttleQueries";
import { HttpError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { passwordResetQueries } from "@/lib/server/passwordResets";
import { resetPasswordSchema } from "@/lib/validation/account";

export const POST = route({ access: "public", body: resetPasswordSchema }, async ({ body }) => {
  const hash = await hashPassword(body.password);
  const email = await passwordResetQueries.resetPassword(body.token, hash);
  if (!email) {
    throw new HttpError(422, "This reset link has expired or was already used. Ask for a new one.", {
      token: ["This reset link has expired or was already used."],
    });
  }
  await throttleQueries.clearKey(accountKey(email)); // a reset lifts a lock-out on the account
  return { message: "Your password was changed. Sign in with the new one." };
});
