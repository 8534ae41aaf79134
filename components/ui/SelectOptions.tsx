/** The `<option>`s of a select, one per choice, in order. */
export function SelectOptions({ options }: { options: readonly { value: string; label: string }[] }) {
  return options.map((o) => (
    <option key={o.value} value={o.value}>
      {o.label}
    </option>
  ));
}
