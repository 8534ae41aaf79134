"use client";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { Segmented } from "./Segmented";

/** The one unit switch (inch / metric) and the length style (decimals / fractions). */
export function DisplayToggle({ prefs, onChange }: { prefs: DisplayPrefs; onChange: (next: Partial<DisplayPrefs>) => void }) {
  return (
    <div className="flex flex-wrap items-end gap-4">
      <Segmented
        legend="Units"
        name="display-units"
        value={prefs.units}
        options={[
          { value: "imperial", label: "Inch" },
          { value: "metric", label: "Metric" },
        ]}
        onChange={(units) => onChange({ units })}
      />
      <Segmented
        legend="Inch lengths as"
        name="display-lengths"
        value={prefs.lengths}
        options={[
          { value: "decimal", label: "Decimals" },
          { value: "fraction", label: "Fractions" },
        ]}
        onChange={(lengths) => onChange({ lengths })}
      />
    </div>
  );
}
