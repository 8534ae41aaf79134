"use client";
import Link from "next/link";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import type { Role } from "@/lib/platform/db/types";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import { type StepPhoto, type WorkOrder, unsignedSteps } from "@/lib/shop/workOrders/api";
import {
  BEAD_SEAT_CAUTION,
  POSITION_LABEL,
  RECHECK_NOTE,
  WORK_ORDER_STATUS_LABEL,
  WORK_ORDER_STATUS_TONE,
  positionsFor,
  stepsFor,
} from "@/lib/shop/workOrders/vocabulary";
import { StatusBar } from "./StatusBar";
import { StepCard } from "./StepCard";
import { TrailAngleChanges } from "./TrailAngleChanges";

/**
 * The work order: a column of wheel positions, each with its steps in the order they are done,
 * then the vehicle's. One column on a phone; on paper every step prints with its sign-off (or a
 * blank line to sign by hand), without the forms.
 */
export function WorkOrderSheet({
  initial,
  role,
  quoteOpen = true,
}: {
  initial: WorkOrder;
  role: Role;
  /** The caller may open the quote (staff open the ones they wrote): otherwise its number is plain text, not a link that answers "not found". */
  quoteOpen?: boolean;
}) {
  const [w, setW] = useState(initial);
  const photoAdded = (p: StepPhoto) => setW((cur) => ({ ...cur, photos: [...cur.photos, p] }));
  const photoRemoved = (id: string) => setW((cur) => ({ ...cur, photos: cur.photos.filter((p) => p.id !== id) }));
  const open = unsignedSteps(w).length;
  const sections = [...positionsFor(w.spare), "vehicle" as const].filter((p) => stepsFor(p, w).length);
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4 print:max-w-none print:gap-2">
      <header className="flex flex-col gap-1">
        <p className="text-sm text-basalt-600 print:hidden">
          {quoteOpen ? (
            <Link className="underline" href={`/shop/quotes/${w.quoteId}`}>
              Quote Q-{w.quoteNumber}
            </Link>
          ) : (
            <>Quote Q-{w.quoteNumber}</>
          )}
        </p>
        <h1 className="text-2xl font-bold">Work order · Q-{w.quoteNumber}</h1>
        <p className="text-basalt-700">
          {w.customerName} · {w.vehicleDescription} · {w.boltPattern} ({w.lugCount} lug nuts per wheel)
        </p>
        {w.bookedFor && <p className="text-sm text-basalt-600">Booked for {w.bookedFor}</p>}
        <p className="flex flex-wrap items-center gap-2 text-sm">
          <Badge tone={WORK_ORDER_STATUS_TONE[w.status]}>{WORK_ORDER_STATUS_LABEL[w.status]}</Badge>
          {w.status !== "done" && <span>{open === 0 ? "Every step is signed." : `${open} step${open === 1 ? "" : "s"} to sign.`}</span>}
          {w.startedBy && (
            <span className="text-basalt-600">
              In the bay since {formatInstant(w.startedAt!, w.timeZone)} ({w.startedBy})
            </span>
          )}
          {w.doneBy && (
            <span className="text-basalt-600">
              Done {formatInstant(w.doneAt!, w.timeZone)} ({w.doneBy})
            </span>
          )}
        </p>
      </header>
      <StatusBar workOrder={w} onChange={setW} />
      <Alert tone="warning" title="Bead seating and torque — the makers' instructions come first" className="print:py-1 print:text-xs">
        <ul className="mt-1 list-disc space-y-1 pl-5">
          {BEAD_SEAT_CAUTION.map((c) => (
            <li key={c}>{c}</li>
          ))}
          <li>
            Torque to the maker&apos;s figure with a torque wrench in calibration, in passes; never run one bolt straight to full torque.
          </li>
          <li>{RECHECK_NOTE}</li>
        </ul>
      </Alert>
      {w.trailAngles && <TrailAngleChanges angles={w.trailAngles} />}
      {sections.map((position) => (
        <Card
          key={position}
          className="flex flex-col gap-3 print:break-inside-avoid print:p-2 print:shadow-none"
          role="region"
          aria-label={POSITION_LABEL[position]}
        >
          <h2 className="text-lg font-semibold">{position === "vehicle" ? "Vehicle" : `${position} · ${POSITION_LABEL[position]}`}</h2>
          <ol className="flex flex-col gap-3">
            {stepsFor(position, w).map((step) => (
              <StepCard
                key={step}
                workOrder={w}
                position={position}
                step={step}
                signed={w.steps.find((s) => s.position === position && s.step === step) ?? null}
                role={role}
                onSigned={setW}
                onPhotoAdded={photoAdded}
                onPhotoRemoved={photoRemoved}
              />
            ))}
          </ol>
        </Card>
      ))}
      <Button type="button" variant="secondary" className="self-start print:hidden" onClick={() => window.print()}>
        Print this work order
      </Button>
    </div>
  );
}
