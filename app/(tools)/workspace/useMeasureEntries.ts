"use client";
import { useState } from "react";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { type MeasureEntry, type Quantity, convertEntry, entryFromValue, measureUnit, typed } from "@/lib/comparisons/measureEntry";

interface EntriesState<K extends string> {
  entries: Record<K, MeasureEntry>;
  /** The display choice the texts were written for. */
  prefs: DisplayPrefs;
  /** Fields whose text did not read when the unit changed under them, with the unit they were typed in. */
  unconverted: Partial<Record<K, string>>;
}

const same = (a: DisplayPrefs, b: DisplayPrefs) => a.units === b.units && a.lengths === b.lengths;

/**
 * The figures of a panel whose units follow the display choice. When the choice changes each
 * figure is converted (lib/comparisons/measureEntry: convertEntry) at render time, the way the
 * workspace rewrites its own fields, so no figure is ever shown relabelled in another unit.
 * `note(key)` is the message for a field whose text could not be converted. `initial` fills
 * fields from stored values (kPa, kg, mm), written in the current choice (the garage's forms);
 * `fill` does the same later (the counter's saved vehicles).
 */
export function useMeasureEntries<K extends string>(
  quantities: Record<K, Quantity>,
  prefs: DisplayPrefs,
  initial?: Partial<Record<K, number | null>>,
) {
  const fromValues = (values: Partial<Record<K, number | null>> | undefined, p: DisplayPrefs): EntriesState<K> => {
    const entries = {} as Record<K, MeasureEntry>;
    for (const k of Object.keys(quantities) as K[]) {
      const v = values?.[k];
      entries[k] = v === undefined || v === null ? typed("") : entryFromValue(v, quantities[k], p);
    }
    return { entries, prefs: p, unconverted: {} };
  };
  const [state, setState] = useState<EntriesState<K>>(() => fromValues(initial, prefs));
  let s = state;
  if (!same(state.prefs, prefs)) {
    const entries = { ...state.entries };
    const unconverted: Partial<Record<K, string>> = {};
    for (const k of Object.keys(quantities) as K[]) {
      const r = convertEntry(state.entries[k], quantities[k], state.prefs, prefs);
      entries[k] = r.entry;
      if (r.unconverted) unconverted[k] = measureUnit(quantities[k], state.prefs);
      else if (state.unconverted[k] && r.entry.text === state.entries[k].text) unconverted[k] = state.unconverted[k];
    }
    s = { entries, prefs, unconverted };
    setState(s);
  }
  const set = (key: K, text: string) =>
    setState((prev) => {
      const unconverted = { ...prev.unconverted };
      delete unconverted[key];
      return { ...prev, entries: { ...prev.entries, [key]: typed(text) }, unconverted };
    });
  const note = (key: K): string | undefined => {
    const was = s.unconverted[key];
    return was
      ? `The unit is now ${measureUnit(quantities[key], prefs)}; this text, typed in ${was}, was not converted — check it, then retype it.`
      : undefined;
  };
  /** Every figure replaced by stored values (kPa, kg, mm), exact values kept: a saved record picked after the form opened. */
  const fill = (values: Partial<Record<K, number | null>> | null) => setState(fromValues(values ?? undefined, prefs));
  return { entries: s.entries, set, note, fill };
}
