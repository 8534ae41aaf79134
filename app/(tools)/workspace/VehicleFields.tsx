"use client";
import { useState } from "react";
import { Badge } from "@/components/ui/Badge";
import { TextField } from "@/components/ui/TextField";
import type { DraftErrors, VehicleDraft } from "@/lib/comparisons/draft";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { vehicleFieldLabel } from "@/lib/comparisons/fields";
import { DEFAULT_VEHICLE } from "@/lib/comparisons/model";

type Key = "kpi" | "axle" | "top" | "first" | "low" | "cruise" | "fender";

/** One figure of the panel: the draft's key, the field path its label and errors go by, its hint. */
interface VehicleField {
  key: Key;
  path: Parameters<typeof vehicleFieldLabel>[0];
  hint: string;
  decimal?: boolean;
  placeholder?: string;
  /** The label says " (default)" while the figure is the default. */
  tagged?: boolean;
}

/** The panel's figures in order; the two optional gear ratios give, with the axle ratio, the crawl ratio. */
const vehicleFields = (defaults: VehicleDraft, prefs: DisplayPrefs): VehicleField[] => [
  {
    key: "kpi",
    path: "kingpinInclinationDeg",
    decimal: true,
    placeholder: "not set",
    tagged: true,
    hint: "Default: not set (scrub then counts the wheel shift only). From the vehicle's alignment specifications.",
  },
  {
    key: "axle",
    path: "axleRatio",
    decimal: true,
    tagged: true,
    hint: `Default ${DEFAULT_VEHICLE.axleRatio.toFixed(2)}, a common factory ratio.`,
  },
  {
    key: "top",
    path: "transmissionRatio",
    decimal: true,
    tagged: true,
    hint: `Default ${DEFAULT_VEHICLE.transmissionRatio.toFixed(2)} (direct); an overdrive is below 1, e.g. 0.70.`,
  },
  {
    key: "first",
    path: "firstGearRatio",
    decimal: true,
    placeholder: "not set",
    hint: "The transmission's first gear, e.g. 4.03. With the low range it gives the crawl ratio.",
  },
  {
    key: "low",
    path: "transferLowRatio",
    decimal: true,
    placeholder: "not set",
    hint: "The transfer case's low range, e.g. 2.72. Crawl ratio = first gear × low range × axle ratio.",
  },
  { key: "cruise", path: "cruiseSpeedsMph", tagged: true, hint: `Default ${defaults.cruise}; up to six, separated by commas.` },
  {
    key: "fender",
    path: "fenderLineMm",
    placeholder: "not measured",
    tagged: true,
    hint: `Optional. Drop a plumb line from the fender edge; measure out from the hub face to it${prefs.units === "metric" ? ", in mm, e.g. 140" : ", in inches, e.g. 5-1/2 or 5.5"}.`,
  },
];

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
  const isDefault = (k: Key) => draft[k].trim() === defaults[k].trim();
  const tag = (k: Key) => (isDefault(k) ? " (default)" : "");
  const fields = vehicleFields(defaults, prefs);
  const count = fields.filter((f) => !isDefault(f.key)).length;
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
        {fields.map((f) => (
          <TextField
            key={f.key}
            label={`${label(f.path)}${f.tagged ? tag(f.key) : ""}`}
            name={`vehicle-${f.key}`}
            inputMode={f.decimal ? "decimal" : undefined}
            placeholder={f.placeholder}
            value={draft[f.key]}
            onChange={(ev) => set({ [f.key]: ev.target.value })}
            error={e(f.path)}
            hint={f.hint}
          />
        ))}
      </div>
    </details>
  );
}
