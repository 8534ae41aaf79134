"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { SetupFields } from "@/components/setup/SetupFields";
import { Button } from "@/components/ui/Button";
import { FailureRegion } from "@/components/ui/FailureRegion";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { fieldBinder } from "@/components/ui/fieldProps";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { setupFieldNames } from "@/lib/setup/fields";
import { EMPTY_SETUP_FORM, setupSchema, setupToForm } from "@/lib/setup/schema";
import type { FitmentCandidates as Candidates } from "@/lib/shop/catalog/api";
import type { CustomerVehicle } from "@/lib/shop/customers/api";
import { type CounterVehicle, type CounterVehicleForm, counterVehicleSchema } from "@/lib/shop/customers/schema";
import { CounterPlacardFields } from "./CounterPlacardFields";
import { useCounterPlacard } from "./useCounterPlacard";

/**
 * Step 2 of a new quote: the vehicle as it is now (typed, or one the customer has saved, its
 * placard filled in too), then the catalog's fits. A saved vehicle changed here is marked edited:
 * with the box ticked, the quote writes the changes over it.
 */
export function VehicleStep(props: {
  customerId: string;
  savedVehicle: string | null;
  onSaved: (id: string | null) => void;
  /** The picked saved vehicle was changed on the screen. */
  edited: boolean;
  onEdited: (b: boolean) => void;
  saveVehicle: boolean;
  onSaveVehicle: (b: boolean) => void;
  onCandidates: (v: CounterVehicle, c: Candidates) => void;
}) {
  const saved = useQuery({
    queryKey: queryKeys.shop.customers.vehicles(props.customerId),
    queryFn: () => api<{ vehicles: CustomerVehicle[] }>(`/api/shop/customers/${props.customerId}`).then((r) => r.vehicles),
  });
  const form = useForm<CounterVehicleForm, unknown, CounterVehicle>({
    resolver: zodResolver(counterVehicleSchema),
    defaultValues: { description: "", boltPattern: "", hubBoreMm: "", currentSetup: EMPTY_SETUP_FORM, axleRatio: "" },
  });
  const { handleSubmit, setError, formState, reset } = form;
  const [failure, setFailure] = useState<string | null>(null);
  const field = fieldBinder(form);
  const setupRead = setupSchema.safeParse(useWatch({ control: form.control, name: "currentSetup" }));
  const placard = useCounterPlacard(setupRead.success ? setupRead.data : null);
  const onFind = (ev: React.FormEvent) => {
    // The placard is read into SI by its own fields (kept apart: their unit follows the inch/metric choice).
    const p = placard.value();
    const b = placard.bodyPoints();
    form.setValue("placard", p ?? null);
    form.setValue("bodyPoints", b ?? null);
    return handleSubmit(async (v) => {
      setFailure(null);
      if (p === undefined || b === undefined) return setFailure("See the messages beside the placard and body point fields.");
      await find(v);
    })(ev);
  };
  const find = async (v: CounterVehicle) => {
    try {
      props.onCandidates(v, await api<Candidates>("/api/shop/fitment/candidates", { body: v }));
    } catch (err) {
      placard.fromServer(err);
      setFailure(
        applyFieldErrors(err, setError, ["description", "boltPattern", "hubBoreMm", ...setupFieldNames("currentSetup"), "axleRatio"]),
      );
    }
  };
  const applySaved = (v: CustomerVehicle) => {
    reset({
      description: v.description,
      boltPattern: v.boltPattern,
      hubBoreMm: v.hubBoreMm === null ? "" : String(v.hubBoreMm),
      currentSetup: setupToForm(v.currentSetup),
      axleRatio: v.axleRatio ? String(v.axleRatio) : "",
    });
    placard.fill(v.placard, v.bodyPoints);
    props.onSaved(v.id);
    props.onEdited(false);
  };
  const edited = () => props.savedVehicle && !props.edited && props.onEdited(true);
  const picked = !!props.savedVehicle;
  return (
    <Card>
      <h2 className="text-lg font-semibold">2. Vehicle as it is now</h2>
      {saved.data && saved.data.length > 0 && (
        <div className="mt-2 flex flex-wrap gap-2 text-sm">
          <span className="self-center text-basalt-600">Saved:</span>
          {saved.data.map((v) => (
            <Button
              key={v.id}
              variant={props.savedVehicle === v.id ? "primary" : "secondary"}
              className="min-h-8 py-1"
              onClick={() => applySaved(v)}
            >
              {v.description} ({v.currentSetup.tire})
            </Button>
          ))}
        </div>
      )}
      <form onSubmit={onFind} onChange={edited} noValidate className="mt-3 grid gap-3 sm:grid-cols-3">
        <FailureRegion message={failure} className="sm:col-span-3" />
        <TextField label="Vehicle" hint="e.g. 2016 half-ton pickup" {...field("description")} />
        <TextField label="Bolt pattern" hint="e.g. 6x5.5 or 6x139.7" {...field("boltPattern")} />
        <TextField
          label="Hub bore (mm)"
          inputMode="decimal"
          hint="Optional; each wheel's centre bore is checked against it"
          {...field("hubBoreMm")}
        />
        <div className="sm:col-span-3">
          <SetupFields form={form} name="currentSetup" legend="Tires and wheels on it now" spacer={false} />
        </div>
        <div className="sm:col-span-3">
          <CounterPlacardFields placard={placard} />
        </div>
        <TextField
          label="Axle ratio (optional)"
          inputMode="decimal"
          hint="For the regear suggestion; 3.73 assumed if empty"
          {...field("axleRatio")}
        />
        <label className="flex items-center gap-2 self-center text-sm sm:col-span-3">
          <input
            type="checkbox"
            className="size-4 accent-ember-600"
            checked={props.saveVehicle && (!picked || props.edited)}
            disabled={picked && !props.edited}
            onChange={(ev) => props.onSaveVehicle(ev.target.checked)}
          />
          {picked ? "Save the changes to this saved vehicle" : "Save this vehicle to the customer"}
        </label>
        <Button type="submit" pending={formState.isSubmitting} className="justify-self-start">
          Find fitments
        </Button>
      </form>
    </Card>
  );
}
