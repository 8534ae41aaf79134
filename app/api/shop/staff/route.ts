import { InvalidError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { appOrigin, queueMail } from "@/lib/platform/mail";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { INVITE_TTL_HOURS, SHOP_OWNER, shopIdOf, shopQueries } from "@/lib/shop/queries";
import { staffInviteSchema } from "@/lib/shop/schema";
import { escapeHtml } from "@/lib/platform/text";

export const GET = route({ access: SHOP_OWNER }, async ({ caller }) => shopQueries.staffData(shopIdOf(caller)));

export const POST = route({ access: SHOP_OWNER, body: staffInviteSchema, idempotent: true }, async ({ caller, body }) => {
  const shopId = shopIdOf(caller);
  // Each invitation mails someone outside the shop: a cap keeps a taken-over account from spamming.
  await rateLimitQueries.consumeOrRefuse([{ spec: RATE_LIMITS.staffInvites, key: shopId }], "Too many invitations sent from this shop.");
  const team = await shopQueries.listTeam(shopId);
  if (team.some((m) => m.email.toLowerCase() === body.email.toLowerCase())) {
    throw InvalidError.fields({ email: ["This person is already on your team."] });
  }
  const shop = await shopQueries.findShop(shopId);
  const { token, invite } = await shopQueries.createInvite(shopId, body.email, caller.userId);
  const link = `${appOrigin()}/join/${token}`;
  const shopName = shop?.name ?? "a shop";
  await queueMail({
    to: body.email,
    subject: `${caller.name} invites you to ${shopName} on Hubface`,
    text:
      `Hello,\n\n${caller.name} invites you to work the counter of ${shopName} on Hubface.\n` +
      `Open this link to join. It works once and expires in ${INVITE_TTL_HOURS} hours:\n\n${link}\n\n` +
      "If you did not expect this, ignore this message.\n",
    html:
      `<p>Hello,</p><p>${escapeHtml(caller.name)} invites you to work the counter of ${escapeHtml(shopName)} on Hubface.</p>` +
      `<p><a href="${link}">Join ${escapeHtml(shopName)}</a> — the link works once and expires in ${INVITE_TTL_HOURS} hours.</p>` +
      "<p>If you did not expect this, ignore this message.</p>",
  });
  return Response.json({ invite }, { status: 201 });
});
