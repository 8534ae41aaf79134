"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { StaffData } from "@/lib/shop/api";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import { type StaffInviteInput, staffInviteSchema } from "@/lib/shop/schema";

export function StaffPanel({ initial, selfId }: { initial: StaffData; selfId: string }) {
  const qc = useQueryClient();
  const data = useQuery({ queryKey: queryKeys.shop.staff.all, queryFn: () => api<StaffData>("/api/shop/staff"), initialData: initial });
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<StaffInviteInput>({ resolver: zodResolver(staffInviteSchema) });
  const [failure, setFailure] = useState<string | null>(null);

  const onInvite = handleSubmit(async (values) => {
    setFailure(null);
    setNotice(null);
    try {
      await api("/api/shop/staff", { body: values });
      setNotice(`Invitation sent to ${values.email}.`);
      reset();
      await qc.invalidateQueries({ queryKey: queryKeys.shop.staff.all });
    } catch (e) {
      setFailure(applyFieldErrors(e, setError, ["email"]));
    }
  });
  const remove = useMutation({
    mutationFn: (id: string) => api(`/api/shop/staff/${id}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: queryKeys.shop.staff.all }),
  });
  const revoke = useMutation({
    mutationFn: (id: string) => api(`/api/shop/staff/invites/${id}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: queryKeys.shop.staff.all }),
  });
  const d = data.data;
  return (
    <div className="grid gap-5 md:grid-cols-2">
      <Card>
        <h2 className="text-lg font-semibold">Team</h2>
        {(remove.isError || revoke.isError) && (
          <Alert tone="error" className="mt-2">
            {((remove.error ?? revoke.error) as Error).message}
          </Alert>
        )}
        <ul className="mt-3 divide-y divide-basalt-100">
          {d.team.map((p) => (
            <li key={p.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
              <span>
                <span className="font-medium">{p.name}</span> <span className="text-basalt-600">{p.email}</span>
              </span>
              <span className="flex items-center gap-2">
                <Badge tone={p.role === "shop_owner" ? "ember" : "steel"}>{p.role === "shop_owner" ? "Owner" : "Staff"}</Badge>
                {p.role === "shop_staff" && p.id !== selfId && (
                  <Button
                    variant="secondary"
                    className="min-h-8 py-1"
                    pending={remove.isPending && remove.variables === p.id}
                    onClick={() => {
                      if (
                        window.confirm(
                          `Remove ${p.name} from the shop? The account stays, with its own garage and comparisons, without shop access.`,
                        )
                      )
                        remove.mutate(p.id);
                    }}
                  >
                    Remove<span className="sr-only"> {p.name}</span>
                  </Button>
                )}
              </span>
            </li>
          ))}
        </ul>
      </Card>
      <Card>
        <h2 className="text-lg font-semibold">Invite staff</h2>
        <form onSubmit={onInvite} noValidate className="mt-3 flex flex-col gap-3">
          <div aria-live="polite">
            {failure && <Alert tone="error">{failure}</Alert>}
            {notice && <Alert tone="success">{notice}</Alert>}
          </div>
          <TextField label="E-mail of the person to invite" type="email" {...register("email")} error={formState.errors.email?.message} />
          <Button type="submit" pending={formState.isSubmitting} className="self-start">
            Send invitation
          </Button>
        </form>
        <h3 className="mt-6 text-sm font-semibold uppercase tracking-wide text-basalt-600">Open invitations</h3>
        {d.invites.length === 0 ? (
          <p className="mt-2 text-sm text-basalt-600">None.</p>
        ) : (
          <ul className="mt-2 divide-y divide-basalt-100 text-sm">
            {d.invites.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span>
                  {i.email} <span className="text-basalt-600">· expires {formatInstant(i.expiresAt, d.timeZone)}</span>
                </span>
                <Button variant="ghost" className="min-h-8 py-1" onClick={() => revoke.mutate(i.id)}>
                  Withdraw<span className="sr-only"> invitation for {i.email}</span>
                </Button>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
