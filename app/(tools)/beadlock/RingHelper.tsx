"use client";
import { useEffect, useState, useSyncExternalStore } from "react";
import { Card } from "@/components/ui/Card";
import { BOLT_COUNT_LIMITS, tighteningSequence, torquePlan, type TorquePlan } from "@/lib/fitment";
import { PassTable } from "./PassTable";
import { RingCautions } from "./RingCautions";
import { RingDiagram } from "./RingDiagram";
import { RingInputs } from "./RingInputs";
import { RING_MEMORY_KEY, type RingMemory, readRingMemory } from "./ringMemory";
import { TickOff } from "./TickOff";
import { torquePair } from "./torqueText";
import { useTickOff } from "./useTickOff";
import { useTorqueEntry } from "./useTorqueEntry";

const noSubscribe = () => () => {};
const readKept = (): string | null => {
  try {
    return sessionStorage.getItem(RING_MEMORY_KEY);
  } catch {
    return null; // storage blocked: the helper works, it only forgets on a reload
  }
};

/**
 * The beadlock ring helper: bolt count and the maker's torque in, the crisscross order as a
 * diagram, the torque passes in both units, a per-pass tick-off, and a one-page print sheet
 * (diagram, passes with the order to tick by hand, cautions; the controls are not printed).
 */
export function RingHelper() {
  const [countText, setCountText] = useState("24");
  const torque = useTorqueEntry();

  const count = /^\d{1,3}$/.test(countText.trim()) ? Number(countText.trim()) : NaN;
  let sequence: number[] | null = null;
  let countError: string | undefined;
  try {
    sequence = tighteningSequence(count);
  } catch {
    countError = `Bolts on the ring: enter a whole number from ${BOLT_COUNT_LIMITS.min} to ${BOLT_COUNT_LIMITS.max} (e.g. 24).`;
  }
  // torque.nm is already read and range-checked, naming the field; the plan cannot refuse it.
  const plan: TorquePlan | null = sequence && torque.nm !== null ? torquePlan({ boltCount: sequence.length, torqueNm: torque.nm }) : null;
  // Without passes, say what stands in the way: a torque that is entered is not asked for again.
  const toFix = [countError ? "Bolts on the ring" : null, torque.error ? torque.label : null].filter((x): x is string => x !== null);
  const missing = [
    toFix.length > 0 ? `fix ${toFix.map((f) => `“${f}”`).join(" and ")}` : null,
    torque.nm === null && !torque.error ? "enter the ring maker's torque figure" : null,
  ]
    .filter((x): x is string => x !== null)
    .join(" and ");
  const noPasses = `${missing.charAt(0).toUpperCase()}${missing.slice(1)} to see the passes in ft·lb and N·m.`;
  const tick = useTickOff(plan ? `${plan.boltCount}|${plan.torqueNm}` : null, sequence ?? [], plan?.passes.length ?? 0);

  // A reload finds the ring as it was (ringMemory.ts). Read once hydrated (the page is
  // prerendered; `undefined` until then), as a render-time update; nothing is written before,
  // so the defaults never overwrite what was kept.
  const kept = useSyncExternalStore(noSubscribe, readKept, () => undefined);
  const [recalled, setRecalled] = useState(false);
  if (!recalled && kept !== undefined) {
    setRecalled(true);
    const m = readRingMemory(kept);
    if (m) {
      setCountText(m.countText);
      torque.restore(m.torque);
      if (m.ticks) tick.restore(m.ticks);
    }
  }
  const memory = JSON.stringify({ countText, torque: torque.entry, ticks: tick.saved } satisfies RingMemory);
  useEffect(() => {
    if (!recalled) return;
    try {
      sessionStorage.setItem(RING_MEMORY_KEY, memory);
    } catch {
      // Storage blocked or full: nothing to keep it in; the screen is unaffected.
    }
  }, [recalled, memory]);

  return (
    // On paper: the diagram on the left, the summary and cautions beside it, the passes below (one page).
    <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)] print:grid-cols-[7cm_minmax(0,1fr)] print:gap-x-6 print:gap-y-3 print:[grid-template-areas:'d_s'_'d_c'_'p_p']">
      {plan && (
        <p data-testid="print-summary" className="hidden text-sm font-semibold print:block print:[grid-area:s]">
          {`Beadlock ring, ${plan.boltCount} bolts — maker's torque ${torquePair(plan.torqueNm, torque.unit, true)}. Bolt 1 is the first clockwise from the valve stem.`}
        </p>
      )}
      <div className="flex flex-col gap-5 print:contents">
        <RingInputs countText={countText} onCountText={setCountText} countError={countError} torque={torque} />
        <RingCautions className="print:[grid-area:c]" />
        <Card className="min-h-72 print:min-h-0 print:p-0 print:shadow-none print:ring-0 print:[grid-area:p]">
          <h2 className="text-lg font-semibold print:hidden">Passes</h2>
          {plan ? (
            <>
              <p className="mt-1 text-sm text-basalt-600">
                Start bolts {plan.startBolts.join(", ")} by hand (one per quadrant), then go round in the order shown at each pass.
              </p>
              <PassTable plan={plan} unit={torque.unit} />
              <p className="mt-2 text-xs text-basalt-500">
                Passes at 30, 60 and 100 % and a check pass are common practice (no source); the maker&apos;s steps win.
              </p>
            </>
          ) : (
            <p className="mt-1 text-sm text-basalt-600" data-testid="passes-missing">
              {noPasses}
            </p>
          )}
        </Card>
      </div>
      <Card className="flex flex-col items-center print:p-0 print:shadow-none print:ring-0 print:[grid-area:d]">
        <h2 className="self-start text-lg font-semibold print:hidden">Order</h2>
        {sequence ? (
          <>
            <RingDiagram
              sequence={sequence}
              done={plan ? tick.done : undefined}
              next={plan ? tick.next : null}
              onBoltClick={plan ? tick.toggle : undefined}
            />
            <p className="mt-2 self-start text-sm text-basalt-700 print:text-xs" data-testid="ring-legend">
              <span className="font-semibold">Big number:</span> the bolt, counted clockwise from the valve stem.{" "}
              <span className="font-semibold">Small “step”:</span> its place in the tightening order.
            </p>
            {/* The passes table carries the order on paper, with a box per bolt. */}
            <p className="mt-1 self-start text-sm text-basalt-700 print:hidden" data-testid="ring-order">
              <span className="font-semibold">Bolt order:</span> {sequence.join(" → ")}
            </p>
            <p className="mt-1 self-start text-xs text-basalt-500">
              Each bolt is followed by the one opposite it (common practice, no source).
            </p>
            {plan ? (
              <TickOff plan={plan} unit={torque.unit} tick={tick} />
            ) : (
              <p className="no-print mt-3 self-start text-sm text-basalt-600">
                Enter the maker&apos;s torque to tick off the bolts pass by pass.
              </p>
            )}
          </>
        ) : (
          <p className="min-h-96 text-sm text-basalt-600">Enter the bolt count to draw the ring.</p>
        )}
      </Card>
    </div>
  );
}
