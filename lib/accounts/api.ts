/**
 * What the account and admin users APIs return (camelCase, ISO dates) and the row → API
 * mappers; shared by server and client. Password hashes and session versions never leave the
 * server.
 */
import type { PublicUser, Role } from "@/lib/platform/db/types";
import { rowTimes } from "@/lib/platform/http/isoDates";
import { SIGN_UP_TTL_HOURS } from "./signUpMails";

export interface User {
  id: string;
  email: string;
  name: string;
  role: Role;
  shopId: string | null;
  createdAt: string;
  updatedAt: string;
}

/** A user as the admin's list shows it: with the name of their shop. */
export interface AdminUser extends User {
  shopName: string | null;
}

/**
 * @example
 * userDto({ id: "u", email: "a@example.test", name: "A", role: "member", shop_id: null, created_at, updated_at });
 * // { id: "u", …, shopId: null, createdAt: "…Z", updatedAt: "…Z" }
 */
export function userDto(u: PublicUser): User {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    shopId: u.shop_id,
    ...rowTimes(u),
  };
}

/** What the sign-up route answers, the same for a new address and one that has an account. */
export interface SignUpAnswer {
  email: string;
  title: string;
  message: string;
}

/**
 * @example
 * signUpAnswer(" ada@example.test ");
 * // { email: "ada@example.test", title: "Check your e-mail to finish signing up", message: "We sent a message to ada@example.test. …" }
 */
export function signUpAnswer(email: string): SignUpAnswer {
  const address = email.trim();
  return {
    email: address,
    title: "Check your e-mail to finish signing up",
    message:
      `We sent a message to ${address}. Open the link in it within ${SIGN_UP_TTL_HOURS} hours. ` +
      "If nothing arrives within a few minutes, look in the spam folder, or sign up again a little later.",
  };
}

/** The signed-in person as /api/me answers: who the session says they are, no dates. */
export interface Me {
  id: string;
  name: string;
  email: string;
  role: Role;
  shopId: string | null;
}

/**
 * @example
 * meDto({ userId: "u", name: "A", email: "a@example.test", role: "member", shopId: null });
 * // { id: "u", name: "A", email: "a@example.test", role: "member", shopId: null }
 */
export function meDto(caller: { userId: string; name: string; email: string; role: Role; shopId: string | null }): Me {
  return { id: caller.userId, name: caller.name, email: caller.email, role: caller.role, shopId: caller.shopId };
}

export function adminUserDto(u: PublicUser & { shop_name: string | null }): AdminUser {
  return { ...userDto(u), shopName: u.shop_name };
}
