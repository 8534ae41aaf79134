import type { InputHTMLAttributes, Ref } from "react";
import { FieldMessages } from "@/components/ui/FieldMessages";

/** A labelled tick box whose error is tied to it for screen readers (like TextField). */
export function CheckField({
  id,
  label,
  error,
  ref,
  ...rest
}: InputHTMLAttributes<HTMLInputElement> & { id: string; label: string; error?: string; ref?: Ref<HTMLInputElement> }) {
  const errorId = `${id}-error`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="flex min-h-10 items-center gap-3 text-sm font-medium text-basalt-800">
        <input
          id={id}
          type="checkbox"
          ref={ref}
          className="size-5"
          aria-invalid={error ? true : undefined}
          aria-describedby={errorId}
          {...rest}
        />
        {label}
      </label>
      <FieldMessages errorId={errorId} error={error} />
    </div>
  );
}
