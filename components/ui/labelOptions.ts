/** One choice of a select or a segmented switch. */
export interface LabelOption<T extends string> {
  value: T;
  label: string;
}

/**
 * A vocabulary's labels as the choices of a select or a segmented switch, so a screen offers
 * the words the feature's vocabulary says once instead of writing them again. `values` picks
 * and orders a subset (what the counter may record, say); by default every label, in the
 * vocabulary's order. `capitalize` is for vocabularies written to sit inside a sentence.
 *
 * @example
 * labelOptions({ ftlb: "ft·lb", nm: "N·m" }); // [{ value: "ftlb", label: "ft·lb" }, { value: "nm", label: "N·m" }]
 * labelOptions({ flange: "flange edge", "bead-seat": "bead seat" }, { capitalize: true })[0]; // { value: "flange", label: "Flange edge" }
 * labelOptions({ provider: "Card online", cash: "Cash" }, { values: ["cash"] }); // [{ value: "cash", label: "Cash" }]
 */
export function labelOptions<T extends string>(
  labels: Readonly<Record<T, string>>,
  { values = Object.keys(labels) as T[], capitalize = false }: { values?: readonly T[]; capitalize?: boolean } = {},
): LabelOption<T>[] {
  return values.map((value) => {
    const label = labels[value];
    return { value, label: capitalize ? label.charAt(0).toUpperCase() + label.slice(1) : label };
  });
}
