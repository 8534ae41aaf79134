import type { Ref, SelectHTMLAttributes } from "react";
import { FieldFrame } from "./FieldFrame";
import { SelectOptions } from "./SelectOptions";

interface Props extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  name: string;
  options: readonly { value: string; label: string }[];
  error?: string;
  hint?: string;
  /** Keep the label for screen readers only (a row of a list whose column says it). */
  hideLabel?: boolean;
  ref?: Ref<HTMLSelectElement>;
}

/** A labelled select whose hint and error are tied to it for screen readers, like TextField. */
export function SelectField({ label, name, options, error, hint, hideLabel, id, className, ref, ...rest }: Props) {
  return (
    <FieldFrame label={label} name={name} id={id} hint={hint} error={error} hideLabel={hideLabel} className={className}>
      {(control) => (
        <select {...control} name={name} ref={ref} {...rest}>
          <SelectOptions options={options} />
        </select>
      )}
    </FieldFrame>
  );
}
