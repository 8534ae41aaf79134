/** The ids a labelled control ties its hint and error to (aria-describedby). */
export function fieldIds(name: string, id: string | undefined, hint: string | undefined) {
  const controlId = id ?? `f-${name}`;
  const hintId = hint ? `${controlId}-hint` : undefined;
  const errorId = `${controlId}-error`;
  return { controlId, hintId, errorId, describedBy: [hintId, errorId].filter(Boolean).join(" ") };
}

/** A control's hint, and its error announced politely as it appears: shared by TextField and SelectField. */
export function FieldMessages({ hintId, errorId, hint, error }: { hintId?: string; errorId: string; hint?: string; error?: string }) {
  return (
    <>
      {hint && (
        <p id={hintId} className="text-xs text-basalt-500">
          {hint}
        </p>
      )}
      <p id={errorId} aria-live="polite" className="min-h-0 text-sm text-contact-600">
        {error}
      </p>
    </>
  );
}
