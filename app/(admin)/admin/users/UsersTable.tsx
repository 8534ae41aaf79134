"use client";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { SearchField } from "@/components/ui/SearchField";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { Table, type TableColumn } from "@/components/ui/Table";
import { useSortedRows } from "@/components/ui/useSortedRows";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { AdminUser } from "@/lib/accounts/api";
import { USERS_SEARCH_LABEL } from "@/lib/accounts/adminSchema";
import { ROLES } from "@/lib/platform/db/types";
import { UserRow } from "./UserRow";

/** A row of the table: the API's AdminUser. */
export type UserItem = AdminUser;

/** The headers; UserRow draws each row's cells in this order (a row holds its own form state). */
const COLUMNS: TableColumn<UserItem>[] = [
  { id: "name", header: "Name", sortable: true, sortValue: (u) => u.name },
  { id: "email", header: "E-mail", sortable: true, sortValue: (u) => u.email },
  // By rank (member, staff, owner, admin), not alphabetically.
  { id: "role", header: "Role", sortable: true, sortValue: (u) => ROLES.indexOf(u.role) },
  { id: "shop", header: "Shop", sortable: true, sortValue: (u) => u.shopName },
  { id: "save", header: <span className="sr-only">Save</span> },
];

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
  const sorted = useSortedRows(users.data ?? [], COLUMNS);
  return (
    <Card>
      <SearchField
        label={USERS_SEARCH_LABEL}
        value={search}
        onValue={setSearch}
        maxLength={100}
        className="mb-4 max-w-sm"
        inputClassName="min-h-10"
      />
      {users.isError && <Alert tone="error">{(users.error as Error).message}</Alert>}
      {/* On a phone each account reflows into a block with its own labels, so the header row goes. */}
      <Table
        caption="Accounts, oldest first; column headers sort"
        className="max-md:block"
        headClassName="max-md:hidden"
        bodyClassName="max-md:block"
        columns={COLUMNS}
        {...sorted}
        rowKey={(u) => u.id}
        renderRow={(u) => <UserRow key={u.id} user={u} shops={shops} self={u.id === selfId} />}
      />
    </Card>
  );
}
