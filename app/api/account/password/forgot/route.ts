import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { route } from "@/lib/platform/http/route";
import { appOrigin, queueMail } from "@/lib/platform/mail";
import { afterResponse } from "@/lib/platform/http/afterResponse";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { RESET_TTL_MINUTES, passwordResetQueries } from "@/lib/accounts/passwordResetQueries";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { withinAccountMailLimits } from "@/lib/accounts/mailLimits";
import { userQueries } from "@/lib/accounts/queries";
import { forgotPasswordSchema } from "@/lib/accounts/schema";
import { escapeHtml } from "@/lib/platform/text";

const ANSWER = {
  message: "If an account uses that address, a reset link is on its way. It works once and expires in 30 minutes.",
};

/**
 * Same answer, in the same time, whether or not the address has an account: the answer goes
 * out before the account is looked up; the lookup, the per-account mail limits and the mail
 * run after it (lib/platform/http/afterResponse.ts). Only the per-address limit answers 429, and it
 * counts every request alike, so it tells nothing about accounts either.
 */
export const POST = route({ access: "public", body: forgotPasswordSchema }, async ({ req, body }) => {
  await rateLimitQueries.consumeOrRefuse(
    [{ spec: RATE_LIMITS.forgotPerAddress, key: clientAddress(req.headers) }],
    "Too many reset requests from your network.",
  );
  const email = body.email.trim().toLowerCase();
  afterResponse("password reset mail", () => mailResetLink(email));
  return ANSWER;
});

/** At most one account mail per address every 2 minutes and 5 a day (a flood would bury the real one). */
async function mailResetLink(email: string): Promise<void> {
  if (!(await withinAccountMailLimits("reset", email))) return;
  const user = await userQueries.findUserByEmail(email);
  if (!user) return;
  const token = await passwordResetQueries.issueResetToken(user.id);
  const link = `${appOrigin()}/reset-password?token=${token}`;
  await queueMail({
    to: user.email,
    subject: "Reset your Hubface password",
    text:
      `Hello ${user.name},\n\nSomeone (hopefully you) asked to reset the password of your Hubface account.\n` +
      `Open this link to choose a new one. It works once and expires in ${RESET_TTL_MINUTES} minutes:\n\n${link}\n\n` +
      "If you did not ask for this, ignore this message; your password stays as it is.\n",
    html:
      `<p>Hello ${escapeHtml(user.name)},</p><p>Someone (hopefully you) asked to reset the password of your Hubface account.</p>` +
      `<p><a href="${link}">Choose a new password</a> — the link works once and expires in ${RESET_TTL_MINUTES} minutes.</p>` +
      "<p>If you did not ask for this, ignore this message; your password stays as it is.</p>",
  });
}
