import { db } from "@/lib/db";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { HttpError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { findOpenInvite } from "@/lib/server/shops";
import { passwordField } from "@/lib/validation/account";
import { joinShopSchema } from "@/lib/validation/shop";

const gone = () => new HttpError(410, "This invitation has expired, was withdrawn or was already used. Ask the shop for a new one.");

/**
 * Accepts a staff invitation: the token is consumed in the same transaction that creates the
 * account (or attaches the existing member account after its password is checked).
 */
export const POST = route({ access: "public", body: joinShopSchema }, async ({ body }) => {
  const result = await db.transaction(async (trx) => {
    const invite = await findOpenInvite(trx, body.token, true);
    if (!invite) throw gone();
    const existing = await trx("users").whereRaw("lower(email) = lower(?)", [invite.email]).first("id", "role", "shop_id", "password_hash");
    let userId: string;
    if (existing) {
      if (!(await verifyPassword(body.password, existing.password_hash))) {
        throw new HttpError(422, "Some fields need attention.", { password: ["This address already has a Hubface account: enter its password."] });
      }
      if (existing.role !== "member") {
        throw new HttpError(409, "This account already belongs to a shop or is an admin account; it cannot join another shop.");
      }
      await trx("users").where({ id: existing.id }).update({ role: "shop_staff", shop_id: invite.shop_id, updated_at: trx.fn.now() });
      userId = existing.id;
    } else {
      const pw = passwordField.safeParse(body.password);
      const fieldErrors: Record<string, string[]> = {};
      if (!body.name) fieldErrors.name = ["Enter your name."];
      if (!pw.success) fieldErrors.password = [pw.error.issues[0]?.message ?? "Choose a longer password."];
      if (Object.keys(fieldErrors).length) throw new HttpError(422, "Some fields need attention.", fieldErrors);
      const [row] = await trx("users")
        .insert({ email: invite.email, name: body.name, password_hash: await hashPassword(body.password), role: "shop_staff", shop_id: invite.shop_id })
        .returning(["id"]);
      userId = (row as { id: string }).id;
    }
    await trx("staff_invites").where({ id: invite.id }).update({ used_at: trx.fn.now() });
    return { userId, email: invite.email, shopName: invite.shop_name, created: !existing };
  });
  return Response.json(result, { status: 200 });
});
