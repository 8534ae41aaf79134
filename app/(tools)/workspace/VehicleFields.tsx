"use client";
import { useState } from "react";
import { Badge } from "@/components/ui/Badge";
import { TextField } from "@/components/ui/TextField";
import type { DraftErrors, VehicleDraft } from "@/lib/comparisons/draft";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { vehicleFieldLabel } from "@/lib/comparisons/fields";
import { DEFAULT_VEHICLE } from "@/lib/comparisons/model";

/** The two optional gear ratios that, with the axle ratio, give the crawl ratio. */
const CRAWL_FIELDS = [
  { key: "first", path: "firstGearRatio", hint: "The transmission's first gear, e.g. 4.03. With the low range it gives the crawl ratio." },
  {
    key: "low",
    path: "transferLowRatio",
    hint: "The transfer case's low range, e.g. 2.72. Crawl ratio = first gear × low range × axle ratio.",
  },
] as const;

/** Vehicle figures in a collapsible panel; each says when it is the default. */
export function VehicleFields({
  draft,
  defaults,
  errors,
  prefs,
  onChange,
  onCommit,
}: {
  draft: VehicleDraft;
  /** The default figures as text in the current units (to tell "default" from "entered"). */
  defaults: VehicleDraft;
  errors: DraftErrors;
  prefs: DisplayPrefs;
  onChange: (next: VehicleDraft) => void;
  onCommit: () => void;
}) {
  const e = (path: string) => errors[`vehicle.${path}`];
  const set = (patch: Partial<VehicleDraft>) => onChange({ ...draft, ...patch });
  const label = (path: Parameters<typeof vehicleFieldLabel>[0]) => vehicleFieldLabel(path, prefs);
  type Key = "kpi" | "axle" | "top" | "first" | "low" | "cruise" | "fender";
  const isDefault = (k: Key) => draft[k].trim() === defaults[k].trim();
  const tag = (k: Key) => (isDefault(k) ? " (default)" : "");
  const count = (["kpi", "axle", "top", "first", "low", "cruise", "fender"] as const).filter((k) => !isDefault(k)).length;
  const hasErrors = Object.keys(errors).some((k) => k.startsWith("vehicle."));
  // Open or closed is the person's choice (the summary toggles it). An error appearing opens the
  // panel so the message is seen; nothing closes it but the person: tying `open` to the errors
  // closed the panel, and took the focus, the moment a retyped figure became valid again.
  const [open, setOpen] = useState(hasErrors);
  const [hadErrors, setHadErrors] = useState(hasErrors);
  if (hasErrors !== hadErrors) {
    setHadErrors(hasErrors);
    if (hasErrors) setOpen(true);
  }
  return (
    <details
      className="group rounded-card bg-white shadow-card ring-1 ring-basalt-100"
      open={open}
      onToggle={(ev) => setOpen(ev.currentTarget.open)}
    >
      <summary className="flex cursor-pointer list-none items-center justify-between gap-3 rounded-card px-4 py-3 font-semibold sm:px-5">
        <span>
          Vehicle details{" "}
          <span className="font-normal text-basalt-500">— kingpin inclination, gearing, crawl ratio, cruise speeds, fender line</span>
        </span>
        <span className="flex items-center gap-2">
          {count === 0 ? <Badge>all defaults</Badge> : <Badge tone="ember">{count} entered</Badge>}
          {hasErrors && <Badge tone="contact">check</Badge>}
          <span aria-hidden className="transition-transform group-open:rotate-180">
            ▾
          </span>
        </span>
      </summary>
      <div className="grid gap-3 border-t border-basalt-100 px-4 py-4 sm:grid-cols-2 sm:px-5 lg:grid-cols-3" onBlur={onCommit}>
        <TextField
          label={`${label("kingpinInclinationDeg")}${tag("kpi")}`}
          name="vehicle-kpi"
          inputMode="decimal"
          placeholder="not set"
          value={draft.kpi}
          onChange={(ev) => set({ kpi: ev.target.value })}
          error={e("kingpinInclinationDeg")}
          hint="Default: not set (scrub then counts the wheel shift only). From the vehicle's alignment specifications."
        />
        <TextField
          label={`${label("axleRatio")}${tag("axle")}`}
          name="vehicle-axle"
          inputMode="decimal"
          value={draft.axle}
          onChange={(ev) => set({ axle: ev.target.value })}
          error={e("axleRatio")}
          hint={`Default ${DEFAULT_VEHICLE.axleRatio.toFixed(2)}, a common factory ratio.`}
        />
        <TextField
          label={`${label("transmissionRatio")}${tag("top")}`}
          name="vehicle-top"
          inputMode="decimal"
          value={draft.top}
          onChange={(ev) => set({ top: ev.target.value })}
          error={e("transmissionRatio")}
          hint={`Default ${DEFAULT_VEHICLE.transmissionRatio.toFixed(2)} (direct); an overdrive is below 1, e.g. 0.70.`}
        />
        {CRAWL_FIELDS.map((f) => (
          <TextField
            key={f.key}
            label={label(f.path)}
            name={`vehicle-${f.key}`}
            inputMode="decimal"
            placeholder="not set"
            value={draft[f.key]}
            onChange={(ev) => set({ [f.key]: ev.target.value })}
            error={e(f.path)}
            hint={f.hint}
          />
        ))}
        <TextField
          label={`${label("cruiseSpeedsMph")}${tag("cruise")}`}
          name="vehicle-cruise"
          value={draft.cruise}
          onChange={(ev) => set({ cruise: ev.target.value })}
          error={e("cruiseSpeedsMph")}
          hint={`Default ${defaults.cruise}; up to six, separated by commas.`}
        />
        <TextField
          label={`${label("fenderLineMm")}${tag("fender")}`}
          name="vehicle-fender"
          value={draft.fender}
          placeholder="not measured"
          onChange={(ev) => set({ fender: ev.target.value })}
          error={e("fenderLineMm")}
          hint={`Optional. Drop a plumb line from the fender edge; measure out from the hub face to it${prefs.units === "metric" ? ", in mm, e.g. 140" : ", in inches, e.g. 5-1/2 or 5.5"}.`}
        />
      </div>
    </details>
  );
}
