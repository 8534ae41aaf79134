import { BulletList } from "@/components/ui/BulletList";
import { type FigureColumn, FigureTable } from "@/components/ui/FigureTable";
import { type DisplayPrefs, formatLoad } from "@/lib/comparisons/format";
import type { AxlePlan, LoadPlan, PressureReason } from "@/lib/comparisons/loadPlan";
import { messageInUnits, pressureText } from "@/lib/comparisons/pressureText";

const REASON: Record<PressureReason, string> = {
  placard: "the placard load (equivalent pressure)",
  "axle load": "the axle load you entered",
  "road minimum": "the road minimum for this tire",
};

/** The columns per axle; the pressures and loads follow the display choice. */
const columns = (prefs: DisplayPrefs): FigureColumn<AxlePlan>[] => [
  { id: "axle", header: "Axle", cell: (a) => (a.axle === "front" ? "Front" : "Rear") },
  {
    id: "set",
    header: "Pressure to set",
    cell: (a) => (
      <>
        <span className="font-semibold" data-testid={`set-${a.axle}`}>
          {pressureText(a.pressureToSetKpa, prefs)}
        </span>
        <span className="block text-xs text-basalt-600">set by {REASON[a.decidedBy]}</span>
      </>
    ),
  },
  {
    id: "equivalent",
    header: "Equivalent pressure",
    cellTestId: (a) => `equivalent-${a.axle}`,
    cell: (a) => (
      <>
        {pressureText(a.equivalentKpa, prefs)}
        {a.equivalentKpa < a.minimumKpa && (
          <span className="block text-xs text-tight-800">below the road minimum {pressureText(a.minimumKpa, prefs)}</span>
        )}
      </>
    ),
  },
  { id: "load", header: "Load per tire", cell: (a) => formatLoad(a.tireLoadKg, prefs) },
  { id: "reserve", header: "Reserve at that pressure", cell: (a) => formatLoad(a.reserveKg, prefs) },
];

/** Per axle: the pressure to set, the equivalent pressure, the load per tire and the reserve. */
export function LoadPressureFigures({ plan, prefs }: { plan: LoadPlan; prefs: DisplayPrefs }) {
  const p = plan.planned;
  return (
    <div className="flex flex-col gap-3">
      <FigureTable
        look="quiet"
        columns={columns(prefs)}
        rows={plan.axles}
        rowKey={(a) => a.axle}
        rowTestId={(a) => `load-${a.axle}`}
        caption={`Cold pressures for ${p.text}, carrying what ${plan.placard.text} carries at the placard pressure`}
        className="min-w-[36rem]"
        scrollRegion={{ label: "Cold pressures per axle (scrolls sideways on narrow screens)" }}
      />
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
      {/* The engine's notes in the panel's units, loads and pressures alike, as its messages are. */}
      <BulletList items={plan.notes.map((n) => messageInUnits(n, prefs))} className="text-xs text-basalt-600" />
    </div>
  );
}
