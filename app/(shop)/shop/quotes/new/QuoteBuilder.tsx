"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import type { FitmentCandidates as Candidates } from "@/lib/shop/catalog/api";
import { ApiError, api, applyFieldErrors } from "@/lib/platform/client/api";
import type { Customer, CustomerVehicle } from "@/lib/shop/customers/api";
import { mmToIn } from "@/lib/fitment";
import { describeFieldErrors } from "@/lib/shop/quotes/fieldLabels";
import { formatUsd } from "@/lib/shop/quotes/money";
import { type CustomerInput, customerSchema } from "@/lib/shop/quotes/schema";
import { SetupFields } from "@/components/setup/SetupFields";
import { setupFieldNames } from "@/lib/setup/fields";
import { EMPTY_SETUP_FORM, setupToForm } from "@/lib/setup/schema";
import { type CounterVehicle, type CounterVehicleForm, counterVehicleSchema } from "@/lib/shop/customers/schema";


const signed = (mm: number, digits = 0) => `${mm > 0 ? "+" : mm < 0 ? "−" : "±"}${Math.abs(mm).toFixed(digits)}`;
const mmIn = (mm: number) => `${signed(mm)} mm (${signed(mmToIn(mm), 1)} in)`;

export function QuoteBuilder() {
  const router = useRouter();
  const [customer, setCustomer] = useState<Customer | null>(null);
  const [savedVehicle, setSavedVehicle] = useState<string | null>(null);
  const [vehicle, setVehicle] = useState<CounterVehicle | null>(null);
  const [saveVehicle, setSaveVehicle] = useState(true);
  const [candidates, setCandidates] = useState<Candidates | null>(null);
  const [pick, setPick] = useState<string | null>(null);
  const [quantity, setQuantity] = useState<4 | 5>(4);
  const [failure, setFailure] = useState<string | null>(null);

  const create = useMutation({
    mutationFn: () => {
      const p = candidates?.picks.find((x) => `${x.tireId}/${x.wheelId}` === pick);
      return api<{ id: string }>("/api/shop/quotes", {
        body: {
          customerId: customer!.id,
          ...(savedVehicle ? { vehicleId: savedVehicle } : { vehicle, saveVehicle }),
          tireItemId: p!.tireId,
          wheelItemId: p!.wheelId,
          quantity,
        },
      });
    },
    onSuccess: (r) => router.push(`/shop/quotes/${r.id}`),
    // The server's field errors in the screen's words ("Wheel: …"), never its request paths.
    onError: (e) => setFailure(e instanceof ApiError ? (describeFieldErrors(e.body.fieldErrors).join(" ") || e.message) : (e as Error).message),
  });

  return (
    <div className="flex flex-col gap-5">
      <CustomerStep customer={customer} onPick={(c) => { setCustomer(c); setSavedVehicle(null); setCandidates(null); }} />
      {customer && (
        <VehicleStep
          customerId={customer.id}
          savedVehicle={savedVehicle}
          onSaved={setSavedVehicle}
          saveVehicle={saveVehicle}
          onSaveVehicle={setSaveVehicle}
          onCandidates={(v, c) => { setVehicle(v); setCandidates(c); setPick(null); }}
        />
      )}
      {candidates && (
        <Card>
          <h2 className="text-lg font-semibold">3. Pick a tire and wheel</h2>
          <p className="mt-1 text-sm text-basalt-600">
            {candidates.wheelsFitting} wheels in the catalog fit the bolt pattern; {candidates.pairs} tire and wheel pairs mount. Ranked by the comparison with the
            current setup: fewest clearance warnings first, then the larger diameter gain.
          </p>
          {candidates.picks.length === 0 ? (
            <Alert tone="warning" className="mt-3">Nothing in the catalog mounts on this bolt pattern. Check the pattern, or add wheels to the catalog.</Alert>
          ) : (
            <fieldset className="mt-3">
              <legend className="sr-only">Tire and wheel</legend>
              <ul className="divide-y divide-basalt-100">
                {candidates.picks.map((p) => {
                  const key = `${p.tireId}/${p.wheelId}`;
                  const s = p.summary;
                  return (
                    <li key={key} className="py-3">
                      <label className="flex cursor-pointer gap-3">
                        <input type="radio" name="pick" className="mt-1 size-4 accent-ember-600" checked={pick === key} onChange={() => setPick(key)} />
                        <span className="grid flex-1 gap-2 text-sm md:grid-cols-[1.3fr_1.3fr_1fr]">
                          <span>
                            <span className="font-medium">{p.tire.description}</span>
                            <span className="block text-basalt-600">{p.tire.tireSize} · {formatUsd(p.tire.priceCents)} · {p.tire.qtyOnHand ?? 0} on hand</span>
                          </span>
                          <span>
                            <span className="font-medium">{p.wheel.description}</span>
                            <span className="block text-basalt-600">
                              {s.planned.wheel} · {p.wheel.boltPattern}{p.wheel.centerBoreMm ? ` · bore ${p.wheel.centerBoreMm} mm` : ""} · {formatUsd(p.wheel.priceCents)} · {p.wheel.qtyOnHand ?? 0} on hand {p.wheel.beadlock && <Badge tone="ember">beadlock</Badge>}
                            </span>
                          </span>
                          <span className="text-basalt-800">
                            <span className="block">Diameter {mmIn(s.diameterChangeMm)}</span>
                            <span className="block">Poke {mmIn(s.outerPokeChangeMm)}</span>
                            <span className="block">Inner room {mmIn(s.innerClearanceChangeMm)}</span>
                            {s.regear && <span className="block">Regear: {s.regear.axleRatio.toFixed(2)} → {s.regear.suggestedRatio.toFixed(2)}</span>}
                          </span>
                          {s.warnings.length > 0 && (
                            <span className="md:col-span-3">
                              {s.warnings.map((w) => (
                                <span key={w} className="mr-2 mt-1 inline-block rounded bg-tight-100 px-2 py-0.5 text-xs text-tight-800">{w}</span>
                              ))}
                            </span>
                          )}
                        </span>
                      </label>
                    </li>
                  );
                })}
              </ul>
            </fieldset>
          )}
          <fieldset className="mt-4 flex flex-wrap items-center gap-4 text-sm">
            <legend className="mb-1 font-medium">Quantity</legend>
            <label className="flex items-center gap-2"><input type="radio" name="qty" className="accent-ember-600" checked={quantity === 4} onChange={() => setQuantity(4)} /> 4</label>
            <label className="flex items-center gap-2"><input type="radio" name="qty" className="accent-ember-600" checked={quantity === 5} onChange={() => setQuantity(5)} /> 5 (with a matching spare)</label>
          </fieldset>
          <div aria-live="assertive" className="mt-3">{failure && <Alert tone="error">{failure}</Alert>}</div>
          <Button className="mt-3" disabled={!pick} pending={create.isPending} onClick={() => { setFailure(null); create.mutate(); }}>Create draft quote</Button>
        </Card>
      )}
    </div>
  );
}

