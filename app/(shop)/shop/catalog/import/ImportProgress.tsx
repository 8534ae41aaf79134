/** The upload's or the import's progress bar, with its percentage announced as it moves. */
export function ImportProgress({ label, value, max }: { label: string; value: number; max: number }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor="import-progress" className="text-sm font-medium">
        {label}
      </label>
      <progress id="import-progress" className="h-3 w-full accent-ember-600" value={value} max={max} />
      <span className="text-xs text-basalt-600" aria-live="polite">
        {max ? Math.round((value / max) * 100) : 0} %
      </span>
    </div>
  );
}
