import { route } from "@/lib/http/route";
import { appOrigin, sendMail } from "@/lib/mail";
import { passwordResetQueries, RESET_TTL_MINUTES } from "@/lib/server/passwordResets";
import { userQueries } from "@/lib/server/users";
import { forgotPasswordSchema } from "@/lib/validation/account";

const ANSWER = {
  message: "If an account uses that address, a reset link is on its way. It works once and expires in 30 minutes.",
};

export const POST = route({ access: "public", body: forgotPasswordSchema }, async ({ body }) => {
  const user = await userQueries.findUserByEmail(body.email);
  // Same answer either way: the form must not reveal which addresses have accounts.
  if (!user) return ANSWER;
  const token = await passwordResetQueries.issueResetToken(user.id);
  const link = `${appOrigin()}/reset-password?token=${token}`;
  await sendMail({
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
  return ANSWER;
});

function escapeHtml(s: string) {
  return s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}
