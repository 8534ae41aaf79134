import { type DisplayPrefs, formatLoad } from "@/lib/comparisons/format";
import type { AxlePlan, LoadPlan, PressureReason } from "@/lib/comparisons/loadPlan";
import { pressureText } from "@/lib/comparisons/pressureText";
import { ColumnHeads } from "./ColumnHeads";

const REASON: Record<PressureReason, string> = {
  placard: "the placard load (equivalent pressure)",
  "axle load": "the axle load you entered",
  "road minimum": "the road minimum for this tire",
};

function AxleRow({ a, prefs }: { a: AxlePlan; prefs: DisplayPrefs }) {
  const name = a.axle === "front" ? "Front" : "Rear";
  return (
    <tr className="border-t border-basalt-100 align-top" data-testid={`load-${a.axle}`}>
      <th scope="row" className="py-2 pr-3 text-left font-semibold">
        {name}
      </th>
      <td className="py-2 pr-3">
        <span className="font-semibold" data-testid={`set-${a.axle}`}>
          {pressureText(a.pressureToSetKpa, prefs)}
        </span>
        <span className="block text-xs text-basalt-600">set by {REASON[a.decidedBy]}</span>
      </td>
      <td className="py-2 pr-3" data-testid={`equivalent-${a.axle}`}>
        {pressureText(a.equivalentKpa, prefs)}
        {a.equivalentKpa < a.minimumKpa && (
          <span className="block text-xs text-tight-800">below the road minimum {pressureText(a.minimumKpa, prefs)}</span>
        )}
      </td>
      <td className="py-2 pr-3">{formatLoad(a.tireLoadKg, prefs)}</td>
      <td className="py-2">{formatLoad(a.reserveKg, prefs)}</td>
    </tr>
  );
}

/** Per axle: the pressure to set, the equivalent pressure, the load per tire and the reserve. */
export function LoadPressureFigures({ plan, prefs }: { plan: LoadPlan; prefs: DisplayPrefs }) {
  const p = plan.planned;
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Cold pressures per axle (scrolls sideways on narrow screens)">
        <table className="w-full min-w-[36rem] text-sm">
          <caption className="mb-1 text-left text-sm text-basalt-700">
            Cold pressures for {p.text}, carrying what {plan.placard.text} carries at the placard pressure
          </caption>
          <thead>
            <ColumnHeads names={["Axle", "Pressure to set", "Equivalent pressure", "Load per tire", "Reserve at that pressure"]} />
          </thead>
          <tbody>
            {plan.axles.map((a) => (
              <AxleRow key={a.axle} a={a} prefs={prefs} />
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-sm" data-testid="sidewall-max">
        Maximum on the sidewall: {formatLoad(p.maxLoadKg, prefs)} at {pressureText(p.maxPressureKpa, prefs)}{" "}
        <span className="text-basalt-600">
          ({p.maxLoadSource}; {p.maxPressureSource})
        </span>
        . Road minimum {pressureText(p.minimumKpa, prefs)} <span className="text-basalt-600">({p.minimumSource})</span>.
      </p>
      {plan.axles.some((a) => a.abovePlacard) && (
        <p role="status" className="rounded-lg bg-tight-100 px-3 py-2 text-sm text-tight-800">
          An axle load you entered is above what the placard tire carries at the placard pressure: check the scale ticket and the placard,
          and do not load past the vehicle&apos;s axle ratings.
        </p>
      )}
      <ul className="list-disc pl-5 text-xs text-basalt-600">
        {plan.notes.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
    </div>
  );
}
