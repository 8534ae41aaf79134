"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/client/api";
import { ROLES, type Role } from "@/lib/db/types";

export interface UserItem {
  id: string;
  email: string;
  name: string;
  role: Role;
  shop_id: string | null;
  shop_name: string | null;
  created_at: string;
}

const ROLE_LABEL: Record<Role, string> = { member: "Member", shop_staff: "Shop staff", shop_owner: "Shop owner", admin: "Admin" };
const isShopRole = (r: Role) => r === "shop_staff" || r === "shop_owner";

export function UsersTable({ initial, shops, selfId }: { initial: UserItem[]; shops: { id: string; name: string }[]; selfId: string }) {
  const [search, setSearch] = useState("");
  const users = useQuery({
    queryKey: ["admin-users", search],
    queryFn: () => api<{ users: UserItem[] }>(`/api/admin/users?q=${encodeURIComponent(search)}`).then((r) => r.users),
    initialData: search ? undefined : initial,
  });
  return (
    <Card className="overflow-x-auto">
      <label className="mb-4 flex max-w-sm flex-col gap-1 text-sm font-medium">
        Search by name or e-mail
        <input className="min-h-10 rounded-lg border border-basalt-300 px-3" value={search} onChange={(e) => setSearch(e.target.value)} type="search" />
      </label>
      {users.isError && <Alert tone="error">{(users.error as Error).message}</Alert>}
      <table className="w-full min-w-[640px] text-left text-sm">
        <thead className="text-xs uppercase tracking-wide text-basalt-500">
          <tr><th className="py-2">Name</th><th>E-mail</th><th>Role</th><th>Shop</th><th><span className="sr-only">Save</span></th></tr>
        </thead>
        <tbody className="divide-y divide-basalt-100">
          {(users.data ?? []).map((u) => <UserRow key={u.id} user={u} shops={shops} self={u.id === selfId} />)}
        </tbody>
      </table>
    </Card>
  );
}

function UserRow({ user, shops, self }: { user: UserItem; shops: { id: string; name: string }[]; self: boolean }) {
  const qc = useQueryClient();
  const [role, setRole] = useState<Role>(user.role);
  const [shopId, setShopId] = useState<string>(user.shop_id ?? shops[0]?.id ?? "");
  const save = useMutation({
    mutationFn: () => api(`/api/admin/users/${user.id}`, { method: "PATCH", body: { role, shopId: isShopRole(role) ? shopId : null } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["admin-users"] }),
  });
  const changed = role !== user.role || (isShopRole(role) && shopId !== user.shop_id);
  return (
    <tr>
      <td className="py-2 pr-2 font-medium">{user.name}{self && <span className="ml-1 text-basalt-500">(you)</span>}</td>
      <td className="pr-2">{user.email}</td>
      <td className="pr-2">
        <select aria-label={`Role of ${user.email}`} className="rounded border border-basalt-300 px-2 py-1" value={role} onChange={(e) => setRole(e.target.value as Role)}>
          {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABEL[r]}</option>)}
        </select>
      </td>
      <td className="pr-2">
        {isShopRole(role) ? (
          <select aria-label={`Shop of ${user.email}`} className="rounded border border-basalt-300 px-2 py-1" value={shopId} onChange={(e) => setShopId(e.target.value)}>
            {shops.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
          </select>
        ) : <span className="text-basalt-500">—</span>}
      </td>
      <td className="py-1 text-right">
        <Button variant="secondary" className="min-h-8 py-1" disabled={!changed} pending={save.isPending} onClick={() => save.mutate()}>Save</Button>
        <span aria-live="polite" className="block text-xs">
          {save.isError && <span className="text-contact-600">{(save.error as Error).message}</span>}
          {save.isSuccess && !changed && <span className="text-clear-600">Saved</span>}
        </span>
      </td>
    </tr>
  );
}
