"use client";
import { TextField } from "@/components/ui/TextField";
import type { MeasureEntry } from "@/lib/comparisons/measureEntry";

/**
 * A typed pressure, load or length whose unit follows the display choice (the label states it;
 * lib/comparisons/measureEntry reads it). The workspace's load and trail panels and the garage's
 * placard form use it.
 */
export function MeasureField({
  label,
  name,
  entry,
  onText,
  error,
  hint,
}: {
  label: string;
  name: string;
  entry: MeasureEntry;
  onText: (text: string) => void;
  error?: string;
  hint?: string;
}) {
  return (
    <TextField
      label={label}
      name={name}
      inputMode="decimal"
      autoComplete="off"
      value={entry.text}
      onChange={(ev) => onText(ev.target.value)}
      error={error}
      hint={hint}
    />
  );
}
