import type { ReactNode } from "react";
import { cx } from "./cx";
import { FieldMessages, fieldIds } from "./FieldMessages";

/** What a field's control carries: its id, its state and messages for screen readers, its look. */
export interface FieldControlProps {
  id: string;
  "aria-invalid": true | undefined;
  "aria-describedby": string;
  className: string;
}

/**
 * A labelled control with its hint and error tied to it (aria-describedby) and the error
 * announced as it appears: the frame TextField and SelectField share. `children` draws the
 * control from the props it must carry.
 *
 * @example
 * <FieldFrame label="Tire size" name="tire" hint="e.g. 265/70R17">{(control) => <input {...control} name="tire" />}</FieldFrame>
 */
export function FieldFrame({
  label,
  name,
  id,
  hint,
  error,
  hideLabel,
  className,
  children,
}: {
  label: string;
  name: string;
  id?: string;
  hint?: string;
  error?: string;
  /** Keep the label for screen readers only (a row of a list whose column says it). */
  hideLabel?: boolean;
  className?: string;
  children: (control: FieldControlProps) => ReactNode;
}) {
  const { controlId, hintId, errorId, describedBy } = fieldIds(name, id, hint);
  return (
    <div className={cx("flex flex-col gap-1", className)}>
      <label htmlFor={controlId} className={hideLabel ? "sr-only" : "text-sm font-medium text-basalt-800"}>
        {label}
      </label>
      {children({
        id: controlId,
        "aria-invalid": error ? true : undefined,
        "aria-describedby": describedBy,
        className: cx(
          "min-h-10 rounded-lg border bg-white px-3 py-2 text-base text-basalt-900 shadow-sm",
          error ? "border-contact-600" : "border-basalt-300 focus:border-ember-500",
        ),
      })}
      <FieldMessages hintId={hintId} errorId={errorId} hint={hint} error={error} />
    </div>
  );
}
