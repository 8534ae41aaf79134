import "server-only";
import type { Knex } from "knex";
import type { ShopSettingsRow } from "@/lib/platform/db/types";
import { type StaffData, type StaffInvite, type TeamMember, staffInviteDto } from "@/lib/shop/api";
import { shopTimeZone } from "@/lib/shop/bookings/timeZoneQueries";
import { hashPassword, verifyPassword } from "@/lib/platform/auth/password";
import { ConflictError, GoneError, InvalidError, NotFoundError } from "@/lib/platform/errors";
import { passwordField } from "@/lib/accounts/schema";
import type { ShopSettings } from "@/lib/shop/schema";
import { bindAppDb } from "@/lib/platform/db/bind";
import { hashToken, randomToken } from "@/lib/platform/tokens";

export const INVITE_TTL_HOURS = 72;

const SHOP_NOT_FOUND = "Your shop";

export async function findShop(db: Knex, shopId: string): Promise<ShopSettingsRow | undefined> {
  return db<ShopSettingsRow>("shops").where({ id: shopId }).first();
}

/** The shop with its settings; NotFoundError when there is no such shop. */
export async function getShop(db: Knex, shopId: string): Promise<ShopSettingsRow> {
  const shop = await findShop(db, shopId);
  if (!shop) throw new NotFoundError(SHOP_NOT_FOUND);
  return shop;
}

export async function updateShopSettings(db: Knex, shopId: string, s: ShopSettings): Promise<ShopSettingsRow> {
  const [row] = await db<ShopSettingsRow>("shops")
    .where({ id: shopId })
    .update({
      name: s.name,
      address: s.address,
      phone: s.phone,
      tax_rate_bp: s.taxRate,
      labour_rate_cents: s.labourRate,
      fabrication_rate_cents: s.fabricationRate,
      quote_validity_days: s.quoteValidityDays,
      deposit_pct: s.depositPct,
      currency: s.currency,
      notice_email: s.noticeEmail,
      updated_at: db.fn.now() as unknown as Date,
    })
    .returning("*");
  if (!row) throw new NotFoundError(SHOP_NOT_FOUND);
  return row;
}

export async function listTeam(db: Knex, shopId: string): Promise<TeamMember[]> {
  return db("users")
    .where({ shop_id: shopId })
    .orderBy([{ column: "role", order: "desc" }, { column: "name" }])
    .select("id", "name", "email", "role");
}

/** Invitations still usable (not used, revoked or expired). */
export async function listOpenInvites(db: Knex, shopId: string): Promise<StaffInvite[]> {
  const rows = await db("staff_invites")
    .where({ shop_id: shopId })
    .whereNull("used_at")
    .whereNull("revoked_at")
    .andWhere("expires_at", ">", db.fn.now())
    .orderBy("created_at", "desc")
    .select("id", "email", "expires_at", "created_at");
  return rows.map(staffInviteDto);
}

/** The staff page's data: the team, the open invitations and the shop's zone to date them in. */
export async function staffData(db: Knex, shopId: string): Promise<StaffData> {
  const [team, invites, timeZone] = await Promise.all([listTeam(db, shopId), listOpenInvites(db, shopId), shopTimeZone(db, shopId)]);
  return { team, invites, timeZone };
}

/** A new single-use invitation (256-bit URL-safe token; only its hash is kept). */
export async function createInvite(
  db: Knex,
  shopId: string,
  email: string,
  invitedBy: string,
): Promise<{ token: string; invite: StaffInvite }> {
  const token = randomToken();
  const invite = await db.transaction(async (trx) => {
    // One open invitation per address: a new one replaces the old link.
    await trx("staff_invites")
      .where({ shop_id: shopId })
      .whereRaw("lower(email) = lower(?)", [email])
      .whereNull("used_at")
      .whereNull("revoked_at")
      .update({ revoked_at: trx.fn.now() });
    const [row] = await trx("staff_invites")
      .insert({
        shop_id: shopId,
        email: email.trim(),
        token_hash: hashToken(token),
        invited_by: invitedBy,
        expires_at: trx.raw("now() + make_interval(hours => ?)", [INVITE_TTL_HOURS]),
      })
      .returning(["id", "email", "expires_at", "created_at"]);
    return staffInviteDto(row);
  });
  return { token, invite };
}

