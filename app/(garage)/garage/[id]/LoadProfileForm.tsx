"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { MeasureField } from "@/components/comparison/MeasureField";
import { VehicleKindChoice } from "@/components/comparison/VehicleKindChoice";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import type { VehicleKind } from "@/lib/fitment";
import {
  type CurrentTire,
  type LoadProfile,
  type MeasureKey,
  PROFILE_QUANTITIES,
  type ProfileErrors,
  type ProfileField,
  PROFILE_SPEC,
  profileLabels,
} from "@/lib/garage/loadProfile";
import { readProfileForm } from "@/lib/garage/loadProfileForm";
import { ApiError, api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { useMeasureEntries } from "@/app/(tools)/workspace/useMeasureEntries";

const GROUPS: { legend: string; keys: MeasureKey[]; note?: string }[] = [
  { legend: "Door placard", keys: ["placardFrontKpa", "placardRearKpa", "frontGawrKg", "rearGawrKg"] },
  {
    legend: "Scale ticket",
    keys: ["frontAxleKg", "rearAxleKg"],
    note: "Weigh each axle loaded as you drive. Without a ticket the pressure is set for the axle ratings.",
  },
  {
    legend: "Body points, measured with the current tires",
    keys: ["frontCornerHeightMm", "frontCornerAheadMm", "rearCornerHeightMm", "rearCornerBehindMm", "midHeightMm", "wheelbaseMm"],
    note: "On level ground at normal load, as the drawing shows.",
  },
];

/**
 * The vehicle's placard, scale weights and body points, typed in the inch/metric choice and stored
 * whole in SI. Messages come from the same checks the server runs (lib/garage/loadProfile.ts);
 * after a first save attempt they follow every keystroke and unit switch.
 */
export function LoadProfileForm({
  vehicleId,
  profile,
  current,
  prefs,
}: {
  vehicleId: string;
  profile: LoadProfile | null;
  current: CurrentTire;
  prefs: DisplayPrefs;
}) {
  const qc = useQueryClient();
  const { entries, set, note } = useMeasureEntries<MeasureKey>(PROFILE_QUANTITIES, prefs, profile ?? undefined);
  const [placardTire, setPlacardTire] = useState(profile?.placardTire ?? "");
  const [vehicleKind, setVehicleKind] = useState<VehicleKind>(profile?.vehicleKind ?? "light-truck");
  const [tried, setTried] = useState(false);
  const [server, setServer] = useState<ProfileErrors>({});
  const [status, setStatus] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [pending, setPending] = useState(false);
  const labels = profileLabels(prefs.units);

  const read = useMemo(
    () => readProfileForm({ entries, placardTire, vehicleKind }, prefs, current),
    [entries, placardTire, vehicleKind, prefs, current],
  );
  const errors: ProfileErrors = tried ? { ...read.errors, ...server } : server;
  const message = (k: ProfileField) => {
    const n = k === "placardTire" ? undefined : note(k);
    return [errors[k], n].filter(Boolean).join(" ") || undefined;
  };
  const edit = (k: ProfileField) => {
    setStatus(null);
    setServer(({ [k]: _, ...rest }) => rest);
  };

  const save = async (ev: React.FormEvent) => {
    ev.preventDefault();
    setTried(true);
    setStatus(null);
    if (!read.profile) {
      setStatus({ tone: "error", text: "Nothing was saved: see the messages beside the fields." });
      return;
    }
    setPending(true);
    try {
      const res = await api<{ profile: LoadProfile }>(`/api/vehicles/${vehicleId}/load`, { method: "PUT", body: read.profile });
      qc.setQueryData(queryKeys.garage.loadProfile(vehicleId), res);
      setStatus({ tone: "success", text: "Saved." });
    } catch (e) {
      const fe = e instanceof ApiError ? e.body.fieldErrors : undefined;
      if (fe) setServer(Object.fromEntries(Object.entries(fe).map(([k, m]) => [k, m[0]])) as ProfileErrors);
      setStatus({
        tone: "error",
        text: fe ? "Nothing was saved: see the messages beside the fields." : e instanceof Error ? e.message : "Something went wrong.",
      });
    } finally {
      setPending(false);
    }
  };

  // The props of one figure's field; its text is converted on a unit switch by useMeasureEntries.
  const fieldProps = (k: MeasureKey) => ({
    label: labels[k],
    name: `profile-${k}`,
    entry: entries[k],
    onText: (t: string) => {
      set(k, t);
      edit(k);
    },
    error: message(k),
    hint: `e.g. ${PROFILE_SPEC[k].example[prefs.units]}`,
  });
  const field = (k: MeasureKey) => <MeasureField key={k} {...fieldProps(k)} />;

  return (
    <form onSubmit={save} noValidate className="flex flex-col gap-4" aria-label="Placard, scale weights and body points">
      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="mb-1 text-sm font-semibold">{GROUPS[0]!.legend}</legend>
        <TextField
          label={labels.placardTire}
          name="profile-placardTire"
          autoComplete="off"
          value={placardTire}
          onChange={(ev) => {
            setPlacardTire(ev.target.value);
            edit("placardTire");
          }}
          error={message("placardTire")}
          hint="As printed on the door placard, with its load index (e.g. P265/70R17 113S)."
        />
        <VehicleKindChoice name="profile-vehicleKind" value={vehicleKind} onChange={setVehicleKind} />
        {GROUPS[0]!.keys.map(field)}
      </fieldset>
      {GROUPS.slice(1).map((g) => (
        <fieldset key={g.legend} className="grid gap-3 sm:grid-cols-2">
          <legend className="mb-1 text-sm font-semibold">{g.legend}</legend>
          {g.note && <p className="text-sm text-basalt-600 sm:col-span-2">{g.note}</p>}
          {g.keys.map(field)}
        </fieldset>
      ))}
      <div aria-live="polite">{status && <Alert tone={status.tone}>{status.text}</Alert>}</div>
      <Button type="submit" pending={pending} className="self-start">
        Save placard and body points
      </Button>
    </form>
  );
}
