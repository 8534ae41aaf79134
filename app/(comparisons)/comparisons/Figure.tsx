/** One headline figure of a saved comparison: its name over its value. */
export function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="min-w-[7.5rem]">
      <dt className="text-xs font-semibold uppercase tracking-wide text-basalt-500">{label}</dt>
      <dd className="font-display text-base font-bold tabular-nums text-basalt-950">{value}</dd>
    </div>
  );
}
