import type { InputHTMLAttributes, Ref } from "react";
import { cx } from "./cx";
import { FieldMessages, fieldIds } from "./FieldMessages";

interface Props extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  name: string;
  error?: string;
  hint?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A labelled input whose hint and error are tied to it for screen readers. */
export function TextField({ label, name, error, hint, id, className, ref, ...rest }: Props) {
  const { controlId: inputId, hintId, errorId, describedBy } = fieldIds(name, id, hint);
  return (
    <div className={cx("flex flex-col gap-1", className)}>
      <label htmlFor={inputId} className="text-sm font-medium text-basalt-800">
        {label}
      </label>
      <input
        id={inputId}
        name={name}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cx(
          "min-h-10 rounded-lg border bg-white px-3 py-2 text-base text-basalt-900 shadow-sm placeholder:text-basalt-500",
          error ? "border-contact-600" : "border-basalt-300 focus:border-ember-500",
        )}
        {...rest}
      />
      <FieldMessages hintId={hintId} errorId={errorId} hint={hint} error={error} />
    </div>
  );
}
