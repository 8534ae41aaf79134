export function PageLoading({ label = "Loading" }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-16 text-basalt-500">
      <span aria-hidden className="size-5 animate-spin rounded-full border-2 border-ember-500 border-t-transparent" />
      {label}…
    </div>
  );
}