/** Withdraws an open invitation of the shop; NotFoundError when there is none open by that id. */
export async function revokeInvite(db: Knex, shopId: string, id: string): Promise<void> {
  const n = await db("staff_invites")
    .where({ id, shop_id: shopId })
    .whereNull("used_at")
    .whereNull("revoked_at")
    .update({ revoked_at: db.fn.now() });
  if (n === 0) throw new NotFoundError("That invitation");
}

/** An open invitation by its token, with the shop's name; locked when a transaction is given. */
export async function findOpenInvite(db: Knex | Knex.Transaction, token: string, lock = false) {
  const q = db("staff_invites as i")
    .join("shops as s", "s.id", "i.shop_id")
    .where("i.token_hash", hashToken(token))
    .whereNull("i.used_at")
    .whereNull("i.revoked_at")
    .andWhere("i.expires_at", ">", db.fn.now())
    .first("i.id", "i.shop_id", "i.email", "i.expires_at", "s.name as shop_name");
  if (lock) q.forUpdate("i");
  return (await q) as { id: string; shop_id: string; email: string; expires_at: Date; shop_name: string } | undefined;
}

const inviteGone = () => new GoneError("This invitation has expired, was withdrawn or was already used. Ask the shop for a new one.");

/**
 * Accepts a staff invitation: the token is consumed in the same transaction that creates the
 * account (or attaches the existing member account after its password is checked).
 */
export async function acceptInvite(db: Knex, input: { token: string; name?: string; password: string }) {
  return db.transaction(async (trx) => {
    const invite = await findOpenInvite(trx, input.token, true);
    if (!invite) throw inviteGone();
    const existing = await trx("users").whereRaw("lower(email) = lower(?)", [invite.email]).first("id", "role", "shop_id", "password_hash");
    let userId: string;
    if (existing) {
      if (!(await verifyPassword(input.password, existing.password_hash))) {
        throw InvalidError.fields({ password: ["This address already has a Hubface account: enter its password."] });
      }
      if (existing.role !== "member") {
        throw new ConflictError("This account already belongs to a shop or is an admin account; it cannot join another shop.");
      }
      await trx("users").where({ id: existing.id }).update({ role: "shop_staff", shop_id: invite.shop_id, updated_at: trx.fn.now() });
      userId = existing.id;
    } else {
      const pw = passwordField.safeParse(input.password);
      const fieldErrors: Record<string, string[]> = {};
      if (!input.name) fieldErrors.name = ["Enter your name."];
      if (!pw.success) fieldErrors.password = [pw.error.issues[0]?.message ?? "Choose a longer password."];
      if (Object.keys(fieldErrors).length) throw InvalidError.fields(fieldErrors);
      const [row] = await trx("users")
        .insert({
          email: invite.email,
          name: input.name,
          password_hash: await hashPassword(input.password),
          role: "shop_staff",
          shop_id: invite.shop_id,
        })
        .returning(["id"]);
      userId = (row as { id: string }).id;
    }
    await trx("staff_invites").where({ id: invite.id }).update({ used_at: trx.fn.now() });
    return { userId, email: invite.email, shopName: invite.shop_name, created: !existing };
  });
}

/**
 * Takes a staff member out of the shop: the account stays, as a member. Owners cannot be
 * removed here. NotFoundError when no such staff member is in this shop.
 */
export async function removeStaff(db: Knex, shopId: string, userId: string): Promise<void> {
  const n = await db("users")
    .where({ id: userId, shop_id: shopId, role: "shop_staff" })
    .update({ role: "member", shop_id: null, updated_at: db.fn.now() });
  if (n === 0) throw new NotFoundError("That staff member");
}

/** The shop every query of a shop route is scoped by (requireCaller already refused a shop role without one). */
export function shopIdOf(caller: { shopId: string | null }): string {
  if (!caller.shopId) throw new Error("shop route reached without a shop id");
  return caller.shopId;
}

export const SHOP_ANY = ["shop_staff", "shop_owner"] as const;
export const SHOP_OWNER = ["shop_owner"] as const;

/** These queries on the app's database handle, for pages and route handlers. */
export const shopQueries = bindAppDb({
  acceptInvite,
  createInvite,
  findOpenInvite,
  findShop,
  getShop,
  listOpenInvites,
  listTeam,
  removeStaff,
  revokeInvite,
  staffData,
  updateShopSettings,
});
