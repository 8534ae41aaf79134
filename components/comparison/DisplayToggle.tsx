"use client";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { Segmented } from "./Segmented";

/**
 * One switch of the display: the preference it sets, its legend, and the label of each value it
 * can take, in the order shown (a record, so a value without a label does not compile).
 */
interface PrefChoice<K extends keyof DisplayPrefs> {
  pref: K;
  legend: string;
  labels: Record<DisplayPrefs[K], string>;
}

const UNITS: PrefChoice<"units"> = { pref: "units", legend: "Units", labels: { imperial: "Inch", metric: "Metric" } };
const LENGTHS: PrefChoice<"lengths"> = {
  pref: "lengths",
  legend: "Inch lengths as",
  labels: { decimal: "Decimals", fraction: "Fractions" },
};

/** The one unit switch (inch / metric) and the length style (decimals / fractions). */
export function DisplayToggle({ prefs, onChange }: { prefs: DisplayPrefs; onChange: (next: Partial<DisplayPrefs>) => void }) {
  const choice = <K extends keyof DisplayPrefs>({ pref, legend, labels }: PrefChoice<K>) => (
    <Segmented
      legend={legend}
      name={`display-${pref}`}
      value={prefs[pref]}
      options={(Object.keys(labels) as DisplayPrefs[K][]).map((value) => ({ value, label: labels[value] }))}
      onChange={(value) => {
        const next: Partial<DisplayPrefs> = {};
        next[pref] = value;
        onChange(next);
      }}
    />
  );
  return (
    <div className="flex flex-wrap items-end gap-4">
      {choice(UNITS)}
      {choice(LENGTHS)}
    </div>
  );
}
