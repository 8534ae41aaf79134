"use client";
import type { ComponentProps } from "react";
import { TextField } from "@/components/ui/TextField";
import { labelOptions } from "@/components/ui/labelOptions";
import { cx } from "@/components/ui/cx";
import { Segmented } from "@/components/comparison/Segmented";
import { clientLazy } from "@/components/ui/clientLazy";
import type { SetupFigures } from "@/lib/comparisons/compute";
import type { DraftErrors, SetupDraft } from "@/lib/comparisons/draft";
import { BACKSPACING_REFERENCE_LABEL, POSITION_MODE_LABEL, SETUP_FIELD_LABEL as L } from "@/lib/setup/fields";
import { type DisplayPrefs, formatInches, formatLen, formatNumber } from "@/lib/comparisons/format";
import { parseTireSize } from "@/lib/fitment/tireSize";
import { BACKSPACING_DIAGRAM_BOX } from "./backspacingDiagramBox";

// Shown only with a backspacing entry (the demo comparison gives offsets), so its drawing is not
// first-load JavaScript. The stand-in is the same empty box, so nothing moves when it arrives.
const BackspacingDiagram = clientLazy(
  () => import("./BackspacingDiagram").then((m) => m.BackspacingDiagram),
  () => <svg {...BACKSPACING_DIAGRAM_BOX} aria-hidden="true" />,
);

type Side = "current" | "planned";
type DraftText = "diameter" | "width" | "offset" | "backspacing" | "flange" | "spacer";

function tireReading(text: string, prefs: DisplayPrefs): string | null {
  try {
    const t = parseTireSize(text);
    return `Reads as ${t.text} · ${formatLen(t.overallDiameterMm, prefs, { decimals: 1 })} tall, ${formatLen(t.sectionWidthMm, prefs, { decimals: 1 })} wide`;
  } catch {
    return null;
  }
}

/**
 * The workspace's inputs of one setup, on its form text (a lib/comparisons/draft SetupDraft, read
 * as you type without a form library; the forms elsewhere use components/setup/SetupFields).
 * `onChange` gets the whole new draft; `onCommit` marks the end of an edit (blur, or a discrete
 * choice) so the browser history gets one entry per edit.
 */
export function SetupDraftFields({
  side,
  draft,
  errors,
  figures,
  prefs,
  onChange,
  onTireChange,
  onModeChange,
  onCommit,
}: {
  side: Side;
  draft: SetupDraft;
  errors: DraftErrors;
  figures: SetupFigures;
  prefs: DisplayPrefs;
  onChange: (next: SetupDraft, discrete?: boolean) => void;
  onTireChange: (tire: string) => void;
  onModeChange: (mode: SetupDraft["mode"]) => void;
  onCommit: () => void;
}) {
  const e = (path: string) => errors[`${side}.${path}`];
  const set = (patch: Partial<SetupDraft>, discrete = false) => onChange({ ...draft, ...patch }, discrete);
  const title = side === "current" ? "Current setup" : "Planned setup";
  const reading = e("tire") ? null : tireReading(draft.tire, prefs);
  const id = (f: string) => `${side}-${f}`;
  /** A text figure of the draft: its label and message go by its field path. */
  const field = (
    k: DraftText,
    path: keyof typeof L,
    extra: Pick<ComponentProps<typeof TextField>, "inputMode" | "hint" | "placeholder">,
  ) => (
    <TextField label={L[path]} name={id(k)} value={draft[k]} onChange={(ev) => set({ [k]: ev.target.value })} error={e(path)} {...extra} />
  );
  return (
    <section
      aria-labelledby={id("title")}
      className={cx(
        "rounded-card bg-white p-4 shadow-card ring-1 sm:p-5",
        side === "current" ? "border-t-4 border-steel-500 ring-steel-100" : "border-t-4 border-dashed border-ember-500 ring-ember-100",
      )}
    >
      <h2 id={id("title")} className={cx("mb-3 text-lg font-semibold", side === "current" ? "text-steel-800" : "text-ember-800")}>
        {title}
      </h2>
      <div className="flex flex-col gap-3" onBlur={onCommit}>
        <TextField
          label={L.tire}
          name={id("tire")}
          value={draft.tire}
          autoComplete="off"
          spellCheck={false}
          onChange={(ev) => onTireChange(ev.target.value)}
          error={e("tire")}
          hint={reading ?? "e.g. 265/70R17, LT285/70R17 121/118Q or 37x12.50R17LT"}
        />
        <div className="grid grid-cols-2 gap-3">
          {field("diameter", "wheelDiameterIn", { inputMode: "decimal" })}
          {field("width", "wheelWidthIn", { inputMode: "decimal", hint: `suits ${figures.rimWidthMinIn}–${figures.rimWidthMaxIn} in` })}
        </div>
        <Segmented
          legend="Wheel position given as"
          name={id("mode")}
          value={draft.mode}
          options={labelOptions(POSITION_MODE_LABEL)}
          onChange={onModeChange}
        />
        {draft.mode === "offset" ? (
          field("offset", "position.offsetMm", {
            inputMode: "text",
            hint: `Minus for a wheel that sits further out. Backspacing ${formatInches(figures.backspacingFlangeIn, prefs)} to the flange edge, ${formatInches(figures.backspacingBeadSeatIn, prefs)} to the bead seat.`,
          })
        ) : (
          <div className="flex flex-col gap-3 rounded-lg bg-dune-50 p-3 ring-1 ring-dune-200">
            {field("backspacing", "position.backspacingIn", {
              inputMode: "text",
              hint: `Fractions work: 4-3/4, 4 3/4, 4¾ or 4.75. Offset ${formatNumber(figures.offsetMm, 1, { signed: true })} mm.`,
            })}
            <Segmented
              legend={L["position.reference"]}
              name={id("reference")}
              value={draft.reference}
              options={labelOptions(BACKSPACING_REFERENCE_LABEL, { capitalize: true })}
              onChange={(reference) => set({ reference }, true)}
            />
            <p className="text-xs text-basalt-600">
              A tape across the back of the wheel reads to the flange edge; the bead seat is the flange allowance further in.
            </p>
            <div className="grid grid-cols-[1fr_auto] items-end gap-3">
              {field("flange", "position.flangeIn", { inputMode: "text", hint: "usually 1/2" })}
              <BackspacingDiagram reference={draft.reference} />
            </div>
          </div>
        )}
        {field("spacer", "spacerMm", {
          inputMode: "text",
          placeholder: "none",
          hint:
            figures.spacerMm > 0
              ? `Acts as offset ${formatNumber(figures.effectiveOffsetMm, 1, { signed: true })} mm`
              : "Leave empty for none. In mm; inches need their unit, e.g. 1 in",
        })}
      </div>
    </section>
  );
}
