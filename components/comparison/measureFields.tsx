import type { MeasureEntry } from "@/lib/comparisons/measureEntry";
import { MeasureField } from "./MeasureField";

/**
 * The number fields of a panel whose figures follow the display choice (see useMeasureEntries):
 * returns a builder that draws the field for one key with its label, its hint, and as its message
 * the field's error followed by the note of a text left unconverted by a unit switch, both tied to
 * the input by aria-describedby (MeasureField).
 *
 * @example
 * const field = measureFields({ prefix: "trail", labels, hints: HINT, entries, set, errors, note });
 * return <div>{FIELDS.map(field)}</div>;
 */
export function measureFields<K extends string>({
  prefix,
  labels,
  hints,
  entries,
  set,
  errors,
  note,
}: {
  /** Names each input `${prefix}-${key}`. */
  prefix: string;
  labels: Record<K, string>;
  hints: Partial<Record<K, string>>;
  entries: Record<K, MeasureEntry>;
  set: (key: K, text: string) => void;
  errors: Partial<Record<K, string>>;
  note: (key: K) => string | undefined;
}) {
  return function measureField(k: K) {
    const message = [errors[k], note(k)].filter(Boolean).join(" ") || undefined;
    return (
      <MeasureField
        key={k}
        label={labels[k]}
        name={`${prefix}-${k}`}
        entry={entries[k]}
        onText={(text) => set(k, text)}
        error={message}
        hint={hints[k]}
      />
    );
  };
}
