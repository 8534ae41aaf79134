"use client";
import { useState } from "react";
import { Button } from "@/components/ui/Button";
import type { Role, StepPosition } from "@/lib/platform/db/types";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import type { SignedOff, StepPhoto, WorkOrder } from "@/lib/shop/workOrders/api";
import { mayRemoveStepPhoto } from "@/lib/shop/workOrders/photoSchema";
import { signedText } from "@/lib/shop/workOrders/signedText";
import { MATCH_MOUNT_NOTE, LUG_NOTE, STEP_LABEL, type StepKind } from "@/lib/shop/workOrders/vocabulary";
import { StepForm } from "./StepForm";
import { StepPhotos } from "./StepPhotos";

const NOTES: Partial<Record<StepKind, string>> = { match_mount: MATCH_MOUNT_NOTE, lug_torque: LUG_NOTE };

/** One step: what was recorded and who signed it when, or the form to sign it (in the bay only), and its photos. */
export function StepCard({
  workOrder,
  position,
  step,
  signed,
  role,
  onSigned,
  onPhotoAdded,
  onPhotoRemoved,
}: {
  workOrder: WorkOrder;
  position: StepPosition;
  step: StepKind;
  signed: SignedOff | null;
  /** The caller's role: who may remove a photo (photoSchema.ts). */
  role: Role;
  onSigned: (w: WorkOrder) => void;
  onPhotoAdded: (p: StepPhoto) => void;
  onPhotoRemoved: (id: string) => void;
}) {
  const [editing, setEditing] = useState(false);
  const canSign = workOrder.status === "in_bay";
  const id = `${position}-${step}`;
  return (
    <li className="flex flex-col gap-2 border-t border-basalt-200 pt-3 first:border-0 first:pt-0" aria-labelledby={`${id}-title`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`${id}-title`} className="font-semibold">
          {STEP_LABEL[step]}
        </h3>
        {signed ? (
          <span className="text-sm text-clear-800" data-testid={`${id}-signed`}>
            ✓ Signed by {signed.signedBy}, {formatInstant(signed.signedAt, workOrder.timeZone)}
          </span>
        ) : (
          <span className="hidden text-sm print:inline">Signed: ____________ Date/time: ________</span>
        )}
      </div>
      {NOTES[step] && <p className="text-xs text-basalt-600">{NOTES[step]}</p>}
      {signed && <p className="text-sm text-basalt-800">{signedText(signed)}</p>}
      <StepPhotos
        workOrderId={workOrder.id}
        position={position}
        step={step}
        photos={workOrder.photos.filter((p) => p.position === position && p.step === step)}
        canAdd={canSign}
        canRemove={mayRemoveStepPhoto(role, !!signed, workOrder.status === "done")}
        onAdded={onPhotoAdded}
        onRemoved={onPhotoRemoved}
        timeZone={workOrder.timeZone}
      />
      {canSign && (!signed || editing) && (
        <StepForm
          workOrder={workOrder}
          position={position}
          step={step}
          onSigned={(w) => {
            setEditing(false);
            onSigned(w);
          }}
        />
      )}
      {canSign && signed && !editing && (
        <Button type="button" variant="secondary" className="self-start print:hidden" onClick={() => setEditing(true)}>
          Correct and sign again
        </Button>
      )}
    </li>
  );
}
