"use client";
import { useId, useState } from "react";
import { Button } from "@/components/ui/Button";
import { comparisonNameSchema } from "@/lib/comparisons/savedSchema";

/** Renames a saved comparison in place: the name is checked with the same schema as the server's before it is sent. */
export function RenameForm({ name, onSave, onCancel }: { name: string; onSave: (name: string) => void; onCancel: () => void }) {
  const [value, setValue] = useState(name);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  return (
    <form
      noValidate
      className="flex flex-wrap items-start gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        const parsed = comparisonNameSchema.safeParse(value);
        if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? "Check the name.");
        onSave(parsed.data);
      }}
    >
      <div className="flex min-w-[14rem] flex-1 flex-col gap-1">
        <label htmlFor={id} className="text-sm font-medium text-basalt-800">
          New name
        </label>
        <input
          id={id}
          value={value}
          maxLength={120}
          autoFocus
          onChange={(e) => {
            setValue(e.target.value);
            setError(null);
          }}
          onKeyDown={(e) => e.key === "Escape" && onCancel()}
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-error`}
          className="min-h-10 rounded-lg border border-basalt-300 bg-white px-3 text-base"
        />
        <p id={`${id}-error`} aria-live="polite" className="text-sm text-contact-600">
          {error}
        </p>
      </div>
      <div className="flex gap-2 pt-6">
        <Button type="submit" className="min-h-9 py-1.5">
          Save name
        </Button>
        <Button type="button" variant="ghost" className="min-h-9 py-1.5" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
