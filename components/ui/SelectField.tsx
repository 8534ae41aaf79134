import type { Ref, SelectHTMLAttributes } from "react";
import { cx } from "./cx";
import { FieldMessages, fieldIds } from "./FieldMessages";

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
  const { controlId: selectId, hintId, errorId, describedBy } = fieldIds(name, id, hint);
  return (
    <div className={cx("flex flex-col gap-1", className)}>
      <label htmlFor={selectId} className={hideLabel ? "sr-only" : "text-sm font-medium text-basalt-800"}>
        {label}
      </label>
      <select
        id={selectId}
        name={name}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cx(
          "min-h-10 rounded-lg border bg-white px-3 py-2 text-base text-basalt-900 shadow-sm",
          error ? "border-contact-600" : "border-basalt-300 focus:border-ember-500",
        )}
        {...rest}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FieldMessages hintId={hintId} errorId={errorId} hint={hint} error={error} />
    </div>
  );
}
