import { hashPassword } from "@/lib/platform/auth/password";
import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { throttleQueries } from "@/lib/platform/auth/throttleQueries";
import { route } from "@/lib/platform/http/route";
import { passwordResetQueries } from "@/lib/accounts/passwordResetQueries";
import { resetPasswordSchema } from "@/lib/accounts/schema";

export const POST = route({ access: "public", body: resetPasswordSchema }, async ({ req, body }) => {
  const hash = await hashPassword(body.password);
  // An expired or used link is an InvalidError on `token` (422) from the query.
  const email = await passwordResetQueries.resetPassword(body.token, hash);
  // A reset proves the mailbox: the wait on this address for this account ends.
  await throttleQueries.clearAttempts({ email, address: clientAddress(req.headers) });
  return { message: "Your password was changed. Sign in with the new one." };
});
