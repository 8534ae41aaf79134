"use client";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { Segmented } from "@/components/comparison/Segmented";
import { formatNumber } from "@/lib/comparison/format";
import { BOLT_COUNT_LIMITS, FitmentInputError, tighteningSequence, torquePlan } from "@/lib/fitment";
import { RingDiagram } from "./RingDiagram";

const COMMON_COUNTS = [16, 24, 30, 32];

export function RingHelper() {
  const [countText, setCountText] = useState("24");
  const [torqueText, setTorqueText] = useState("");
  const [unit, setUnit] = useState<"ftlb" | "nm">("ftlb");

  const count = /^\d{1,3}$/.test(countText.trim()) ? Number(countText.trim()) : NaN;
  let sequence: number[] | null = null;
  let countError: string | undefined;
  try {
    sequence = tighteningSequence(count);
  } catch {
    countError = `Enter a whole number of bolts from ${BOLT_COUNT_LIMITS.min} to ${BOLT_COUNT_LIMITS.max} (e.g. 24).`;
  }
  const torque = /^\s*(\d+(\.\d*)?|\.\d+)\s*$/.test(torqueText) ? Number(torqueText) : NaN;
  let plan: ReturnType<typeof torquePlan> | null = null;
  let torqueError: string | undefined;
  if (torqueText.trim() !== "" && sequence) {
    try {
      plan = torquePlan(unit === "ftlb" ? { boltCount: count, torqueFtLb: torque } : { boltCount: count, torqueNm: torque });
    } catch (e) {
      torqueError = e instanceof FitmentInputError && Number.isFinite(torque)
        ? `The figure must be between 1 and ${unit === "ftlb" ? "1500 ft·lb" : "2000 N·m"} — check the ring maker's instructions.`
        : `Enter the ring maker's figure as a number, like ${unit === "ftlb" ? "17" : "23"}.`;
    }
  }

  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <div className="flex flex-col gap-5">
        <Card>
          <div className="flex flex-wrap items-end gap-4">
            <TextField className="w-40" label="Bolts on the ring" name="ring-bolts" inputMode="numeric" value={countText} onChange={(e) => setCountText(e.target.value)} error={countError} hint={`Common: ${COMMON_COUNTS.join(", ")}`} />
            <TextField className="w-44" label={`Maker's torque (${unit === "ftlb" ? "ft·lb" : "N·m"})`} name="ring-torque" inputMode="decimal" value={torqueText} placeholder="from the maker" onChange={(e) => setTorqueText(e.target.value)} error={torqueError} hint="Printed in the ring maker's instructions" />
            <Segmented legend="Torque unit" name="ring-unit" value={unit} options={[{ value: "ftlb", label: "ft·lb" }, { value: "nm", label: "N·m" }]} onChange={setUnit} className="mb-6" />
          </div>
        </Card>
        <Alert tone="warning" title="Before you start">
          <ul className="mt-1 list-disc space-y-1 pl-5">
            <li>Seat beads in a safety cage, or with a clip-on air chuck and an in-line gauge while you stand clear — never lean over a tire being inflated.</li>
            <li>Never exceed the bead-seating pressure printed on the sidewall. If the bead will not seat at that pressure, deflate and find out why.</li>
            <li>Re-check the ring bolts after the first run and after every time you air down, and at the intervals the maker gives.</li>
            <li>Follow the wheel and ring maker&apos;s instructions: their bolt, torque, order and lubrication wins over anything here. When in doubt, have a tire shop do it.</li>
          </ul>
        </Alert>
        <Card className="min-h-72">
          <h2 className="text-lg font-semibold">Passes</h2>
          {plan ? (
            <>
              <p className="mt-1 text-sm text-basalt-600">
                Start bolts {plan.startBolts.join(", ")} by hand (one per quadrant), then go round in the order shown at each pass.
              </p>
              <table className="mt-3 w-full text-sm tabular-nums" data-testid="torque-passes">
                <thead>
                  <tr className="border-b border-basalt-200 text-left">
                    <th scope="col" className="py-1.5">Pass</th>
                    <th scope="col" className="py-1.5 text-right">Share</th>
                    <th scope="col" className="py-1.5 text-right">ft·lb</th>
                    <th scope="col" className="py-1.5 text-right">N·m</th>
                  </tr>
                </thead>
                <tbody>
                  {plan.passes.map((p) => (
                    <tr key={p.pass} className="border-b border-basalt-100">
                      <th scope="row" className="py-1.5 text-left font-medium">{p.kind === "check" ? `${p.pass}: check every bolt` : `${p.pass}`}</th>
                      <td className="py-1.5 text-right">{Math.round(p.fraction * 100)} %</td>
                      <td className="py-1.5 text-right">{formatNumber(p.torqueFtLb, 1)}</td>
                      <td className="py-1.5 text-right">{formatNumber(p.torqueNm, 1)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              <p className="mt-2 text-xs text-basalt-500">Passes at 30, 60 and 100 % and a check pass are common practice (no source); the maker&apos;s steps win.</p>
            </>
          ) : (
            <p className="mt-1 text-sm text-basalt-600">Enter the ring maker&apos;s torque figure to see the passes in ft·lb and N·m.</p>
          )}
        </Card>
      </div>
      <Card className="flex flex-col items-center">
        <h2 className="self-start text-lg font-semibold">Order</h2>
        {sequence ? (
          <>
            <RingDiagram sequence={sequence} />
            <p className="mt-2 self-start text-sm text-basalt-700" data-testid="ring-order">
              <span className="font-semibold">Bolt order:</span> {sequence.join(" → ")}
            </p>
            <p className="mt-1 self-start text-xs text-basalt-500">
              Bolt 1 is the first clockwise from the valve stem. Each bolt is followed by the one opposite it (common practice, no source).
            </p>
          </>
        ) : (
          <p className="min-h-96 text-sm text-basalt-600">Enter the bolt count to draw the ring.</p>
        )}
      </Card>
    </div>
  );
}