function CustomerStep({ customer, onPick }: { customer: Customer | null; onPick: (c: Customer) => void }) {
  const [search, setSearch] = useState("");
  const [submitted, setSubmitted] = useState("");
  const [adding, setAdding] = useState(false);
  const found = useQuery({
    queryKey: ["shop-customers", submitted],
    queryFn: () => api<{ customers: Customer[] }>(`/api/shop/customers?q=${encodeURIComponent(submitted)}`).then((r) => r.customers),
    enabled: submitted.length > 0,
  });
  const { register, handleSubmit, setError, formState } = useForm<CustomerInput>({ resolver: zodResolver(customerSchema), defaultValues: { name: "", phone: "", email: "" } });
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
          <p className="text-sm" data-testid="chosen-customer">{customer.name} · {customer.phone || "no phone"} · {customer.email || "no e-mail"}</p>
        </div>
        <Button variant="secondary" onClick={() => onPick(null as unknown as Customer)}>Change</Button>
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
        <TextField className="w-full sm:w-80" label="Phone, e-mail or name" name="customer-search" type="search" value={search} onChange={(e) => setSearch(e.target.value)} />
        <Button type="submit" variant="secondary" className="mb-5">Find</Button>
        <Button type="button" variant="ghost" className="mb-5" onClick={() => setAdding((a) => !a)}>New customer</Button>
      </form>
      {found.isError && <Alert tone="error">{(found.error as Error).message}</Alert>}
      {found.data && (
        found.data.length === 0 ? (
          <p className="text-sm text-basalt-600" role="status">No customer matches “{submitted}”.</p>
        ) : (
          <ul className="divide-y divide-basalt-100 text-sm" aria-label="Matching customers">
            {found.data.map((c) => (
              <li key={c.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span><span className="font-medium">{c.name}</span> <span className="text-basalt-600">{c.phone} {c.email}</span></span>
                <Button variant="secondary" className="min-h-8 py-1" onClick={() => onPick(c)}>Use<span className="sr-only"> {c.name}</span></Button>
              </li>
            ))}
          </ul>
        )
      )}
      {adding && (
        <form onSubmit={onCreate} noValidate className="mt-4 grid gap-3 border-t border-basalt-100 pt-4 sm:grid-cols-3">
          <div aria-live="assertive" className="sm:col-span-3">{failure && <Alert tone="error">{failure}</Alert>}</div>
          <TextField label="Name" {...register("name")} error={formState.errors.name?.message} />
          <TextField label="Phone" type="tel" {...register("phone")} error={formState.errors.phone?.message} />
          <TextField label="E-mail" type="email" {...register("email")} error={formState.errors.email?.message} />
          <Button type="submit" pending={formState.isSubmitting} className="justify-self-start">Add customer</Button>
        </form>
      )}
    </Card>
  );
}

