"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useId, useState } from "react";
import { Button } from "@/components/ui/Button";
import { ApiError, api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { ROLES, type Role } from "@/lib/platform/db/types";
import { labelledMessage } from "@/lib/platform/validation/labels";
import { PhoneLabel } from "./PhoneLabel";
import type { UserItem } from "./UsersTable";

const ROLE_LABEL: Record<Role, string> = { member: "Member", shop_staff: "Shop staff", shop_owner: "Shop owner", admin: "Admin" };
const isShopRole = (r: Role) => r === "shop_staff" || r === "shop_owner";
/** The row's controls as the table's column headers name them. */
const LABELS = { role: "Role", shopId: "Shop" };

/** What the row says when a save is refused: the server's field messages after the column they belong to. */
function refusal(e: unknown): string {
  if (!(e instanceof ApiError)) return "The change was not saved. Try again.";
  return labelledMessage(e.body.fieldErrors, LABELS) ?? e.message;
}

export function UserRow({ user, shops, self }: { user: UserItem; shops: { id: string; name: string }[]; self: boolean }) {
  const qc = useQueryClient();
  const noteId = useId();
  const [role, setRole] = useState<Role>(user.role);
  const [shopId, setShopId] = useState<string>(user.shopId ?? shops[0]?.id ?? "");
  const save = useMutation({
    mutationFn: () => api(`/api/admin/users/${user.id}`, { method: "PATCH", body: { role, shopId: isShopRole(role) ? shopId : null } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: queryKeys.admin.users.all }),
  });
  const changed = role !== user.role || (isShopRole(role) && shopId !== user.shopId);
  return (
    <tr className="max-md:flex max-md:flex-col max-md:gap-2 max-md:py-3">
      {/* A name or address that is one long word breaks anywhere rather than widening the page. */}
      <td className="py-2 pr-2 font-medium wrap-anywhere max-md:py-0">
        {user.name}
        {self && <span className="ml-1 text-basalt-500">(you)</span>}
      </td>
      <td className="pr-2 wrap-anywhere">{user.email}</td>
      <td className="pr-2">
        <PhoneLabel>Role</PhoneLabel>
        <select
          aria-label={`Role of ${user.email}`}
          aria-describedby={self ? noteId : undefined}
          disabled={self}
          className="max-w-full rounded border border-basalt-300 px-2 py-1 disabled:bg-basalt-50"
          value={role}
          onChange={(e) => setRole(e.target.value as Role)}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABEL[r]}
            </option>
          ))}
        </select>
        {self && (
          <span id={noteId} className="block text-xs text-basalt-600">
            Another admin changes your own role.
          </span>
        )}
      </td>
      <td className="pr-2">
        <PhoneLabel>Shop</PhoneLabel>
        {isShopRole(role) ? (
          <select
            aria-label={`Shop of ${user.email}`}
            className="max-w-full rounded border border-basalt-300 px-2 py-1"
            value={shopId}
            onChange={(e) => setShopId(e.target.value)}
          >
            {shops.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        ) : (
          <span className="text-basalt-500">—</span>
        )}
      </td>
      <td className="py-1 text-right max-md:text-left">
        <Button
          variant="secondary"
          className="min-h-8 py-1"
          aria-label={`Save ${user.email}`}
          disabled={!changed}
          pending={save.isPending}
          onClick={() => save.mutate()}
        >
          Save
        </Button>
        <span aria-live="polite" className="block text-xs">
          {save.isError && <span className="text-contact-600">{refusal(save.error)}</span>}
          {save.isSuccess && !changed && <span className="text-clear-600">Saved</span>}
        </span>
      </td>
    </tr>
  );
}
