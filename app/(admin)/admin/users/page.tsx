import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/auth/session";
import { userQueries } from "@/lib/server/users";
import { UsersTable, type UserItem } from "./UsersTable";

export const metadata: Metadata = { title: "Users and roles" };

export default async function AdminUsersPage() {
  const caller = await requirePageCaller("/admin/users", ["admin"]);
  const [users, shops] = await Promise.all([userQueries.listUsers(), userQueries.listShops()]);
  const initial: UserItem[] = users.map((u) => ({
    id: u.id, email: u.email, name: u.name, role: u.role, shop_id: u.shop_id, shop_name: u.shop_name,
    created_at: new Date(u.created_at).toISOString(),
  }));
  return (
    <>
      <PageHeader title="Users and roles" lead="Change what each account may do. Shop roles belong to one shop." />
      <UsersTable initial={initial} shops={shops as { id: string; name: string }[]} selfId={caller.userId} />
    </>
  );
}
