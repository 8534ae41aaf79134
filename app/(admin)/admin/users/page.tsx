import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { userQueries } from "@/lib/accounts/queries";
import { UsersTable } from "./UsersTable";

export const metadata: Metadata = { title: "Users and roles" };

export default async function AdminUsersPage() {
  const caller = await requirePageCaller("/admin/users", ["admin"]);
  const [users, shops] = await Promise.all([userQueries.listUsers(), userQueries.listShops()]);
  return (
    <>
      <PageHeader title="Users and roles" lead="Change what each account may do. Shop roles belong to one shop." />
      <UsersTable initial={users} shops={shops as { id: string; name: string }[]} selfId={caller.userId} />
    </>
  );
}
