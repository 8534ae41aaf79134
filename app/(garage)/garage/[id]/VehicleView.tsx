"use client";
import { useMutation, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import dynamic from "next/dynamic";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button, buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { MountWhenNear } from "@/components/ui/MountWhenNear";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { formatBoltPattern, parseBoltPattern, setupGeometry } from "@/lib/fitment";
import { bothUnits, setupLine } from "@/lib/garage/format";
import type { VehicleDetail } from "@/lib/garage/types";
import { CLEARANCE_DIRECTION_LABEL, FRONT_SUSPENSION_LABEL, SUSPENSION_STATE_LABEL } from "@/lib/garage/schema";
import { type Setup, toEngineSetup } from "@/lib/setup/model";
import { PhotoDrop } from "../_components/PhotoDrop";
import { AddPoint } from "./AddPoint";
import { DeletePoint } from "./DeletePoint";
import { useLoadProfile } from "./useLoadProfile";

// Below the fold on a phone: their code (forms, zod schemas, the predictions) loads when scrolled near.
const LoadProfileCard = dynamic(() => import("./LoadProfileCard").then((m) => m.LoadProfileCard), { ssr: false });
const PlannedPanel = dynamic(() => import("./PlannedPanel").then((m) => m.PlannedPanel), { ssr: false });

export function VehicleView({ initial, initialPlanned }: { initial: VehicleDetail; initialPlanned: Setup | null }) {
  const id = initial.vehicle.id;
  const router = useRouter();
  const q = useQuery({
    queryKey: queryKeys.garage.vehicle(id),
    queryFn: () => api<VehicleDetail>(`/api/vehicles/${id}`),
    initialData: initial,
  });
  const { vehicle: v, clearances, photos } = q.data;
  const loadProfile = useLoadProfile(id).data?.profile ?? null;
  // The Units switch sits on the placard card below; every length on the page follows it.
  const [prefs] = useDisplayPrefs();
  const len = (mm: number) => bothUnits(mm, prefs);
  const [confirming, setConfirming] = useState(false);
  const del = useMutation({
    mutationFn: () => api(`/api/vehicles/${id}`, { method: "DELETE" }),
    // The garage list is rendered on the server: the refresh after the move shows it without the vehicle.
    onSuccess: () => {
      router.push("/garage");
      router.refresh();
    },
  });
  const current = setupGeometry(toEngineSetup(v.currentSetup));
  const bp = parseBoltPattern(v.boltPattern);
  const row = (k: string, val: string | null) => (
    <div className="flex justify-between gap-3 border-b border-basalt-100 py-1.5 text-sm last:border-0">
      <dt className="text-basalt-600">{k}</dt>
      <dd className="text-right font-medium">{val ?? "—"}</dd>
    </div>
  );
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold text-basalt-950">{v.name}</h1>
          <p className="mt-1 text-basalt-600">{[v.year, v.make, v.model, v.trim].filter(Boolean).join(" ") || "No description"}</p>
        </div>
        <div className="no-print flex flex-wrap gap-2">
          <Link href={`/garage/${id}/edit`} className={buttonClass("secondary")}>
            Edit
          </Link>
          <Link href={`/garage/${id}/finder`} className={buttonClass("secondary")}>
            Fitment finder
          </Link>
          {!confirming ? (
            <Button variant="ghost" onClick={() => setConfirming(true)}>
              Delete vehicle
            </Button>
          ) : (
            <span className="flex items-center gap-2">
              <span className="text-sm">Delete it with its points and photos?</span>
              <Button variant="danger" pending={del.isPending} onClick={() => del.mutate()}>
                Yes, delete
              </Button>
              <Button variant="ghost" onClick={() => setConfirming(false)}>
                Keep
              </Button>
            </span>
          )}
        </div>
      </div>
      {del.isError && <Alert tone="error">{(del.error as Error).message}</Alert>}

      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-2">
        <Card>
          <h2 className="text-lg font-semibold">Details</h2>
          <dl className="mt-2">
            {row("Front suspension", FRONT_SUSPENSION_LABEL[v.frontSuspension])}
            {row("Bolt pattern", `${formatBoltPattern(bp, "in")} in = ${formatBoltPattern(bp, "mm")} mm`)}
            {row("Hub bore", v.hubBoreMm === null ? null : len(v.hubBoreMm))}
            {row("Lift height", v.liftHeightMm === null ? null : len(v.liftHeightMm))}
            {row("Kingpin inclination", v.kingpinInclinationDeg === null ? null : `${v.kingpinInclinationDeg}°`)}
            {row("Axle ratio", v.axleRatio === null ? null : v.axleRatio.toFixed(2))}
            {row("Top-gear ratio", v.transmissionRatio === null ? null : v.transmissionRatio.toFixed(2))}
            {row("Stock setup", setupLine(v.stockSetup))}
            {row("Current setup", setupLine(v.currentSetup))}
            {row("Current tire diameter", len(current.overallDiameterMm))}
            {row("Current reach inboard / outboard of the hub face", `${len(current.innerSwingMm)} / ${len(current.outerSwingMm)}`)}
          </dl>
          {v.notes && <p className="mt-3 whitespace-pre-line text-sm text-basalt-700">{v.notes}</p>}
        </Card>
        <Card>
          <h2 className="text-lg font-semibold">Photos of the vehicle</h2>
          <div className="mt-3">
            <PhotoDrop vehicleId={id} label="the vehicle" photos={photos.filter((p) => p.clearanceId === null)} />
          </div>
        </Card>
      </div>

      <Card>
        <h2 className="text-lg font-semibold">Measured clearances</h2>
        <p className="mt-1 text-sm text-basalt-600">
          Gaps you measured from the tire to the nearest part, each with the setup fitted at the time.
        </p>
        {clearances.length === 0 ? (
          <p className="mt-3 text-sm text-basalt-700">
            No points yet. Measure the tightest spots (frame at full lock, fender at full stuff) and add them below.
          </p>
        ) : (
          <ul className="mt-4 flex flex-col gap-4" aria-label="Measured points">
            {clearances.map((c) => (
              <li key={c.id} className="rounded-lg border border-basalt-200 p-3" data-testid="clearance-point">
                <div className="flex flex-wrap items-start justify-between gap-2">
                  <div>
                    <p className="font-semibold">{c.label}</p>
                    <p className="text-sm text-basalt-600">
                      {CLEARANCE_DIRECTION_LABEL[c.direction]} · {SUSPENSION_STATE_LABEL[c.suspensionState]} · {len(c.distanceMm)} (entered
                      as {c.distanceText})
                    </p>
                    <p className="text-xs text-basalt-500">Measured with {setupLine(c.measuredSetup)}</p>
                  </div>
                  <DeletePoint vehicleId={id} clearanceId={c.id} label={c.label} />
                </div>
                <div className="mt-2">
                  <PhotoDrop vehicleId={id} clearanceId={c.id} label={c.label} photos={photos.filter((p) => p.clearanceId === c.id)} />
                </div>
              </li>
            ))}
          </ul>
        )}
        <AddPoint vehicleId={id} />
      </Card>

      {/* Below the fold on a phone: mounted when scrolled near, so hydrating the page skips their forms. Reserves are
          under their heights at 375–1280 px (the plan grows with the measured points). */}
      <MountWhenNear label="Loading placard, axle weights and body points" reserve="min-h-[120rem] sm:min-h-[80rem] lg:min-h-[60rem]">
        <LoadProfileCard vehicle={v} />
      </MountWhenNear>

      <MountWhenNear label="Loading plan a setup" reserve="min-h-[64rem] sm:min-h-[60rem] lg:min-h-[40rem]">
        <PlannedPanel detail={q.data} initialPlanned={initialPlanned} loadProfile={loadProfile} />
      </MountWhenNear>
    </div>
  );
}
