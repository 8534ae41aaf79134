"use client";
import { useQueryClient } from "@tanstack/react-query";
import Image from "next/image";
import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/Button";
import { cx } from "@/components/ui/cx";
import { api } from "@/lib/platform/client/api";
import { PHOTO_ACCEPT, PHOTO_HINT, MAX_PHOTO_BYTES, photoTooBigFor } from "@/lib/garage/photos/limits";
import { sendPhoto } from "@/lib/garage/photos/sendPhoto";
import { queryKeys } from "@/lib/platform/query/keys";
import type { VehiclePhoto } from "@/lib/garage/types";

/** Drag-and-drop (or pick) photos for a vehicle or one of its clearance points. */
export function PhotoDrop({
  vehicleId,
  clearanceId = null,
  label,
  photos,
}: {
  vehicleId: string;
  clearanceId?: string | null;
  label: string;
  photos: VehiclePhoto[];
}) {
  const qc = useQueryClient();
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const [progress, setProgress] = useState<{ name: string; pct: number } | null>(null);
  const [message, setMessage] = useState<{ tone: "error" | "ok"; text: string } | null>(null);

  async function upload(files: FileList | File[]) {
    for (const file of Array.from(files)) {
      setMessage(null);
      if (file.size > MAX_PHOTO_BYTES) {
        setMessage({ tone: "error", text: photoTooBigFor(file.name) });
        continue;
      }
      setProgress({ name: file.name, pct: 0 });
      try {
        await sendPhoto<VehiclePhoto>(`/api/vehicles/${vehicleId}/photos`, file, { clearanceId }, (pct) =>
          setProgress({ name: file.name, pct }),
        );
        setMessage({ tone: "ok", text: `${file.name} uploaded.` });
        await qc.invalidateQueries({ queryKey: queryKeys.garage.vehicle(vehicleId) });
      } catch (e) {
        setMessage({ tone: "error", text: `${file.name}: ${(e as Error).message}` });
      } finally {
        setProgress(null);
      }
    }
  }

  async function remove(p: VehiclePhoto) {
    try {
      await api(`/api/photos/${p.id}`, { method: "DELETE" });
      await qc.invalidateQueries({ queryKey: queryKeys.garage.vehicle(vehicleId) });
    } catch (e) {
      setMessage({ tone: "error", text: (e as Error).message });
    }
  }

  return (
    <div className="flex flex-col gap-3">
      {photos.length > 0 && (
        <ul className="flex flex-wrap gap-3" aria-label={`${label}: photos`}>
          {photos.map((p) => (
            <li key={p.id} className="flex flex-col items-start gap-1">
              <a href={p.url} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-lg ring-1 ring-basalt-200">
                <Image
                  src={p.thumbUrl}
                  alt={`Photo: ${p.name}`}
                  width={120}
                  height={120}
                  unoptimized
                  className="size-[120px] object-cover"
                  data-testid="photo-thumb"
                />
              </a>
              <Button
                type="button"
                variant="ghost"
                className="min-h-8 px-2 py-1 text-xs"
                onClick={() => remove(p)}
                aria-label={`Delete photo ${p.name}`}
              >
                Delete
              </Button>
            </li>
          ))}
        </ul>
      )}
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setOver(false);
          void upload(e.dataTransfer.files);
        }}
        className={cx(
          "no-print flex flex-col items-center gap-2 rounded-lg border-2 border-dashed px-4 py-4 text-center text-sm",
          over ? "border-ember-500 bg-ember-50" : "border-basalt-300 bg-white",
        )}
        data-testid={`drop-${clearanceId ?? "vehicle"}`}
      >
        <p className="text-basalt-700">Drop a photo here, or</p>
        <label
          htmlFor={inputId}
          className="cursor-pointer rounded-lg bg-white px-3 py-1.5 font-semibold text-basalt-900 ring-1 ring-inset ring-basalt-300 hover:bg-basalt-50 focus-within:outline-2 focus-within:outline-ember-500"
        >
          Choose a photo for {label}
        </label>
        <input
          ref={input}
          id={inputId}
          type="file"
          accept={PHOTO_ACCEPT}
          className="sr-only"
          onChange={(e) => {
            if (e.target.files) void upload(e.target.files);
            e.target.value = "";
          }}
        />
        <p className="text-xs text-basalt-500">{PHOTO_HINT}</p>
        {progress && (
          <div className="w-full max-w-xs">
            <progress
              className="h-2 w-full accent-ember-600"
              max={100}
              value={progress.pct}
              aria-label={`Uploading ${progress.name}`}
              data-testid="upload-progress"
            />
            <p className="text-xs text-basalt-600">
              Uploading {progress.name}: {progress.pct}%
            </p>
          </div>
        )}
        <p
          aria-live="polite"
          className={cx("text-sm", message?.tone === "error" ? "text-contact-600" : "text-clear-800")}
          data-testid="upload-message"
        >
          {message?.text}
        </p>
      </div>
    </div>
  );
}
