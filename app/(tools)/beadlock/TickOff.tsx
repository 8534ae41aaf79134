import { Button } from "@/components/ui/Button";
import { cx } from "@/components/ui/cx";
import { Segmented } from "@/components/comparison/Segmented";
import type { TorquePlan, TorqueUnit } from "@/lib/fitment";
import { torquePair } from "./torqueText";
import type { TickOff as TickOffState } from "./useTickOff";

/** What the status line says: where the technician is, at what torque, and which bolt is next. */
function statusText(plan: TorquePlan, unit: TorqueUnit, t: TickOffState): string {
  const p = plan.passes[t.pass];
  if (!p) return "";
  const cleared = t.cleared ? "The bolt count or torque changed, so the ticks were cleared. " : "";
  if (t.allDone) return `${cleared}All ${plan.passes.length} passes done. Re-check every bolt after the first run, as the maker says.`;
  const what = p.kind === "check" ? "check every bolt" : `${Math.round(p.fraction * 100)} %`;
  const where = `Pass ${p.pass} of ${plan.passes.length}, ${what}: ${torquePair(p.torqueNm, unit)}.`;
  if (t.next === null) return `${cleared}${where} All ${plan.boltCount} bolts done.`;
  return `${cleared}${where} ${t.done.size} of ${plan.boltCount} done — next: bolt ${t.next} (step ${p.sequence.indexOf(t.next) + 1}).`;
}

/**
 * Per-pass tick-off: a button that ticks the next bolt (one key press per bolt, and the focus
 * stays on it), a native checkbox per bolt in the order for ticking out of turn, a pass picker and
 * a reset. A polite live region says the next bolt after each tick.
 */
export function TickOff({ plan, unit, tick }: { plan: TorquePlan; unit: TorqueUnit; tick: TickOffState }) {
  const pass = plan.passes[tick.pass];
  const sequence = pass?.sequence ?? [];
  return (
    <section aria-labelledby="tickoff-title" className="no-print mt-4 w-full border-t border-basalt-100 pt-4">
      <h3 id="tickoff-title" className="text-base font-semibold">
        Tick off as you go
      </h3>
      <Segmented
        legend="Pass"
        name="tick-pass"
        value={String(tick.pass)}
        options={plan.passes.map((p, i) => ({ value: String(i), label: `Pass ${p.pass}${tick.complete[i] ? " (done)" : ""}` }))}
        onChange={(v) => tick.select(Number(v))}
        className="mt-2"
      />
      <p role="status" aria-live="polite" data-testid="tickoff-status" className="mt-2 text-sm text-basalt-800">
        {statusText(plan, unit, tick)}
      </p>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <Button type="button" onClick={tick.markNext} disabled={tick.next === null} className="min-h-12 text-base">
          {tick.next === null ? "Pass done" : `Mark bolt ${tick.next} done`}
        </Button>
        <Button type="button" variant="ghost" onClick={tick.reset}>
          Reset the tick-off
        </Button>
      </div>
      <ol
        className="mt-3 grid grid-cols-[repeat(auto-fill,minmax(6.5rem,1fr))] gap-1.5"
        aria-label={`Bolts in order, pass ${pass?.pass ?? ""}`}
      >
        {sequence.map((bolt, i) => {
          const done = tick.done.has(bolt);
          const next = tick.next === bolt;
          return (
            <li key={bolt}>
              <label
                className={cx(
                  "flex min-h-11 cursor-pointer items-center gap-2 rounded-lg px-2 py-1 ring-1 ring-inset has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-ember-500",
                  done
                    ? "bg-clear-100 text-clear-800 ring-clear-600/40"
                    : next
                      ? "bg-ember-50 ring-2 ring-ember-600"
                      : "bg-white ring-basalt-200",
                )}
              >
                <input type="checkbox" className="size-4 accent-clear-600" checked={done} onChange={() => tick.toggle(bolt)} />
                <span className="flex flex-col leading-tight">
                  <span className={cx("text-lg font-bold", done && "line-through")}>Bolt {bolt}</span>
                  <span className="text-xs text-basalt-600">
                    <span className="sr-only">,</span> step {i + 1}
                    {/* The status line already says which bolt is next; this is for the eye. */}
                    {next && (
                      <span aria-hidden className="font-semibold uppercase text-ember-700">
                        {" "}
                        · next
                      </span>
                    )}
                  </span>
                </span>
              </label>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
