"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import type { FitmentCandidates as Candidates } from "@/lib/shop/catalog/api";
import { ApiError, api } from "@/lib/platform/client/api";
import type { Customer } from "@/lib/shop/customers/api";
import { mmToIn } from "@/lib/fitment";
import { describeFieldErrors } from "@/lib/shop/quotes/fieldLabels";
import { formatUsd } from "@/lib/shop/quotes/money";
import { CustomerStep } from "./CustomerStep";
import { VehicleStep } from "./VehicleStep";
import { useVehicleChoice } from "./useVehicleChoice";

const signed = (mm: number, digits = 0) => `${mm > 0 ? "+" : mm < 0 ? "−" : "±"}${Math.abs(mm).toFixed(digits)}`;
const mmIn = (mm: number) => `${signed(mm)} mm (${signed(mmToIn(mm), 1)} in)`;

export function QuoteBuilder() {
  const router = useRouter();
  const [customer, setCustomer] = useState<Customer | null>(null);
  const choice = useVehicleChoice();
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
          ...choice.request(),
          tireItemId: p!.tireId,
          wheelItemId: p!.wheelId,
          quantity,
        },
      });
    },
    onSuccess: (r) => router.push(`/shop/quotes/${r.id}`),
    // The server's field errors in the screen's words ("Wheel: …"), never its request paths.
    onError: (e) =>
      setFailure(e instanceof ApiError ? describeFieldErrors(e.body.fieldErrors).join(" ") || e.message : (e as Error).message),
  });

  return (
    <div className="flex flex-col gap-5">
      <CustomerStep
        customer={customer}
        onPick={(c) => {
          setCustomer(c);
          choice.forgetSaved();
          setCandidates(null);
        }}
      />
      {customer && (
        <VehicleStep
          customerId={customer.id}
          {...choice.step}
          onCandidates={(v, c) => {
            choice.setVehicle(v);
            setCandidates(c);
            setPick(null);
          }}
        />
      )}
      {candidates && (
        <Card>
          <h2 className="text-lg font-semibold">3. Pick a tire and wheel</h2>
          <p className="mt-1 text-sm text-basalt-600">
            {candidates.wheelsFitting} wheels in the catalog fit the bolt pattern; {candidates.pairs} tire and wheel pairs mount. Ranked by
            the comparison with the current setup: fewest clearance warnings first, then the larger diameter gain.
          </p>
          {candidates.picks.length === 0 ? (
            <Alert tone="warning" className="mt-3">
              Nothing in the catalog mounts on this bolt pattern. Check the pattern, or add wheels to the catalog.
            </Alert>
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
                        <input
                          type="radio"
                          name="pick"
                          className="mt-1 size-4 accent-ember-600"
                          checked={pick === key}
                          onChange={() => setPick(key)}
                        />
                        <span className="grid flex-1 gap-2 text-sm md:grid-cols-[1.3fr_1.3fr_1fr]">
                          <span>
                            <span className="font-medium">{p.tire.description}</span>
                            <span className="block text-basalt-600">
                              {p.tire.tireSize} · {formatUsd(p.tire.priceCents)} · {p.tire.qtyOnHand ?? 0} on hand
                            </span>
                          </span>
                          <span>
                            <span className="font-medium">{p.wheel.description}</span>
                            <span className="block text-basalt-600">
                              {s.planned.wheel} · {p.wheel.boltPattern}
                              {p.wheel.centerBoreMm ? ` · bore ${p.wheel.centerBoreMm} mm` : ""} · {formatUsd(p.wheel.priceCents)} ·{" "}
                              {p.wheel.qtyOnHand ?? 0} on hand {p.wheel.beadlock && <Badge tone="ember">beadlock</Badge>}
                            </span>
                          </span>
                          <span className="text-basalt-800">
                            <span className="block">Diameter {mmIn(s.diameterChangeMm)}</span>
                            <span className="block">Poke {mmIn(s.outerPokeChangeMm)}</span>
                            <span className="block">Inner room {mmIn(s.innerClearanceChangeMm)}</span>
                            {s.regear && (
                              <span className="block">
                                Regear: {s.regear.axleRatio.toFixed(2)} → {s.regear.suggestedRatio.toFixed(2)}
                              </span>
                            )}
                          </span>
                          {s.warnings.length > 0 && (
                            <span className="md:col-span-3">
                              {s.warnings.map((w) => (
                                <span key={w} className="mr-2 mt-1 inline-block rounded bg-tight-100 px-2 py-0.5 text-xs text-tight-800">
                                  {w}
                                </span>
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
            <label className="flex items-center gap-2">
              <input type="radio" name="qty" className="accent-ember-600" checked={quantity === 4} onChange={() => setQuantity(4)} /> 4
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" name="qty" className="accent-ember-600" checked={quantity === 5} onChange={() => setQuantity(5)} /> 5
              (with a matching spare)
            </label>
          </fieldset>
          <div aria-live="assertive" className="mt-3">
            {failure && <Alert tone="error">{failure}</Alert>}
          </div>
          <Button
            className="mt-3"
            disabled={!pick}
            pending={create.isPending}
            onClick={() => {
              setFailure(null);
              create.mutate();
            }}
          >
            Create draft quote
          </Button>
        </Card>
      )}
    </div>
  );
}
