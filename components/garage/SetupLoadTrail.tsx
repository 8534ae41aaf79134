import { LoadPressureFigures } from "@/components/comparison/LoadPressureFigures";
import { TrailAngleTable } from "@/components/comparison/TrailAngleTable";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { PRESSURE_CAUTION } from "@/lib/comparisons/pressureText";
import type { SetupFigures } from "@/lib/garage/loadFigures";

/**
 * The pressure to set and the trail-angle changes of a planned setup on a vehicle (the vehicle
 * page, the install checklist, the share page), with what is missing said in words and the
 * cautions beside the pressures.
 */
export function SetupLoadTrail({
  figures,
  missing,
  prefs,
}: {
  figures: SetupFigures | null;
  missing: { load: string | null; angles: string | null };
  prefs: DisplayPrefs;
}) {
  const load = figures?.load ?? null;
  const angles = figures?.angles ?? [];
  return (
    <section aria-labelledby="setup-load-title" className="flex flex-col gap-3" data-testid="setup-load-trail">
      <h3 id="setup-load-title" className="text-base font-semibold">
        Pressure to set and trail angles
      </h3>
      {load?.plan ? (
        <>
          <LoadPressureFigures plan={load.plan} prefs={prefs} />
          <p className="text-xs text-basalt-600">Axle loads from the vehicle&apos;s {load.from}.</p>
        </>
      ) : load && load.messages.length > 0 ? (
        <ul className="rounded-lg bg-contact-100 px-3 py-2 text-sm text-contact-800" role="status" data-testid="load-refused">
          {load.messages.map((m) => (
            <li key={m}>{m}</li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-basalt-600">{missing.load}</p>
      )}
      <p className="rounded-lg bg-tight-100 px-3 py-2 text-sm text-tight-800">{PRESSURE_CAUTION}</p>
      {angles.length > 0 ? (
        <TrailAngleTable angles={angles} />
      ) : (
        missing.angles && <p className="text-sm text-basalt-600">{missing.angles}</p>
      )}
      {figures?.angleMessages.map((m) => (
        <p key={m} className="text-sm text-contact-700">
          {m}
        </p>
      ))}
      {angles.length > 0 && (
        <p className="text-xs text-basalt-600">
          Body points as measured with the current tires, raised by the radius change; no lift change. A lift changes steering and driveline
          angles too: follow the lift maker&apos;s instructions and have the alignment checked.
        </p>
      )}
    </section>
  );
}
