import type { OutgoingMail } from "@/lib/platform/mail";
import { escapeHtml } from "@/lib/platform/text";

/** How long a sign-up confirmation link works (hours). */
export const SIGN_UP_TTL_HOURS = 24;

/**
 * The mail to a new address: the link that creates the account. Nothing exists until it is
 * used, so a stranger's sign-up with this address costs its owner one mail and no account.
 *
 * @example
 * signUpConfirmMail({ to: "a@example.test", name: "Ada", link: "https://…/sign-up/confirm?token=…" }).subject;
 * // "Confirm your Hubface account"
 */
export function signUpConfirmMail(m: { to: string; name: string; link: string }): OutgoingMail {
  return {
    to: m.to,
    subject: "Confirm your Hubface account",
    text:
      `Hello ${m.name},\n\nSomeone (hopefully you) signed up for Hubface with this address.\n` +
      `Open this link and confirm to create the account. It works once and expires in ${SIGN_UP_TTL_HOURS} hours:\n\n${m.link}\n\n` +
      "If you did not sign up, ignore this message: no account is made without this link.\n",
    html:
      `<p>Hello ${escapeHtml(m.name)},</p><p>Someone (hopefully you) signed up for Hubface with this address.</p>` +
      `<p><a href="${m.link}">Confirm and create the account</a> — the link works once and expires in ${SIGN_UP_TTL_HOURS} hours.</p>` +
      "<p>If you did not sign up, ignore this message: no account is made without this link.</p>",
  };
}

/**
 * The mail to an address that already has an account: someone used it on the sign-up form.
 * The form answered as for a new address; only the mailbox's owner learns the account exists.
 *
 * @example
 * signUpAttemptMail({ to: "a@example.test", name: "Ada", signInLink: "…/sign-in", resetLink: "…/forgot-password" }).subject;
 * // "Someone tried to sign up with your address"
 */
export function signUpAttemptMail(m: { to: string; name: string; signInLink: string; resetLink: string }): OutgoingMail {
  return {
    to: m.to,
    subject: "Someone tried to sign up with your address",
    text:
      `Hello ${m.name},\n\nSomeone (perhaps you) tried to create a Hubface account with this address, which already has one.\n` +
      "Nothing was changed on your account.\n\n" +
      `Sign in: ${m.signInLink}\nForgot your password? Choose a new one: ${m.resetLink}\n\n` +
      "If it was not you, you need not do anything.\n",
    html:
      `<p>Hello ${escapeHtml(m.name)},</p><p>Someone (perhaps you) tried to create a Hubface account with this address, which already has one.</p>` +
      "<p>Nothing was changed on your account.</p>" +
      `<p><a href="${m.signInLink}">Sign in</a> · <a href="${m.resetLink}">Forgot your password? Choose a new one</a></p>` +
      "<p>If it was not you, you need not do anything.</p>",
  };
}
