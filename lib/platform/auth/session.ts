import "server-only";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import type { Role } from "@/lib/platform/db/types";
import { forbidden, unauthorized } from "@/lib/platform/http/errors";
import { authOptions } from "./options";

/** Who is calling: the ids every query is scoped by. */
export interface Caller {
  userId: string;
  role: Role;
  shopId: string | null;
  name: string;
  email: string;
}

/** Which callers a route or page admits: "public" admits everyone, including anonymous. */
export type Access = "public" | "signed-in" | readonly Role[];

export async function currentCaller(): Promise<Caller | null> {
  const session = await getServerSession(authOptions);
  const u = session?.user;
  if (!u?.id || !u.role) return null;
  return { userId: u.id, role: u.role, shopId: u.shopId ?? null, name: u.name ?? "", email: u.email ?? "" };
}

export function admits(access: Access, caller: Caller | null): boolean {
  if (access === "public") return true;
  if (!caller) return false;
  if (access === "signed-in") return true;
  return access.includes(caller.role);
}

/** For route handlers and server actions: the caller, or a 401/403 HttpError. */
export async function requireCaller(access: Exclude<Access, "public"> = "signed-in"): Promise<Caller> {
  const caller = await currentCaller();
  if (!caller) throw unauthorized();
  if (!admits(access, caller)) throw forbidden();
  if ((caller.role === "shop_staff" || caller.role === "shop_owner") && !caller.shopId) throw forbidden();
  return caller;
}

/** For pages: anonymous callers go to sign-in and come back; the wrong role sees /forbidden. */
export async function requirePageCaller(path: string, access: Exclude<Access, "public"> = "signed-in"): Promise<Caller> {
  const caller = await currentCaller();
  if (!caller) redirect(`/sign-in?callbackUrl=${encodeURIComponent(path)}`);
  if (!admits(access, caller)) redirect("/forbidden");
  return caller;
}