function VehicleStep(props: {
  customerId: string;
  savedVehicle: string | null;
  onSaved: (id: string | null) => void;
  saveVehicle: boolean;
  onSaveVehicle: (b: boolean) => void;
  onCandidates: (v: CounterVehicle, c: Candidates) => void;
}) {
  const saved = useQuery({
    queryKey: ["shop-customer", props.customerId],
    queryFn: () => api<{ vehicles: CustomerVehicle[] }>(`/api/shop/customers/${props.customerId}`).then((r) => r.vehicles),
  });
  const form = useForm<CounterVehicleForm, unknown, CounterVehicle>({
    resolver: zodResolver(counterVehicleSchema),
    defaultValues: { description: "", boltPattern: "", hubBoreMm: "", currentSetup: EMPTY_SETUP_FORM, axleRatio: "" },
  });
  const { register, handleSubmit, setError, formState, reset } = form;
  const [failure, setFailure] = useState<string | null>(null);
  const e = formState.errors;
  const onFind = handleSubmit(async (v) => {
    setFailure(null);
    try {
      props.onCandidates(v, await api<Candidates>("/api/shop/fitment/candidates", { body: v }));
    } catch (err) {
      setFailure(applyFieldErrors(err, setError, ["description", "boltPattern", "hubBoreMm", ...setupFieldNames("currentSetup"), "axleRatio"]));
    }
  });
  const applySaved = (v: CustomerVehicle) => {
    reset({
      description: v.description,
      boltPattern: v.boltPattern,
      hubBoreMm: v.hubBoreMm === null ? "" : String(v.hubBoreMm),
      currentSetup: setupToForm(v.currentSetup),
      axleRatio: v.axleRatio ? String(v.axleRatio) : "",
    });
    props.onSaved(v.id);
  };
  const edited = () => props.savedVehicle && props.onSaved(null);
  return (
    <Card>
      <h2 className="text-lg font-semibold">2. Vehicle as it is now</h2>
      {saved.data && saved.data.length > 0 && (
        <div className="mt-2 flex flex-wrap gap-2 text-sm">
          <span className="self-center text-basalt-600">Saved:</span>
          {saved.data.map((v) => (
            <Button key={v.id} variant={props.savedVehicle === v.id ? "primary" : "secondary"} className="min-h-8 py-1" onClick={() => applySaved(v)}>
              {v.description} ({v.currentSetup.tire})
            </Button>
          ))}
        </div>
      )}
      <form onSubmit={onFind} onChange={edited} noValidate className="mt-3 grid gap-3 sm:grid-cols-3">
        <div aria-live="assertive" className="sm:col-span-3">{failure && <Alert tone="error">{failure}</Alert>}</div>
        <TextField label="Vehicle" hint="e.g. 2016 half-ton pickup" {...register("description")} error={e.description?.message} />
        <TextField label="Bolt pattern" hint="e.g. 6x5.5 or 6x139.7" {...register("boltPattern")} error={e.boltPattern?.message} />
        <TextField label="Hub bore (mm)" inputMode="decimal" hint="Optional; each wheel's centre bore is checked against it" {...register("hubBoreMm")} error={e.hubBoreMm?.message} />
        <div className="sm:col-span-3">
          <SetupFields form={form} name="currentSetup" legend="Tires and wheels on it now" spacer={false} />
        </div>
        <TextField label="Axle ratio (optional)" inputMode="decimal" hint="For the regear suggestion; 3.73 assumed if empty" {...register("axleRatio")} error={e.axleRatio?.message} />
        <label className="flex items-center gap-2 self-center text-sm sm:col-span-3">
          <input type="checkbox" className="size-4 accent-ember-600" checked={props.saveVehicle && !props.savedVehicle} disabled={!!props.savedVehicle} onChange={(ev) => props.onSaveVehicle(ev.target.checked)} />
          Save this vehicle to the customer
        </label>
        <Button type="submit" pending={formState.isSubmitting} className="justify-self-start">Find fitments</Button>
      </form>
    </Card>
  );
}
