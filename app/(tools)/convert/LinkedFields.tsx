"use client";
import { useState } from "react";
import { TextField } from "@/components/ui/TextField";

/** One unit of a linked group: how its text becomes the base value and back. */
export interface LinkedUnit {
  key: string;
  label: string;
  /** Text → base value; throw or return null when the text is not a value. */
  read: (text: string) => number | null;
  /** Base value → text shown in this field. */
  show: (base: number) => string;
  /** Extra line under the field (e.g. the fraction of an inch). */
  extra?: (base: number) => string;
  hint?: string;
  /** What to type, shown after the field's label when the text is not a value, e.g. "enter a length like 120.65." */
  error: string;
  /** When `read` throws an Error, its message already names the field and says why: show it instead. */
  readSaysWhy?: boolean;
}

/**
 * A group of fields showing one quantity in several units: the field typed in last is the
 * source, the others show the converted value.
 */
export function LinkedFields({
  idPrefix,
  units,
  initial,
}: {
  idPrefix: string;
  units: LinkedUnit[];
  initial: { key: string; text: string };
}) {
  const [source, setSource] = useState(initial);
  const src = units.find((u) => u.key === source.key) ?? units[0];
  let base: number | null = null;
  let why: string | null = null;
  try {
    base = src ? src.read(source.text) : null;
  } catch (e) {
    base = null;
    if (src?.readSaysWhy && e instanceof Error) why = e.message;
  }
  if (base !== null && !Number.isFinite(base)) base = null;
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      {units.map((u) => {
        const isSource = u.key === source.key;
        const value = isSource ? source.text : base === null ? "" : u.show(base);
        // Every message names the field as labelled.
        const error = isSource && source.text.trim() !== "" && base === null ? (why ?? `${u.label}: ${u.error}`) : undefined;
        const extra = base !== null && u.extra ? u.extra(base) : null;
        return (
          <div key={u.key}>
            <TextField
              label={u.label}
              name={`${idPrefix}-${u.key}`}
              inputMode="text"
              autoComplete="off"
              value={value}
              onChange={(e) => setSource({ key: u.key, text: e.target.value })}
              error={error}
              hint={extra ?? u.hint}
            />
          </div>
        );
      })}
    </div>
  );
}
