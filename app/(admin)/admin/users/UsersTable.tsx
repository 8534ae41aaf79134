"use client";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { AdminUser } from "@/lib/accounts/api";
import { USERS_SEARCH_LABEL } from "@/lib/accounts/adminSchema";
import { UserRow } from "./UserRow";

/** A row of the table: the API's AdminUser. */
export type UserItem = AdminUser;

/**
 * Every account with its role. From tablet width up a table; on a phone each account reflows
 * into a block (name, e-mail, role, shop, Save under each other) so nothing is clipped.
 */
export function UsersTable({ initial, shops, selfId }: { initial: UserItem[]; shops: { id: string; name: string }[]; selfId: string }) {
  const [search, setSearch] = useState("");
  const users = useQuery({
    queryKey: queryKeys.admin.users.list(search),
    queryFn: () => api<{ users: UserItem[] }>(`/api/admin/users?q=${encodeURIComponent(search)}`).then((r) => r.users),
    initialData: search ? undefined : initial,
  });
  return (
    <Card>
      <label className="mb-4 flex max-w-sm flex-col gap-1 text-sm font-medium">
        {USERS_SEARCH_LABEL}
        <input className="min-h-10 rounded-lg border border-basalt-300 px-3" value={search} onChange={(e) => setSearch(e.target.value)} type="search" maxLength={100} />
      </label>
      {users.isError && <Alert tone="error">{(users.error as Error).message}</Alert>}
      <table className="w-full text-left text-sm max-md:block">
        <thead className="text-xs uppercase tracking-wide text-basalt-500 max-md:sr-only">
          <tr><th className="py-2">Name</th><th>E-mail</th><th>Role</th><th>Shop</th><th><span className="sr-only">Save</span></th></tr>
        </thead>
        <tbody className="divide-y divide-basalt-100 max-md:block">
          {(users.data ?? []).map((u) => <UserRow key={u.id} user={u} shops={shops} self={u.id === selfId} />)}
        </tbody>
      </table>
    </Card>
  );
}
