"use client";
import { useCallback, useId, useState } from "react";
import { Button } from "@/components/ui/Button";
import { cx } from "@/components/ui/cx";
import { api } from "@/lib/platform/client/api";
import { MAX_PHOTO_BYTES, PHOTO_HINT, photoTooBigFor } from "@/lib/garage/photos/limits";
import { sendPhoto } from "@/lib/garage/photos/sendPhoto";
import type { StepPhoto } from "@/lib/shop/workOrders/api";
import { MAX_PHOTOS_PER_STEP } from "@/lib/shop/workOrders/photoSchema";
import type { StepPosition } from "@/lib/platform/db/types";
import { STEP_LABEL, type StepKind } from "@/lib/shop/workOrders/vocabulary";
import { PhotoViewer } from "./PhotoViewer";

/** The upload control's look: a label that opens the file input (the input itself is visually hidden). */
const PICK =
  "cursor-pointer rounded-lg bg-white px-3 py-2 text-sm font-semibold text-basalt-900 ring-1 ring-inset ring-basalt-300 hover:bg-basalt-50 focus-within:outline-2 focus-within:outline-ember-500";

/**
 * A step's photos as a technician uses them with a phone in the bay: take one with the camera or
 * pick several from the phone, see them as thumbnails on the step, open one full size, remove a
 * wrong one. Uploads go one after another, each with its progress; size and type are checked as
 * the garage's uploads are (lib/garage/photos/limits.ts), the server checking again from the bytes.
 */
export function StepPhotos({
  workOrderId,
  position,
  step,
  photos,
  canAdd,
  canRemove,
  onAdded,
  onRemoved,
  timeZone,
}: {
  workOrderId: string;
  position: StepPosition;
  step: StepKind;
  photos: StepPhoto[];
  /** The work order is in the bay. */
  canAdd: boolean;
  /** mayRemoveStepPhoto for the caller and this step. */
  canRemove: boolean;
  onAdded: (p: StepPhoto) => void;
  onRemoved: (id: string) => void;
  /** The shop's, for the time a photo was taken. */
  timeZone: string;
}) {
  const ids = useId();
  const what = `${position} ${STEP_LABEL[step].toLowerCase()}`;
  const [progress, setProgress] = useState<{ name: string; pct: number } | null>(null);
  const [message, setMessage] = useState<{ tone: "error" | "ok"; text: string } | null>(null);
  const [open, setOpen] = useState<StepPhoto | null>(null);
  const [removing, setRemoving] = useState<string | null>(null);
  const closeViewer = useCallback(() => setOpen(null), []);

  async function upload(files: File[]) {
    let room = MAX_PHOTOS_PER_STEP - photos.length;
    for (const file of files) {
      setMessage(null);
      if (room <= 0) {
        setMessage({ tone: "error", text: `This step already has ${MAX_PHOTOS_PER_STEP} photos: remove one before adding another.` });
        return;
      }
      if (file.size > MAX_PHOTO_BYTES) {
        setMessage({ tone: "error", text: photoTooBigFor(file.name) });
        continue;
      }
      setProgress({ name: file.name, pct: 0 });
      try {
        const photo = await sendPhoto<StepPhoto>(`/api/shop/work-orders/${workOrderId}/photos`, file, { position, step }, (pct) =>
          setProgress({ name: file.name, pct }),
        );
        room--;
        onAdded(photo);
        setMessage({ tone: "ok", text: `${file.name} added.` });
      } catch (e) {
        setMessage({ tone: "error", text: `${file.name}: ${(e as Error).message}` });
      } finally {
        setProgress(null);
      }
    }
  }

  async function remove(p: StepPhoto) {
    setMessage(null);
    setRemoving(p.id);
    try {
      await api(p.url, { method: "DELETE" });
      onRemoved(p.id);
      setMessage({ tone: "ok", text: `${p.name} removed.` });
    } catch (e) {
      setMessage({ tone: "error", text: (e as Error).message });
    } finally {
      setRemoving(null);
    }
  }

  if (!photos.length && !canAdd) return null;
  const picker = (suffix: string, label: string, extra: { capture?: "environment"; multiple?: boolean }) => (
    <label htmlFor={`${ids}-${suffix}`} className={PICK}>
      {label}
      <input
        id={`${ids}-${suffix}`}
        type="file"
        accept="image/*"
        className="sr-only"
        disabled={!!progress}
        {...extra}
        onChange={(e) => {
          const files = Array.from(e.target.files ?? []);
          e.target.value = "";
          void upload(files);
        }}
        aria-describedby={`${ids}-hint`}
      />
    </label>
  );
  return (
    <div className="flex flex-col gap-2">
      {photos.length > 0 && (
        <ul className="flex flex-wrap gap-2" aria-label={`Photos of ${what}`}>
          {photos.map((p) => (
            <li key={p.id} className="flex flex-col items-start gap-1">
              <button
                type="button"
                className="overflow-hidden rounded-lg ring-1 ring-basalt-200 focus-visible:outline-2 focus-visible:outline-ember-500"
                onClick={() => setOpen(p)}
                aria-label={`Open photo ${p.name} full size`}
              >
                {/* The route answers the staff's session only; next/image's optimiser would fetch it without one. */}
                {/* eslint-disable-next-line @next/next/no-img-element */}
                <img src={p.thumbUrl} alt={`Thumbnail: ${p.name}`} width={96} height={96} className="size-24 object-cover print:size-16" />
              </button>
              {canRemove && (
                <Button
                  type="button"
                  variant="ghost"
                  className="min-h-8 px-2 py-1 text-xs print:hidden"
                  pending={removing === p.id}
                  onClick={() => void remove(p)}
                  aria-label={`Remove photo ${p.name}`}
                >
                  Remove
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
      {canAdd && (
        <div className="flex flex-wrap items-center gap-2 print:hidden">
          {picker("camera", "Take a photo", { capture: "environment" })}
          {picker("pick", "Add photos", { multiple: true })}
          <p id={`${ids}-hint`} className="text-xs text-basalt-500">
            {PHOTO_HINT}
          </p>
        </div>
      )}
      {progress && (
        <div className="w-full max-w-xs print:hidden">
          <progress className="h-2 w-full accent-ember-600" max={100} value={progress.pct} aria-label={`Uploading ${progress.name}`} />
          <p className="text-xs text-basalt-600">
            Uploading {progress.name}: {progress.pct}%
          </p>
        </div>
      )}
      <p aria-live="polite" className={cx("text-sm print:hidden", message?.tone === "error" ? "text-contact-600" : "text-clear-800")}>
        {message?.text}
      </p>
      {open && <PhotoViewer photo={open} title={`Photo of ${what}: ${open.name}`} timeZone={timeZone} onClose={closeViewer} />}
    </div>
  );
}
