"use client";
import { useEffect, useRef } from "react";
import { buttonClass } from "@/components/ui/Button";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import type { StepPhoto } from "@/lib/shop/workOrders/api";

/**
 * One step photo full size over the sheet, as a phone shows a picture: the whole screen, closed
 * by its button or Escape; focus goes to the button and back to the sheet after.
 */
export function PhotoViewer({
  photo,
  title,
  timeZone,
  onClose,
}: {
  photo: StepPhoto;
  title: string;
  timeZone: string;
  onClose: () => void;
}) {
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    const back = document.activeElement as HTMLElement | null;
    close.current?.focus();
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") onClose();
    };
    document.addEventListener("keydown", onKey);
    return () => {
      document.removeEventListener("keydown", onKey);
      back?.focus();
    };
  }, [onClose]);
  return (
    <div
      role="dialog"
      aria-modal="true"
      aria-label={title}
      className="fixed inset-0 z-50 flex flex-col items-center justify-center gap-3 bg-basalt-900/90 p-3 print:hidden"
    >
      {/* The route answers the staff's session only; next/image's optimiser would fetch it without one. */}
      {/* eslint-disable-next-line @next/next/no-img-element */}
      <img src={photo.url} alt={title} className="max-h-[80vh] max-w-full object-contain" data-testid="photo-full" />
      <p className="text-sm text-white">
        {photo.name} · taken by {photo.takenBy}, {formatInstant(photo.createdAt, timeZone)}
      </p>
      <div className="flex gap-2">
        <button ref={close} type="button" className={buttonClass("secondary")} onClick={onClose}>
          Close
        </button>
        <a className="self-center text-sm text-white underline" href={photo.url} target="_blank" rel="noreferrer">
          Open in a new tab
        </a>
      </div>
    </div>
  );
}
