import "server-only";
import type { Knex } from "knex";
import type { PublicUser, Role, UserRow } from "@/lib/platform/db/types";
import { bindAppDb } from "@/lib/platform/db/bind";
import { containsPattern } from "@/lib/platform/search/normalize";
import { type AdminUser, adminUserDto } from "@/lib/accounts/api";
import { InvalidError, NotFoundError, SOME_FIELDS } from "@/lib/platform/errors";

const PUBLIC_COLUMNS = ["id", "email", "name", "role", "shop_id", "created_at", "updated_at"] as const;

export async function findUserByEmail(db: Knex, email: string): Promise<UserRow | undefined> {
  return db<UserRow>("users").whereRaw("lower(email) = lower(?)", [email.trim()]).first();
}

export async function findUserById(db: Knex, id: string): Promise<PublicUser | undefined> {
  return (await db<UserRow>("users")
    .select([...PUBLIC_COLUMNS])
    .where({ id })
    .first()) as PublicUser | undefined;
}

/** The address is taken: a field error on `email`, as the sign-up form shows it. */
export class DuplicateEmailError extends InvalidError {
  constructor() {
    super(SOME_FIELDS, { email: ["An account with this e-mail address already exists."] });
  }
}

export async function createUser(
  db: Knex,
  input: { email: string; name: string; passwordHash: string; role?: Role; shopId?: string | null },
): Promise<PublicUser> {
  try {
    const [row] = await db<UserRow>("users")
      .insert({
        email: input.email.trim(),
        name: input.name.trim(),
        password_hash: input.passwordHash,
        role: input.role ?? "member",
        shop_id: input.shopId ?? null,
      })
      .returning(PUBLIC_COLUMNS);
    return row as PublicUser;
  } catch (e) {
    if ((e as { code?: string }).code === "23505") throw new DuplicateEmailError();
    throw e;
  }
}

/** Every account (or those whose e-mail or name matches), with its shop's name, oldest first. */
export async function listUsers(db: Knex, opts: { search?: string; limit?: number; offset?: number } = {}): Promise<AdminUser[]> {
  const q = db("users as u")
    .leftJoin("shops as s", "s.id", "u.shop_id")
    .select("u.id", "u.email", "u.name", "u.role", "u.shop_id", "u.created_at", "u.updated_at", "s.name as shop_name")
    .orderBy("u.created_at", "asc");
  if (opts.search) {
    const like = containsPattern(opts.search);
    q.where((w) => w.whereILike("u.email", like).orWhereILike("u.name", like));
  }
  return ((await q.limit(opts.limit ?? 200).offset(opts.offset ?? 0)) as (PublicUser & { shop_name: string | null })[]).map(adminUserDto);
}

/** Sets the role (and shop); NotFoundError when there is no such user. */
export async function setUserRole(db: Knex, id: string, role: Role, shopId: string | null): Promise<PublicUser> {
  const shop = role === "shop_staff" || role === "shop_owner" ? shopId : null;
  const [row] = await db<UserRow>("users")
    .where({ id })
    // A changed role or shop ends the user's live sessions (lib/accounts/sessionQueries.ts): they sign in
    // again and get what the new role allows, not what the old token said.
    .update({
      role,
      shop_id: shop,
      session_version: db.raw("session_version + (case when role is distinct from ? or shop_id is distinct from ? then 1 else 0 end)", [
        role,
        shop,
      ]) as unknown as number,
      updated_at: db.fn.now() as unknown as Date,
    })
    .returning(PUBLIC_COLUMNS);
  if (!row) throw new NotFoundError("That user");
  return row as PublicUser;
}

/** Sets a new password and ends every session made with the old one. */
export async function setPassword(db: Knex, id: string, passwordHash: string) {
  await db("users")
    .where({ id })
    .update({ password_hash: passwordHash, session_version: db.raw("session_version + 1"), updated_at: db.fn.now() });
}

export async function listShops(db: Knex) {
  return db("shops").select("id", "name").orderBy("name");
}

/** These queries on the app's database handle, for pages and route handlers. */
export const userQueries = bindAppDb({ createUser, findUserByEmail, findUserById, listShops, listUsers, setUserRole });
