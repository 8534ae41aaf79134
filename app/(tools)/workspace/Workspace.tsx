"use client";
import { type ReactNode, useCallback, useEffect, useMemo, useRef, useState } from "react";
import { ChartsSection } from "@/components/comparison/ChartsSection";
import type { DrawnLimits } from "@/components/comparison/CrossSection";
import { DisplayToggle } from "@/components/comparison/DisplayToggle";
import { DrawingAndWarnings } from "@/components/comparison/DrawingAndWarnings";
import { HeadlineChanges } from "@/components/comparison/ResultsPanel";
import { LazySetupDetailTable } from "@/components/comparison/LazySetupDetailTable";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { Button } from "@/components/ui/Button";
import { MountWhenNear } from "@/components/ui/MountWhenNear";
import { clientLazy } from "@/components/ui/clientLazy";
import { computeComparison } from "@/lib/comparisons/compute";
import { type Draft, type DraftErrors, type SetupDraft, draftFromInput, followTire, inchText } from "@/lib/comparisons/draft";
import { fenderUnit, speedUnit, vehicleFieldLabel } from "@/lib/comparisons/fields";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { type ComparisonInput, DEFAULT_INPUT } from "@/lib/comparisons/model";
import { WORKSPACE_PATH, workspaceParam, workspaceUrl } from "@/lib/comparisons/url";
import { type LinkProblem, problemText } from "@/lib/setup/url";
import type { WorkspaceVehicle } from "@/lib/garage/types";
import { CurrentInputContext } from "./currentInput";
import { SetupDraftFields } from "./SetupDraftFields";
import { useAddressBar } from "./useAddressBar";
import { type Reading, loadReading, readingNow, useReading } from "./useReading";
import { VehicleFields } from "./VehicleFields";

// Below the fold on every screen: their code loads when they are scrolled near (MountWhenNear below).
const LoadPressurePanel = clientLazy(() => import("./LoadPressurePanel").then((m) => m.LoadPressurePanel));
const TrailAnglesPanel = clientLazy(() => import("./TrailAnglesPanel").then((m) => m.TrailAnglesPanel));

// Only members with vehicles load the garage panel (and the prediction code with it).
const GaragePanel = clientLazy(
  () => import("./GaragePanel").then((m) => m.default),
  () => <div className="h-24 animate-pulse rounded-card bg-basalt-50" role="status" aria-label="Loading your garage" />,
);

interface State {
  draft: Draft;
  errors: DraftErrors;
  /** The last complete, valid comparison: what the results show. */
  good: ComparisonInput;
  /** The display choice the draft's text was written for. */
  prefs: DisplayPrefs;
}

const fromInput = (input: ComparisonInput, prefs: DisplayPrefs): State => ({
  draft: draftFromInput(input, prefs),
  errors: {},
  good: input,
  prefs,
});
const sameprefs = (a: DisplayPrefs, b: DisplayPrefs) => a.units === b.units && a.lengths === b.lengths;

/**
 * Rewrites unit-dependent text for a new display choice, each field from its own text: one that
 * reads is converted whatever the other fields hold; one that does not keeps its text, and its
 * message says the unit changed under it (never a figure silently relabelled).
 */
function reformat({ convertDraft, readDraft }: Reading, s: State, prefs: DisplayPrefs): State {
  const { draft, unconverted } = convertDraft(s.draft, s.good, s.prefs, prefs);
  const read = readDraft(draft, prefs);
  const errors = { ...read.errors };
  for (const path of unconverted) {
    const unit = path === "cruiseSpeedsMph" ? speedUnit(prefs) : fenderUnit(prefs);
    const key = `vehicle.${path}`;
    const note = `The unit is now ${unit}; this text was not converted.`;
    errors[key] = errors[key]
      ? `${errors[key]} ${note}`
      : `${vehicleFieldLabel(path, prefs)}: “${path === "cruiseSpeedsMph" ? draft.vehicle.cruise : draft.vehicle.fender}” did not read in ${path === "cruiseSpeedsMph" ? speedUnit(s.prefs) : fenderUnit(s.prefs)}. ${note} Check it, then retype it.`;
  }
  const clean = Object.keys(errors).length === 0;
  return { draft, errors, good: clean && read.input ? read.input : s.good, prefs };
}

