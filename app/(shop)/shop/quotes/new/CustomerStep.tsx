"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { ApiError, api, applyFieldErrors } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { Customer } from "@/lib/shop/customers/api";
import { type CustomerInput, customerSchema } from "@/lib/shop/quotes/schema";

/** Step 1 of a new quote: find the customer by phone, e-mail or name, or add one. */
export function CustomerStep({ customer, onPick }: { customer: Customer | null; onPick: (c: Customer) => void }) {
  const [search, setSearch] = useState("");
  const [submitted, setSubmitted] = useState("");
  const [adding, setAdding] = useState(false);
  const found = useQuery({
    queryKey: queryKeys.shop.customers.search(submitted),
    queryFn: () => api<{ customers: Customer[] }>(`/api/shop/customers?q=${encodeURIComponent(submitted)}`).then((r) => r.customers),
    enabled: submitted.length > 0,
  });
  const { register, handleSubmit, setError, formState } = useForm<CustomerInput>({
    resolver: zodResolver(customerSchema),
    defaultValues: { name: "", phone: "", email: "" },
  });
  const [failure, setFailure] = useState<string | null>(null);
  const onCreate = handleSubmit(async (values) => {
    setFailure(null);
    try {
      const r = await api<{ customer: Customer }>("/api/shop/customers", { body: values });
      onPick(r.customer);
      setAdding(false);
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) {
        const existing = (e.body as unknown as { existing?: Customer }).existing;
        setFailure(e.message);
        if (existing) setSubmitted(existing.phone || existing.email);
        return;
      }
      setFailure(applyFieldErrors(e, setError, ["name", "phone", "email"]));
    }
  });

  if (customer) {
    return (
      <Card className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h2 className="text-lg font-semibold">1. Customer</h2>
          <p className="text-sm" data-testid="chosen-customer">
            {customer.name} · {customer.phone || "no phone"} · {customer.email || "no e-mail"}
          </p>
        </div>
        <Button variant="secondary" onClick={() => onPick(null as unknown as Customer)}>
          Change
        </Button>
      </Card>
    );
  }
  return (
    <Card>
      <h2 className="text-lg font-semibold">1. Customer</h2>
      <form
        className="mt-3 flex flex-wrap items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          setSubmitted(search.trim());
        }}
      >
        <TextField
          className="w-full sm:w-80"
          label="Phone, e-mail or name"
          name="customer-search"
          type="search"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
        />
        <Button type="submit" variant="secondary" className="mb-5">
          Find
        </Button>
        <Button type="button" variant="ghost" className="mb-5" onClick={() => setAdding((a) => !a)}>
          New customer
        </Button>
      </form>
      {found.isError && <Alert tone="error">{(found.error as Error).message}</Alert>}
      {found.data &&
        (found.data.length === 0 ? (
          <p className="text-sm text-basalt-600" role="status">
            No customer matches “{submitted}”.
          </p>
        ) : (
          <ul className="divide-y divide-basalt-100 text-sm" aria-label="Matching customers">
            {found.data.map((c) => (
              <li key={c.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span>
                  <span className="font-medium">{c.name}</span>{" "}
                  <span className="text-basalt-600">
                    {c.phone} {c.email}
                  </span>
                </span>
                <Button variant="secondary" className="min-h-8 py-1" onClick={() => onPick(c)}>
                  Use<span className="sr-only"> {c.name}</span>
                </Button>
              </li>
            ))}
          </ul>
        ))}
      {adding && (
        <form onSubmit={onCreate} noValidate className="mt-4 grid gap-3 border-t border-basalt-100 pt-4 sm:grid-cols-3">
          <div aria-live="assertive" className="sm:col-span-3">
            {failure && <Alert tone="error">{failure}</Alert>}
          </div>
          <TextField label="Name" {...register("name")} error={formState.errors.name?.message} />
          <TextField label="Phone" type="tel" {...register("phone")} error={formState.errors.phone?.message} />
          <TextField label="E-mail" type="email" {...register("email")} error={formState.errors.email?.message} />
          <Button type="submit" pending={formState.isSubmitting} className="justify-self-start">
            Add customer
          </Button>
        </form>
      )}
    </Card>
  );
}