/**
 * `saveSlot`: controls shown in the toolbar (the save control), reading the comparison through
 * CurrentInputContext. The workspace writes its own URL (workspaceUrl) from what it knows — the
 * comparison, the saved comparison it belongs to, the garage vehicle picked — never from what the
 * address bar happens to hold, so no write loses `saved` or `v`.
 */
export function Workspace({
  initialInput,
  initialProblems,
  saveSlot,
  garage,
  savedId: openedId = null,
}: {
  initialInput: ComparisonInput;
  /** Values of the opening link that could not be used, each with what replaced it. */
  initialProblems: LinkProblem[];
  saveSlot?: ReactNode;
  /** The signed-in member's vehicles (none for visitors and shop roles). */
  garage?: { vehicles: WorkspaceVehicle[]; initialVehicleId: string | null } | null;
  /** The caller's saved comparison this workspace was opened from (null: none). */
  savedId?: string | null;
}) {
  const [storedPrefs, setPrefs] = useDisplayPrefs();
  const reading = useReading();
  const [state, setState] = useState<State>(() => fromInput(initialInput, storedPrefs));
  const [linkProblems, setLinkProblems] = useState(initialProblems);
  const [copied, setCopied] = useState<"idle" | "done" | "failed">("idle");
  const [vehicleId, setVehicleId] = useState<string | null>(garage?.initialVehicleId ?? null);
  const [savedId, setSavedId] = useState<string | null>(openedId);
  const [limits, setLimits] = useState<DrawnLimits | null>(null);
  // An edit (typing in one field) is one history entry: the first change pushes, the rest replace.
  const editOpen = useRef(false);
  // An entry made before the reading code arrived: its text is kept, and read when the code lands.
  const pendingRead = useRef<{ discrete: boolean } | null>(null);

  // The stored unit choice arrives after hydration: rewrite the text for it (render-time update).
  // Until the reading code is here everything shows in the units the text is written in.
  let s = state;
  if (reading && !sameprefs(state.prefs, storedPrefs)) {
    s = reformat(reading, state, storedPrefs);
    setState(s);
  }
  const prefs = s.prefs;

  const writeUrl = useAddressBar();

  const apply = useCallback(
    (draft: Draft, discrete = false) => {
      if (!reading) {
        setState((prev) => ({ ...prev, draft }));
        pendingRead.current = { discrete };
        return;
      }
      const read = reading.readDraft(draft, prefs);
      setState((prev) => ({ draft, errors: read.errors, good: read.input ?? prev.good, prefs }));
      if (read.input) {
        writeUrl(workspaceUrl({ input: read.input, savedId, vehicleId }), editOpen.current && !discrete ? "replace" : "push");
        editOpen.current = !discrete;
      }
    },
    [reading, prefs, writeUrl, savedId, vehicleId],
  );
  const commit = useCallback(() => {
    editOpen.current = false;
  }, []);

  const draftNow = s.draft;
  useEffect(() => {
    const pending = pendingRead.current;
    if (!reading || !pending) return;
    pendingRead.current = null;
    apply(draftNow, pending.discrete);
  }, [reading, apply, draftNow]);

  /** Shows the comparison the address bar holds; `unless`: not when it is that comparison already. */
  const showAddressBar = useCallback(
    (unless?: ComparisonInput) => {
      const search = window.location.search;
      const show = ({ decodeComparison }: Reading) => {
        const { input } = decodeComparison(search);
        if (unless && workspaceUrl({ input }) === workspaceUrl({ input: unless })) return;
        pendingRead.current = null;
        setState(fromInput(input, prefs));
        // The saved comparison stays the one being worked on (the save control keeps it too).
        const v = workspaceParam(search, "vehicle");
        setVehicleId(garage?.vehicles.some((x) => x.id === v) ? v : null);
        setLinkProblems([]);
      };
      const now = readingNow();
      if (now) show(now);
      // The same fetch as useReading's: if it fails, useReading shows the error.
      else loadReading().then(show, () => undefined);
    },
    [prefs, garage],
  );

  useEffect(() => {
    const onPop = () => {
      editOpen.current = false;
      showAddressBar();
    };
    window.addEventListener("popstate", onPop);
    return () => window.removeEventListener("popstate", onPop);
  }, [showAddressBar]);

  // Back or Forward into the workspace from another page: Next shows the page as it was first
  // rendered, while the address bar holds the edits made after. The address bar wins. A bare
  // /workspace is the page as rendered, so the reading code is not fetched for it.
  const opened = useRef({ initialInput, showAddressBar });
  useEffect(() => {
    const { initialInput: rendered, showAddressBar: showOnce } = opened.current;
    if (window.location.search !== "" && workspaceUrl({ input: rendered }) !== WORKSPACE_PATH + window.location.search) showOnce(rendered);
  }, []);

  const good = s.good;
  const pickVehicle = useCallback(
    (id: string | null) => {
      setVehicleId(id);
      writeUrl(workspaceUrl({ input: good, savedId, vehicleId: id }), "replace");
    },
    [good, savedId, writeUrl],
  );
  const onSaved = useCallback(
    (id: string) => {
      setSavedId(id);
      // A reload keeps the saved comparison: every later write names it too.
      writeUrl(workspaceUrl({ input: good, savedId: id, vehicleId }), "replace");
    },
    [good, vehicleId, writeUrl],
  );
  const takeVehicle = (v: WorkspaceVehicle) => {
    const next: ComparisonInput = {
      ...s.good,
      current: v.currentSetup,
      vehicle: {
        ...s.good.vehicle,
        kingpinInclinationDeg: v.kingpinInclinationDeg,
        axleRatio: v.axleRatio ?? DEFAULT_INPUT.vehicle.axleRatio,
        transmissionRatio: v.transmissionRatio ?? DEFAULT_INPUT.vehicle.transmissionRatio,
      },
    };
    apply(draftFromInput(next, prefs), true);
  };

  const result = useMemo(() => computeComparison(s.good), [s.good]);
  const defaultsText = useMemo(() => draftFromInput(DEFAULT_INPUT, prefs).vehicle, [prefs]);
  const errorCount = Object.keys(s.errors).length;

  const setupProps = (side: "current" | "planned") => ({
    side,
    draft: s.draft[side],
    errors: s.errors,
    figures: result[side],
    prefs,
    onCommit: commit,
    onChange: (next: SetupDraft, discrete?: boolean) => apply({ ...s.draft, [side]: next }, discrete),
    onTireChange: (tire: string) => apply({ ...s.draft, [side]: followTire(s.draft[side], tire) }),
    onModeChange: (mode: SetupDraft["mode"]) => {
      // Switching keeps the same wheel: the other figure is filled in from the last valid one.
      const f = result[side];
      const d = s.draft[side];
      const next: SetupDraft =
        mode === "offset"
          ? { ...d, mode, offset: String(Math.round(f.offsetMm * 100) / 100) }
          : {
              ...d,
              mode,
              backspacing: inchText(d.reference === "flange" ? f.backspacingFlangeIn : f.backspacingBeadSeatIn, prefs),
              flange: d.flange.trim() === "" ? inchText(f.flangeAllowanceIn, prefs) : d.flange,
            };
      apply({ ...s.draft, [side]: next }, true);
    },
  });

  const swap = () => apply({ ...s.draft, current: s.draft.planned, planned: s.draft.current }, true);
  const copyLink = async () => {
    try {
      // From what the screen shows, not from the address bar, which may be a moment behind.
      await navigator.clipboard.writeText(new URL(workspaceUrl({ input: s.good, savedId, vehicleId }), window.location.origin).href);
      setCopied("done");
    } catch {
      setCopied("failed");
    }
  };

  return (
    <CurrentInputContext value={{ input: s.good, complete: errorCount === 0, vehicleId: garage ? vehicleId : undefined, onSaved }}>
      <div className="flex flex-col gap-6">
        <div className="flex flex-wrap items-end justify-between gap-4">
          <DisplayToggle prefs={prefs} onChange={setPrefs} />
          <div className="flex flex-wrap items-center gap-2">
            <Button variant="secondary" onClick={swap}>
              Swap current and planned
            </Button>
            <Button variant="secondary" onClick={copyLink}>
              Copy link
            </Button>
            <span role="status" className="min-w-[9rem] text-sm text-basalt-600">
              {copied === "done" ? "Link copied." : copied === "failed" ? "Copy the address bar instead." : ""}
            </span>
          </div>
        </div>
        {saveSlot}
        {linkProblems.length > 0 && (
          <div role="status" className="rounded-lg bg-tight-100 px-3 py-2 text-sm text-tight-800" data-testid="link-problems">
            <p className="font-semibold">Some values in the link could not be used and were replaced:</p>
            <ul className="mt-1 list-disc pl-5">
              {linkProblems.map((p) => (
                <li key={`${p.field}:${p.given}`}>{problemText(p)}</li>
              ))}
            </ul>
          </div>
        )}
        <div className="grid gap-4 md:grid-cols-2">
          <SetupDraftFields {...setupProps("current")} />
          <SetupDraftFields {...setupProps("planned")} />
        </div>
        <VehicleFields
          draft={s.draft.vehicle}
          defaults={defaultsText}
          errors={s.errors}
          prefs={prefs}
          onChange={(vehicle) => apply({ ...s.draft, vehicle })}
          onCommit={commit}
        />
        {garage && garage.vehicles.length > 0 && (
          <GaragePanel
            vehicles={garage.vehicles}
            vehicleId={vehicleId}
            planned={s.good.planned}
            prefs={prefs}
            onPick={pickVehicle}
            onLimits={setLimits}
            onUseVehicle={takeVehicle}
          />
        )}

        <div aria-labelledby="results-title" role="region" className="flex flex-col gap-6">
          <div className="flex min-h-10 flex-wrap items-center justify-between gap-2">
            <h2 id="results-title" className="sr-only">
              Results
            </h2>
            <p
              className={errorCount > 0 ? "rounded-lg bg-tight-100 px-3 py-2 text-sm text-tight-800" : "text-sm text-basalt-500"}
              data-testid="results-status"
            >
              {errorCount > 0
                ? `Showing the last complete comparison: ${errorCount === 1 ? "one field needs" : `${errorCount} fields need`} attention above.`
                : "Results follow your entries as you type."}
            </p>
          </div>
          <HeadlineChanges result={result} prefs={prefs} />
          <DrawingAndWarnings result={result} prefs={prefs} limits={vehicleId ? limits : null} />
          <ChartsSection result={result} prefs={prefs} />
          <LazySetupDetailTable result={result} prefs={prefs} />
        </div>
        {/* Mounted when scrolled near, so hydration on a phone skips them; reserves a little under their heights at 375–1280 px. */}
        <MountWhenNear label="Loading load and pressure" reserve="min-h-[78rem] sm:min-h-[54rem] lg:min-h-[42rem]">
          <LoadPressurePanel currentTire={s.good.current.tire} plannedTire={s.good.planned.tire} prefs={prefs} />
        </MountWhenNear>
        <MountWhenNear label="Loading trail angles" reserve="min-h-[58rem] sm:min-h-[40rem] lg:min-h-[35rem]">
          <TrailAnglesPanel result={result} prefs={prefs} />
        </MountWhenNear>
      </div>
    </CurrentInputContext>
  );
}
